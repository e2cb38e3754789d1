package org.arcwright.notes;

import java.io.IOException;
import java.io.InterruptedIOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Future;
import java.util.concurrent.Phaser;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.stream.IntStream;
import org.apache.lucene.document.Document;
import org.apache.lucene.facet.FacetsConfig;
import org.apache.lucene.index.BinaryDocValues;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.store.Directory;
import org.apache.lucene.util.Bits;
import org.arcwright.io.InputFiles;
import org.arcwright.io.InputProblem;

/**
 * Brings an index in line with the note files of a {@link SourceScan}: notes whose content hash
 * changed are written, notes gone are removed, and a note file that no longer parses keeps its last
 * good version (from the index being updated, or from the old index a rebuild replaces).
 */
final class NoteSync {
    /** Notes are read and parsed in chunks of this many (on the common pool), then queued for indexing. */
    private static final int CHUNK = 512;

    private final TradeAnalyzer indexAnalyzer;
    private final FacetsConfig facetsConfig;

    /** What a sync did: notes written and removed, and the note files that could not be used. */
    record Outcome(int written, int removed, List<InputProblem> problems) {}

    /** A note as the index has it: id, content hash, file. */
    record Indexed(String id, String hash, String location) {}

    /** A note file read and parsed (or the problem with it). */
    private record Loaded(SourceScan.Entry entry, String text, Note note, String hash, InputProblem problem, boolean gone) {}

    NoteSync(TradeAnalyzer indexAnalyzer, FacetsConfig facetsConfig) {
        this.indexAnalyzer = indexAnalyzer;
        this.facetsConfig = facetsConfig;
    }

    /**
     * Half the heap, between 16 and 128 MB, for the documents buffered before a segment is written:
     * a 100,000-note build in a 256 MB heap then writes two segments instead of four or five and
     * merges less (docs/benchmarks/notes.md).
     */
    private static double indexingBufferMB() {
        double half = Runtime.getRuntime().maxMemory() / 2.0 / (1024 * 1024);
        return Math.max(16, Math.min(128, half));
    }

