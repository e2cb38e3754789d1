package org.arcwright.notes;

import java.io.Closeable;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import org.apache.lucene.analysis.en.EnglishAnalyzer;
import org.apache.lucene.document.Document;
import org.apache.lucene.facet.FacetsCollectorManager;
import org.apache.lucene.facet.FacetsConfig;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.Term;
import org.apache.lucene.queries.mlt.MoreLikeThis;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.MatchAllDocsQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.search.TopScoreDocCollectorManager;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PracticePack;

/**
 * The practice notes of a pack stack, searchable through a Lucene index kept in a cache folder.
 *
 * <p>The note files are the truth; the index is derived from them and never trusted over them.
 * {@link #open} compares a stamp of the note files (paths, sizes, times) with the one recorded in
 * the index: when they match the index is opened as it is; when they differ the notes are read and
 * only those whose content hash changed are re-indexed; when the index is missing, unreadable,
 * corrupt or of another schema it is rebuilt; when its folder is locked by a live process or cannot
 * be written it is built in memory for this session. A search that meets a corrupt index rebuilds
 * it and searches again.
 *
 * <p>A note file that cannot be parsed is reported in {@link #problems()} with file, line and key;
 * the version of it last indexed stays searchable, so a half-saved file loses nothing.
 *
 * <p>{@link #add} and {@link #save} write into the stack's personal pack through
 * {@link AtomicFiles} and update the index for that one note.
 *
 * <p>Searches may run from several threads; writes are serialised. Close the store to release
 * the index files.
 *
 * <p>The work is shared out: {@link NoteIndex} keeps the index (open, check, rebuild, recover),
 * {@link NoteSync} brings it in line with the note files, {@link PersonalNotes} writes into the
 * personal pack, {@link NoteQueries} builds the queries from the user's text, and {@link NoteHits}
 * makes the hits, snippets and facet counts.
 */
public final class NotesStore implements NoteLibrary, Closeable {
    private static final int TOTAL_HITS_THRESHOLD = 1000;

    private final PackStack stack;
    private final TradeAnalyzer indexAnalyzer = TradeAnalyzer.forIndexing();
    /**
     * The query chain, whose synonym map (parsed and compiled from the synonym list, with the
     * analysis classes it loads) takes about as long as opening the index in a fresh JVM: so it is
     * made on a thread of its own while the index opens, and the first search waits for it.
     */
    private final CompletableFuture<TradeAnalyzer> queryChain = startQueryChain();
    private final NoteHits hits;
    private final NoteIndex index;
    private final PersonalNotes personal;

    private static CompletableFuture<TradeAnalyzer> startQueryChain() {
        return CompletableFuture.supplyAsync(TradeAnalyzer::forQueries, task -> {
            Thread t = new Thread(task, "notes-query-chain");
            t.setDaemon(true);
            t.start();
        });
    }

    private TradeAnalyzer queryAnalyzer() {
        try {
            return queryChain.join();
        } catch (CompletionException e) {
            if (e.getCause() instanceof RuntimeException) throw (RuntimeException) e.getCause();
            if (e.getCause() instanceof Error) throw (Error) e.getCause();
            throw e;
        }
    }

    private NotesStore(PackStack stack, Path indexFolder, NoteHits hits) {
        this.stack = Objects.requireNonNull(stack, "stack");
        FacetsConfig facetsConfig = NoteDocuments.facetsConfig();
        this.hits = hits == null ? new NoteHits(facetsConfig) : hits;
        this.index = new NoteIndex(stack, indexFolder, indexAnalyzer, facetsConfig);
        this.personal = new PersonalNotes(stack, facetsConfig);
    }

    /**
     * Opens the notes of {@code stack} with their index in {@code indexFolder} (created if
     * missing), bringing the index in line with the notes first.
     *
     * @param stack the packs whose {@code notes/*.md} files are the notes, lowest layer first
     * @param indexFolder the cache folder for this stack's index, e.g. from {@link #indexFolderFor}
     */
    public static NotesStore open(PackStack stack, Path indexFolder) {
        return open(stack, indexFolder, null);
    }

