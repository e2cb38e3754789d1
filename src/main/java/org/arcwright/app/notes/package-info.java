/** The Notes panel: practice notes searched as you type, facets, reading and writing a note. */
package org.arcwright.app.notes;
