package org.arcwright.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.lang.management.OperatingSystemMXBean;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import java.util.stream.Collectors;
import org.arcwright.io.JsonFiles;
import org.arcwright.notes.IndexReport;
import org.arcwright.notes.NoteFilters;
import org.arcwright.notes.NotesStore;
import org.arcwright.notes.SearchResult;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PracticePack;

/**
 * Measures the notes store on 100,000 generated notes. A main() harness rather than JMH because
 * building the index and a cold open happen once per process.
 *
 * <p>Run each phase in its own JVM, in this order (the folder is reused between phases):
 * <pre>
 *   mvn -B -o -Pharness test-compile exec:exec -Dharness=org.arcwright.bench.NotesHarness -Dharness.jvm=-Xmx256m -Dharness.args="build /tmp/notes-bench 100000"
 *   mvn -B -o -Pharness test-compile exec:exec -Dharness=org.arcwright.bench.NotesHarness -Dharness.jvm=-Xmx256m -Dharness.args="cold /tmp/notes-bench"
 *   mvn -B -o -Pharness test-compile exec:exec -Dharness=org.arcwright.bench.NotesHarness -Dharness.jvm=-Xmx256m -Dharness.args="warm /tmp/notes-bench"
 * </pre>
 * ({@code cold-unchecked} times {@link NotesStore#openUnchecked} the same way; {@code build-warm}
 * times the build after a warm-up build of other notes in the same JVM.)
 * {@code build} writes the notes (not timed) and times a full index build; {@code cold} times
 * opening the store over an up-to-date index plus the first search, in a fresh JVM; {@code warm}
 * times 1,000 searches without and 1,000 with facet counts after 1,800 warm-up searches and prints percentiles. Each phase prints the
 * peak heap used.
 */
public final class NotesHarness {
    private static final String[] QUERIES = {"fillet fatigue shaft", "R0.5", "CR 1.2", "o-ring groove corner", "2768-m",
            "bearing chamfer shoulder", "profile datums bracket", "edge break burr", "casting fillet stock", "comparator chart",
            "supplier relax radius", "tangent mismatch", "kt at the minimum radius", "R1.5 ±0.1 housing", "sealing land edge",
            "title block radius", "cross-hole edge manifold", "spherical end pin", "rib root moulded", "first-article cmm"};

    private NotesHarness() {}

    public static void main(String[] args) throws Exception {
        long mainEntered = System.nanoTime();
        if (args.length < 2) {
            System.err.println("usage: NotesHarness build|build-warm|cold|cold-unchecked|warm FOLDER [COUNT]");
            System.exit(2);
        }
        Path root = Path.of(args[1]);
        Path pack = root.resolve("pack");
        Path index = root.resolve("index");
        switch (args[0]) {
            case "build": build(pack, index, args.length > 2 ? Integer.parseInt(args[2]) : 100_000); break;
            case "build-warm": buildWarm(root, pack, index, args.length > 2 ? Integer.parseInt(args[2]) : 100_000); break;
            case "cold": cold(pack, index); break;
            case "cold-unchecked": coldUnchecked(pack, index); break;
            case "warm": warm(pack, index); break;
            default: throw new IllegalArgumentException(args[0]);
        }
        long jvmUpAtMain = ManagementFactory.getRuntimeMXBean().getUptime() - (System.nanoTime() - mainEntered) / 1_000_000;
        System.out.printf("JVM start until main() (not part of the figures above): about %d ms%n", jvmUpAtMain);
        System.out.printf("ran within a %d MB heap; peak heap used %.1f MB (sum of the pools' peaks, an upper bound)%n",
                Runtime.getRuntime().maxMemory() / (1024 * 1024), peakHeapMb());
    }

    private static PackStack stack(Path pack) {
        return new PackStack(List.of(PracticePack.open(pack, PackLayer.TEAM, new JsonFiles())), List.of());
    }

