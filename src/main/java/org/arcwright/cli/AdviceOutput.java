package org.arcwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.IntFunction;
import org.arcwright.callout.CalloutFormatter;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.rules.Advice;
import org.arcwright.rules.DesignChange;
import org.arcwright.rules.Need;
import org.arcwright.rules.NoteLink;
import org.arcwright.rules.Recommendation;
import org.arcwright.rules.RuleBook;

/** Prints advice as text for a reader or as JSON for a program. */
final class AdviceOutput {
    private final JsonFiles json = new JsonFiles();

    /**
     * The advice as a JSON object: {@code feature}, {@code needs}, {@code designChanges}, {@code recommendations}
     * (each with {@code meets} and {@code meetsAll}), {@code conflicts}, {@code warnings}.
     */
    ObjectNode toJson(String feature, Advice advice) {
        ObjectNode root = json.mapper().createObjectNode();
        if (feature != null) root.put("feature", feature);
        root.set("needs", json.mapper().valueToTree(advice.needs()));
        root.set("designChanges", json.mapper().valueToTree(advice.designChanges()));
        ArrayNode recs = root.putArray("recommendations");
        for (Recommendation r : advice.recommendations()) {
            ObjectNode n = recs.addObject();
            n.put("rule", r.ruleId());
            ObjectNode callout = json.mapper().valueToTree(r.callout());
            if (!callout.has("datums")) callout.set("datums", json.mapper().valueToTree(r.callout().allDatums()));
            Map<String, Object> nums = r.numbers().asMap();
            if (!callout.has("min") && nums.get("min") != null && !"general".equals(r.callout().typeName())) {
                callout.set("admitsMin", json.mapper().valueToTree(nums.get("min")));
                callout.set("admitsMax", json.mapper().valueToTree(nums.get("max")));
            }
            if ("general".equals(r.callout().typeName())) {
                callout.set("min", json.mapper().valueToTree(nums.get("min")));
                callout.set("max", json.mapper().valueToTree(nums.get("max")));
            }
            n.set("callout", callout);
            if (r.refinement() != null) n.set("refinement", json.mapper().valueToTree(r.refinement()));
            n.put("text", r.text());
            n.put("score", r.score());
            n.put("demoted", r.demoted());
            n.set("meets", json.mapper().valueToTree(r.meets()));
            if (r.meetsAll() != null) n.put("meetsAll", r.meetsAll());
            n.set("because", json.mapper().valueToTree(r.because()));
            n.set("cautions", json.mapper().valueToTree(r.cautions()));
            n.set("references", json.mapper().valueToTree(r.references()));
            n.set("numbers", json.mapper().valueToTree(r.numbers()));
            n.set("trace", json.mapper().valueToTree(r.trace()));
            n.set("notes", json.mapper().valueToTree(r.notes()));
        }
        root.set("conflicts", json.mapper().valueToTree(advice.conflicts()));
        root.set("warnings", json.mapper().valueToTree(advice.warnings()));
        return root;
    }

    String write(JsonNode node) { return json.write(node); }

    /** Packs and problems, for the top of a JSON answer. */
    ObjectNode packs(RuleBook book, List<String> packNames) {
        ObjectNode n = json.mapper().createObjectNode();
        n.set("packs", json.mapper().valueToTree(packNames));
        n.set("problems", json.mapper().valueToTree(book.problems().stream().map(InputProblem::getMessage).toList()));
        return n;
    }

    void printText(PrintWriter out, Advice advice, int limit) {
        printText(out, advice, limit, () -> { }, i -> List.of());
    }

    /** As above, with a block printed before the cards and extra lines per card (e.g. simulated evidence). */
    void printText(PrintWriter out, Advice advice, int limit, Runnable beforeCards,
                   IntFunction<List<String>> cardExtra) {
        DesignCase c = advice.designCase();
        out.printf("%s%s R%s %s, %s, %s, %s, %s%s%s%n",
                c.feature() == null ? "" : c.feature() + ": ", c.kind().key(),
                DecimalText.significant(c.nominalRadius(), 4), c.units().symbol(), c.function().key(),
                c.loading() == Loading.NONE ? "no load" : c.loading().key() + " load",
                c.process().key(), c.standard().key().toUpperCase(Locale.ROOT),
                c.hasDatums() ? ", datums " + String.join(" ", c.datums()) : ", no datums",
                (c.formMatters() ? ", form matters" : "") + (c.locationMatters() ? ", location matters" : "")
                        + (c.cornerAngle() == null ? "" : ", " + DecimalText.significant(c.cornerAngle(), 4) + "° corner"));
        List<Recommendation> recs = advice.recommendations();
        for (String w : advice.warnings()) out.println("warning   " + w);
        if (!advice.designChanges().isEmpty()) {
            out.println();
            out.println(advice.anyUsable() ? "Design changes worth weighing:" : "What would work (design changes):");
            for (DesignChange d : advice.designChanges()) out.println("  - " + d.kind().key() + ": " + d.text());
        }
        printNeeds(out, advice, Math.min(limit, recs.size()));
        beforeCards.run();
        for (int i = 0; i < recs.size() && i < limit; i++) {
            Recommendation r = recs.get(i);
            out.println();
            out.printf("%d. %s%n", i + 1, r.text());
            out.printf("   %s, score %s%s%s, rule %s%n", CalloutFormatter.controlName(r.callout(), c.standard()),
                    DecimalText.significant(r.score(), 4),
                    r.demoted() ? " (DEMOTED)" : "", Boolean.FALSE.equals(r.meetsAll()) ? " (MISSES A NEED)" : "", r.ruleId());
            for (String b : r.because()) out.println("   because   " + b);
            out.println("   numbers   " + numbersLine(r.numbers().asMap()));
            for (String s : cardExtra.apply(i)) out.println("   " + s);
            for (String t : r.cautions()) out.println("   caution   " + t);
            for (String ref : r.references()) out.println("   reference " + ref);
            for (NoteLink n : r.notes()) out.println("   note      " + n.title() + " [" + n.id() + ", " + n.pack() + "]");
            for (String t : r.trace()) {
                if (!t.startsWith("numbers: ") && !t.startsWith("tolerance from ")) out.println("   trace     " + t);
            }
        }
        if (recs.size() > limit) {
            out.println();
            out.printf("(%d more; --all lists every recommendation, --format json gives everything)%n", recs.size() - limit);
        }
        for (String cf : advice.conflicts()) out.println("CONFLICT  " + cf);
    }

