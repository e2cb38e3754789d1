package org.arcwright.bench;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;

/**
 * Start-up harness: wall time from starting a JVM to the first usable window (its first frame painted,
 * as seen by a one-pixel probe on the top layer), for the Arcwright window and for a bare Swing frame
 * started the same way (the same JVM options as {@code ./arcwright} uses for the window), with and
 * without a class-data-sharing archive made by a training run (as {@code ./arcwright} does); and, for
 * Arcwright, to the Decide form built just after. Each child also reports its own CPU time at that
 * moment, which depends far less than wall time on what else the machine is doing. The system property
 * {@code startup.flags} replaces the JVM options for both, to try others side by side; {@code startup.before}
 * names another build's jar (e.g. a copy of the previous commit's), timed in the same rounds with its
 * own archive, for a before/after comparison at the same load.
 *
 * <p>Run on a display (e.g. {@code xvfb-run -a}) after {@code mvn -B -o -q package -DskipTests}:
 * {@code xvfb-run -a mvn -B -o -q -Pharness test-compile exec:exec -Dharness=org.arcwright.bench.StartupHarness}.
 * Arguments: runs per configuration (default 7). Each Arcwright run uses a fresh config directory,
 * so it takes the first-run path with the demo worksheet.
 */
public final class StartupHarness {
    /** The JVM options {@code ./arcwright} starts the window with; the bare frame gets the same. */
    static final List<String> LAUNCH_FLAGS = List.of("-XX:+UseSerialGC", "-XX:TieredStopAtLevel=1",
            "-XX:Tier3InvocationThreshold=1000", "-XX:Tier3MinInvocationThreshold=500", "-XX:Tier3CompileThreshold=5000",
            "-Xshare:auto");

    private StartupHarness() {}

    public static void main(String[] args) throws Exception {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 7;
        Path target = Path.of("target");
        Path appJar = target.resolve("arcwright.jar");
        if (!Files.exists(appJar)) throw new IllegalStateException("build the jar first: mvn -B -o -q package -DskipTests");
        Path bench = Files.createDirectories(target.resolve("bench"));
        Path bareJar = bareJar(bench);
        Path appCds = bench.resolve("app.jsa");
        Path bareCds = bench.resolve("bare.jsa");
        Files.deleteIfExists(appCds);
        Files.deleteIfExists(bareCds);
        System.out.printf(Locale.ROOT, "load average at start: %s%n", Files.readString(Path.of("/proc/loadavg")).trim());
        time(List.of("-XX:ArchiveClassesAtExit=" + appCds), appJar, "exit", bench);
        time(List.of("-XX:ArchiveClassesAtExit=" + bareCds), bareJar, "exit", bench);
        String beforeJar = System.getProperty("startup.before");
        Path before = beforeJar == null ? null : Path.of(beforeJar);
        Path beforeCds = bench.resolve("before.jsa");
        if (before != null) {
            Files.deleteIfExists(beforeCds);
            time(List.of("-XX:ArchiveClassesAtExit=" + beforeCds), before, "exit", bench);
        }
        List<Sample> previous = new ArrayList<>();
        List<Sample> app = new ArrayList<>();
        List<Sample> bare = new ArrayList<>();
        List<Sample> appCold = new ArrayList<>();
        List<Sample> bareCold = new ArrayList<>();
        for (int i = 0; i < runs; i++) {
            bare.add(time(List.of("-XX:SharedArchiveFile=" + bareCds), bareJar, "exit", bench));
            app.add(time(List.of("-XX:SharedArchiveFile=" + appCds), appJar, "exit", bench));
            if (before != null) previous.add(time(List.of("-XX:SharedArchiveFile=" + beforeCds), before, "exit", bench));
            bareCold.add(time(List.of(), bareJar, "exit", bench));
            appCold.add(time(List.of(), appJar, "exit", bench));
        }
        System.out.printf(Locale.ROOT, "load average at end: %s%n", Files.readString(Path.of("/proc/loadavg")).trim());
        System.out.println("| configuration | wall median ms | wall min ms | wall max ms | CPU median ms | CPU min ms"
                + " | Decide form built, wall median ms |");
        System.out.println("|---|---:|---:|---:|---:|---:|---:|");
        row("bare JFrame, CDS archive", bare);
        row("Arcwright window, CDS archive (as ./arcwright)", app);
        if (before != null) row("Arcwright before (" + before.getFileName() + "), CDS archive", previous);
        row("bare JFrame, JDK default CDS only", bareCold);
        row("Arcwright window, JDK default CDS only", appCold);
        System.out.printf(Locale.ROOT, "ratio Arcwright/bare with CDS, wall medians: %.2f, wall minima: %.2f, CPU medians: %.2f%n",
                median(wall(app)) / median(wall(bare)), Collections.min(wall(app)) / Collections.min(wall(bare)),
                median(cpu(app)) / median(cpu(bare)));
        if (before != null) {
            System.out.printf(Locale.ROOT, "ratio before/bare with CDS, wall medians: %.2f, CPU medians: %.2f%n",
                    median(wall(previous)) / median(wall(bare)), median(cpu(previous)) / median(cpu(bare)));
        }
        System.out.printf(Locale.ROOT, "ratio Arcwright/bare without archive, wall medians: %.2f, CPU medians: %.2f%n",
                median(wall(appCold)) / median(wall(bareCold)), median(cpu(appCold)) / median(cpu(bareCold)));
    }

