package org.arcwright.cli;

import static org.arcwright.testing.StandardMarks.assertOwnMarks;
import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.model.Process;
import org.arcwright.pack.PackStack;
import org.arcwright.rules.Advice;
import org.arcwright.rules.Advisor;
import org.arcwright.rules.RuleBook;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * The advisor's own sentences under each standard: every function × loading × blend × form and location need ×
 * process × stress section × engineer's tolerance × mating corner, in mm and inches, through {@code advise}'s text
 * (every card) and JSON, failing on a mark or term of the other standard (ASME Y14.5-2018 / ISO 1101:2017, the
 * lists in {@code testing.StandardMarks}). The callouts themselves are swept by {@code render.StandardMarksSweepTest}.
 */
@Tag("slow")
class AdviseMarksSweepTest {
    private static final double MM = 25.4;
    /**
     * A rule's or a candidate's id in a card or its trace ("rule stress-relief.located-form.composite", "built from the
     * needs: needs.composite", a quoted 'needs.composite' in a conflict): a name in the pack, not a drawing mark.
     */
    private static final Pattern RULE_ID = Pattern.compile("\\b(rule|needs:) [a-z0-9.-]+|'[a-z0-9-]+(\\.[a-z0-9-]+)+'");
    private static Advisor advisor;

    @BeforeAll
    static void load() {
        PackStack stack = PackStack.builtIn();
        advisor = Advisors.standard(stack, RuleBook.load(stack));
    }

    /** Invented cases on an invented Ø42/Ø35 shaft shoulder (demo data), in {@code units}. */
    private static List<DesignCase> cases(DrawingStyle style, Units units) {
        double per = units == Units.INCH ? MM : 1;
        List<DesignCase> out = new ArrayList<>();
        List<String> tolerances = Arrays.asList(null, "R2 ±0.2", "R2 +0.3/+0.1");
        for (BlendFunction f : BlendFunction.values()) {
            for (Loading l : Loading.values()) {
                for (BlendKind k : BlendKind.values()) {
                    for (int needs = 0; needs < 4; needs++) {
                        boolean form = (needs & 1) != 0;
                        boolean location = (needs & 2) != 0;
                        List<String> datums = location ? List.of("A", "B") : List.of();
                        for (Process p : List.of(Process.MACHINED, Process.CAST, Process.MOLDED)) {
                            // the engineer's tolerance varies on machined radii only: it sizes the same way whatever the process
                            for (String tol : p == Process.MACHINED ? tolerances : Arrays.asList((String) null)) {
                                String t = tol == null || units == Units.MM ? tol
                                        : tol.equals("R2 ±0.2") ? "R.079 ±.008" : "R.079 +.012/+.004";
                                DesignCase.StressInputs stress = k == BlendKind.FILLET && l != Loading.NONE
                                        ? new DesignCase.StressInputs("stepped-shaft", "bending", 42 / per, 35 / per,
                                        new DesignCase.Strength(900, "MPa"), null, 1.75) : null;
                                DesignCase.MatingCorner mating = f == BlendFunction.MATING
                                        ? new DesignCase.MatingCorner(k == BlendKind.FILLET ? "bearing" : "chamfer", 1.1 / per, null)
                                        : null;
                                out.add(new DesignCase(units, style, "sweep", k, 2.0 / per, f, l, form, location, datums, p,
                                        stress, mating, t));
                            }
                        }
                    }
                }
            }
        }
        return out;
    }

    /**
     * The text values of a JSON tree, what a reader of the JSON sees; its keys, a callout's {@code type} and a rule's
     * id are names in the file format and the pack, the same under both standards.
     */
    private static List<String> texts(JsonNode node) {
        List<String> out = new ArrayList<>();
        if (node.isTextual()) out.add(node.asText());
        node.fields().forEachRemaining(e -> {
            if (!e.getKey().equals("type") && !e.getKey().equals("rule")) out.addAll(texts(e.getValue()));
        });
        if (node.isArray()) node.forEach(child -> out.addAll(texts(child)));
        return out;
    }

    @Test
    void adviceTextAndJsonCarryOnlyTheirStandardsMarks() {
        AdviceOutput output = new AdviceOutput();
        Map<String, String> found = new LinkedHashMap<>();
        int swept = 0;
        for (DrawingStyle style : DrawingStyle.values()) {
            for (Units units : Units.values()) {
                for (DesignCase c : cases(style, units)) {
                    Advice advice = advisor.advise(c);
                    StringWriter text = new StringWriter();
                    output.printText(new PrintWriter(text, true), advice, Integer.MAX_VALUE);
                    String what = style + " " + units + " " + c.function().key() + " " + c.loading().key() + " "
                            + c.kind().key() + " form=" + c.formMatters() + " location=" + c.locationMatters() + " "
                            + c.process().key() + " tolerance=" + c.tolerance();
                    try {
                        assertOwnMarks(what + " text", style, RULE_ID.matcher(text.toString()).replaceAll("rule"));
                        assertOwnMarks(what + " json", style,
                                RULE_ID.matcher(String.join("\n", texts(output.toJson("sweep", advice)))).replaceAll("rule"));
                    } catch (AssertionError e) {
                        found.putIfAbsent(e.getMessage().substring(e.getMessage().indexOf(": ") + 2), e.getMessage());
                    }
                    swept++;
                }
            }
        }
        assertThat(found.values()).as("marks of the other standard, first case of each").isEmpty();
        assertThat(swept).isGreaterThan(1500);
    }
}
