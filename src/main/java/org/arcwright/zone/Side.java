package org.arcwright.zone;

/** A side of a directed contour, looking along its direction of travel. */
public enum Side {
    LEFT,
    RIGHT
}
