/**
 * What each callout lets through: a simulated population of parts from a process model, each
 * measured as a CMM would and judged by every candidate callout, against the function judged on the
 * generator's true geometry.
 *
 * <h2>Main abstractions</h2>
 * <ul>
 *   <li>{@link org.arcwright.simulate.ProcessModel}: radius and position scatter, flats, steps,
 *       measuring noise and scan density; {@link org.arcwright.simulate.Needs}: what the function
 *       asks of the true blend.</li>
 *   <li>{@link org.arcwright.simulate.PartGenerator}: draws a part's true geometry
 *       ({@link org.arcwright.simulate.Part}) and its measured section.</li>
 *   <li>{@link org.arcwright.simulate.SimulationRunner}: N parts × K callouts on all cores, each
 *       section judged by {@link org.arcwright.inspect.Inspector} (the engine behind
 *       {@code arcwright inspect}); the same seed gives the same counts on any number of threads.</li>
 *   <li>{@link org.arcwright.simulate.SimulationResult}: per callout the accepted, escape and
 *       false-reject counts with Wilson score intervals ({@link org.arcwright.simulate.Share}).</li>
 *   <li>{@link org.arcwright.simulate.SimulationFiles}: reads the process file (JSON) with located
 *       errors; corner and callouts have exactly the inspection file's shape and parser.</li>
 *   <li>{@link org.arcwright.simulate.ProcessDefaults}: a default process model per manufacturing
 *       process, for evidence on the advisor's candidates.</li>
 * </ul>
 *
 * <p>A simulated process is a model, not the shop's capability data: every report carries that
 * caution ({@link org.arcwright.simulate.SimulationResult#CAUTION}).
 *
 * <p>May import: the JDK, Jackson, Apache Commons RNG, {@code org.arcwright.io},
 * {@code org.arcwright.tolerance}, {@code org.arcwright.zone}, {@code org.arcwright.inspect} and
 * {@code org.arcwright.pack} (tables). Must not import Swing/AWT or print.
 */
package org.arcwright.simulate;
