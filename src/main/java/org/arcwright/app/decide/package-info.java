/**
 * The Decide panel: the guided form for one radius's case, the limits of the tolerance intent as
 * you type, and the recommendations as ranked cards to choose from.
 *
 * <p>May import: the JDK, Swing/AWT, MigLayout, the core packages, {@code org.arcwright.render},
 * {@code org.arcwright.app.model} and {@code org.arcwright.app.widgets}.
 */
package org.arcwright.app.decide;
