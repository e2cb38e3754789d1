package org.arcwright.bench;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;

/**
 * Writes a practice pack of invented notes for benchmarks: fixed seed, nothing taken from a real
 * company. Each note has the real header format and a body of 140 to 290 words, like the built-in
 * notes.
 *
 * <p>Words are drawn from a vocabulary of {@value #VOCABULARY} words with a Zipf-like distribution
 * (the word of rank r has weight 1/r, as in ordinary prose): English function words first, then
 * trade words spread from rank 40 to about rank 2,600, the rest invented pseudo-words. So a trade
 * word is found in anywhere from most notes to a few percent of them, as in a real, varied pack,
 * and a typical query matches a small fraction of the notes instead of nearly all of them.
 */
public final class GeneratedNotes {
    static final int VOCABULARY = 30_000;
    private static final String[] FUNCTION_WORDS = {"the", "of", "and", "to", "a", "in", "is", "for", "on", "that", "with",
            "at", "by", "it", "as", "be", "this", "are", "from", "or", "not", "but", "an", "was", "which", "when", "than",
            "so", "all", "if", "can", "one", "no", "only", "more", "each", "its", "both", "must", "then"};
    /** Trade words, most common first; placed among the invented words at growing ranks. */
    private static final String[] TRADE_WORDS = {"radius", "edge", "fillet", "corner", "part", "drawing", "surface",
            "tolerance", "round", "shaft", "housing", "load", "stress", "inspection", "supplier", "bracket", "profile",
            "datum", "blend", "groove", "cast", "machined", "fatigue", "bearing", "chamfer", "shoulder", "flange", "cover",
            "lever", "o-ring", "burr", "seal", "gauge", "comparator", "tangent", "mismatch", "casting", "stock", "draft",
            "rework", "deviation", "mould", "pocket", "boss", "rib", "web", "undercut", "keyseat", "spindle", "impeller",
            "manifold", "yoke", "clevis", "carrier", "mount", "gland", "hub", "rocker", "sleeve", "plate", "knuckle", "pin",
            "crack", "notch", "kt", "scan", "cmm", "crescent", "title", "block", "first-article", "sealing", "land",
            "cross-hole", "spherical", "root", "bend", "parting", "line", "lip", "relief", "minimum", "maximum", "cyclic",
            "clearance", "mating", "finish", "cosmetic", "handling", "safety", "flow", "turned", "milled", "ground",
            "forged", "moulded", "sheet", "additive", "callout", "chart", "cell", "field", "returns", "relax", "tightened",
            "concentration", "sharp", "break", "controlled", "limits", "zone", "contour", "fitted", "bisector", "angle",
            "wall", "thickness", "shrink", "sink", "gate", "flash", "die", "tool", "insert", "cutter", "nose", "feed",
            "vibration", "weld", "toe", "thread", "runout", "fit", "press", "interference", "retaining", "ring", "snap",
            "circlip", "washer", "bolt", "nut", "torque", "hole", "bore", "counterbore", "spotface", "countersink", "slot",
            "key", "spline", "gear", "tooth", "cam", "follower", "roller", "race", "journal", "bushing", "lubrication",
            "corrosion", "coating", "anodise", "plating", "paint", "polish", "deburr", "tumble", "blast", "peen", "heat",
            "treatment", "hardness", "case", "quench", "temper", "aluminium", "steel", "titanium", "brass", "bronze",
            "nylon", "acetal", "polycarbonate", "elastomer", "gasket", "leak", "pressure", "vacuum", "pump", "valve",
            "actuator", "cylinder", "piston", "rod", "eye", "lug", "ear", "tab", "clip", "latch", "hinge", "detent"};
    private static final String[] SYLLABLES = {"ka", "lo", "ven", "tor", "mi", "sel", "dra", "quon", "bri", "fal", "nes",
            "ur", "pel", "zo", "tha", "rim", "ost", "gle", "ban", "vi", "cor", "dun", "ep", "sha", "wen", "ly", "mar", "tis",
            "ob", "fen", "hal", "ix", "ru", "sto", "nak", "el", "pra", "gon", "wil", "tre"};
    private static final String[] PARTS = {"bracket", "housing", "shaft", "manifold", "cover", "lever", "flange", "impeller",
            "yoke", "clevis", "spindle", "carrier", "mount", "gland", "hub", "rocker", "sleeve", "plate", "knuckle", "pin"};
    private static final String[] COMPANIES = {"Quillfeather Instruments", "Brackenridge Pumps", "Tarnwell Motion",
            "Oxlade Hydraulics", "Pellmoor Castings", "Wrenfield Tooling"};
    private static final String[] FUNCTIONS = {"stress-relief", "sealing", "mating-clearance", "edge-finish", "cosmetic",
            "flow", "general", "handling-safety"};
    private static final String[] PROCESSES = {"machined", "turned", "milled", "ground", "cast", "die-cast", "moulded",
            "forged", "sheet-metal", "additive"};
    private static final String[] STANDARDS = {"ASME Y14.5-2018", "ISO 1101", "ISO 2768-1", "ISO 13715", "Peterson's",
            "Shigley's", "Roark's", "common practice"};

    private final String[] words;
    private final double[] cumulative;

