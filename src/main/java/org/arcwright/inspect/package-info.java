/**
 * Conformance of measured contours: does a measured section of a fillet or round meet its callout,
 * and why.
 *
 * <h2>Main abstractions</h2>
 * <ul>
 *   <li>{@link org.arcwright.inspect.Inspector}: the service. An
 *       {@link org.arcwright.inspect.InspectionRequest} in (nominal, callout, points), an
 *       {@link org.arcwright.inspect.InspectionResult} out; used by the CLI and the desktop app alike.</li>
 *   <li>{@link org.arcwright.inspect.InspectionFiles}: reads the inspection file (JSON, points inline or
 *       in a CSV read by {@link org.arcwright.inspect.PointsCsv}) with located errors.</li>
 *   <li>{@link org.arcwright.inspect.InspectionCallout}: radius (R), controlled radius (CR), profile
 *       (located, partly or fully floating, dynamic, unequally disposed), composite profile.</li>
 *   <li>{@link org.arcwright.inspect.CircleFits}: Taubin, geometric least squares, minimum zone.</li>
 *   <li>{@link org.arcwright.inspect.ProfileCheck}: Chebyshev registration of a profile zone over the
 *       free degrees of freedom; {@link org.arcwright.inspect.ControlledRadiusCheck}: local radius,
 *       flats and reversals, each local radius with its uncertainty; {@link org.arcwright.inspect.Blend}:
 *       separating the blend from the legs; {@link org.arcwright.inspect.AdjacentSurfaces}: the surfaces
 *       next to the blend, fitted to the points (robust orthogonal lines), on which R and CR zones are
 *       built (ADR 0302).</li>
 *   <li>{@link org.arcwright.inspect.Verdict}: pass, fail or indeterminate (ISO 14253-1 default rule
 *       when an uncertainty is stated, or when a CR window's local radius straddles a limit).</li>
 *   <li>{@link org.arcwright.inspect.InspectionJson}: the JSON form of a result;
 *       {@link org.arcwright.inspect.PointExcesses}: each point's excess and the allowance it is
 *       read against, for the plot and the window alike.</li>
 * </ul>
 *
 * <h2>Method</h2>
 * Minimax problems (minimum-zone circle, profile registration) are solved by successive linear
 * programmes with an active set of extreme points and a small dense simplex (ADR 0301); points are
 * kept in primitive arrays throughout, so a million-point section inspects in a 256 MB heap.
 *
 * <p>May import: the JDK, Jackson, {@code org.arcwright.io}, {@code org.arcwright.model}, {@code org.arcwright.tolerance} and
 * {@code org.arcwright.zone}. Must not import Swing/AWT or print.
 */
package org.arcwright.inspect;
