/**
 * The Stress view: Kt and Kf against the fillet radius, the tolerance band, the smallest radius for a target.
 *
 * <p>May import: the JDK, Swing/AWT, MigLayout, JFreeChart, the core packages, {@code org.arcwright.render},
 * {@code org.arcwright.render.plot}, {@code org.arcwright.app.model} and {@code org.arcwright.app.widgets}.
 */
package org.arcwright.app.stress;
