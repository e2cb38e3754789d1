package org.arcwright.notes;

import java.io.Closeable;
import java.io.IOException;
import java.io.InterruptedIOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.WeakHashMap;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.stream.Stream;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.synonym.SynonymGraphFilter;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionLengthAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;
import org.apache.lucene.document.Document;
import org.apache.lucene.facet.FacetResult;
import org.apache.lucene.facet.Facets;
import org.apache.lucene.facet.FacetsCollectorManager;
import org.apache.lucene.facet.FacetsConfig;
import org.apache.lucene.facet.LabelAndValue;
import org.apache.lucene.facet.sortedset.DefaultSortedSetDocValuesReaderState;
import org.apache.lucene.facet.sortedset.SortedSetDocValuesFacetCounts;
import org.apache.lucene.facet.sortedset.SortedSetDocValuesReaderState;
import org.apache.lucene.index.BinaryDocValues;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.SegmentInfos;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.Term;
import org.apache.lucene.queries.mlt.MoreLikeThis;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.BoostQuery;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.MatchAllDocsQuery;
import org.apache.lucene.search.MultiPhraseQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.SearcherManager;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.search.TopScoreDocCollectorManager;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.store.LockObtainFailedException;
import org.apache.lucene.util.Bits;
import org.apache.lucene.util.QueryBuilder;
import org.arcwright.io.AtomicFiles;
import org.arcwright.io.InputFiles;
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
 */
public final class NotesStore implements Closeable {
    private static final float TITLE_BOOST = 3.0f;
    private static final float TAGS_BOOST = 2.5f;
    private static final float BODY_BOOST = 1.0f;
    private static final float PHRASE_BOOST = 1.5f;
    private static final int FACET_VALUES = 20;
    private static final int SUMMARY_CHARS = 220;
    private static final int TOTAL_HITS_THRESHOLD = 1000;
    private static final int RESCORE_WINDOW = 50;
    /** Score a label earns in {@link #related} when it is one of a note's tags, functions or processes (the best one counts). */
    private static final float TAG_MATCH = 4f;
    private static final float FUNCTION_MATCH = 3f;
    private static final float PROCESS_MATCH = 2f;

    private final PackStack stack;
    private final Path indexFolder;
    private final TradeAnalyzer indexAnalyzer = TradeAnalyzer.forIndexing();
    /**
     * The query chain, whose synonym map (parsed and compiled from the synonym list, with the
     * analysis classes it loads) takes about as long as opening the index in a fresh JVM: so it is
     * made on a thread of its own while the index opens, and the first search waits for it.
     */
    private final CompletableFuture<TradeAnalyzer> queryChain = startQueryChain();
    private final FacetsConfig facetsConfig = NoteDocuments.facetsConfig();
    private final Map<IndexReader, SortedSetDocValuesReaderState> facetStates =
            Collections.synchronizedMap(new WeakHashMap<>());

    private Directory directory;
    private volatile SearcherManager manager;
    private volatile List<InputProblem> problems = List.of();
    private volatile IndexReport report;
    private boolean inMemory;

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

    private NotesStore(PackStack stack, Path indexFolder) {
        this.stack = Objects.requireNonNull(stack, "stack");
        this.indexFolder = Objects.requireNonNull(indexFolder, "indexFolder");
    }

    /**
     * Opens the notes of {@code stack} with their index in {@code indexFolder} (created if
     * missing), bringing the index in line with the notes first.
     *
     * @param stack the packs whose {@code notes/*.md} files are the notes, lowest layer first
     * @param indexFolder the cache folder for this stack's index, e.g. from {@link #indexFolderFor}
     */
    public static NotesStore open(PackStack stack, Path indexFolder) {
        NotesStore s = new NotesStore(stack, indexFolder);
        s.start(true);
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
        NotesStore s = new NotesStore(stack, indexFolder);
        s.start(false);
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
        return report;
    }

    /** Note files that could not be read or parsed at the last check, each naming file, line and key. */
    public List<InputProblem> problems() {
        return problems;
    }

    /** The cache folder of the index. */
    public Path indexFolder() {
        return indexFolder;
    }

    /** How many notes are in force (after layering). */
    public int size() {
        return withSearcher(s -> s.getIndexReader().numDocs());
    }

