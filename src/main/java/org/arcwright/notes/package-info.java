/**
 * Practice notes: the short Markdown write-ups in which lead engineers record why their company
 * tolerances fillets, rounds and edge breaks the way it does, and the Lucene index that lets a
 * junior engineer find them while deciding.
 *
 * <h2>Main abstractions</h2>
 * <ul>
 *   <li>{@link org.arcwright.notes.Note}: one note, parsed from its file by
 *       {@link org.arcwright.notes.NoteFormat} (a {@code key: value} header between {@code ---}
 *       lines, then a Markdown body).</li>
 *   <li>{@link org.arcwright.notes.NotesStore}: the notes of a {@link org.arcwright.pack.PackStack}
 *       (a later layer replaces a note with the same id), searchable, with facets, related notes
 *       for the advisor, and atomic add and edit into the personal pack.</li>
 *   <li>{@link org.arcwright.notes.TradeAnalyzer}: the analysis chain that keeps {@code R0.5},
 *       {@code CR} and {@code 2768-m} whole, knows the trade's synonyms and stems English.</li>
 * </ul>
 *
 * <h2>The notes are the truth</h2>
 * The index is a cache in a folder outside the repository ({@link org.arcwright.notes.NotesPaths}).
 * It is checked against the note files when the store opens and brought up to date incrementally
 * (by content hash) when they changed; it is rebuilt from the notes when it is missing, corrupt,
 * from another schema, or locked by another process (then in memory). A note file with a broken
 * header is reported in {@link org.arcwright.notes.NotesStore#problems()}, and its last good
 * version stays searchable.
 *
 * <h2>Typical use</h2>
 * <pre>
 *   try (NotesStore store = NotesStore.open(PackStack.builtIn(), NotesPaths.defaultIndexFolder())) {
 *       SearchResult r = store.search("R0.5 seal groove", NoteFilters.none(), 10);
 *       List&lt;NoteHit&gt; more = store.related(List.of("sealing"), "o-ring groove corner", 5);
 *   }
 * </pre>
 *
 * <p>May import: the JDK, Lucene, {@code org.arcwright.io} and {@code org.arcwright.pack}. Must not
 * import Swing/AWT or print.
 */
package org.arcwright.notes;
