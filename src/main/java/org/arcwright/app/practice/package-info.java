/**
 * The Practice editor: the rules of the active packs, checked as you type, and each pack's examples run in one click.
 *
 * <p>May import: the JDK, Swing/AWT, FlatLaf, MigLayout, the core packages, {@code org.arcwright.render}
 * and {@code org.arcwright.app.model}.
 */
package org.arcwright.app.practice;
