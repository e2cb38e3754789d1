package org.arcwright.bench;

import java.io.BufferedReader;
import java.io.File;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;
import java.util.stream.Stream;

/**
 * Start-up harness: wall time from starting a JVM to the first usable window (its first frame painted,
 * as seen by a one-pixel probe on the top layer), for the Arcwright window ({@link StartupProbe}, which
 * opens it as {@code ./arcwright} does) and for a bare Swing frame ({@link BareFrame}) started the same
 * way, on each JDK named, interleaved run by run (bare, Arcwright, bare, Arcwright...), so that both see
 * the same load. On a JDK before 24 each is timed with a dynamic class-data-sharing archive made by a
 * training run (as {@code ./arcwright} makes on JDK 17) and with the JDK's default archive only; on JDK
 * 24 and later with an ahead-of-time cache made by a training run and {@code -XX:AOTMode=create} (as
 * {@code ./arcwright} makes when it finds such a JDK) and without it. Each child also reports its own
 * CPU time at that moment, which depends far less than wall time on what else the machine is doing.
 *
 * <p>Run on a display after {@code mvn -B -o -q package -DskipTests && mvn -B -o -q test-compile}:
 * {@code xvfb-run -a -s "-screen 0 1600x1000x24" java -Dstartup.jdks=/usr/lib/jvm/java-17-openjdk-amd64,/usr/lib/jvm/temurin-25-jdk-amd64
 * -cp target/test-classes org.arcwright.bench.StartupHarness 7}. Argument: runs per configuration
 * (default 7). {@code startup.jdks}: comma-separated JDK homes (default: the JDK running the harness);
 * a home that is not there is left out with a line saying so.
 * {@code startup.flags} replaces the JVM options for every child, to try others side by side.
 * {@code startup.trainMillis} keeps the AOT training run's window open that much longer after the
 * Decide form (packs, notes index), closer to the user's session that {@code ./arcwright} records. Each
 * Arcwright run uses a fresh config directory, so it takes the first-run path with the demo worksheet.
 */
public final class StartupHarness {
    /** The JVM options {@code ./arcwright} starts the window with; the bare frame gets the same. */
    static final List<String> LAUNCH_FLAGS = List.of("-XX:+UseSerialGC", "-XX:TieredStopAtLevel=1",
            "-XX:Tier3InvocationThreshold=1000", "-XX:Tier3MinInvocationThreshold=500", "-XX:Tier3CompileThreshold=5000");

    private StartupHarness() {}

    public static void main(String[] args) throws Exception {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 7;
        Path target = Path.of("target");
        Path appJar = target.resolve("arcwright.jar");
        if (!Files.exists(appJar)) throw new IllegalStateException("build the jar first: mvn -B -o -q package -DskipTests");
        Path bench = Files.createDirectories(target.resolve("bench"));
        String cp = appJar + File.pathSeparator + classJar(bench, StartupProbe.class);
        Subject bare = new Subject("bare JFrame", classJar(bench, BareFrame.class).toString(), BareFrame.class.getName());
        Subject app = new Subject("Arcwright window", cp, StartupProbe.class.getName());
        String homes = System.getProperty("startup.jdks", System.getProperty("java.home"));

        List<Config> configs = new ArrayList<>();
        for (String h : homes.split(",")) {
            Path home = Path.of(h.trim());
            if (!Files.isRegularFile(home.resolve("release"))) {
                System.out.printf(Locale.ROOT, "%s: no JDK there (no release file), left out%n", home);
                continue;
            }
            Jdk jdk = Jdk.at(home);
            System.out.printf(Locale.ROOT, "%s: training runs (load %s)%n", jdk.name(), loadAverage());
            for (Subject s : List.of(bare, app)) {
                configs.add(new Config(jdk, s, jdk.aot() ? "with AOT cache (as ./arcwright)" : "with CDS archive (as ./arcwright)",
                        trained(jdk, s, bench)));
                configs.add(new Config(jdk, s, jdk.aot() ? "without AOT cache" : "JDK default CDS only", jdk.plainFlags()));
            }
        }
        if (configs.isEmpty()) throw new IllegalArgumentException("no JDK to time in startup.jdks=" + homes);
        Map<Config, List<Sample>> samples = new LinkedHashMap<>();
        configs.forEach(c -> samples.put(c, new ArrayList<>()));
        System.out.printf(Locale.ROOT, "timed runs: load average at start %s%n", loadAverage());
        for (int i = 0; i < runs; i++) {
            for (Config c : configs) samples.get(c).add(time(c.jdk(), c.flags(), c.subject(), "exit", bench));
            System.out.printf(Locale.ROOT, "round %d done, load average %s%n", i + 1, loadAverage());
        }
        System.out.printf(Locale.ROOT, "load average at end: %s%n", loadAverage());
        System.out.println("| JDK | configuration | wall median ms | wall min ms | wall max ms | CPU median ms | CPU min ms | CPU max ms"
                + " | Decide form built, wall median ms |");
        System.out.println("|---|---|---:|---:|---:|---:|---:|---:|---:|");
        for (Config c : configs) row(c, samples.get(c));
        System.out.println();
        System.out.println("| JDK | configuration | Arcwright/bare, wall medians | CPU medians | per-round wall ratio, median (min-max) |");
        System.out.println("|---|---|---:|---:|---|");
        for (int i = 0; i < configs.size(); i += 4) {
            for (int m = 0; m < 2; m++) {
                Config b = configs.get(i + m);
                Config a = configs.get(i + 2 + m);
                List<Sample> sb = samples.get(b);
                List<Sample> sa = samples.get(a);
                List<Double> paired = new ArrayList<>();
                for (int r = 0; r < sa.size(); r++) paired.add(sa.get(r).wall() / sb.get(r).wall());
                System.out.printf(Locale.ROOT, "| %s | %s | %.2f | %.2f | %.2f (%.2f-%.2f) |%n", a.jdk().name(), a.mode(),
                        median(wall(sa)) / median(wall(sb)), median(cpu(sa)) / median(cpu(sb)),
                        median(paired), Collections.min(paired), Collections.max(paired));
            }
        }
    }

