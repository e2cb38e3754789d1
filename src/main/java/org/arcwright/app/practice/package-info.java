/**
 * The Practice editor: the rules of the active packs, checked as you type, and each pack's examples run in one click.
 *
 * <p>May import: the JDK, Swing/AWT, FlatLaf, MigLayout, the core packages, {@code org.arcwright.render},
 * {@code org.arcwright.app.model} and {@code org.arcwright.app.widgets}.
 */
package org.arcwright.app.practice;
