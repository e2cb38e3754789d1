/**
 * The Practice editor: the rules of the active packs as a form over their JSON, checked as you type, each pack's
 * examples run in one click; the note templates with the fields they may use and a live preview; the packs in force
 * and the team packs of the settings. New, Delete and Revert for rules and templates, asking first.
 *
 * <p>May import: the JDK, Swing/AWT, FlatLaf, MigLayout, the core packages, {@code org.arcwright.render},
 * {@code org.arcwright.app.model} and {@code org.arcwright.app.widgets}.
 */
package org.arcwright.app.practice;