    /** A JDK to time on: its home, version and whether it can keep an ahead-of-time cache (24 and later). */
    record Jdk(Path home, String version, int feature) {
        static Jdk at(Path home) throws IOException {
            String version = "";
            for (String line : Files.readAllLines(home.resolve("release"), StandardCharsets.UTF_8)) {
                if (line.startsWith("JAVA_VERSION=")) version = line.substring(13).replace("\"", "");
            }
            String first = version.split("[.+-]")[0];
            return new Jdk(home, version, Integer.parseInt(first.equals("1") ? version.split("\\.")[1] : first));
        }

        boolean aot() { return feature >= 24; }

        String name() { return "JDK " + version; }

        String java() { return home.resolve("bin").resolve("java").toString(); }

        /** What {@code ./arcwright} adds on this JDK: native access for Lucene on JDK 24 and later. */
        List<String> extraFlags() { return aot() ? List.of("--enable-native-access=ALL-UNNAMED") : List.of(); }

        /** Without an archive of our own: the JDK's default CDS ({@code -Xshare} cannot be named beside an AOT cache). */
        List<String> plainFlags() { return aot() ? List.of() : List.of("-Xshare:auto"); }
    }

    record Subject(String name, String classPath, String mainClass) {}

    record Config(Jdk jdk, Subject subject, String mode, List<String> flags) {}

    /** Makes the subject's archive (CDS) or cache (AOT) with a training run; returns the options that use it. */
    private static List<String> trained(Jdk jdk, Subject s, Path bench) throws Exception {
        String stem = (s.mainClass().endsWith("BareFrame") ? "bare" : "app") + "-" + jdk.feature();
        if (!jdk.aot()) {
            Path cds = bench.resolve(stem + ".jsa");
            Files.deleteIfExists(cds);
            time(jdk, List.of("-Xshare:auto", "-XX:ArchiveClassesAtExit=" + cds), s, "exit", bench);
            return List.of("-Xshare:auto", "-XX:SharedArchiveFile=" + cds);
        }
        Path conf = bench.resolve(stem + ".aotconf");
        Path cache = bench.resolve(stem + ".aot");
        Files.deleteIfExists(conf);
        Files.deleteIfExists(cache);
        List<String> quiet = List.of("-Xlog:aot=off", "-Xlog:cds=off");
        List<String> record = new ArrayList<>(List.of("-XX:AOTMode=record", "-XX:AOTConfiguration=" + conf));
        record.addAll(quiet);
        record.add("-D" + StartupProbe.LINGER_PROPERTY + "=" + Integer.getInteger("startup.trainMillis", 0));
        time(jdk, record, s, "exit", bench);
        List<String> create = new ArrayList<>(List.of(jdk.java()));
        create.addAll(flags());
        create.addAll(jdk.extraFlags());
        create.addAll(List.of("-XX:AOTMode=create", "-XX:AOTConfiguration=" + conf, "-XX:AOTCache=" + cache));
        create.addAll(quiet);
        create.addAll(List.of("-cp", s.classPath()));
        Process p = new ProcessBuilder(create).redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        if (p.waitFor() != 0 || !Files.exists(cache)) throw new IllegalStateException("no AOT cache from " + create);
        return List.of("-XX:AOTCache=" + cache);
    }

    private static List<String> flags() {
        String flags = System.getProperty("startup.flags");
        return flags == null ? LAUNCH_FLAGS : List.of(flags.trim().split("\\s+"));
    }

    private static List<Double> wall(List<Sample> s) { return s.stream().map(Sample::wall).toList(); }

    private static List<Double> cpu(List<Sample> s) { return s.stream().map(Sample::cpu).toList(); }

