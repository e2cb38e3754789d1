/**
 * Nominal contours of a section through an edge, and the tolerance zones placed on them.
 *
 * <h2>Main abstractions</h2>
 * <ul>
 *   <li>{@link org.arcwright.zone.Corner}: two adjacent surfaces meeting at a vertex, with the side the
 *       material is on (a {@link org.arcwright.model.BlendKind}: the case vocabulary's round or fillet); the family of blends tangent to both.</li>
 *   <li>{@link org.arcwright.zone.Contour}: a chain of {@link org.arcwright.zone.Segment}s (lines and
 *       arcs) with an air side; signed deviation of points from it, positive toward air.</li>
 *   <li>{@link org.arcwright.zone.RadiusZone}: the zone of a radius tolerance (between the tangent
 *       arcs of the limit radii) and the envelope of radii a set of points allows.</li>
 *   <li>{@link org.arcwright.zone.ProfileZone}: a profile of a surface zone, equal or unequally
 *       disposed, with the ASME and ISO ways of stating the disposition.</li>
 * </ul>
 *
 * <p>All lengths are in the drawing's units; angles in radians unless a name says degrees. Points are
 * passed as primitive arrays so that a million of them cost 16 MB, not 50.
 *
 * <p>May import: the JDK, {@code org.arcwright.io} and {@code org.arcwright.model}. Must not import Swing/AWT or print.
 */
package org.arcwright.zone;