    private static List<Double> wall(List<Sample> s) { return s.stream().map(Sample::wall).toList(); }

    private static List<Double> cpu(List<Sample> s) { return s.stream().map(Sample::cpu).toList(); }

    private static List<Double> completeWall(List<Sample> s) { return s.stream().map(Sample::completeWall).toList(); }

    private static void row(String name, List<Sample> s) {
        List<Double> w = wall(s);
        List<Double> c = cpu(s);
        System.out.printf(Locale.ROOT, "| %s | %.0f | %.0f | %.0f | %.0f | %.0f | %.0f |%n", name, median(w), Collections.min(w),
                Collections.max(w), median(c), Collections.min(c), median(completeWall(s)));
    }

    private static double median(List<Double> v) {
        List<Double> s = new ArrayList<>(v);
        Collections.sort(s);
        int n = s.size();
        return n % 2 == 1 ? s.get(n / 2) : (s.get(n / 2 - 1) + s.get(n / 2)) / 2;
    }

    /**
     * Wall and CPU milliseconds from process start to the first frame painted, and to the Decide form
     * built after it (the same moment for the bare frame).
     */
    record Sample(double wall, double cpu, double completeWall, double completeCpu) {}

    private static Sample time(List<String> jvm, Path jar, String probe, Path bench) throws Exception {
        Path config = Files.createTempDirectory(bench, "config");
        List<String> cmd = new ArrayList<>(List.of("java"));
        String flags = System.getProperty("startup.flags");
        cmd.addAll(flags == null ? LAUNCH_FLAGS : List.of(flags.trim().split("\\s+")));
        cmd.addAll(jvm);
        cmd.add("-Darcwright.startupProbe=" + probe);
        cmd.add("-Darcwright.config=" + config.toAbsolutePath());
        cmd.addAll(List.of("-jar", jar.toString()));
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectError(ProcessBuilder.Redirect.DISCARD);
        long start = System.nanoTime();
        Process p = pb.start();
        double[] usable = null;
        double[] complete = null;
        try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("arcwright-window-usable")) usable = mark(line, start);
                if (line.startsWith("arcwright-window-complete")) {
                    complete = mark(line, start);
                    break;
                }
            }
        }
        if (!p.waitFor(30, TimeUnit.SECONDS)) p.destroyForcibly();
        deleteTree(config);
        if (usable == null || complete == null) throw new IllegalStateException("no usable and complete markers from " + cmd);
        return new Sample(usable[0], usable[1], complete[0], complete[1]);
    }

    /** Removes a run's config directory, so that repeated harness runs do not pile them up under target/bench. */
    private static void deleteTree(Path dir) throws IOException {
        try (java.util.stream.Stream<Path> files = Files.walk(dir)) {
            for (Path f : files.sorted(java.util.Comparator.reverseOrder()).toList()) Files.deleteIfExists(f);
        }
    }

    /** Wall ms since {@code start} and the CPU ms the child printed on a marker line. */
    private static double[] mark(String line, long start) {
        double wall = (System.nanoTime() - start) / 1e6;
        int i = line.indexOf("cpu=");
        return new double[] {wall, i >= 0 ? Double.parseDouble(line.substring(i + 4).trim()) : -1};
    }

    /** Packs {@link BareFrame} into its own jar, so it can use a class-data-sharing archive like the app. */
    private static Path bareJar(Path bench) throws IOException {
        Path jar = bench.resolve("bareframe.jar");
        Manifest mf = new Manifest();
        mf.getMainAttributes().put(Attributes.Name.MANIFEST_VERSION, "1.0");
        mf.getMainAttributes().put(Attributes.Name.MAIN_CLASS, BareFrame.class.getName());
        String entry = BareFrame.class.getName().replace('.', '/');
        try (OutputStream out = Files.newOutputStream(jar); JarOutputStream j = new JarOutputStream(out, mf)) {
            for (String suffix : List.of(".class", "$1.class")) {
                Path cls = Path.of("target/test-classes", entry + suffix);
                if (!Files.exists(cls)) continue;
                j.putNextEntry(new JarEntry(entry + suffix));
                j.write(Files.readAllBytes(cls));
                j.closeEntry();
            }
        }
        return jar;
    }
}
