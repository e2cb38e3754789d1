package org.arcwright.notes;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.stream.Stream;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.arcwright.pack.PackStack;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The notes are the truth and the index is a cache: whatever happens to the index folder, or to a
 * note file mid-save, the store opens, says what it did, and loses no note.
 */
class NotesStoreRecoveryTest {
    private static final List<String> ALL = List.of("note-00", "note-01", "note-02", "note-03", "note-04", "note-05");

    @TempDir
    Path tmp;

    private Path pack;
    private Path index;

    @BeforeEach
    void packOfSixNotes() {
        pack = TestPacks.pack(tmp.resolve("pack"), "Recovery pack");
        for (int i = 0; i < ALL.size(); i++) {
            TestPacks.note(pack, ALL.get(i) + ".md", TestPacks.text(ALL.get(i), "Invented note " + i + " on fillet " + i,
                    "t" + i, "general", "Body of invented note number " + i + " about radius R" + i + ".5 on a bracket."));
        }
        index = tmp.resolve("index");
    }

    private PackStack stack() {
        return TestPacks.stack(pack);
    }

    private void buildOnce() {
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.REBUILT);
        }
    }

    private List<Path> indexFiles() throws IOException {
        try (Stream<Path> s = Files.list(index)) {
            return s.filter(p -> !p.getFileName().toString().equals("write.lock")).sorted().toList();
        }
    }

    @Test
    void garbageInEveryIndexFileIsRebuiltFromTheNotes() throws IOException {
        buildOnce();
        Random random = new Random(20261130L);
        for (Path f : indexFiles()) {
            byte[] junk = new byte[(int) Math.max(16, Files.size(f))];
            random.nextBytes(junk);
            Files.write(f, junk);
        }
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.REBUILT);
            assertThat(s.ids()).containsExactlyElementsOf(ALL);
            assertThat(s.search("fillet 3", NoteFilters.none(), 1).hits().get(0).id()).isEqualTo("note-03");
        }
    }

    @Test
    void aFlippedByteInTheMiddleOfASegmentIsCaughtAndRebuilt() throws IOException {
        buildOnce();
        for (Path f : indexFiles()) {
            if (f.getFileName().toString().startsWith("segments")) continue;
            byte[] b = Files.readAllBytes(f);
            if (b.length > 64) {
                b[b.length / 2] ^= (byte) 0x5a;
                Files.write(f, b);
            }
        }
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.ids()).containsExactlyElementsOf(ALL);
            assertThat(s.search("bracket", NoteFilters.none(), 10).totalHits()).isEqualTo(ALL.size());
            assertThat(s.get("note-02").orElseThrow().note().title()).isEqualTo("Invented note 2 on fillet 2");
        }
    }

    @Test
    void aDeletedSegmentFileIsRebuilt() throws IOException {
        buildOnce();
        for (Path f : indexFiles()) {
            if (!f.getFileName().toString().startsWith("segments")) Files.delete(f);
        }
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.REBUILT);
            assertThat(s.ids()).containsExactlyElementsOf(ALL);
        }
    }

    @Test
    void aMissingIndexFolderIsBuilt() throws IOException {
        buildOnce();
        try (Stream<Path> s = Files.walk(index)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) Files.delete(p);
        }
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().reason()).isEqualTo("no index yet");
            assertThat(s.ids()).containsExactlyElementsOf(ALL);
        }
    }

    @Test
    void aStaleLockFileLeftByACrashedRunDoesNotBlockAnUpdate() throws IOException {
        buildOnce();
        Files.deleteIfExists(index.resolve("write.lock"));
        Files.createFile(index.resolve("write.lock"));
        TestPacks.note(pack, "note-06.md", TestPacks.text("note-06", "Invented note 6", "t6", "general", "Added later."));
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().kind()).as(s.report().describe()).isEqualTo(IndexReport.Kind.UPDATED);
            assertThat(s.report().written()).isEqualTo(1);
            assertThat(s.get("note-06")).isPresent();
        }
    }

    @Test
    void aLockFileWithJunkInItIsThrownAwayWithTheIndex() throws IOException {
        buildOnce();
        Files.writeString(index.resolve("write.lock"), "not a lock file Lucene wrote");
        TestPacks.note(pack, "note-06.md", TestPacks.text("note-06", "Invented note 6", "t6", "general", "Added later."));
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.REBUILT);
            assertThat(s.ids()).hasSize(ALL.size() + 1);
        }
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.OPENED);
        }
    }

    @Test
    void anIndexLockedByALiveWriterIsBuiltInMemoryAndTheDiskCopyCatchesUpLater() throws IOException {
        buildOnce();
        TestPacks.note(pack, "note-06.md", TestPacks.text("note-06", "Invented note 6", "t6", "general", "Added later."));
        try (Directory d = FSDirectory.open(index);
             IndexWriter owner = new IndexWriter(d, new IndexWriterConfig(new StandardAnalyzer()))) {
            try (NotesStore s = NotesStore.open(stack(), index)) {
                assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.IN_MEMORY);
                assertThat(s.report().reason()).contains("locked");
                assertThat(s.ids()).hasSize(ALL.size() + 1);
            }
            owner.rollback();
        }
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.UPDATED);
            assertThat(s.ids()).hasSize(ALL.size() + 1);
        }
    }

    @Test
    void aTruncatedNoteIsReportedAndItsLastGoodVersionStaysSearchable() throws IOException {
        buildOnce();
        Path victim = pack.resolve("notes/note-04.md");
        String text = Files.readString(victim);
        Files.writeString(victim, text.substring(0, text.indexOf("process:") - 3));
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.problems()).hasSize(1);
            assertThat(s.problems().get(0).source()).isEqualTo(victim.toString());
            assertThat(s.problems().get(0).getMessage()).contains("header not closed");
            assertThat(s.ids()).containsExactlyElementsOf(ALL);
            assertThat(s.get("note-04").orElseThrow().note().body()).contains("R4.5");
        }
        try (NotesStore again = NotesStore.open(stack(), index)) {
            assertThat(again.problems()).as("a broken note is reported on every open until fixed").hasSize(1);
            assertThat(again.ids()).containsExactlyElementsOf(ALL);
        }
        Files.writeString(victim, text);
        try (NotesStore fixed = NotesStore.open(stack(), index)) {
            assertThat(fixed.problems()).isEmpty();
            assertThat(fixed.ids()).containsExactlyElementsOf(ALL);
        }
    }

    @Test
    void aNoteTruncatedToNothingOrToHalfABodyLosesNoOtherNote() throws IOException {
        Files.writeString(pack.resolve("notes/note-01.md"), "");
        String two = Files.readString(pack.resolve("notes/note-02.md"));
        Files.writeString(pack.resolve("notes/note-02.md"), two.substring(0, two.length() - 20));
        Files.write(pack.resolve("notes/note-03.md"), new byte[] {'-', '-', '-', '\n', (byte) 0xC3});
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.problems()).hasSize(2);
            assertThat(s.ids()).containsExactly("note-00", "note-02", "note-04", "note-05");
            assertThat(s.get("note-02").orElseThrow().note().body()).startsWith("Body of invented note number 2");
        }
    }

    @Test
    void anIndexFromAnotherSchemaIsRebuilt() throws IOException {
        try (Directory d = FSDirectory.open(index);
             IndexWriter w = new IndexWriter(d, new IndexWriterConfig(new StandardAnalyzer()))) {
            w.setLiveCommitData(Map.of("schema", "arcwright-notes-0").entrySet());
            w.commit();
        }
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.REBUILT);
            assertThat(s.report().reason()).contains("another version");
            assertThat(s.ids()).containsExactlyElementsOf(ALL);
        }
    }

    @Test
    void anUnwritableIndexLocationFallsBackToMemory() throws IOException {
        Path notAFolder = tmp.resolve("file-in-the-way");
        Files.writeString(notAFolder, "x");
        try (NotesStore s = NotesStore.open(stack(), notAFolder)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.IN_MEMORY);
            assertThat(s.ids()).containsExactlyElementsOf(ALL);
        }
    }

    @Test
    void reindexRebuildsOnRequestAndKeepsEveryNote() {
        buildOnce();
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.OPENED);
            IndexReport r = s.reindex();
            assertThat(r.kind()).isEqualTo(IndexReport.Kind.REBUILT);
            assertThat(r.written()).isEqualTo(ALL.size());
            assertThat(s.ids()).containsExactlyElementsOf(ALL);
        }
    }

    @Test
    void aNoteWhoseHeaderBrokeKeepsItsLastGoodVersionThroughAReindexAndIsReported() throws IOException {
        buildOnce();
        Path victim = pack.resolve("notes/note-04.md");
        String text = Files.readString(victim);
        Files.writeString(victim, text.substring(0, text.indexOf("process:") - 3));
        try (NotesStore s = NotesStore.open(stack(), index)) {
            IndexReport r = s.reindex();
            assertThat(r.kind()).isEqualTo(IndexReport.Kind.REBUILT);
            assertThat(r.problems()).isEqualTo(1);
            assertThat(s.problems()).extracting(p -> p.source()).containsExactly(victim.toString());
            assertThat(s.ids()).containsExactlyElementsOf(ALL);
            assertThat(s.get("note-04").orElseThrow().note().body()).contains("R4.5");
            assertThat(s.search("R4.5", NoteFilters.none(), 3).hits()).extracting(NoteHit::id).contains("note-04");
        }
        try (NotesStore again = NotesStore.open(stack(), index)) {
            assertThat(again.problems()).as("still reported after the reindex").hasSize(1);
            assertThat(again.get("note-04").orElseThrow().note().body()).contains("R4.5");
        }
    }

    @Test
    void aBugInTheHitCodeSurfacesAndLeavesTheIndexAlone() throws IOException {
        buildOnce();
        List<Path> before = indexFiles();
        NoteHits faulty = new NoteHits(NoteDocuments.facetsConfig()) {
            @Override
            NoteHit hit(FiledNote f, float score, Set<String> marks) {
                throw new IllegalStateException("a bug in the hit code");
            }
        };
        try (NotesStore s = NotesStore.open(stack(), index, faulty)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.OPENED);
            assertThatThrownBy(() -> s.search("bracket", NoteFilters.none(), 5))
                    .isInstanceOf(IllegalStateException.class).hasMessageContaining("a bug in the hit code");
            assertThat(s.report().kind()).as("no rebuild after the bug").isEqualTo(IndexReport.Kind.OPENED);
        }
        assertThat(indexFiles()).as("the index files are the ones written before").isEqualTo(before);
        try (NotesStore s = NotesStore.open(stack(), index)) {
            assertThat(s.report().kind()).isEqualTo(IndexReport.Kind.OPENED);
            assertThat(s.search("bracket", NoteFilters.none(), 10).hits()).hasSize(ALL.size());
        }
    }
}
