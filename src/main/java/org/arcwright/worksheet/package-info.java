/**
 * The part worksheet: every radius feature of one part with its design case, the chosen
 * recommendation and, once measured, the inspection result. Saved as JSON with the {@code .arcpart}
 * extension (see {@code docs/decisions/0002-part-worksheet-file.md}).
 *
 * <p>May import: the JDK, Jackson and the core packages. Must not import Swing/AWT or print.
 */
package org.arcwright.worksheet;
