/**
 * The Zone view: the nominal blend, the zone its control allows, magnified deviations, zoom and pan.
 *
 * <p>May import: the JDK, Swing/AWT, MigLayout, the core packages, {@code org.arcwright.render},
 * {@code org.arcwright.app.model} and {@code org.arcwright.app.widgets}.
 */
package org.arcwright.app.zoneview;
