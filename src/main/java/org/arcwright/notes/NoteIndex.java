package org.arcwright.notes;

import java.io.Closeable;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.stream.Stream;
import org.apache.lucene.document.Document;
import org.apache.lucene.facet.FacetsConfig;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.SegmentInfos;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.MatchAllDocsQuery;
import org.apache.lucene.search.SearcherManager;
import org.apache.lucene.store.AlreadyClosedException;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.store.LockObtainFailedException;
import org.arcwright.io.InputProblem;
import org.arcwright.pack.PackStack;

/**
 * The index of a pack stack's notes over its life: opened, checked against the note files and
 * updated, rebuilt when damaged ({@link IndexDamage}), built in memory when its folder is locked by
 * a live process or cannot be written, and searched through a {@link SearcherManager}.
 *
 * <p>Only damage to the index files triggers a rebuild. A failure of our own code during a search
 * or a sync surfaces to the caller, and the index stays as it was.
 */
final class NoteIndex implements Closeable {
    private final PackStack stack;
    private final Path indexFolder;
    private final TradeAnalyzer indexAnalyzer;
    private final NoteSync sync;

    private Directory directory;
    private volatile SearcherManager manager;
    private volatile List<InputProblem> problems = List.of();
    private volatile IndexReport report;
    private boolean inMemory;

    /** Something done with a searcher that may meet a damaged index. */
    @FunctionalInterface
    interface SearchWork<T> {
        T apply(IndexSearcher s) throws IOException;
    }

    NoteIndex(PackStack stack, Path indexFolder, TradeAnalyzer indexAnalyzer, FacetsConfig facetsConfig) {
        LuceneNotices.quiet();
        this.stack = Objects.requireNonNull(stack, "stack");
        this.indexFolder = Objects.requireNonNull(indexFolder, "indexFolder");
        this.indexAnalyzer = Objects.requireNonNull(indexAnalyzer, "indexAnalyzer");
        this.sync = new NoteSync(indexAnalyzer, facetsConfig);
    }

    IndexReport report() {
        return report;
    }

    List<InputProblem> problems() {
        return problems;
    }

    Path folder() {
        return indexFolder;
    }

    int size() {
        return withSearcher(s -> s.getIndexReader().numDocs());
    }

