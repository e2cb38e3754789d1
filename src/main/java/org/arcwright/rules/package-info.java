/**
 * The advisor: the design case an engineer describes, practice-pack rules, the engine that ranks
 * callout recommendations, and the recommendations with their reasoning, numbers and cautions.
 *
 * <p>May import: the JDK, Jackson and the core packages ({@code io}, {@code tolerance},
 * {@code pack}, {@code callout}, {@code mechanics}). Linked notes come in through the
 * {@link org.arcwright.rules.NoteLinker} seam, so this package does not depend on Lucene. Must not
 * import Swing/AWT or print.
 */
package org.arcwright.rules;
