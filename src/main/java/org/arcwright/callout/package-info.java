/**
 * The controls a drawing can put on a fillet, round or edge: the closed family of callout kinds
 * that the advisor recommends, the renderer draws, the inspector evaluates and the worksheet stores.
 *
 * <h2>Kinds</h2>
 * <ul>
 *   <li>{@link org.arcwright.callout.Callout.General}: no dimension-level tolerance; the title
 *       block's general tolerance (e.g. ISO 2768-m) or an ISO 13715 edge note applies.</li>
 *   <li>{@link org.arcwright.callout.Callout.Radius} (R): limits on size only.</li>
 *   <li>{@link org.arcwright.callout.Callout.ControlledRadius} (CR, ASME only): size plus a fair
 *       curve without flats or reversals.</li>
 *   <li>{@link org.arcwright.callout.Callout.Profile}: profile of a surface, equal or unequally
 *       disposed, with or without datums, optionally dynamic.</li>
 *   <li>{@link org.arcwright.callout.Callout.CompositeProfile}: tiers sharing one symbol; the lower
 *       tiers refine form and orientation inside the located upper tier.</li>
 * </ul>
 * The JSON form uses a {@code type} field with the names {@code general}, {@code radius},
 * {@code controlled-radius}, {@code profile}, {@code composite-profile}.
 *
 * <p>May import: the JDK, Jackson, {@code org.arcwright.io} and {@code org.arcwright.tolerance}.
 * Must not import Swing/AWT or print.
 */
package org.arcwright.callout;