    /**
     * Opens the index, or builds it when it is missing, damaged or of another schema; with
     * {@code checkSources}, also brings it in line with the note files.
     */
    synchronized void start(boolean checkSources) {
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
        } catch (IOException e) {
            rebuild("index unreadable: " + IndexDamage.name(e), t0);
            return;
        }
        if (!NoteDocuments.SCHEMA.equals(commit.get(NoteDocuments.COMMIT_SCHEMA))) {
            rebuild("index from another version", t0);
            return;
        }
        try {
            manager = new SearcherManager(directory, null);
            probe();
        } catch (IOException e) {
            closeQuietly();
            rebuild("index corrupt: " + IndexDamage.name(e), t0);
            return;
        }
        if (!checkSources) {
            report = new IndexReport(IndexReport.Kind.OPENED, "note files not checked yet", size(), 0, 0, 0, millisSince(t0));
            return;
        }
        refreshFrom(commit.get(NoteDocuments.COMMIT_STAMP), t0);
    }

    /** Checks the note files against the index and brings it up to date. */
    synchronized IndexReport refresh() {
        if (directory == null) throw new IllegalStateException("the notes store is closed");
        long t0 = System.nanoTime();
        String recorded;
        try {
            recorded = SegmentInfos.readLatestCommit(directory).getUserData().get(NoteDocuments.COMMIT_STAMP);
        } catch (IOException e) {
            rebuild("index unreadable: " + IndexDamage.name(e), t0);
            return report;
        }
        refreshFrom(recorded, t0);
        return report;
    }

    /** Throws the index away and builds it again from the notes, keeping the last good version of a note whose file no longer parses. */
    synchronized IndexReport rebuild(String reason) {
        rebuild(reason, System.nanoTime(), SourceScan.of(stack), true);
        return report;
    }

    private void refreshFrom(String recordedStamp, long t0) {
        SourceScan scan = SourceScan.of(stack);
        if (Long.toString(scan.stamp()).equals(recordedStamp)) {
            report = new IndexReport(IndexReport.Kind.OPENED, "", size(), 0, 0, 0, millisSince(t0));
            return;
        }
        try {
            NoteSync.Outcome c = sync.sync(directory, scan, false, null);
            problems = c.problems();
            manager.maybeRefreshBlocking();
            report = new IndexReport(IndexReport.Kind.UPDATED, "notes changed", size(), c.written(), c.removed(),
                    problems.size(), millisSince(t0));
        } catch (LockObtainFailedException e) {
            closeQuietly();
            buildInMemory("index locked by another process", t0);
        } catch (IOException | AlreadyClosedException e) {
            if (e instanceof AlreadyClosedException && !IndexDamage.isDamage(e)) throw (AlreadyClosedException) e;
            closeQuietly();
            if (IndexDamage.isDamage(e)) {
                rebuild("index corrupt: " + IndexDamage.name(e), t0, scan, false);
            } else {
                buildInMemory("index folder not writable: " + IndexDamage.name(e), t0);
            }
        }
    }

    private void rebuild(String reason, long t0) {
        rebuild(reason, t0, SourceScan.of(stack), false);
    }

    /**
     * Builds the index afresh from the notes. With {@code keepLastGood} (a rebuild asked for, of an
     * index that is not known to be damaged) the new index is written over the old one, which is read
     * meanwhile for the last good version of each note whose file no longer parses; otherwise, or if
     * the old index turns out damaged, the folder is wiped first.
     */
    private void rebuild(String reason, long t0, SourceScan scan, boolean keepLastGood) {
        closeQuietly();
        if (inMemory) {
            buildInMemory(reason, t0);
            return;
        }
        try (DirectoryReader lastGood = keepLastGood ? lastGoodVersions() : null) {
            if (lastGood != null) {
                try {
                    NoteSync.Outcome c = sync.sync(directory, scan, true, lastGood);
                    opened(IndexReport.Kind.REBUILT, reason, c, t0);
                    return;
                } catch (LockObtainFailedException e) {
                    closeQuietly();
                    buildInMemory("index locked by another process", t0);
                    return;
                } catch (IOException e) {
                    if (!IndexDamage.isDamage(e)) throw e;
                    closeQuietly();
                }
            }
        } catch (IOException e) {
            closeQuietly();
            buildInMemory(reason + "; index folder not writable: " + IndexDamage.name(e), t0);
            return;
        }
        try {
            wipeIndexFolder();
            directory = FSDirectory.open(indexFolder);
            NoteSync.Outcome c = sync.sync(directory, scan, true, null);
            opened(IndexReport.Kind.REBUILT, reason, c, t0);
        } catch (IOException e) {
            closeQuietly();
            buildInMemory(reason + "; index folder not writable: " + IndexDamage.name(e), t0);
        }
    }

    private void opened(IndexReport.Kind kind, String reason, NoteSync.Outcome c, long t0) throws IOException {
        problems = c.problems();
        manager = new SearcherManager(directory, null);
        report = new IndexReport(kind, reason, size(), c.written(), c.removed(), problems.size(), millisSince(t0));
    }

    /**
     * The index being replaced, open on its last commit, when it is readable and of this schema:
     * the source of the last good version of notes whose files no longer parse. Null otherwise (the
     * notes are the truth; a damaged index has nothing to give).
     */
    private DirectoryReader lastGoodVersions() {
        if (directory == null) return null;
        DirectoryReader r = null;
        try {
            if (!DirectoryReader.indexExists(directory)) return null;
            r = DirectoryReader.open(directory);
            if (NoteDocuments.SCHEMA.equals(r.getIndexCommit().getUserData().get(NoteDocuments.COMMIT_SCHEMA))) return r;
        } catch (IOException unreadable) {
            // nothing to keep: the rebuild starts from the note files alone
        }
        if (r != null) {
            try {
                r.close();
            } catch (IOException ignored) {
                // a reader of an index about to be wiped
            }
        }
        return null;
    }

    private void buildInMemory(String reason, long t0) {
        inMemory = true;
        Directory old = directory;
        directory = new ByteBuffersDirectory();
        try {
            NoteSync.Outcome c = sync.sync(directory, SourceScan.of(stack), true, null);
            problems = c.problems();
            manager = new SearcherManager(directory, null);
            report = new IndexReport(IndexReport.Kind.IN_MEMORY, reason, size(), c.written(), 0, problems.size(),
                    millisSince(t0));
        } catch (IOException e) {
            throw new UncheckedIOException("could not build the notes index even in memory", e);
        } finally {
            closeDirectory(old);
        }
    }

    private static void closeDirectory(Directory d) {
        if (d == null) return;
        try {
            d.close();
        } catch (IOException ignored) {
            // the directory is no longer used
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
        } catch (IOException ignored) {
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

    /**
     * Puts one written note's document in the index and moves the recorded stamp of the note files
     * by {@code stampDelta}, so the next open does not re-read every note.
     */
    synchronized void update(Document doc, String id, long stampDelta) {
        try {
            Map<String, String> old = DirectoryReader.indexExists(directory)
                    ? SegmentInfos.readLatestCommit(directory).getUserData() : Map.of();
            String oldStamp = old.getOrDefault(NoteDocuments.COMMIT_STAMP, "unclean");
            String newStamp = "unclean".equals(oldStamp) ? oldStamp : Long.toString(parseLong(oldStamp) + stampDelta);
            IndexWriterConfig cfg = new IndexWriterConfig(indexAnalyzer)
                    .setOpenMode(IndexWriterConfig.OpenMode.CREATE_OR_APPEND).setCommitOnClose(false);
            try (IndexWriter w = new IndexWriter(directory, cfg)) {
                w.updateDocument(new Term(NoteDocuments.ID, id), doc);
                w.setLiveCommitData(NoteSync.commitData(newStamp).entrySet());
                w.commit();
            }
            manager.maybeRefreshBlocking();
        } catch (LockObtainFailedException e) {
            closeQuietly();
            buildInMemory("index locked by another process", System.nanoTime());
        } catch (IOException | AlreadyClosedException e) {
            if (e instanceof AlreadyClosedException && !IndexDamage.isDamage(e)) throw (AlreadyClosedException) e;
            rebuild((IndexDamage.isDamage(e) ? "index corrupt: " : "index not updated: ") + IndexDamage.name(e),
                    System.nanoTime());
        }
    }

    private static long parseLong(String s) {
        try {
            return Long.parseLong(s);
        } catch (NumberFormatException e) {
            return 0;
        }
    }

    /**
     * Runs {@code work} on the current searcher; if the index turns out damaged, rebuilds it and
     * tries once more. Any other failure (including a bug in {@code work}) reaches the caller and
     * leaves the index alone.
     */
    <T> T withSearcher(SearchWork<T> work) {
        try {
            return once(work);
        } catch (IOException e) {
            if (!IndexDamage.isDamage(e)) throw new UncheckedIOException("the notes index could not be read", e);
            damagedDuringSearch(e);
        } catch (UncheckedIOException e) {
            if (!IndexDamage.isDamage(e)) throw e;
            damagedDuringSearch(e);
        }
        try {
            return once(work);
        } catch (IOException again) {
            throw new UncheckedIOException("the notes index failed again after a rebuild", again);
        }
    }

    private synchronized void damagedDuringSearch(Exception e) {
        rebuild("index failed during a search: " + IndexDamage.name(e), System.nanoTime());
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
        }
    }

    private static long millisSince(long t0) {
        return (System.nanoTime() - t0) / 1_000_000;
    }
}