    /**
     * Finds notes for a query typed by a user. The text is analysed, never parsed as a query
     * language: quotes, brackets, {@code *} and {@code AND} are words or nothing, never errors.
     * Title and tags weigh more than the body; among the best 50, words found near each other in the
     * body weigh more.
     * An empty query lists the notes the filters allow.
     *
     * @param text what the user typed
     * @param filters facet restrictions, {@link NoteFilters#none()} for none
     * @param limit how many hits at most, 1 or more
     */
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
        String q = text == null ? "" : text;
        Query textQuery = q.isBlank() ? new MatchAllDocsQuery() : textQuery(q);
        if (textQuery == null) return SearchResult.empty(q);
        Query query = withFilters(textQuery, filters);
        Query phrase = q.isBlank() ? null : phraseQuery(q);
        int window = phrase == null ? limit : Math.max(limit, RESCORE_WINDOW);
        return withSearcher(s -> {
            TopDocs top;
            Map<NoteFacet, List<FacetCount>> facets;
            if (countFacets) {
                FacetsCollectorManager.FacetsResult r = FacetsCollectorManager.search(s, query, window, new FacetsCollectorManager());
                top = r.topDocs();
                facets = facetCounts(s.getIndexReader(), r);
            } else {
                top = s.search(query, new TopScoreDocCollectorManager(window, null, TOTAL_HITS_THRESHOLD, false));
                facets = Map.of();
            }
            if (phrase != null) top = rescoreByProximity(s, top, phrase, limit);
            Set<String> marks = q.isBlank() ? Set.of() : Snippets.markTerms(queryAnalyzer(), NoteDocuments.BODY, q);
            StoredFields stored = s.storedFields();
            List<NoteHit> hits = new ArrayList<>();
            for (ScoreDoc sd : top.scoreDocs) {
                FiledNote f = filed(stored.document(sd.doc));
                hits.add(hit(f, sd.score, snippet(f, marks)));
            }
            return new SearchResult(q, top.totalHits.value, hits, facets);
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
    public List<NoteHit> related(Collection<String> tags, String text, int limit) {
        return related(tags, text, limit, Set.of());
    }

    private static Query labelQuery(NoteFacet facet, String label, float weight) {
        return new BoostQuery(new org.apache.lucene.search.ConstantScoreQuery(
                new TermQuery(new Term(NoteDocuments.filterField(facet), label))), weight);
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
        return withSearcher(s -> {
            BooleanQuery.Builder b = new BooleanQuery.Builder();
            boolean any = false;
            for (String t : tags) {
                if (t == null || t.isBlank()) continue;
                String label = Note.label(t);
                b.add(new org.apache.lucene.search.DisjunctionMaxQuery(List.of(
                        labelQuery(NoteFacet.TAG, label, TAG_MATCH),
                        labelQuery(NoteFacet.FUNCTION, label, FUNCTION_MATCH),
                        labelQuery(NoteFacet.PROCESS, label, PROCESS_MATCH)), 0f), Occur.SHOULD);
                any = true;
            }
            if (text != null && !text.isBlank()) {
                MoreLikeThis mlt = new MoreLikeThis(s.getIndexReader());
                mlt.setAnalyzer(indexAnalyzer);
                mlt.setFieldNames(new String[] {NoteDocuments.BODY});
                mlt.setMinTermFreq(1);
                mlt.setMinDocFreq(1);
                mlt.setMaxQueryTerms(25);
                mlt.setMinWordLen(2);
                mlt.setStopWords(org.apache.lucene.analysis.en.EnglishAnalyzer.ENGLISH_STOP_WORDS_SET);
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
            for (ScoreDoc sd : top.scoreDocs) out.add(hit(stored.document(sd.doc), sd.score, null));
            return out;
        });
    }

    /** The note in force under {@code id}, with the pack that supplies it. */
    public Optional<FiledNote> get(String id) {
        Objects.requireNonNull(id, "id");
        return withSearcher(s -> {
            TopDocs top = s.search(new TermQuery(new Term(NoteDocuments.ID, id)), 1);
            if (top.scoreDocs.length == 0) return Optional.<FiledNote>empty();
            Document d = s.storedFields().document(top.scoreDocs[0].doc);
            return Optional.of(filed(d));
        });
    }

    /** The ids of all notes in force, sorted. */
    public List<String> ids() {
        return withSearcher(s -> {
            List<String> out = new ArrayList<>(idsIn(s.getIndexReader()).keySet());
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
        String text = readNoteText(file);
        Note note = NoteFormat.parse(text, file.toString());
        Path target = personalTarget(note.id());
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
    public synchronized FiledNote save(Note note) {
        Objects.requireNonNull(note, "note");
        return write(note, NoteFormat.format(note), personalTarget(note.id()));
    }

    /** Throws the index away and builds it again from the notes. */
    public synchronized IndexReport reindex() {
        long t0 = System.nanoTime();
        rebuild("asked for", t0);
        return report;
    }

    @Override
    public synchronized void close() {
        try {
            if (manager != null) manager.close();
            if (directory != null) directory.close();
        } catch (IOException e) {
            throw new UncheckedIOException("could not close the notes index in " + indexFolder, e);
        } finally {
            manager = null;
            directory = null;
            indexAnalyzer.close();
            queryChain.thenAccept(TradeAnalyzer::close);
        }
    }

    // ---------------------------------------------------------------- opening and syncing

    private synchronized void start(boolean checkSources) {
        long t0 = System.nanoTime();
        try {
            Files.createDirectories(indexFolder);
            directory = FSDirectory.open(indexFolder);
        } catch (IOException e) {
            buildInMemory("index folder unusable: " + e.getMessage(), t0);
            return;
        }
        Map<String, String> commit;
        try {
            if (!DirectoryReader.indexExists(directory)) {
                rebuild("no index yet", t0);
                return;
            }
            commit = SegmentInfos.readLatestCommit(directory).getUserData();
        } catch (IOException | RuntimeException e) {
            rebuild("index unreadable: " + e.getClass().getSimpleName(), t0);
            return;
        }
        if (!NoteDocuments.SCHEMA.equals(commit.get(NoteDocuments.COMMIT_SCHEMA))) {
            rebuild("index from another version", t0);
            return;
        }
        try {
            manager = new SearcherManager(directory, null);
            probe();
        } catch (IOException | RuntimeException e) {
            closeQuietly();
            rebuild("index corrupt: " + e.getClass().getSimpleName(), t0);
            return;
        }
        if (!checkSources) {
            report = new IndexReport(IndexReport.Kind.OPENED, "note files not checked yet", size(), 0, 0, 0, millisSince(t0));
            return;
        }
        refreshFrom(commit.get(NoteDocuments.COMMIT_STAMP), t0);
    }

    /**
     * Checks the note files against the index now and brings it up to date, as {@link #open} does.
     * For a store opened with {@link #openUnchecked}, call this once from a worker thread soon after
     * the first search.
     */
    public synchronized IndexReport refresh() {
        if (directory == null) throw new IllegalStateException("the notes store is closed");
        long t0 = System.nanoTime();
        String recorded;
        try {
            recorded = SegmentInfos.readLatestCommit(directory).getUserData().get(NoteDocuments.COMMIT_STAMP);
        } catch (IOException | RuntimeException e) {
            rebuild("index unreadable: " + e.getClass().getSimpleName(), t0);
            return report;
        }
        refreshFrom(recorded, t0);
        return report;
    }

    /**
     * Runs {@link #refresh()} on a new daemon thread and returns its report when done: for a store
     * from {@link #openUnchecked}, so that the check of every note file (one file-system look per
     * note; contents read only where size or time changed) runs after the first search, not before.
     * Searches keep working during the check and see its changes when it ends.
     */
    public CompletableFuture<IndexReport> refreshInBackground() {
        CompletableFuture<IndexReport> done = new CompletableFuture<>();
        Thread t = new Thread(() -> {
            try {
                done.complete(refresh());
            } catch (RuntimeException | Error e) {
                done.completeExceptionally(e);
            }
        }, "notes-refresh");
        t.setDaemon(true);
        t.start();
        return done;
    }

    private void refreshFrom(String recordedStamp, long t0) {
        SourceScan scan = SourceScan.of(stack);
        if (Long.toString(scan.stamp()).equals(recordedStamp)) {
            report = new IndexReport(IndexReport.Kind.OPENED, "", size(), 0, 0, 0, millisSince(t0));
            return;
        }
        try {
            SyncCounts c = sync(scan, false);
            manager.maybeRefreshBlocking();
            report = new IndexReport(IndexReport.Kind.UPDATED, "notes changed", size(), c.written, c.removed,
                    problems.size(), millisSince(t0));
        } catch (LockObtainFailedException e) {
            closeQuietly();
            buildInMemory("index locked by another process", t0);
        } catch (IOException | RuntimeException e) {
            if (e instanceof InputProblem) throw (InputProblem) e;
            closeQuietly();
            rebuild("index corrupt: " + e, t0, scan);
        }
    }

    private void rebuild(String reason, long t0) {
        rebuild(reason, t0, SourceScan.of(stack));
    }

    private void rebuild(String reason, long t0, SourceScan scan) {
        closeQuietly();
        if (inMemory) {
            buildInMemory(reason, t0);
            return;
        }
        try {
            wipeIndexFolder();
            directory = FSDirectory.open(indexFolder);
            SyncCounts c = sync(scan, true);
            manager = new SearcherManager(directory, null);
            report = new IndexReport(IndexReport.Kind.REBUILT, reason, size(), c.written, c.removed, problems.size(),
                    millisSince(t0));
        } catch (IOException | RuntimeException e) {
            if (e instanceof InputProblem) throw (InputProblem) e;
            closeQuietly();
            buildInMemory(reason + "; index folder not writable: " + e.getClass().getSimpleName(), t0);
        }
    }

    private void buildInMemory(String reason, long t0) {
        inMemory = true;
        directory = new ByteBuffersDirectory();
        try {
            SyncCounts c = sync(SourceScan.of(stack), true);
            manager = new SearcherManager(directory, null);
            report = new IndexReport(IndexReport.Kind.IN_MEMORY, reason, size(), c.written, 0, problems.size(),
                    millisSince(t0));
        } catch (IOException e) {
            throw new UncheckedIOException("could not build the notes index even in memory", e);
        }
    }

    private void wipeIndexFolder() throws IOException {
        if (directory != null) {
            directory.close();
            directory = null;
        }
        if (Files.isDirectory(indexFolder)) {
            try (Stream<Path> s = Files.walk(indexFolder)) {
                for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                    if (!p.equals(indexFolder)) Files.deleteIfExists(p);
                }
            }
        }
        Files.createDirectories(indexFolder);
    }

    private void closeQuietly() {
        try {
            if (manager != null) manager.close();
        } catch (IOException | RuntimeException ignored) {
            // the index is being thrown away or replaced; nothing in it is needed
        }
        manager = null;
    }

    private void probe() throws IOException {
        IndexSearcher s = manager.acquire();
        try {
            s.search(new MatchAllDocsQuery(), 1);
            IndexReader r = s.getIndexReader();
            for (LeafReaderContext leaf : r.leaves()) {
                leaf.reader().getBinaryDocValues(NoteDocuments.HASH);
            }
        } finally {
            manager.release(s);
        }
    }

    private record SyncCounts(int written, int removed) {}

    private record Indexed(String id, String hash, String location) {}

    /**
     * Half the heap, between 16 and 128 MB, for the documents buffered before a segment is written:
     * a 100,000-note build in a 256 MB heap then writes two segments instead of four or five and
     * merges less (48 MB: 3,400 to 4,700 notes/s; 128 MB: 4,850 to 5,180 on the same machine, see
     * docs/benchmarks/notes.md).
     */
    private static double indexingBufferMB() {
        double half = Runtime.getRuntime().maxMemory() / 2.0 / (1024 * 1024);
        return Math.max(16, Math.min(128, half));
    }

    /**
     * Brings the index in {@link #directory} in line with the notes. Packs are read from the top
     * layer down, so the first note seen under an id is the one in force, and only the set of seen
     * ids is kept in memory (not the notes).
     */
    private SyncCounts sync(SourceScan scan, boolean fresh) throws IOException {
        Map<String, Indexed> existing = new HashMap<>();
        Map<String, String> idAtLocation = new HashMap<>();
        if (!fresh) {
            try (DirectoryReader r = DirectoryReader.open(directory)) {
                existing = idsIn(r);
            }
            for (Indexed x : existing.values()) idAtLocation.put(x.location(), x.id());
        }
        IndexWriterConfig cfg = new IndexWriterConfig(indexAnalyzer)
                .setOpenMode(fresh ? IndexWriterConfig.OpenMode.CREATE : IndexWriterConfig.OpenMode.CREATE_OR_APPEND)
                .setRAMBufferSizeMB(indexingBufferMB())
                .setCommitOnClose(false);
        List<InputProblem> found = new ArrayList<>();
        Map<String, Integer> seen = new HashMap<>();
        Set<String> pinned = new HashSet<>();
        int written = 0;
        int removed = 0;
        List<SourceScan.Entry> entries = scan.entries();
        try (IndexWriter w = new IndexWriter(directory, cfg)) {
            Indexer indexer = new Indexer(w, fresh);
            boolean indexed = false;
            try {
                int start = 0;
                List<int[]> packRanges = new ArrayList<>();
                for (int i = 1; i <= entries.size(); i++) {
                    if (i == entries.size() || entries.get(i).packIndex() != entries.get(start).packIndex()) {
                        packRanges.add(new int[] {start, i});
                        start = i;
                    }
                }
                Collections.reverse(packRanges);
                for (int[] range : packRanges) {
                    for (int from = range[0]; from < range[1]; from += CHUNK) {
                        int to = Math.min(range[1], from + CHUNK);
                        List<Loaded> loaded = java.util.stream.IntStream.range(from, to).parallel()
                                .mapToObj(i -> load(entries.get(i))).toList();
                        List<Loaded> toWrite = new ArrayList<>();
                        for (Loaded l : loaded) {
                            SourceScan.Entry e = l.entry();
                            String location = e.path().toString();
                            if (l.gone()) continue;
                            if (l.problem() != null) {
                                found.add(l.problem());
                                String kept = idAtLocation.get(location);
                                if (kept != null) {
                                    pinned.add(kept);
                                    seen.putIfAbsent(kept, e.packIndex());
                                }
                                continue;
                            }
                            Note note = l.note();
                            Integer seenIn = seen.get(note.id());
                            if (seenIn != null) {
                                if (seenIn == e.packIndex() && !pinned.contains(note.id())) {
                                    found.add(new InputProblem(location, 2, 1, "id", "another note in the same pack already has the id '"
                                            + note.id() + "'; this one is ignored"));
                                }
                                continue;
                            }
                            seen.put(note.id(), e.packIndex());
                            Indexed old = existing.get(note.id());
                            if (old != null && old.hash().equals(l.hash()) && old.location().equals(location)) continue;
                            toWrite.add(l);
                        }
                        for (Loaded l : toWrite) indexer.submit(l);
                        written += toWrite.size();
                    }
                }
                indexer.finish();
                indexed = true;
            } finally {
                if (!indexed) indexer.abandon();
            }
            for (String id : existing.keySet()) {
                if (!seen.containsKey(id)) {
                    w.deleteDocuments(new Term(NoteDocuments.ID, id));
                    removed++;
                }
            }
            found.sort(Comparator.comparing(p -> p.source() == null ? "" : p.source()));
            w.setLiveCommitData(commitData(found.isEmpty() ? Long.toString(scan.stamp()) : "unclean").entrySet());
            w.commit();
        }
        problems = List.copyOf(found);
        return new SyncCounts(written, removed);
    }

    /** Notes are read and parsed in chunks of this many (on the common pool), then queued for the indexing threads. */
    private static final int CHUNK = 512;

    /**
     * Turns queued notes into documents and adds them to the writer on its own threads, one per core
     * (at most four), so that reading the next notes, and one thread's flush of a full segment,
     * overlap with indexing on the others: with a parallel loop per chunk instead, both cores waited
     * at the end of each chunk for whichever thread was flushing, and the build used little more
     * than one core. At the end each thread flushes one buffered segment, so the last segments are
     * written side by side rather than one after the other in the commit.
     */
    private final class Indexer {
        private static final int QUEUE = 1024;
        private final IndexWriter writer;
        private final boolean fresh;
        private final BlockingQueue<Loaded> queue = new ArrayBlockingQueue<>(QUEUE);
        private final AtomicReference<Throwable> failure = new AtomicReference<>();
        private final List<Thread> threads = new ArrayList<>();
        private final Loaded end = new Loaded(null, null, null, null, null, true);
        private final CountDownLatch drained;

        Indexer(IndexWriter writer, boolean fresh) {
            this.writer = writer;
            this.fresh = fresh;
            int n = Math.max(1, Math.min(4, Runtime.getRuntime().availableProcessors()));
            drained = new CountDownLatch(n);
            for (int i = 0; i < n; i++) {
                Thread t = new Thread(this::run, "notes-indexing-" + i);
                t.setDaemon(true);
                threads.add(t);
                t.start();
            }
        }

        void submit(Loaded l) throws IOException {
            try {
                while (!queue.offer(l, 100, TimeUnit.MILLISECONDS)) rethrow();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new InterruptedIOException("interrupted while indexing notes");
            }
            rethrow();
        }

        /** Waits for every queued note to be indexed and the buffered segments to be flushed. */
        void finish() throws IOException {
            try {
                for (int i = 0; i < threads.size(); i++) {
                    while (!queue.offer(end, 100, TimeUnit.MILLISECONDS)) rethrow();
                }
                for (Thread t : threads) t.join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new InterruptedIOException("interrupted while indexing notes");
            }
            rethrow();
        }

        /**
         * Indexes queued notes until this thread's end mark. After a failure (kept for the caller) the
         * thread still takes notes off the queue, without indexing them, until its end mark, so the
         * caller never waits on a full queue and every thread gets its own end mark.
         */
        private void run() {
            try {
                for (Loaded l = queue.take(); l != end; l = queue.take()) {
                    if (failure.get() != null) continue;
                    try {
                        index(l);
                    } catch (IOException | RuntimeException | Error e) {
                        failure.compareAndSet(null, e);
                    }
                }
                drained.countDown();
                drained.await();
                if (failure.get() == null) writer.flushNextBuffer();
            } catch (InterruptedException e) {
                failure.compareAndSet(null, e);
            } catch (IOException | RuntimeException | Error e) {
                failure.compareAndSet(null, e);
            } finally {
                drained.countDown();
            }
        }

        private void index(Loaded l) throws IOException {
            SourceScan.Entry e = l.entry();
            Document doc = NoteDocuments.toDocument(facetsConfig, l.note(), l.text(), e.pack().name(),
                    e.pack().layer(), e.path().toString(), l.hash());
            if (fresh) {
                writer.addDocument(doc);
            } else {
                writer.updateDocument(new Term(NoteDocuments.ID, l.note().id()), doc);
            }
        }

        /**
         * Stops the threads after their current note when the build ends early (an exception on the
         * caller's side); no interrupt, which would close the index files under a writing thread.
         */
        void abandon() {
            failure.compareAndSet(null, new CancellationException("notes build abandoned"));
            queue.clear();
            for (int i = 0; i < threads.size(); i++) queue.offer(end);
            for (Thread t : threads) {
                try {
                    t.join(10_000);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        }

        private void rethrow() throws IOException {
            Throwable t = failure.get();
            if (t == null) return;
            if (t instanceof IOException) throw (IOException) t;
            if (t instanceof RuntimeException) throw (RuntimeException) t;
            if (t instanceof Error) throw (Error) t;
            throw new InterruptedIOException("indexing interrupted");
        }
    }

    /** A note file read and parsed (or the problem with it). */
    private record Loaded(SourceScan.Entry entry, String text, Note note, String hash, InputProblem problem, boolean gone) {}

    private static Loaded load(SourceScan.Entry e) {
        try {
            InputFiles.requireInside(e.path(), e.pack().root());
            InputFiles.requireRegular(e.path(), InputFiles.TEXT_LIMIT);
            byte[] bytes = Files.readAllBytes(e.path());
            String text = decode(bytes, e.path());
            Note note = NoteFormat.parse(text, e.path().toString());
            return new Loaded(e, text, note, NoteDocuments.hash(bytes, e.pack().name(), e.pack().layer()), null, false);
        } catch (InputProblem p) {
            return new Loaded(e, null, null, null, p, false);
        } catch (NoSuchFileException gone) {
            return new Loaded(e, null, null, null, null, true);
        } catch (IOException x) {
            return new Loaded(e, null, null, null, new InputProblem(e.path().toString(), 0, 0, null,
                    "could not read the note: " + x.getMessage()), false);
        }
    }

    private static Map<String, String> commitData(String stamp) {
        Map<String, String> m = new HashMap<>();
        m.put(NoteDocuments.COMMIT_SCHEMA, NoteDocuments.SCHEMA);
        m.put(NoteDocuments.COMMIT_STAMP, stamp);
        return m;
    }

    private static Map<String, Indexed> idsIn(IndexReader r) throws IOException {
        Map<String, Indexed> out = new HashMap<>();
        for (LeafReaderContext leaf : r.leaves()) {
            Bits live = leaf.reader().getLiveDocs();
            BinaryDocValues ids = leaf.reader().getBinaryDocValues(NoteDocuments.ID);
            BinaryDocValues hashes = leaf.reader().getBinaryDocValues(NoteDocuments.HASH);
            BinaryDocValues locations = leaf.reader().getBinaryDocValues(NoteDocuments.LOCATION);
            if (ids == null || hashes == null || locations == null) continue;
            for (int doc = ids.nextDoc(); doc != BinaryDocValues.NO_MORE_DOCS; doc = ids.nextDoc()) {
                if (live != null && !live.get(doc)) continue;
                String id = ids.binaryValue().utf8ToString();
                String hash = hashes.advanceExact(doc) ? hashes.binaryValue().utf8ToString() : "";
                String loc = locations.advanceExact(doc) ? locations.binaryValue().utf8ToString() : "";
                out.put(id, new Indexed(id, hash, loc));
            }
        }
        return out;
    }

    private static String decode(byte[] bytes, Path file) {
        try {
            String s = StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString();
            return s;
        } catch (CharacterCodingException e) {
            throw new InputProblem(file.toString(), 0, 0, null, "not UTF-8 text (a truncated or binary file?)");
        }
    }

    private static String readNoteText(Path file) {
        try {
            return decode(Files.readAllBytes(file), file);
        } catch (NoSuchFileException e) {
            throw new InputProblem(file.toString(), 0, 0, null, "file not found");
        } catch (IOException e) {
            throw new UncheckedIOException("could not read " + file + ": " + e.getMessage(), e);
        }
    }

    // ---------------------------------------------------------------- writing notes

    private PracticePack personalPack() {
        for (int i = stack.packs().size() - 1; i >= 0; i--) {
            PracticePack p = stack.packs().get(i);
            if (p.layer() == PackLayer.PERSONAL) return p;
        }
        throw InputProblem.ofField("personal pack", "no personal pack is open, so there is nowhere to save the note");
    }

    private int packIndexOf(PracticePack pack) {
        return stack.packs().indexOf(pack);
    }

    private Path personalTarget(String id) {
        PracticePack personal = personalPack();
        Optional<FiledNote> current = get(id);
        if (current.isPresent() && current.get().layer() == PackLayer.PERSONAL
                && current.get().pack().equals(personal.name())) {
            Path p = Path.of(current.get().location());
            if (p.startsWith(personal.root())) return p;
        }
        return personal.root().resolve("notes").resolve(id + ".md");
    }

    private FiledNote write(Note note, String text, Path target) {
        PracticePack personal = personalPack();
        int packIndex = packIndexOf(personal);
        long delta = 0;
        if (Files.exists(target)) delta -= SourceScan.entry(packIndex, personal, target).stamp();
        AtomicFiles.writeString(target, text);
        delta += SourceScan.entry(packIndex, personal, target).stamp();
        String location = target.toString();
        String hash = NoteDocuments.hash(text.getBytes(StandardCharsets.UTF_8), personal.name(), personal.layer());
        Document doc = NoteDocuments.toDocument(facetsConfig, note, text, personal.name(), personal.layer(), location, hash);
        try {
            Map<String, String> old = DirectoryReader.indexExists(directory)
                    ? SegmentInfos.readLatestCommit(directory).getUserData() : Map.of();
            String oldStamp = old.getOrDefault(NoteDocuments.COMMIT_STAMP, "unclean");
            String newStamp = "unclean".equals(oldStamp) ? oldStamp : Long.toString(parseLong(oldStamp) + delta);
            IndexWriterConfig cfg = new IndexWriterConfig(indexAnalyzer)
                    .setOpenMode(IndexWriterConfig.OpenMode.CREATE_OR_APPEND).setCommitOnClose(false);
            try (IndexWriter w = new IndexWriter(directory, cfg)) {
                w.updateDocument(new Term(NoteDocuments.ID, note.id()), doc);
                w.setLiveCommitData(commitData(newStamp).entrySet());
                w.commit();
            }
            manager.maybeRefreshBlocking();
        } catch (LockObtainFailedException e) {
            closeQuietly();
            buildInMemory("index locked by another process", System.nanoTime());
        } catch (IOException | RuntimeException e) {
            if (e instanceof InputProblem) throw (InputProblem) e;
            rebuild("index corrupt: " + e.getClass().getSimpleName(), System.nanoTime());
        }
        return new FiledNote(note, personal.name(), personal.layer(), location);
    }

    private static long parseLong(String s) {
        try {
            return Long.parseLong(s);
        } catch (NumberFormatException e) {
            return 0;
        }
    }

    // ---------------------------------------------------------------- searching

    /** Something done with a searcher that may meet a broken index. */
    @FunctionalInterface
    private interface SearchWork<T> {
        T apply(IndexSearcher s) throws IOException;
    }

    /** Runs {@code work} on the current searcher; if the index turns out broken, rebuilds and retries once. */
    private <T> T withSearcher(SearchWork<T> work) {
        try {
            return once(work);
        } catch (IOException | RuntimeException e) {
            if (e instanceof InputProblem) throw (InputProblem) e;
            synchronized (this) {
                rebuild("index failed during a search: " + e.getClass().getSimpleName(), System.nanoTime());
            }
            try {
                return once(work);
            } catch (IOException again) {
                throw new UncheckedIOException("the notes index failed again after a rebuild", again);
            }
        }
    }

    private <T> T once(SearchWork<T> work) throws IOException {
        SearcherManager m = manager;
        if (m == null) throw new IllegalStateException("the notes store is closed");
        IndexSearcher s = m.acquire();
        try {
            return work.apply(s);
        } finally {
            m.release(s);
        }
    }

    private Query textQuery(String text) {
        QueryBuilder qb = new TradeQueryBuilder(queryAnalyzer());
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        boolean any = false;
        String[] fields = {NoteDocuments.TITLE, NoteDocuments.TAGS, NoteDocuments.BODY};
        float[] boosts = {TITLE_BOOST, TAGS_BOOST, BODY_BOOST};
        for (int i = 0; i < fields.length; i++) {
            Query q = qb.createBooleanQuery(fields[i], text, Occur.SHOULD);
            if (q != null) {
                b.add(new BoostQuery(q, boosts[i]), Occur.SHOULD);
                any = true;
            }
        }
        return any ? b.build() : null;
    }

    /**
     * Adds {@link #PHRASE_BOOST} times the phrase score to each hit whose body has the words near
     * each other, and keeps the best {@code limit}. Visits the hits in document order with one
     * phrase scorer per segment (setting up a scorer costs more than checking a document), and
     * checks each hit's own document only.
     */
    private static TopDocs rescoreByProximity(IndexSearcher s, TopDocs top, Query phrase, int limit) throws IOException {
        org.apache.lucene.search.Weight w = s.createWeight(s.rewrite(phrase), org.apache.lucene.search.ScoreMode.COMPLETE, 1f);
        List<LeafReaderContext> leaves = s.getIndexReader().leaves();
        ScoreDoc[] docs = top.scoreDocs.clone();
        Integer[] byDoc = new Integer[docs.length];
        for (int i = 0; i < byDoc.length; i++) byDoc[i] = i;
        java.util.Arrays.sort(byDoc, Comparator.comparingInt(i -> docs[i].doc));
        LeafReaderContext leaf = null;
        org.apache.lucene.search.Scorer sc = null;
        org.apache.lucene.search.TwoPhaseIterator two = null;
        org.apache.lucene.search.DocIdSetIterator approx = null;
        for (int k : byDoc) {
            ScoreDoc sd = docs[k];
            if (leaf == null || sd.doc >= leaf.docBase + leaf.reader().maxDoc()) {
                leaf = leaves.get(org.apache.lucene.index.ReaderUtil.subIndex(sd.doc, leaves));
                sc = w.scorer(leaf);
                two = sc == null ? null : sc.twoPhaseIterator();
                approx = sc == null ? null : two != null ? two.approximation() : sc.iterator();
            }
            if (sc == null) continue;
            int target = sd.doc - leaf.docBase;
            int at = approx.docID() >= target ? approx.docID() : approx.advance(target);
            if (at == target && (two == null || two.matches())) {
                docs[k] = new ScoreDoc(sd.doc, sd.score + PHRASE_BOOST * sc.score());
            }
        }
        java.util.Arrays.sort(docs, (a, b) -> a.score != b.score ? Float.compare(b.score, a.score) : Integer.compare(a.doc, b.doc));
        return new TopDocs(top.totalHits, java.util.Arrays.copyOf(docs, Math.min(limit, docs.length)));
    }

    /**
     * Words of the query found near each other in the body: applied to the best
     * {@link #RESCORE_WINDOW} notes only (rescoring), since a sloppy phrase over every match is the
     * most expensive part of a search. One sloppy {@link MultiPhraseQuery}
     * over the words typed, each position also accepting its one-word synonyms: the phrase query the
     * analyser's synonym graph would give is one sloppy phrase per path through the graph (32 for
     * {@code kt at the minimum radius}), each weighed and scored on its own. Multi-word synonyms
     * still count in the main query, not here. Null for a one-word query.
     */
    private Query phraseQuery(String text) {
        List<int[]> spans = new ArrayList<>();
        List<String> words = new ArrayList<>();
        List<Boolean> typed = new ArrayList<>();
        try (TokenStream ts = queryAnalyzer().tokenStream(NoteDocuments.BODY, text)) {
            var term = ts.addAttribute(CharTermAttribute.class);
            var inc = ts.addAttribute(PositionIncrementAttribute.class);
            var len = ts.addAttribute(PositionLengthAttribute.class);
            var type = ts.addAttribute(TypeAttribute.class);
            ts.reset();
            int pos = -1;
            while (ts.incrementToken()) {
                pos += inc.getPositionIncrement();
                spans.add(new int[] {pos, pos + len.getPositionLength()});
                words.add(term.toString());
                typed.add(!SynonymGraphFilter.TYPE_SYNONYM.equals(type.type()));
            }
            ts.end();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        MultiPhraseQuery.Builder b = new MultiPhraseQuery.Builder().setSlop(3);
        int at = 0;
        for (int i = 0; i < words.size(); i++) {
            if (!typed.get(i)) continue;
            List<Term> alternatives = new ArrayList<>();
            alternatives.add(new Term(NoteDocuments.BODY, words.get(i)));
            for (int j = 0; j < words.size(); j++) {
                if (!typed.get(j) && spans.get(j)[0] == spans.get(i)[0] && spans.get(j)[1] == spans.get(i)[1]) {
                    alternatives.add(new Term(NoteDocuments.BODY, words.get(j)));
                }
            }
            b.add(alternatives.toArray(new Term[0]), at++);
        }
        return at < 2 ? null : b.build();
    }

    private static Query withFilters(Query main, NoteFilters filters) {
        if (filters.isEmpty()) return main;
        BooleanQuery.Builder b = new BooleanQuery.Builder().add(main, Occur.MUST);
        for (Map.Entry<NoteFacet, Set<String>> e : filters.values().entrySet()) {
            BooleanQuery.Builder any = new BooleanQuery.Builder();
            for (String v : e.getValue()) any.add(new TermQuery(new Term(NoteDocuments.filterField(e.getKey()), v)), Occur.SHOULD);
            b.add(any.build(), Occur.FILTER);
        }
        return b.build();
    }

    /**
     * The shown passage of a hit: its best two sentences with the query's words marked, cut to
     * about two lines; null (the caller shows the summary) when none of the words is in the body.
     */
    private String snippet(FiledNote f, Set<String> marks) {
        if (marks.isEmpty()) return null;
        String passages = Snippets.pick(NoteFormat.plainText(f.note().body()), marks, 2);
        return passages == null ? null : trimSnippet(passages.replaceAll("\\s+", " ").strip());
    }

    /** Keeps a snippet to about two lines, starting shortly before the first highlight, cut at words. */
    static String trimSnippet(String s) {
        int max = 320;
        if (s.length() <= max) return s;
        int first = s.indexOf("**");
        String head = "";
        if (first > max - 100) {
            int from = s.lastIndexOf(' ', first - 60);
            s = s.substring(from < 0 ? first : from + 1);
            head = "… ";
        }
        if (s.length() <= max) return head + s;
        int cut = s.lastIndexOf(' ', max);
        if (cut < max / 2) cut = max;
        String body = s.substring(0, cut);
        int marks = body.split("\\*\\*", -1).length - 1;
        if (marks % 2 == 1) body = body + "**";
        return head + body + " …";
    }

    private Map<NoteFacet, List<FacetCount>> facetCounts(IndexReader reader, FacetsCollectorManager.FacetsResult r)
            throws IOException {
        Map<NoteFacet, List<FacetCount>> out = new EnumMap<>(NoteFacet.class);
        if (reader.numDocs() == 0) return out;
        SortedSetDocValuesReaderState state;
        try {
            state = facetStates.computeIfAbsent(reader, rd -> {
                try {
                    return new DefaultSortedSetDocValuesReaderState(rd, facetsConfig);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (IllegalArgumentException noFacets) {
            return out;
        }
        Facets facets = new SortedSetDocValuesFacetCounts(state, r.facetsCollector());
        for (NoteFacet f : NoteFacet.values()) {
            FacetResult fr;
            try {
                fr = facets.getTopChildren(FACET_VALUES, f.key());
            } catch (IllegalArgumentException dimensionNeverIndexed) {
                fr = null;
            }
            List<FacetCount> counts = new ArrayList<>();
            if (fr != null) {
                for (LabelAndValue lv : fr.labelValues) counts.add(new FacetCount(lv.label, lv.value.intValue()));
            }
            out.put(f, counts);
        }
        return out;
    }

    private NoteHit hit(Document d, float score, String snippet) {
        return hit(filed(d), score, snippet);
    }

    private NoteHit hit(FiledNote f, float score, String snippet) {
        Note n = f.note();
        String sn = snippet == null || snippet.isBlank() ? n.summary(SUMMARY_CHARS) : snippet;
        return new NoteHit(n.id(), n.title(), score, sn, f.pack(), f.layer(), n.tags(), n.functions(), n.standards(),
                n.processes());
    }

    private static FiledNote filed(Document d) {
        String location = d.get(NoteDocuments.LOCATION);
        Note n = NoteFormat.parse(d.get(NoteDocuments.SOURCE), location);
        return new FiledNote(n, d.get(NoteDocuments.PACK), PackLayer.valueOf(d.get(NoteDocuments.LAYER)), location);
    }

    private static long millisSince(long t0) {
        return (System.nanoTime() - t0) / 1_000_000;
    }

    /** Distinct non-blank labels, in order; a convenience for callers assembling {@link #related} input. */
    public static List<String> labels(Collection<String> raw) {
        Set<String> out = new LinkedHashSet<>();
        for (String r : raw) if (r != null && !r.isBlank()) out.add(Note.label(r));
        return List.copyOf(out);
    }
}
