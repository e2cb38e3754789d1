/**
 * What both shells (the desktop window and the command line) load and call, so that the same
 * input gives the same answer in both: the practice in force (packs, rules, mechanics, note
 * templates, loaded once by {@link org.arcwright.services.Practice#load}), the advisor over it with
 * or without linked notes, and the tolerancing sheet ({@link org.arcwright.services.SheetService}).
 *
 * <p>May import: the JDK, every core package and {@code org.arcwright.render}. It uses {@code render}
 * only for the sheet. Swing-free and
 * silent: no Swing or AWT windows, nothing printed. Imported by {@code cli} and {@code app} only.
 */
package org.arcwright.services;
