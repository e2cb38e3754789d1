/**
 * Tolerance arithmetic for radii: callouts as drawn, their limits, the crescent-shaped zone they
 * define, the text forms of the ASME and ISO drawing styles, and general (title-block) tolerances.
 *
 * <h2>Main abstractions</h2>
 * <ul>
 *   <li>{@link org.arcwright.tolerance.RadiusCallout}: an R or CR dimension with one of the
 *       {@link org.arcwright.tolerance.ToleranceForm} kinds (equal or unequal bilateral, limits, a
 *       single limit, or none so that the general tolerance applies).</li>
 *   <li>{@link org.arcwright.tolerance.CalloutParser}: the trade's text forms, with errors that
 *       point at the column where reading stopped.</li>
 *   <li>{@link org.arcwright.tolerance.DrawingStyle}: ASME Y14.5 and ISO 129-1 text forms.</li>
 *   <li>{@link org.arcwright.tolerance.CrescentZone}: the true width of the zone between the
 *       smallest and largest arcs, and the profile zone that holds it.</li>
 *   <li>{@link org.arcwright.tolerance.GeneralToleranceTable}: ISO 2768-1 and company title-block
 *       tables, loaded from JSON.</li>
 * </ul>
 *
 * <p>May import: the JDK, Jackson and {@code org.arcwright.io}. Must not import Swing/AWT or print.
 */
package org.arcwright.tolerance;
