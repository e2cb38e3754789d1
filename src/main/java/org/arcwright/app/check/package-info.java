/**
 * The Check panel: import a measured contour, run the inspection off the UI thread, show the verdict.
 *
 * <p>May import: the JDK, Swing/AWT, MigLayout, the core packages, {@code org.arcwright.render},
 * {@code org.arcwright.app.model} and {@code org.arcwright.app.widgets}.
 */
package org.arcwright.app.check;
