/**
 * Drawing results to images and documents: plots of measured contours against their zones (Java2D
 * to PNG, JFreeSVG to SVG), and later feature control frames and sheets.
 *
 * <p>May import: the JDK including {@code java.awt} and {@code javax.imageio}, JFreeSVG, JFreeChart,
 * PDFBox and the core packages. Must not import Swing or the app, and opens no window.
 */
package org.arcwright.render;