    /**
     * Brings the index in {@code directory} in line with the notes. Packs are read from the top
     * layer down, so the first note seen under an id is the one in force, and only the set of seen
     * ids is kept in memory (not the notes).
     *
     * @param fresh true to write a new index over whatever is in {@code directory}
     * @param lastGood for a fresh index, the index it replaces (open on its last commit), from which
     *     a note whose file no longer parses keeps its last good version; null when there is none
     */
    Outcome sync(Directory directory, SourceScan scan, boolean fresh, IndexReader lastGood) throws IOException {
        Map<String, Indexed> existing = new HashMap<>();
        Map<String, String> idAtLocation = new HashMap<>();
        if (!fresh) {
            try (DirectoryReader r = DirectoryReader.open(directory)) {
                existing = idsIn(r);
            }
            for (Indexed x : existing.values()) idAtLocation.put(x.location(), x.id());
        }
        Map<String, Indexed> lastGoodAt = new HashMap<>();
        if (fresh && lastGood != null) {
            for (Indexed x : idsIn(lastGood).values()) lastGoodAt.put(x.location(), x);
        }
        IndexWriterConfig cfg = new IndexWriterConfig(indexAnalyzer)
                .setOpenMode(fresh ? IndexWriterConfig.OpenMode.CREATE : IndexWriterConfig.OpenMode.CREATE_OR_APPEND)
                .setRAMBufferSizeMB(indexingBufferMB())
                .setCommitOnClose(false);
        List<InputProblem> found = new ArrayList<>();
        Map<String, Integer> seen = new HashMap<>();
        Set<String> pinned = new HashSet<>();
        List<Document> kept = new ArrayList<>();
        int written = 0;
        int removed = 0;
        List<SourceScan.Entry> entries = scan.entries();
        try (IndexWriter w = new IndexWriter(directory, cfg)) {
            try (ParallelIndexer indexer = new ParallelIndexer(w, fresh)) {
                for (int[] range : packRangesTopDown(entries)) {
                    for (int from = range[0]; from < range[1]; from += CHUNK) {
                        int to = Math.min(range[1], from + CHUNK);
                        List<Loaded> loaded = IntStream.range(from, to).parallel()
                                .mapToObj(i -> load(entries.get(i))).toList();
                        List<Loaded> toWrite = new ArrayList<>();
                        for (Loaded l : loaded) {
                            SourceScan.Entry e = l.entry();
                            String location = e.path().toString();
                            if (l.gone()) continue;
                            if (l.problem() != null) {
                                found.add(l.problem());
                                String keptId = idAtLocation.get(location);
                                if (keptId != null) {
                                    pinned.add(keptId);
                                    seen.putIfAbsent(keptId, e.packIndex());
                                } else {
                                    Indexed old = lastGoodAt.get(location);
                                    if (old != null && !seen.containsKey(old.id())) {
                                        Document d = lastGoodDocument(lastGood, old);
                                        if (d != null) {
                                            kept.add(d);
                                            pinned.add(old.id());
                                            seen.put(old.id(), e.packIndex());
                                        }
                                    }
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
            }
            for (Document d : kept) w.addDocument(d);
            written += kept.size();
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
        return new Outcome(written, removed, List.copyOf(found));
    }

    /** Index ranges of {@code entries} by pack, top layer first. */
    private static List<int[]> packRangesTopDown(List<SourceScan.Entry> entries) {
        List<int[]> ranges = new ArrayList<>();
        int start = 0;
        for (int i = 1; i <= entries.size(); i++) {
            if (i == entries.size() || entries.get(i).packIndex() != entries.get(start).packIndex()) {
                ranges.add(new int[] {start, i});
                start = i;
            }
        }
        Collections.reverse(ranges);
        return ranges;
    }

    /** The document of {@code old} in the index being replaced, ready to add to the new one; null if it cannot be read. */
    private Document lastGoodDocument(IndexReader lastGood, Indexed old) throws IOException {
        IndexSearcher s = new IndexSearcher(lastGood);
        TopDocs top = s.search(new TermQuery(new Term(NoteDocuments.ID, old.id())), 1);
        if (top.scoreDocs.length == 0) return null;
        Document stored = s.storedFields().document(top.scoreDocs[0].doc);
        String source = stored.get(NoteDocuments.SOURCE);
        FiledNote f;
        try {
            f = NoteHits.filed(stored);
        } catch (InputProblem unreadable) {
            return null;
        }
        return NoteDocuments.toDocument(facetsConfig, f.note(), source, f.pack(), f.layer(), old.location(), old.hash());
    }

    /**
     * Turns queued notes into documents and adds them to the writer on a pool of threads, one per
     * core (at most four), so that reading the next notes, and one thread's flush of a full segment,
     * overlap with indexing on the others: with a parallel loop per chunk instead, both cores waited
     * at the end of each chunk for whichever thread was flushing, and the build used little more
     * than one core. At the end each thread flushes one buffered segment, so the last segments are
     * written side by side rather than one after the other in the commit. When the queue is full the
     * caller indexes the note itself, which keeps memory bounded.
     */
    private final class ParallelIndexer implements AutoCloseable {
        private static final int QUEUE = 1024;
        private final IndexWriter writer;
        private final boolean fresh;
        private final int threads;
        private final ThreadPoolExecutor pool;
        private final Phaser inFlight = new Phaser(1);
        private final AtomicReference<Throwable> failure = new AtomicReference<>();
        private boolean finished;

        ParallelIndexer(IndexWriter writer, boolean fresh) {
            this.writer = writer;
            this.fresh = fresh;
            this.threads = Math.max(1, Math.min(4, Runtime.getRuntime().availableProcessors()));
            this.pool = new ThreadPoolExecutor(threads, threads, 0, TimeUnit.MILLISECONDS,
                    new ArrayBlockingQueue<>(QUEUE), daemonThreads(), new ThreadPoolExecutor.CallerRunsPolicy());
        }

        void submit(Loaded l) throws IOException {
            rethrow();
            inFlight.register();
            pool.execute(() -> {
                try {
                    if (failure.get() == null) index(l);
                } catch (IOException | RuntimeException | Error e) {
                    failure.compareAndSet(null, e);
                } finally {
                    inFlight.arriveAndDeregister();
                }
            });
        }

        /** Waits for every submitted note to be indexed, then flushes the buffered segments side by side. */
        void finish() throws IOException {
            try {
                inFlight.awaitAdvanceInterruptibly(inFlight.arrive());
                rethrow();
                List<Future<?>> flushes = new ArrayList<>();
                for (int i = 0; i < threads; i++) flushes.add(pool.submit(() -> {
                    writer.flushNextBuffer();
                    return null;
                }));
                for (Future<?> f : flushes) f.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new InterruptedIOException("interrupted while indexing notes");
            } catch (ExecutionException e) {
                failure.compareAndSet(null, e.getCause());
                rethrow();
            }
            finished = true;
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
         * Stops the pool. When the build ended early (an exception on the caller's side) the queued
         * notes are skipped and the running ones finish; no interrupt, which would close the index
         * files under a writing thread.
         */
        @Override
        public void close() {
            if (!finished) failure.compareAndSet(null, new CancellationException("notes build abandoned"));
            pool.shutdown();
            try {
                pool.awaitTermination(10, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
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

    private static ThreadFactory daemonThreads() {
        AtomicInteger n = new AtomicInteger();
        return task -> {
            Thread t = new Thread(task, "notes-indexing-" + n.getAndIncrement());
            t.setDaemon(true);
            return t;
        };
    }

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

    /** The user data of a commit: the schema, and the stamp of the note files it is in line with ("unclean" when some did not parse). */
    static Map<String, String> commitData(String stamp) {
        Map<String, String> m = new HashMap<>();
        m.put(NoteDocuments.COMMIT_SCHEMA, NoteDocuments.SCHEMA);
        m.put(NoteDocuments.COMMIT_STAMP, stamp);
        return m;
    }

    /** Every live note in {@code r} by id, from the doc values (no stored fields read). */
    static Map<String, Indexed> idsIn(IndexReader r) throws IOException {
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
        return InputFiles.decode(bytes, file);
    }

    /** The text of a note file, UTF-8 checked; a missing or undecodable file is an {@link InputProblem}. */
    static String readNoteText(Path file) {
        return InputFiles.readText(file);
    }
}
