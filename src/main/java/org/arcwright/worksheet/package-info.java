/**
 * The part worksheet: every radius feature of one part with its design case, the chosen
 * recommendation and, once measured, the inspection result. Saved as JSON with the {@code .arcpart}
 * extension (see {@code docs/decisions/0002-part-worksheet-file.md}).
 *
 * <p>May import: the JDK, Jackson, {@code org.arcwright.io}, {@code org.arcwright.tolerance},
 * {@code org.arcwright.model} (the case vocabulary) and {@code org.arcwright.rules} (a chosen control is
 * the advisor's recommendation as kept). Must not import Swing/AWT or print.
 */
package org.arcwright.worksheet;
