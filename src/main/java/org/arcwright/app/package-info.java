/**
 * The desktop window: FlatLaf and MigLayout views over view models, each a thin shell that binds
 * controls to a model and dispatches actions to the core.
 *
 * <p>May import: the JDK, Swing/AWT, FlatLaf, MigLayout, JFreeChart, every core package,
 * {@code org.arcwright.app.model}, {@code org.arcwright.app.widgets} and {@code org.arcwright.app.shell} (the window it starts). Core
 * packages must never import this one.
 */
package org.arcwright.app;
