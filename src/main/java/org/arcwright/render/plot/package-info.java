/**
 * Charts of computed results, drawn with JFreeChart to PNG (Java2D into an image) and SVG
 * (JFreeSVG). {@link org.arcwright.render.plot.StressPlot}: K<sub>t</sub> and K<sub>f</sub>
 * against the fillet radius with the tolerance band shaded.
 *
 * <p>May import: the JDK, {@code java.awt} and {@code javax.imageio} (for drawing into images), the core
 * packages, JFreeChart and JFreeSVG.
 * Must not import javax.swing or the app, and opens no window.
 */
package org.arcwright.render.plot;