    /** The needs with a tick or cross per card shown. */
    private static void printNeeds(PrintWriter out, Advice advice, int cards) {
        if (advice.needs().isEmpty()) {
            out.println();
            out.println("Needs: none beyond the radius itself (no floor, ceiling, form or location need stated).");
            return;
        }
        out.println();
        StringBuilder head = new StringBuilder(String.format("%-16s %-36s", "need", "limit"));
        for (int i = 1; i <= cards; i++) head.append(String.format(" %3s", "#" + i));
        out.println("Needs" + (cards > 0 ? " (✓ met, ✗ not met, by card):" : ":"));
        out.println("  " + head);
        String u = advice.designCase().units().symbol();
        for (Need n : advice.needs()) {
            String limit = n.min() != null ? "r ≥ " + DecimalText.significant(n.min(), 4) + " " + u
                    : n.max() != null ? "r ≤ " + DecimalText.significant(n.max(), 4) + " " + u : n.reachable() ? "" : "none reaches it";
            StringBuilder row = new StringBuilder(String.format("%-16s %-36s", n.key(), limit));
            for (int i = 0; i < cards; i++) {
                Boolean ok = advice.recommendations().get(i).meets().get(n.key());
                row.append(String.format(" %3s", ok == null ? "?" : ok ? "✓" : "✗"));
            }
            out.println("  " + row);
            out.println("      " + n.why() + " [" + n.source() + "]");
        }
    }

    private static String numbersLine(Map<String, Object> m) {
        StringBuilder sb = new StringBuilder();
        String u = String.valueOf(m.get("units"));
        int p = "in".equals(u) ? 4 : 3;
        append(sb, m.containsKey("zone") ? "radius range the zone admits" : "limits", num(m, "min", p) + " to "
                + num(m, "max", p) + " " + u);
        if (m.containsKey("zone")) append(sb, "zone", exact(m.get("zone")) + (m.get("tierZones") instanceof List<?> tiers
                ? " (tiers " + String.join(", ", tiers.stream().map(AdviceOutput::exact).toList()) + ")" : ""));
        Object angle = m.get("angle");
        boolean square = angle instanceof Number n && n.doubleValue() == DesignCase.SQUARE_CORNER;
        append(sb, "crescent", num(m, "crescentWidth", p + 1)
                + (angle == null || square ? "" : " at a " + DecimalText.significant(((Number) angle).doubleValue(), 4) + "° corner"));
        append(sb, "equivalent profile zone", num(m, "equivalentProfileZone", p + 1)
                + (m.get("nominal") instanceof Number n ? " about R" + DecimalText.exact(n.doubleValue()) : ""));
        if (m.containsKey("ktAtMin")) append(sb, "Kt at min/max", num(m, "ktAtMin", 2) + "/" + num(m, "ktAtMax", 2));
        if (m.containsKey("kfAtMin")) append(sb, "Kf at min/max", num(m, "kfAtMin", 2) + "/" + num(m, "kfAtMax", 2));
        if (m.containsKey("minRadiusForTarget")) append(sb, "smallest radius meeting the target", num(m, "minRadiusForTarget", p));
        if (m.containsKey("seats")) append(sb, "seats", m.get("seats") + ", margin " + num(m, "seatingMargin", p) + " " + u);
        sb.append("\n             tolerance from ").append(m.get("toleranceSource"));
        return sb.toString();
    }

    /** A figure as the advisor rounded it: {@code 0.0001}, not {@code 1.0E-4}. */
    private static String exact(Object v) {
        return v instanceof Number n ? DecimalText.exact(n.doubleValue()) : String.valueOf(v);
    }

    private static String num(Map<String, Object> m, String key, int places) {
        Object v = m.get(key);
        return v instanceof Double d ? DecimalText.fixed(d, places) : String.valueOf(v);
    }

    private static void append(StringBuilder sb, String k, String v) {
        if (sb.length() > 0) sb.append("; ");
        sb.append(k).append(' ').append(v);
    }
}