    /** As {@link #open(PackStack, Path)}, with the hits made by {@code hits} (tests stand in a faulty one). */
    static NotesStore open(PackStack stack, Path indexFolder, NoteHits hits) {
        NotesStore s = new NotesStore(stack, indexFolder, hits);
        s.index.start(true);
        return s;
    }

    /**
     * Opens a usable index without first checking the note files against it (one file-system look
     * per note, seconds for a pack of 100,000 notes on a busy disk), so the first search can run at
     * once; a missing, corrupt or other-version index is still rebuilt. The caller must then call
     * {@link #refresh()}, typically on a worker thread, to pick up notes changed since the index
     * was written. For the desktop app's start-up; the command line uses {@link #open}.
     */
    public static NotesStore openUnchecked(PackStack stack, Path indexFolder) {
        NotesStore s = new NotesStore(stack, indexFolder, null);
        s.index.start(false);
        return s;
    }

    /**
     * A folder under {@code indexRoot} for the index of this stack: stacks of different packs get
     * different folders, so switching between them does not rebuild each time.
     */
    public static Path indexFolderFor(Path indexRoot, PackStack stack) {
        StringBuilder key = new StringBuilder();
        for (PracticePack p : stack.packs()) key.append(p.layer()).append('|').append(p.root().toAbsolutePath()).append('\n');
        return indexRoot.resolve("stack-" + NoteDocuments.hash(key.toString().getBytes(StandardCharsets.UTF_8), "", PackLayer.BUILT_IN));
    }

    /** How the index was brought in line with the notes at open, or by the last {@link #reindex}. */
    public IndexReport report() {
        return index.report();
    }

    /** Note files that could not be read or parsed at the last check, each naming file, line and key. */
    public List<InputProblem> problems() {
        return index.problems();
    }

    /** The cache folder of the index. */
    public Path indexFolder() {
        return index.folder();
    }

    /** How many notes are in force (after layering). */
    public int size() {
        return index.size();
    }

    /**
     * Finds notes for a query typed by a user. The text is analysed, never parsed as a query
     * language: quotes, brackets, {@code *} and {@code AND} are words or nothing, never errors.
     * Title and tags weigh more than the body; among the best 50, words found near each other in the
     * body weigh more. Only the first {@value NoteQueries#MAX_QUERY_WORDS} words count.
     * An empty query lists the notes the filters allow.
     *
     * @param text what the user typed
     * @param filters facet restrictions, {@link NoteFilters#none()} for none
     * @param limit how many hits at most, 1 or more
     */
    @Override
    public SearchResult search(String text, NoteFilters filters, int limit) {
        return search(text, filters, limit, true);
    }

    /**
     * As {@link #search(String, NoteFilters, int)}; with {@code countFacets} false the facets are
     * left empty and {@link SearchResult#totalHits()} is exact only up to 1,000 (beyond that it is a
     * lower bound), which lets Lucene skip notes that cannot reach the top: the fast path for
     * search-as-you-type, with facet counts fetched separately when the user pauses.
     */
    public SearchResult search(String text, NoteFilters filters, int limit, boolean countFacets) {
        Objects.requireNonNull(filters, "filters");
        if (limit < 1) throw InputProblem.ofField("limit", "must be 1 or more, got " + limit);
        String typed = text == null ? "" : text;
        String q = NoteQueries.capped(typed);
        Query textQuery = q.isBlank() ? new MatchAllDocsQuery() : NoteQueries.textQuery(queryAnalyzer(), q);
        if (textQuery == null) return SearchResult.empty(typed);
        Query query = NoteQueries.withFilters(textQuery, filters);
        Query phrase = q.isBlank() ? null : NoteQueries.phraseQuery(queryAnalyzer(), q);
        int window = phrase == null ? limit : Math.max(limit, NoteQueries.RESCORE_WINDOW);
        return index.withSearcher(s -> {
            TopDocs top;
            Map<NoteFacet, List<FacetCount>> facets;
            if (countFacets) {
                FacetsCollectorManager.FacetsResult r = FacetsCollectorManager.search(s, query, window, new FacetsCollectorManager());
                top = r.topDocs();
                facets = hits.facetCounts(s.getIndexReader(), r);
            } else {
                top = s.search(query, new TopScoreDocCollectorManager(window, null, TOTAL_HITS_THRESHOLD, false));
                facets = Map.of();
            }
            if (phrase != null) top = NoteQueries.rescoreByProximity(s, top, phrase, limit);
            Set<String> marks = q.isBlank() ? Set.of() : Snippets.markTerms(queryAnalyzer(), NoteDocuments.BODY, q);
            StoredFields stored = s.storedFields();
            List<NoteHit> found = new ArrayList<>();
            for (ScoreDoc sd : top.scoreDocs) {
                found.add(hits.hit(NoteHits.filed(stored.document(sd.doc)), sd.score, marks));
            }
            return new SearchResult(typed, top.totalHits.value, found, facets);
        });
    }

