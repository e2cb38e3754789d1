/**
 * The window's frame: the layout of the panels, the command catalog behind the menus, shortcuts
 * and command finder, the file commands, the status line, and the wiring of the panels to the
 * services loaded once for the window.
 *
 * <p>May import: every {@code app} panel package, {@code app.widgets}, {@code app.model} and the
 * core. No panel package imports this one; {@code app} (the entry point) starts it.
 */
package org.arcwright.app.shell;