    private static List<Double> completeWall(List<Sample> s) { return s.stream().map(Sample::completeWall).toList(); }

    private static void row(Config c, List<Sample> s) {
        List<Double> w = wall(s);
        List<Double> u = cpu(s);
        System.out.printf(Locale.ROOT, "| %s | %s, %s | %.0f | %.0f | %.0f | %.0f | %.0f | %.0f | %.0f |%n", c.jdk().name(),
                c.subject().name(), c.mode(), median(w), Collections.min(w), Collections.max(w), median(u),
                Collections.min(u), Collections.max(u), median(completeWall(s)));
    }

    private static double median(List<Double> v) {
        List<Double> s = new ArrayList<>(v);
        Collections.sort(s);
        int n = s.size();
        return n % 2 == 1 ? s.get(n / 2) : (s.get(n / 2 - 1) + s.get(n / 2)) / 2;
    }

    private static String loadAverage() throws IOException {
        return Files.readString(Path.of("/proc/loadavg")).trim();
    }

    /**
     * Wall and CPU milliseconds from process start to the first frame painted, and to the Decide form
     * built after it (the same moment for the bare frame).
     */
    record Sample(double wall, double cpu, double completeWall, double completeCpu) {}

    private static Sample time(Jdk jdk, List<String> jvm, Subject s, String probe, Path bench) throws Exception {
        Path config = Files.createTempDirectory(bench, "config");
        List<String> cmd = new ArrayList<>(List.of(jdk.java()));
        cmd.addAll(flags());
        cmd.addAll(jdk.extraFlags());
        cmd.addAll(jvm);
        cmd.add("-D" + StartupProbe.PROBE_PROPERTY + "=" + probe);
        cmd.add("-Darcwright.config=" + config.toAbsolutePath());
        cmd.addAll(List.of("-cp", s.classPath(), s.mainClass()));
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectError(ProcessBuilder.Redirect.DISCARD);
        long start = System.nanoTime();
        Process p = pb.start();
        double[] usable = null;
        double[] complete = null;
        try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (line.startsWith(StartupProbe.USABLE_MARKER)) usable = mark(line, start);
                if (line.startsWith(StartupProbe.COMPLETE_MARKER)) {
                    complete = mark(line, start);
                    break;
                }
            }
            // Drains the rest (a training run prints where it wrote its configuration) so the child never blocks.
            while (r.readLine() != null) {
                continue;
            }
        }
        if (!p.waitFor(60, TimeUnit.SECONDS)) p.destroyForcibly();
        deleteTree(config);
        if (usable == null || complete == null) throw new IllegalStateException("no usable and complete markers from " + cmd);
        return new Sample(usable[0], usable[1], complete[0], complete[1]);
    }

    /** Removes a run's config directory, so that repeated harness runs do not pile them up under target/bench. */
    private static void deleteTree(Path dir) throws IOException {
        try (Stream<Path> files = Files.walk(dir)) {
            for (Path f : files.sorted(Comparator.reverseOrder()).toList()) Files.deleteIfExists(f);
        }
    }

    /** Wall ms since {@code start} and the CPU ms the child printed on a marker line. */
    private static double[] mark(String line, long start) {
        double wall = (System.nanoTime() - start) / 1e6;
        int i = line.indexOf("cpu=");
        return new double[] {wall, i >= 0 ? Double.parseDouble(line.substring(i + 4).trim()) : -1};
    }

    /**
     * Packs a main class and its nested classes from the test classes into a jar of its own, so that it
     * can be named on a class path that a CDS archive or AOT cache accepts (jars only, no folders).
     */
    private static Path classJar(Path bench, Class<?> main) throws IOException {
        Path jar = bench.resolve(main.getSimpleName().toLowerCase(Locale.ROOT) + ".jar");
        Manifest mf = new Manifest();
        mf.getMainAttributes().put(Attributes.Name.MANIFEST_VERSION, "1.0");
        mf.getMainAttributes().put(Attributes.Name.MAIN_CLASS, main.getName());
        String entry = main.getName().replace('.', '/');
        Path dir = Path.of("target/test-classes", entry).getParent();
        List<Path> classes;
        try (Stream<Path> files = Files.list(dir)) {
            String simple = main.getSimpleName();
            classes = files.filter(f -> {
                String n = f.getFileName().toString();
                return n.equals(simple + ".class") || n.startsWith(simple + "$");
            }).sorted().toList();
        }
        try (OutputStream out = Files.newOutputStream(jar); JarOutputStream j = new JarOutputStream(out, mf)) {
            for (Path cls : classes) {
                JarEntry e = new JarEntry(entry.substring(0, entry.lastIndexOf('/') + 1) + cls.getFileName());
                e.setTime(0L);
                j.putNextEntry(e);
                j.write(Files.readAllBytes(cls));
                j.closeEntry();
            }
        }
        return jar;
    }
}