    private static void build(Path pack, Path index, int count) throws Exception {
        if (!Files.isDirectory(pack.resolve("notes"))) {
            long g0 = System.nanoTime();
            GeneratedNotes.write(pack, count, 20261130L);
            System.out.printf("generated %d notes in %.1f s (not part of the figures)%n", count, (System.nanoTime() - g0) / 1e9);
        }
        deleteTree(index);
        long cpu0 = processCpuNanos();
        long t0 = System.nanoTime();
        try (NotesStore store = NotesStore.open(stack(pack), index)) {
            double s = (System.nanoTime() - t0) / 1e9;
            double cpu = (processCpuNanos() - cpu0) / 1e9;
            IndexReport r = store.report();
            System.out.println(r.describe());
            System.out.printf("index build: %d notes in %.2f s wall = %.0f notes/s (read, parse, hash, analyse, index, commit)%n",
                    r.written(), s, r.written() / s);
            System.out.printf("             %.2f s of process CPU (all threads, JIT and GC included) = %.0f notes per CPU-second%n",
                    cpu, r.written() / cpu);
            System.out.printf("index size on disk: %.1f MB%n", sizeMb(index));
        }
    }

    /**
     * As {@code build}, after a warm-up build of {@value #WARM_UP_NOTES} other generated notes in the
     * same JVM (a separate pack and index, deleted after), so the figure is the build's own speed
     * with the just-in-time compiler's work done, as JMH measures after its warm-up iterations, and
     * as in a desktop session that has built an index before.
     */
    private static void buildWarm(Path root, Path pack, Path index, int count) throws Exception {
        Path warmPack = root.resolve("warm-up-pack");
        Path warmIndex = root.resolve("warm-up-index");
        if (!Files.isDirectory(warmPack.resolve("notes"))) GeneratedNotes.write(warmPack, WARM_UP_NOTES, 20261201L);
        deleteTree(warmIndex);
        long w0 = System.nanoTime();
        try (NotesStore store = NotesStore.open(stack(warmPack), warmIndex)) {
            System.out.printf("warm-up build: %d notes in %.2f s (not part of the figures)%n", store.size(), (System.nanoTime() - w0) / 1e9);
        }
        deleteTree(warmIndex);
        System.gc();
        build(pack, index, count);
    }

    private static final int WARM_UP_NOTES = 25_000;

    private static void cold(Path pack, Path index) {
        long t0 = System.nanoTime();
        try (NotesStore store = NotesStore.open(stack(pack), index)) {
            long opened = System.nanoTime();
            SearchResult r = store.search("fillet fatigue shaft", NoteFilters.none(), 10, false);
            long searched = System.nanoTime();
            store.search("bearing chamfer shoulder", NoteFilters.none(), 10, true);
            long faceted = System.nanoTime();
            System.out.println(store.report().describe());
            System.out.printf("cold open (checking every note file): %.0f ms, first search (no facets): %.0f ms, total %.0f ms"
                    + " (%d hits of at least %d); then a first search with facet counts: %.0f ms%n",
                    (opened - t0) / 1e6, (searched - opened) / 1e6, (searched - t0) / 1e6, r.hits().size(), r.totalHits(),
                    (faceted - searched) / 1e6);
        }
    }

    private static void coldUnchecked(Path pack, Path index) {
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        long cpuMain0 = threads.getCurrentThreadCpuTime();
        long cpuAll0 = processCpuNanos();
        long p0 = System.nanoTime();
        PackStack stack = stack(pack);
        long t0 = System.nanoTime();
        try (NotesStore store = NotesStore.openUnchecked(stack, index)) {
            long opened = System.nanoTime();
            SearchResult r = store.search("fillet fatigue shaft", NoteFilters.none(), 10, false);
            long searched = System.nanoTime();
            long cpuMain1 = threads.getCurrentThreadCpuTime();
            long cpuAll1 = processCpuNanos();
            IndexReport refreshed = store.refreshInBackground().join();
            long checked = System.nanoTime();
            System.out.printf("opening the pack (pack.json, first use of the JSON library; not the notes store): %.0f ms%n",
                    (t0 - p0) / 1e6);
            System.out.printf("cold open (unchecked): %.0f ms, first search (no facets): %.0f ms, total %.0f ms (%d hits);"
                    + " then refreshInBackground() until done: %.0f ms (%s)%n",
                    (opened - t0) / 1e6, (searched - opened) / 1e6, (searched - t0) / 1e6, r.hits().size(),
                    (checked - searched) / 1e6, refreshed.kind());
            System.out.printf("CPU time from opening the pack to the end of the first search: process %.0f ms (all threads, JIT"
                    + " and GC included), main thread %.0f ms%n", (cpuAll1 - cpuAll0) / 1e6, (cpuMain1 - cpuMain0) / 1e6);
        }
        for (int round = 1; round <= 3; round++) {
            long t1 = System.nanoTime();
            try (NotesStore store = NotesStore.openUnchecked(stack, index)) {
                long opened = System.nanoTime();
                SearchResult r = store.search("groove corner o-ring", NoteFilters.none(), 10, false);
                long searched = System.nanoTime();
                System.out.printf("re-open %d in the same JVM (classes loaded, as when the app switches stacks): open %.1f ms,"
                        + " first search %.1f ms, total %.1f ms (%d hits)%n", round, (opened - t1) / 1e6,
                        (searched - opened) / 1e6, (searched - t1) / 1e6, r.hits().size());
            }
        }
    }

