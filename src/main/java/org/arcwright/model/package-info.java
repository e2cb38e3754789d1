/**
 * The case vocabulary every layer may use: what an engineer says about one radius before any advice
 * is given. The advisor, the worksheet, the desktop forms, the sheets and the CLI all read and write
 * these types, so they live here rather than in any one of those layers.
 *
 * <h2>Main abstractions</h2>
 * <ul>
 *   <li>{@link org.arcwright.model.DesignCase}: one radius, with its section geometry
 *       ({@link org.arcwright.model.DesignCase.StressInputs}) and the mating corner it must seat under
 *       ({@link org.arcwright.model.DesignCase.MatingCorner}).</li>
 *   <li>{@link org.arcwright.model.BlendKind}, {@link org.arcwright.model.BlendFunction},
 *       {@link org.arcwright.model.Loading}, {@link org.arcwright.model.Process}: the closed lists a case
 *       chooses from, read and written by their file keys ({@link org.arcwright.model.Keys}).</li>
 * </ul>
 *
 * <p>Nothing here recommends, judges or computes a tolerance; the JSON form of a case is unchanged by
 * where these types live.
 *
 * <p>May import: the JDK, Jackson, {@code org.arcwright.io} and {@code org.arcwright.tolerance}.
 * Of {@code tolerance} a case uses the two vocabulary types it carries ({@code Units},
 * {@code DrawingStyle}) and {@code CalloutParser}, to refuse a mistyped tolerance where it is read; {@code tolerance} itself imports only the JDK, Jackson and {@code io}, so no
 * cycle can form. Must not import Swing/AWT or print.
 */
package org.arcwright.model;
