/**
 * Drawing-note templates: title-block general notes, per-callout notes, edge-break notes and
 * inspection notes for the quality plan, written as logic-less JMustache templates.
 *
 * <h2>Main abstractions</h2>
 * <ul>
 *   <li>{@link org.arcwright.templates.NoteTemplates}: every template of a pack stack, a later
 *       layer overriding an earlier one by file name; each is checked at load against
 *       {@link org.arcwright.templates.NoteFields}, so a template naming an unknown field fails
 *       with its file, line, column and field.</li>
 *   <li>{@link org.arcwright.templates.NoteContext}: the values a template is filled from, built
 *       from the part worksheet. Every number in it is already formatted by
 *       {@link org.arcwright.tolerance.DrawingStyle}; templates never format numbers.</li>
 *   <li>{@link org.arcwright.templates.CalloutText}: a callout as words and as one line of text
 *       (plain, or Unicode with the GD&amp;T code points) for notes and for pasting into CAD.</li>
 * </ul>
 * Templates are data: no partials, no lambdas, no delimiter changes, no method calls; the context
 * holds only maps, lists, strings and booleans, so filling a template executes nothing.
 *
 * <p>May import: the JDK, JMustache and the core packages ({@code io}, {@code tolerance},
 * {@code pack}, {@code callout}, {@code model}, {@code rules}, {@code worksheet}). Must not import Swing/AWT or print.
 */
package org.arcwright.templates;