    /**
     * Notes to recommend beside a decision: those sharing the given labels (each label counts once,
     * as a tag 4, a function 3 or a process 2, however rare it is) and those whose words are most
     * like {@code text} (more-like-this by tf-idf). For the advisor, which passes the function and tags of the case and its explanation.
     *
     * @param tags labels such as {@code stress-relief}, {@code sealing}, {@code cast}; may be empty
     * @param text free text describing the case; may be empty
     * @param limit how many at most, 1 or more
     * @return the best notes first; empty when neither tags nor text give anything to go on
     */
    @Override
    public List<NoteHit> related(Collection<String> tags, String text, int limit) {
        return related(tags, text, limit, Set.of());
    }

    /** Notes related to the note {@code id} by its tags and its text, the note itself left out. */
    public List<NoteHit> relatedTo(String id, int limit) {
        Optional<FiledNote> n = get(id);
        if (n.isEmpty()) return List.of();
        Note note = n.get().note();
        List<String> labels = new ArrayList<>(note.tags());
        labels.addAll(note.functions());
        return related(labels, note.title() + "\n" + NoteFormat.plainText(note.body()), limit, Set.of(id));
    }

    private List<NoteHit> related(Collection<String> tags, String text, int limit, Set<String> exclude) {
        Objects.requireNonNull(tags, "tags");
        if (limit < 1) throw InputProblem.ofField("limit", "must be 1 or more, got " + limit);
        List<Query> labels = NoteQueries.labelClauses(tags);
        return index.withSearcher(s -> {
            BooleanQuery.Builder b = new BooleanQuery.Builder();
            boolean any = !labels.isEmpty();
            for (Query l : labels) b.add(l, Occur.SHOULD);
            if (text != null && !text.isBlank()) {
                MoreLikeThis mlt = new MoreLikeThis(s.getIndexReader());
                mlt.setAnalyzer(indexAnalyzer);
                mlt.setFieldNames(new String[] {NoteDocuments.BODY});
                mlt.setMinTermFreq(1);
                mlt.setMinDocFreq(1);
                mlt.setMaxQueryTerms(25);
                mlt.setMinWordLen(2);
                mlt.setStopWords(EnglishAnalyzer.ENGLISH_STOP_WORDS_SET);
                Query like = mlt.like(NoteDocuments.BODY, new StringReader(text));
                if (like instanceof BooleanQuery bq && !bq.clauses().isEmpty()) {
                    b.add(like, Occur.SHOULD);
                    any = true;
                }
            }
            if (!any) return List.<NoteHit>of();
            for (String x : exclude) b.add(new TermQuery(new Term(NoteDocuments.ID, x)), Occur.MUST_NOT);
            TopDocs top = s.search(b.build(), limit);
            StoredFields stored = s.storedFields();
            List<NoteHit> out = new ArrayList<>();
            for (ScoreDoc sd : top.scoreDocs) out.add(hits.hit(NoteHits.filed(stored.document(sd.doc)), sd.score, Set.of()));
            return out;
        });
    }

