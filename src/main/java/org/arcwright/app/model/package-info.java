/**
 * View models of the desktop window: state, validation and commands of each panel, with no Swing in
 * them, so that they are unit-tested without a screen. Views in the sibling packages only bind
 * controls to these and dispatch user actions to them.
 *
 * <p>May import: the JDK, Jackson and the core packages. Must not import Swing/AWT ({@code AppArchitectureTest}).
 */
package org.arcwright.app.model;