    private static void warm(Path pack, Path index) {
        try (NotesStore store = NotesStore.open(stack(pack), index)) {
            SplittableRandom random = new SplittableRandom(7);
            for (int i = 0; i < 1500; i++) store.search(QUERIES[random.nextInt(QUERIES.length)], NoteFilters.none(), 10, i % 2 == 0);
            List<String> sample = new ArrayList<>();
            for (boolean facets : new boolean[] {false, true}) {
                for (int i = 0; i < 300; i++) store.search(QUERIES[random.nextInt(QUERIES.length)], NoteFilters.none(), 10, facets);
                int n = 1000;
                long[] nanos = new long[n];
                long[] cpu = new long[n];
                ThreadMXBean threads = ManagementFactory.getThreadMXBean();
                Map<String, List<Long>> byQuery = new TreeMap<>();
                for (int i = 0; i < n; i++) {
                    String q = QUERIES[random.nextInt(QUERIES.length)];
                    long c = threads.getCurrentThreadCpuTime();
                    long t = System.nanoTime();
                    SearchResult r = store.search(q, NoteFilters.none(), 10, facets);
                    nanos[i] = System.nanoTime() - t;
                    cpu[i] = threads.getCurrentThreadCpuTime() - c;
                    byQuery.computeIfAbsent(q, k -> new ArrayList<>()).add(nanos[i]);
                    if (i < 3 && facets) sample.add(q + " -> " + r.totalHits() + " hits");
                }
                Arrays.sort(nanos);
                Arrays.sort(cpu);
                System.out.printf("warm search (10 hits with snippets%s), %d queries: wall p50 %.2f ms, p95 %.2f ms, p99 %.2f ms,"
                        + " max %.2f ms; CPU time of the searching thread p50 %.2f ms, p95 %.2f ms%n",
                        facets ? " and facet counts over all matches" : ", no facets", n, nanos[n / 2] / 1e6,
                        nanos[(int) (n * 0.95)] / 1e6, nanos[(int) (n * 0.99)] / 1e6, nanos[n - 1] / 1e6,
                        cpu[n / 2] / 1e6, cpu[(int) (n * 0.95)] / 1e6);
                System.out.println("  slowest queries by median: " + byQuery.entrySet().stream()
                        .map(e -> Map.entry(e.getKey(), e.getValue().stream().sorted().toList().get(e.getValue().size() / 2)))
                        .sorted(Map.Entry.<String, Long>comparingByValue().reversed()).limit(5)
                        .map(e -> String.format("\"%s\" %.2f ms", e.getKey(), e.getValue() / 1e6))
                        .collect(Collectors.joining(", ")));
            }
            long t = System.nanoTime();
            for (int i = 0; i < 200; i++) store.related(List.of("sealing", "o-ring"), "groove corner radius on a housing", 5);
            System.out.printf("related(): mean %.2f ms over 200 calls%n", (System.nanoTime() - t) / 200 / 1e6);
            sample.forEach(System.out::println);
        }
    }

    private static long processCpuNanos() {
        OperatingSystemMXBean os = ManagementFactory.getOperatingSystemMXBean();
        if (os instanceof com.sun.management.OperatingSystemMXBean sun) return sun.getProcessCpuTime();
        return 0;
    }

    private static double peakHeapMb() {
        long sum = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) sum += pool.getPeakUsage().getUsed();
        }
        return sum / (1024.0 * 1024.0);
    }

    private static double sizeMb(Path dir) throws Exception {
        try (var s = Files.walk(dir)) {
            return s.filter(Files::isRegularFile).mapToLong(p -> p.toFile().length()).sum() / (1024.0 * 1024.0);
        }
    }

    private static void deleteTree(Path dir) throws Exception {
        if (!Files.exists(dir)) return;
        try (var s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) Files.delete(p);
        }
    }
}