    /** The note in force under {@code id}, with the pack that supplies it. */
    @Override
    public Optional<FiledNote> get(String id) {
        Objects.requireNonNull(id, "id");
        return index.withSearcher(s -> {
            TopDocs top = s.search(new TermQuery(new Term(NoteDocuments.ID, id)), 1);
            if (top.scoreDocs.length == 0) return Optional.<FiledNote>empty();
            Document d = s.storedFields().document(top.scoreDocs[0].doc);
            return Optional.of(NoteHits.filed(d));
        });
    }

    /** The ids of all notes in force, sorted. */
    public List<String> ids() {
        return index.withSearcher(s -> {
            List<String> out = new ArrayList<>(NoteSync.idsIn(s.getIndexReader()).keySet());
            Collections.sort(out);
            return out;
        });
    }

    /**
     * Adds a note file to the personal pack (as {@code notes/ID.md}, text unchanged) and indexes it.
     * A note with the same id in a lower layer is thereby replaced for this user.
     *
     * @param file a Markdown note with a header
     * @param replace whether a note with the same id already in the personal pack may be replaced
     * @throws InputProblem when the file cannot be read or parsed, or the id is taken and
     *     {@code replace} is false
     */
    public synchronized FiledNote add(Path file, boolean replace) {
        String text = NoteSync.readNoteText(file);
        Note note = NoteFormat.parse(text, file.toString());
        Path target = personal.target(note.id(), get(note.id()));
        if (Files.exists(target) && !replace) {
            throw new InputProblem(file.toString(), 0, 0, "id", "a note '" + note.id()
                    + "' is already in the personal pack (" + target + "); replace it or choose another id");
        }
        return write(note, text.endsWith("\n") ? text : text + "\n", target);
    }

    /**
     * Saves a new or edited note into the personal pack and re-indexes it. Editing a built-in or team
     * note this way creates a personal note with the same id that replaces it for this user.
     */
    @Override
    public synchronized FiledNote save(Note note) {
        Objects.requireNonNull(note, "note");
        return write(note, NoteFormat.format(note), personal.target(note.id(), get(note.id())));
    }

    private FiledNote write(Note note, String text, Path target) {
        PersonalNotes.Written w = personal.write(note, text, target);
        index.update(w.document(), note.id(), w.stampDelta());
        return w.filed();
    }

    /**
     * Throws the index away and builds it again from the notes. A note whose file no longer parses
     * keeps its last good version from the index thrown away, and is listed in {@link #problems()}.
     */
    public synchronized IndexReport reindex() {
        return index.rebuild("asked for");
    }

    /**
     * Checks the note files against the index now and brings it up to date, as {@link #open} does.
     * For a store opened with {@link #openUnchecked}, call this once from a worker thread soon after
     * the first search.
     */
    public IndexReport refresh() {
        return index.refresh();
    }

    /**
     * Runs {@link #refresh()} on a new daemon thread and returns its report when done: for a store
     * from {@link #openUnchecked}, so that the check of every note file (one file-system look per
     * note; contents read only where size or time changed) runs after the first search, not before.
     * Searches keep working during the check and see its changes when it ends.
     */
    public CompletableFuture<IndexReport> refreshInBackground() {
        return CompletableFuture.supplyAsync(this::refresh, task -> {
            Thread t = new Thread(task, "notes-refresh");
            t.setDaemon(true);
            t.start();
        });
    }

    @Override
    public synchronized void close() {
        try {
            index.close();
        } finally {
            indexAnalyzer.close();
            queryChain.thenAccept(TradeAnalyzer::close);
        }
    }

    /** Distinct non-blank labels, in order; a convenience for callers assembling {@link #related} input. */
    public static List<String> labels(Collection<String> raw) {
        Set<String> out = new LinkedHashSet<>();
        for (String r : raw) if (r != null && !r.isBlank()) out.add(Note.label(r));
        return List.copyOf(out);
    }
}
