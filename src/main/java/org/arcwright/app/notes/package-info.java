/**
 * The Notes panel: practice notes searched as you type, facets, reading and writing a note.
 *
 * <p>May import: the JDK, Swing/AWT, MigLayout, the core packages, {@code org.arcwright.render}
 * and {@code org.arcwright.app.model}.
 */
package org.arcwright.app.notes;
