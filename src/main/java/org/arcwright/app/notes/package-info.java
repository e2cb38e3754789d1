/**
 * The Notes panel: practice notes searched as you type, facets, reading and writing a note.
 *
 * <p>May import: the JDK, Swing/AWT, MigLayout, commonmark-java, the core packages, {@code org.arcwright.render},
 * {@code org.arcwright.app.model} and {@code org.arcwright.app.widgets}.
 */
package org.arcwright.app.notes;
