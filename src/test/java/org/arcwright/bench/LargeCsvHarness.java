package org.arcwright.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Random;
import org.arcwright.cli.Cli;

/**
 * End-to-end check that a 1,000,000-point CSV inspects within a small heap: writes the CSV
 * (streamed), then runs {@code arcwright inspect} in-process for a controlled radius and for a
 * floating profile, printing wall time and the peak heap used.
 *
 * <p>Run: {@code mvn -B -o -Pharness test-compile exec:exec -Dharness=org.arcwright.bench.LargeCsvHarness -Dharness.jvm=-Xmx256m}
 */
public final class LargeCsvHarness {
    private LargeCsvHarness() {}

    public static void main(String[] args) throws IOException {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 1_000_000;
        Path dir = Files.createTempDirectory("arcwright-large");
        Path csv = dir.resolve("section.csv");
        Random rnd = new Random(1);
        double[] xy = new double[2];
        try (BufferedWriter w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            w.write("x,y\n");
            for (int i = 0; i < n; i++) {
                SectionData.point(i, n, rnd, xy);
                w.write(xy[0] + "," + xy[1] + "\n");
            }
        }
        String head = "{\"units\": \"mm\", \"corner\": {\"vertex\": [0, 0], \"legA\": [1, 0], \"legB\": [0, 1], \"kind\": \"round\"},"
                + " \"nominalRadius\": 2, \"resolution\": 0.005, \"pointsFile\": \"section.csv\", ";
        Files.writeString(dir.resolve("cr.json"), head + "\"callout\": {\"type\": \"controlled-radius\", \"min\": 1.9, \"max\": 2.1}}");
        Files.writeString(dir.resolve("floating.json"), head + "\"callout\": {\"type\": \"profile\", \"zone\": 0.05, \"free\": [\"x\", \"y\", \"rotation\"]}}");
        System.out.printf("%,d points, CSV %,d bytes, max heap %d MB%n", n, Files.size(csv), Runtime.getRuntime().maxMemory() >> 20);
        for (String f : new String[] {"cr.json", "floating.json", "cr.json", "floating.json"}) {
            long t0 = System.nanoTime();
            int code = Cli.run(new String[] {"inspect", dir.resolve(f).toString(), "--format", "json"});
            long ms = (System.nanoTime() - t0) / 1_000_000;
            System.err.printf("%s: exit %d in %d ms (sum of the heap pools' peaks so far %d MB)%n", f, code, ms, peakHeapMb());
        }
        Files.walk(dir).sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
    }

    private static long peakHeapMb() {
        long sum = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) sum += p.getPeakUsage().getUsed();
        }
        return sum >> 20;
    }
}
