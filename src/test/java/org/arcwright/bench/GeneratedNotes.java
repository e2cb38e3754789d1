package org.arcwright.bench;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Writes a practice pack of invented notes for benchmarks: fixed seed, plausible trade vocabulary,
 * nothing taken from a real company. Each note has the real header format and a body of about
 * 120 to 260 words.
 */
public final class GeneratedNotes {
    private static final String[] SUBJECTS = {"fillet", "round", "blend", "edge break", "controlled radius", "shoulder fillet",
            "groove corner", "pocket corner", "bend radius", "casting fillet", "boss fillet", "rib root", "spherical end",
            "sealing land edge", "cross-hole edge", "keyseat radius", "undercut", "web fillet", "flange blend", "lip radius"};
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
    private static final String[] TAGS = {"fatigue", "kt", "o-ring", "bearing", "chamfer", "profile", "datum", "cmm",
            "gauge", "comparator", "scan", "title-block", "2768-m", "cr", "crescent", "tangent", "mismatch", "burr",
            "draft", "parting-line", "stock", "rework", "deviation", "supplier", "first-article", "drawing-review"};
    private static final String[] SENTENCES = {
            "On the %s the %s is held at %s because the %s sees cyclic load from the %s.",
            "Inspect the %s with a %s before the %s leaves the cell, and record the %s.",
            "The supplier of the %s asked to relax the %s to %s; the answer was no because of the %s at the %s.",
            "A %s larger than %s fouls the mating %s, so the callout carries a maximum on the %s.",
            "Our %s practice puts a profile of 0.%d on the %s to datums A and B, which covers the %s and the %s.",
            "When the %s is cast, the %s grows by %s and the machined %s must clean up the %s.",
            "Field returns of the %s traced cracks to a %s below %s at the %s; the %s was then tightened.",
            "Leave the %s to the title block only when nothing depends on the %s, the %s or the %s.",
            "The %s of the %s is checked on the comparator at 20x against a chart of the %s and the %s.",
            "For the %s the smallest %s allowed by %s sets the stress concentration at the %s."};

    private GeneratedNotes() {}

    /** Writes {@code count} notes into {@code packDir} (creating pack.json) with the given seed; returns the note files. */
    public static List<Path> write(Path packDir, int count, long seed) {
        try {
            Path notes = Files.createDirectories(packDir.resolve("notes"));
            Files.writeString(packDir.resolve("pack.json"),
                    "{\"name\": \"Generated benchmark pack\", \"description\": \"Invented notes for benchmarks\"}\n");
            SplittableRandom r = new SplittableRandom(seed);
            List<Path> out = new ArrayList<>(count);
            for (int i = 0; i < count; i++) {
                String id = String.format("gen-%06d", i);
                Path p = notes.resolve(id + ".md");
                Files.writeString(p, note(id, r));
                out.add(p);
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String note(String id, SplittableRandom r) {
        String subject = pick(SUBJECTS, r);
        String part = pick(PARTS, r);
        String company = pick(COMPANIES, r);
        StringBuilder sb = new StringBuilder();
        sb.append("---\n");
        sb.append("id: ").append(id).append('\n');
        sb.append("title: ").append(capital(subject)).append(" on ").append(company).append(' ').append(part).append("s ")
                .append(radius(r)).append('\n');
        sb.append("tags: ").append(pick(TAGS, r)).append(", ").append(pick(TAGS, r)).append(", ").append(part).append('\n');
        sb.append("functions: ").append(pick(FUNCTIONS, r)).append('\n');
        sb.append("standard: ").append(pick(STANDARDS, r)).append(", ").append(pick(STANDARDS, r)).append('\n');
        sb.append("process: ").append(pick(PROCESSES, r)).append('\n');
        sb.append("author: ").append("Lead engineer, ").append(company).append('\n');
        sb.append("updated: 2026-").append(String.format("%02d-%02d", 1 + r.nextInt(11), 1 + r.nextInt(28))).append('\n');
        sb.append("---\n");
        sb.append("Invented note for benchmarks. ");
        int sentences = 8 + r.nextInt(10);
        for (int s = 0; s < sentences; s++) {
            String template = pick(SENTENCES, r);
            int slots = template.split("%", -1).length - 1;
            Object[] args = new Object[slots];
            for (int k = 0; k < slots; k++) {
                int kind = r.nextInt(4);
                args[k] = kind == 0 ? radius(r) : kind == 1 ? pick(SUBJECTS, r) : kind == 2 ? pick(PARTS, r) : pick(TAGS, r);
            }
            String line = template.contains("0.%d") ? template.replace("0.%d", "0." + (1 + r.nextInt(9))) : template;
            sb.append(String.format(line, args)).append(s % 4 == 3 ? "\n\n" : " ");
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
