/**
 * The desktop window: FlatLaf and MigLayout views over view models, each a thin shell that binds
 * controls to a model and dispatches actions to the core.
 *
 * <p>May import: Swing/AWT, FlatLaf, MigLayout, JFreeChart and every core package. Core packages
 * must never import this one.
 */
package org.arcwright.app;
