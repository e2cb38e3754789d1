/**
 * The Part panel: the worksheet's radius features in a table, with add, duplicate and delete.
 *
 * <p>May import: the JDK, Swing/AWT, MigLayout, the core packages, {@code org.arcwright.render},
 * {@code org.arcwright.app.model} and {@code org.arcwright.app.widgets}.
 */
package org.arcwright.app.part;
