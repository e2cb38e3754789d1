/**
 * The window's frame: the layout of the panels, the command catalog behind the menus, shortcuts
 * and command finder, the file commands, the status line, and the wiring of the panels to the
 * services loaded once for the window.
 *
 * <p>May import: the JDK, Swing/AWT, FlatLaf, MigLayout, the core packages, {@code org.arcwright.render},
 * {@code org.arcwright.services}, {@code org.arcwright.app.model}, {@code org.arcwright.app.widgets} and
 * the panels ({@code org.arcwright.app.check}, {@code org.arcwright.app.decide},
 * {@code org.arcwright.app.notes}, {@code org.arcwright.app.part}, {@code org.arcwright.app.practice},
 * {@code org.arcwright.app.simulate}, {@code org.arcwright.app.stress}, {@code org.arcwright.app.zoneview}).
 * No panel package imports this one; {@code app} (the entry point) starts it.
 */
package org.arcwright.app.shell;
