/**
 * Fillet mechanics: what a radius tolerance does to strength and to fit.
 *
 * <h2>Main abstractions</h2>
 * <ul>
 *   <li>{@link org.arcwright.mechanics.StressConcentration}: Peterson's curve fits for shoulder
 *       fillets ({@link org.arcwright.mechanics.PetersonFits}), giving K<sub>t</sub> with a
 *       {@code withinFit} flag so extrapolation is never silent.</li>
 *   <li>{@link org.arcwright.mechanics.NotchSensitivity}: Neuber's constant for steels from
 *       Shigley's cubic fits, q and K<sub>f</sub>.</li>
 *   <li>{@link org.arcwright.mechanics.FilletStressAnalysis}: K<sub>t</sub> and K<sub>f</sub> at the
 *       smallest, nominal and largest radius ({@link org.arcwright.mechanics.FilletStressReport}) and
 *       the inverse, the smallest radius that meets a target
 *       ({@link org.arcwright.mechanics.MinimumRadius}).</li>
 *   <li>{@link org.arcwright.mechanics.ClearanceAnalysis}: whether the largest fillet still lets a
 *       mating part ({@link org.arcwright.mechanics.MatingCorner}: chamfer at any angle, radius, or a
 *       rolling bearing from {@link org.arcwright.mechanics.BearingSeatTable}) seat flush, and the
 *       shoulder support left.</li>
 *   <li>{@link org.arcwright.mechanics.FilletMechanics}: all of the above wired together from the
 *       packs in force, for the advisor and the shells.</li>
 *   <li>{@link org.arcwright.mechanics.EdgeState}: ISO 13715 edges of undefined shape and the ASME
 *       note that says the same.</li>
 * </ul>
 *
 * <p>Everything here is a handbook estimate for design guidance; results carry
 * {@link org.arcwright.mechanics.Cautions}. Fatigue-critical parts need analysis or test to the
 * governing code and a licensed engineer's judgement.
 *
 * <p>May import: the JDK, Jackson, {@code org.arcwright.io}, {@code org.arcwright.tolerance} and
 * {@code org.arcwright.pack}. Must not import Swing/AWT, the shells or render, and never prints.
 */
package org.arcwright.mechanics;
