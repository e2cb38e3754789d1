/**
 * The window's frame: themes, the command finder, menus and shortcuts built from one command
 * catalog, the status line, the notice strip, and the wiring of the panels.
 */
package org.arcwright.app.shell;
