/**
 * Drawing output: feature control frames and radius dimensions as a vector model, painted to SVG,
 * PNG, PDF and text; the part's tolerancing sheet exported as Markdown, HTML and PDF; and plots
 * of measured contours against their zones (Java2D to PNG, JFreeSVG to SVG).
 *
 * <h2>Main abstractions</h2>
 * <ul>
 *   <li>{@link org.arcwright.render.CalloutDrawing}: a callout laid out in millimetres on paper:
 *       its cells, the symbol geometry as vector shapes and the text labels. No window, no
 *       device: every painter draws the same model.</li>
 *   <li>{@link org.arcwright.render.CalloutLayout}: builds the model from a
 *       {@link org.arcwright.callout.Callout}, with symbols drawn from the standards' proportions
 *       ({@link org.arcwright.render.Symbols}).</li>
 *   <li>{@link org.arcwright.render.DrawingFont}: the bundled DejaVu Sans, so text measures and
 *       draws the same on every machine; text reaches SVG and PNG as glyph outlines.</li>
 *   <li>{@link org.arcwright.render.FrameRenderer}: the service the app and the command line
 *       call: SVG, PNG at any DPI, plain text and Unicode text of one callout.</li>
 *   <li>{@link org.arcwright.render.SheetExporter}: the tolerancing sheet of a part worksheet as
 *       Markdown, HTML or PDF, with an optional progress callback.</li>
 * </ul>
 *
 * <p>May import: the JDK including {@code java.awt} and {@code javax.imageio}, JFreeSVG, JFreeChart,
 * PDFBox, Jackson (annotations of request records) and the core packages. Must not import Swing or the
 * app, and opens no window.
 */
package org.arcwright.render;