    private GeneratedNotes(long seed) {
        words = vocabulary(new SplittableRandom(seed ^ 0x5eedL));
        cumulative = new double[words.length];
        double sum = 0;
        for (int r = 0; r < words.length; r++) {
            sum += 1.0 / (r + 1);
            cumulative[r] = sum;
        }
        for (int r = 0; r < words.length; r++) cumulative[r] /= sum;
    }

    /** Writes {@code count} notes into {@code packDir} (creating pack.json) with the given seed; returns the note files. */
    public static List<Path> write(Path packDir, int count, long seed) {
        try {
            Path notes = Files.createDirectories(packDir.resolve("notes"));
            Files.writeString(packDir.resolve("pack.json"),
                    "{\"name\": \"Generated benchmark pack\", \"description\": \"Invented notes for benchmarks\"}\n");
            GeneratedNotes g = new GeneratedNotes(seed);
            SplittableRandom r = new SplittableRandom(seed);
            List<Path> out = new ArrayList<>(count);
            for (int i = 0; i < count; i++) {
                String id = String.format("gen-%06d", i);
                Path p = notes.resolve(id + ".md");
                Files.writeString(p, g.note(id, r));
                out.add(p);
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Function words, then trade words at ranks 40, 50, 62, ... (growing by 1.5 % each), invented words between and after. */
    private static String[] vocabulary(SplittableRandom r) {
        String[] out = new String[VOCABULARY];
        Set<String> used = new LinkedHashSet<>();
        for (int i = 0; i < FUNCTION_WORDS.length; i++) {
            out[i] = FUNCTION_WORDS[i];
            used.add(FUNCTION_WORDS[i]);
        }
        double rank = FUNCTION_WORDS.length;
        for (String w : TRADE_WORDS) {
            int at = (int) rank;
            while (out[at] != null) at++;
            out[at] = w;
            used.add(w);
            rank = Math.min(rank * 1.015 + 1, VOCABULARY - 1.0);
        }
        for (int i = 0; i < VOCABULARY; i++) {
            if (out[i] != null) continue;
            String w;
            do {
                StringBuilder sb = new StringBuilder();
                int syllables = 2 + r.nextInt(3);
                for (int k = 0; k < syllables; k++) sb.append(SYLLABLES[r.nextInt(SYLLABLES.length)]);
                w = sb.toString();
            } while (!used.add(w));
            out[i] = w;
        }
        return out;
    }

    private String word(SplittableRandom r) {
        int i = Arrays.binarySearch(cumulative, r.nextDouble());
        return words[Math.min(words.length - 1, i < 0 ? -i - 1 : i)];
    }

    /** A word past the function words, for titles and tags. */
    private String contentWord(SplittableRandom r) {
        String w;
        do {
            w = word(r);
        } while (isFunctionWord(w));
        return w;
    }

    private static boolean isFunctionWord(String w) {
        for (String f : FUNCTION_WORDS) if (f.equals(w)) return true;
        return false;
    }

    String note(String id, SplittableRandom r) {
        String part = pick(PARTS, r);
        String company = pick(COMPANIES, r);
        StringBuilder sb = new StringBuilder();
        sb.append("---\n");
        sb.append("id: ").append(id).append('\n');
        sb.append("title: ").append(capital(contentWord(r))).append(' ').append(contentWord(r)).append(' ')
                .append(contentWord(r)).append(" on ").append(company).append(' ').append(part).append("s ")
                .append(radius(r)).append('\n');
        sb.append("tags: ").append(contentWord(r)).append(", ").append(contentWord(r)).append(", ").append(part).append('\n');
        sb.append("functions: ").append(pick(FUNCTIONS, r)).append('\n');
        sb.append("standard: ").append(pick(STANDARDS, r)).append(", ").append(pick(STANDARDS, r)).append('\n');
        sb.append("process: ").append(pick(PROCESSES, r)).append('\n');
        sb.append("author: ").append("Lead engineer, ").append(company).append('\n');
        sb.append("updated: 2026-").append(String.format("%02d-%02d", 1 + r.nextInt(11), 1 + r.nextInt(28))).append('\n');
        sb.append("---\n");
        sb.append("Invented note for benchmarks.");
        int target = 140 + r.nextInt(151);
        int written = 0;
        int sentence = 0;
        while (written < target) {
            int len = 6 + r.nextInt(14);
            for (int k = 0; k < len; k++) {
                String w = r.nextInt(25) == 0 ? radius(r) : word(r);
                if (sb.charAt(sb.length() - 1) != '\n') sb.append(' ');
                sb.append(k == 0 ? capital(w) : w);
            }
            sb.append('.');
            written += len;
            if (++sentence % 4 == 0) sb.append("\n\n");
        }
        sb.append("\n\nSource: invented for benchmarks.\n");
        return sb.toString();
    }

    private static String radius(SplittableRandom r) {
        int kind = r.nextInt(3);
        String value = (1 + r.nextInt(40)) / 10.0 + "";
        return kind == 0 ? "R" + value : kind == 1 ? "CR " + value : "R" + value + " ±0." + (1 + r.nextInt(3));
    }

    private static String pick(String[] from, SplittableRandom r) {
        return from[r.nextInt(from.length)];
    }

    private static String capital(String s) {
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
