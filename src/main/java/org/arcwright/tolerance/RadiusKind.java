package org.arcwright.tolerance;

/**
 * The two radius dimensions of ASME Y14.5: a plain radius (R), whose zone is the crescent between
 * the limit arcs, and a controlled radius (CR), which adds that the contour be a fair curve without
 * flats or reversals (ASME Y14.5-2018, radius and controlled radius definitions, from memory). ISO
 * drawings know only R.
 */
public enum RadiusKind {
    R("R"),
    CR("CR");

    private final String symbol;

    RadiusKind(String symbol) { this.symbol = symbol; }

    /** The prefix as drawn. */
    public String symbol() { return symbol; }
}
