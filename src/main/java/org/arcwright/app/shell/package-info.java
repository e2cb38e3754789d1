/**
 * The window's frame: themes, the command finder, menus and shortcuts built from one command
 * catalog, the status line, the notice strip, and the wiring of the panels.
 *
 * <p>May import: the JDK, Swing/AWT, FlatLaf, MigLayout, the core packages, {@code org.arcwright.render},
 * {@code org.arcwright.app.model} and the panels ({@code app.check}, {@code app.decide}, {@code app.notes},
 * {@code app.part}, {@code app.practice}, {@code app.stress}, {@code app.zoneview}).
 */
package org.arcwright.app.shell;
