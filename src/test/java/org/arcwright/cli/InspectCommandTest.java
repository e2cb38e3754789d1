package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.assertj.core.api.Assertions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class InspectCommandTest {
    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter(), err = new StringWriter();

    private int run(String... args) {
        return Cli.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
    }

    private static final String CORNER = "\"units\": \"mm\", \"corner\": {\"vertex\": [0, 0], \"legA\": [1, 0], \"legB\": [0, 1], \"kind\": \"round\"}, \"nominalRadius\": 2";

    /** An exact 2.05 blend, 31 points on the arc and 5 on each leg. */
    private static String arcPoints(double r) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < 5; i++) sb.append("[").append(6 - i * (6 - r) / 5).append(", 0], ");
        for (int i = 0; i <= 30; i++) {
            double t = -Math.PI / 2 - Math.PI / 2 * i / 30;
            sb.append("[").append(r + r * Math.cos(t)).append(", ").append(r + r * Math.sin(t)).append("], ");
        }
        for (int i = 1; i <= 5; i++) sb.append("[0, ").append(r + i * (6 - r) / 5).append("]").append(i < 5 ? ", " : "");
        return sb.append("]").toString();
    }

    private Path file(String name, String json) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, json);
        return p;
    }

    @Test
    void passingControlledRadiusExitsZeroWithEnvelopeAndLocalRadii() throws IOException {
        Path f = file("cr.json", "{" + CORNER + ", \"callout\": {\"type\": \"controlled-radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": "
                + arcPoints(2.05) + "}");
        assertThat(run("inspect", f.toString(), "--format", "json")).isEqualTo(0);
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertThat(j.get("verdict").asText()).isEqualTo("pass");
        assertThat(j.at("/envelope/smallest").asDouble()).isBetween(2.05 - 1e-9, 2.05 + 1e-9);
        assertThat(j.at("/envelope/largest").asDouble()).isBetween(2.05 - 1e-9, 2.05 + 1e-9);
        assertThat(j.at("/local/min").asDouble()).isBetween(2.05 - 1e-9, 2.05 + 1e-9);
        assertThat(j.get("reversals").size()).isZero();
        assertThat(j.at("/fits/leastSquares/radius").asDouble()).isBetween(2.05 - 1e-9, 2.05 + 1e-9);
        assertThat(j.at("/fits/minimumZone/inner").isNumber()).isTrue();
        assertThat(j.at("/tangency/stepA").asDouble()).isLessThan(1e-9);
        assertThat(j.at("/worst/index").isInt()).isTrue();
    }

    @Test
    void undecidedControlledRadiusExitsThreeAndListsTheWindows() throws IOException {
        // 31 points on the arc with a 0.004 ripple: each window's local radius is known only to
        // about ± 0.2, which straddles the limits (ISO 14253-1 default rule: neither proven)
        String pts = arcPoints(2.05);
        StringBuilder noisy = new StringBuilder();
        Matcher m = Pattern.compile("\\[([-0-9.E]+), ([-0-9.E]+)\\]").matcher(pts);
        int i = 0;
        while (m.find()) {
            double x = Double.parseDouble(m.group(1)), y = Double.parseDouble(m.group(2)) + 0.004 * Math.sin(i++ * 2.1);
            noisy.append(noisy.length() == 0 ? "[" : ", ").append("[").append(x).append(", ").append(y).append("]");
        }
        Path f = file("cr.json", "{" + CORNER + ", \"resolution\": 0.01, \"callout\": {\"type\": \"controlled-radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": "
                + noisy + "]}");
        assertThat(run("inspect", f.toString(), "--format", "json")).as(err.toString()).isEqualTo(Cli.INDETERMINATE);
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertThat(j.get("verdict").asText()).isEqualTo("indeterminate");
        assertThat(j.at("/local/uncertainty").isNumber()).isTrue();
        assertThat(j.get("indeterminate").size()).isPositive();
        assertThat(j.at("/surfaces/a/fitted").asBoolean()).isTrue();
        assertThat(j.at("/surfaces/angle").asDouble()).isBetween(89.0, 91.0);
        // the text names the limit each undecided window reaches across, with its unit (before: "a limit")
        out.getBuffer().setLength(0);
        assertThat(run("inspect", f.toString())).isEqualTo(Cli.INDETERMINATE);
        assertThat(out.toString()).containsPattern("undecided +window \\d+ \\(s = [^)]*\\): local radius [0-9.]+ ± [0-9.]+ mm straddles "
                + "(the (1\\.9|2\\.1) mm limit|both limits, 1\\.9 and 2\\.1 mm)\\n").doesNotContain("straddles a limit");
    }

    @Test
    void statedUncertaintyIsAppliedAndReported() throws IOException {
        Path f = file("r.json", "{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": "
                + arcPoints(2.05) + "}");
        assertThat(run("inspect", f.toString(), "--uncertainty", "0.0001", "--format", "json")).isEqualTo(0);
        assertThat(new ObjectMapper().readTree(out.toString()).get("uncertainty").asDouble()).isEqualTo(0.0001);
        assertThat(run("inspect", f.toString(), "--uncertainty", "0.05")).isEqualTo(Cli.INDETERMINATE);
        assertThat(out.toString()).contains("INDETERMINATE", "U = 0.05 mm", "ISO 14253-1");
    }

    @Test
    void windowBelowItsLeastLengthOrNotANumberExitsTwo() throws IOException {
        // before: --window 1e-9 never ended and --window NaN silently used the default
        Path f = file("cr.json", "{" + CORNER + ", \"callout\": {\"type\": \"controlled-radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": "
                + arcPoints(2.05) + "}");
        assertThat(run("inspect", f.toString(), "--window", "1e-9")).isEqualTo(2);
        assertThat(err.toString()).contains("--window").contains("at least 0.012566");
        assertThat(run("inspect", f.toString(), "--window", "NaN")).isEqualTo(2);
        assertThat(err.toString()).contains("--window").contains("not a number");
    }

    @Test
    void inconsistentCalloutsInAFileAreBadInput() throws IOException {
        Path same = file("s.json", "{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 2, \"max\": 2}, \"points\": " + arcPoints(2.05) + "}");
        assertThat(run("inspect", same.toString())).isEqualTo(2);
        assertThat(err.toString()).contains("max").contains("equals min");
        Path nominal = file("n.json", "{" + CORNER.replace("\"nominalRadius\": 2", "\"nominalRadius\": 5")
                + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": " + arcPoints(2.05) + "}");
        assertThat(run("inspect", nominal.toString())).isEqualTo(2);
        assertThat(err.toString()).contains("nominalRadius");
        Path tiers = file("t.json", "{" + CORNER + ", \"callout\": {\"type\": \"composite-profile\", \"tiers\": [{\"zone\": 0.02, \"free\": []}, "
                + "{\"zone\": 0.05, \"free\": [\"x\", \"y\", \"rotation\"]}]}, \"points\": " + arcPoints(2.05) + "}");
        assertThat(run("inspect", tiers.toString())).isEqualTo(2);
        assertThat(err.toString()).contains("larger than tier 1");
        Path res = file("res.json", "{" + CORNER + ", \"resolution\": 0.05, \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": "
                + arcPoints(2.05) + "}");
        assertThat(run("inspect", res.toString())).isEqualTo(2);
        assertThat(err.toString()).contains("resolution").contains("tenth of the tolerance");
    }

    @Test
    void failingRadiusExitsOne() throws IOException {
        Path f = file("r.json", "{" + CORNER.replace("\"nominalRadius\": 2", "\"nominalRadius\": 2.2")
                + ", \"callout\": {\"type\": \"radius\", \"min\": 2.1, \"max\": 2.3}, \"points\": " + arcPoints(2.05) + "}");
        assertThat(run("inspect", f.toString())).isEqualTo(1);
        assertThat(out.toString()).startsWith("FAIL").contains("smallest 2.05");
    }

    @Test
    void profileJsonReportsRequiredZoneRegistrationAndDeviations() throws IOException {
        Path f = file("p.json", "{" + CORNER + ", \"callout\": {\"type\": \"profile\", \"zone\": 0.2, \"outward\": 0.05, \"free\": [\"x\", \"y\"]}, \"points\": "
                + arcPoints(2.05) + "}");
        assertThat(run("inspect", f.toString(), "--format", "json")).isEqualTo(0);
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertThat(j.get("requiredZone").isNumber()).isTrue();
        assertThat(j.at("/registration/x").isNumber()).isTrue();
        assertThat(j.at("/registration/rotation").asDouble()).isZero();
        assertThat(j.get("maxOutward").isNumber()).isTrue();
        assertThat(j.get("maxInward").isNumber()).isTrue();
        assertThat(j.get("isoOffset").asDouble()).isCloseTo(-0.05, Assertions.within(1e-12));
    }

    @Test
    void compositeReportsEachTierAndCompareListsEveryControl() throws IOException {
        Path f = file("c.json", "{" + CORNER + ", \"callout\": {\"type\": \"composite-profile\", \"tiers\": [{\"zone\": 0.2, \"free\": []},"
                + " {\"zone\": 0.05, \"free\": [\"x\", \"y\", \"rotation\"]}]}, \"points\": " + arcPoints(2.05) + "}");
        assertThat(run("inspect", f.toString(), "--format", "json", "--compare")).isEqualTo(0);
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertThat(j.get("tiers").size()).isEqualTo(2);
        assertThat(j.at("/tiers/0/verdict").asText()).isEqualTo("pass");
        assertThat(j.at("/tiers/1/requiredZone").isNumber()).isTrue();
        assertThat(j.get("compare").size()).isEqualTo(5);
    }

    @Test
    void pointsFileIsReadRelativeToTheInspectionFileAndPlotIsWritten() throws IOException {
        Files.createDirectories(dir.resolve("data"));
        StringBuilder csv = new StringBuilder("x,y\n");
        for (JsonNode p : new ObjectMapper().readTree(arcPoints(2.05))) csv.append(p.get(0).asDouble()).append(',').append(p.get(1).asDouble()).append('\n');
        Files.writeString(dir.resolve("data/section.csv"), csv);
        Path f = file("data/run.json", "{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"pointsFile\": \"section.csv\"}");
        Path png = dir.resolve("plot.png"), svg = dir.resolve("plot.svg");
        assertThat(run("inspect", f.toString(), "--plot", png.toString())).isEqualTo(0);
        assertThat(run("inspect", f.toString(), "--plot", svg.toString())).isEqualTo(0);
        assertThat(Files.size(png)).isGreaterThan(1000);
        assertThat(Files.readString(svg)).contains("<svg").contains("PASS");
    }

    @Test
    void generalContourFileIsJudgedForProfile() throws IOException {
        String contour = "\"units\": \"mm\", \"contour\": {\"air\": \"left\", \"segments\": ["
                + "{\"type\": \"line\", \"from\": [6, 0], \"to\": [2, 0]},"
                + "{\"type\": \"arc\", \"from\": [2, 0], \"to\": [0, 2], \"centre\": [2, 2], \"turn\": \"cw\"},"
                + "{\"type\": \"line\", \"from\": [0, 2], \"to\": [0, 6]}]}";
        Path f = file("g.json", "{" + contour + ", \"callout\": {\"type\": \"profile\", \"zone\": 0.2}, \"points\": " + arcPoints(2.05) + "}");
        assertThat(run("inspect", f.toString(), "--format", "json")).isEqualTo(0);
        JsonNode j = new ObjectMapper().readTree(out.toString());
        // the 2.05 blend lies inside (toward the material) of the 2.0 nominal of a round: negative deviations
        assertThat(j.get("maxInward").asDouble()).isPositive();
        assertThat(j.has("fits")).isFalse();
    }

    @Test
    void csvJunkLineIsBadInputNamingTheLine() throws IOException {
        Files.writeString(dir.resolve("s.csv"), "x,y\n1,0\n0.5,0.1\nabc,2\n");
        Path f = file("run.json", "{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"pointsFile\": \"s.csv\"}");
        assertThat(run("inspect", f.toString())).isEqualTo(2);
        assertThat(err.toString()).contains("s.csv:4:1: x: not a number").doesNotContain("abc");
    }

    @Test
    void badInputExitsTwoWithALocatedMessage() throws IOException {
        String[][] cases = {
                {"{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": []}", "no points"},
                {"{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": [[1, 0], [0, 1]]}", "too few"},
                {"{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": [[1, 0], [NaN, 1]]}", "NaN"},
                {"{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": [[1, 0], [\"a\", 1]]}", "points: [1]: x must be a number"},
                {"{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": -1, \"max\": 2.1}, \"points\": [[1, 0]]}", "min: must be zero or more"},
                {"{\"units\": \"mm\", \"corner\": {\"vertex\": [0, 0], \"legA\": [1, 0], \"legB\": [-2, 0], \"kind\": \"round\"}, \"nominalRadius\": 2,"
                        + " \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": [[1, 0], [2, 0], [3, 1]]}", "parallel"},
                {"{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": [[8, 0], [9, 0], [10, 0]]}", "extent"},
                {"{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": [[2, 0], [1.5, 0], [1, 0], [0.5, 0]]}", "blend"},
                {"{" + CORNER + ", \"callout\": {\"type\": \"chamfer\"}, \"points\": [[1, 0]]}", "unknown callout type 'chamfer'"},
                {"{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": [[1, 0]], \"colour\": 1}", "unknown field 'colour'"},
                {"{" + CORNER + ", \"callout\": {\"type\": \"profile\", \"zone\": 0.1, \"free\": [\"z\"]}, \"points\": [[1, 0]]}", "unknown freedom 'z'"},
                {"{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": [[1, 0]", "bad.json:1:"},
        };
        for (String[] c : cases) {
            out.getBuffer().setLength(0);
            err.getBuffer().setLength(0);
            Path f = file("bad.json", c[0]);
            assertThat(run("inspect", f.toString())).as(c[1]).isEqualTo(2);
            assertThat(err.toString()).as(c[0]).contains(c[1]).contains("bad.json");
        }
    }

    @Test
    void coordinatesInOneReportReadAtOneResolution() {
        // a CMM report lists coordinates at fixed places per unit (common practice): 0.0001 mm here
        Pattern pair = Pattern.compile("(through|at|near|about) \\[([^\\]]*)\\]");
        for (String example : new String[] {"bracket-round-r", "bracket-round-profile", "bracket-round-composite", "housing-fillet-profile"}) {
            out.getBuffer().setLength(0);
            run("inspect", "examples/inspect/" + example + ".json");
            Matcher m = pair.matcher(out.toString());
            int pairs = 0;
            while (m.find()) {
                pairs++;
                assertThat(m.group(2)).as(example + ": " + m.group()).matches("-?\\d+\\.\\d{4}, -?\\d+\\.\\d{4}");
            }
            assertThat(pairs).as(example).isGreaterThanOrEqualTo(4);
        }
        out.getBuffer().setLength(0);
        run("inspect", "examples/inspect/bracket-round-r.json");
        assertThat(out.toString()).contains("a through [4.1306, 0.0002]").contains("b through [-0.0001, 4.2078]");
        // stations along the contour are positions too
        out.getBuffer().setLength(0);
        run("inspect", "examples/inspect/bracket-round-cr-flat.json");
        Matcher s = Pattern.compile("s = (\\S+) to (\\S+) mm").matcher(out.toString());
        int stations = 0;
        while (s.find()) {
            stations++;
            assertThat(s.group(1) + " " + s.group(2)).as(s.group()).matches("\\d+\\.\\d{4} \\d+\\.\\d{4}");
        }
        assertThat(stations).isGreaterThanOrEqualTo(5);
        assertThat(out.toString()).contains("window 1 (s = 0.0002 to 0.5763 mm)");
    }

    @Test
    void roundOffOfAPerfectSectionReadsAsZeroAtTheReportsResolution() throws IOException {
        // A perfect blend leaves residuals of 1e-17 and solver round-off of 1e-9: a CMM report states
        // lengths no finer than its coordinates, 0.0001 mm (common practice). Before:
        // "rms 0.0000000000000000671 mm", "width 0.000000005257", "step ... 0.0000000000007794 mm",
        // "needs zone 0.000000005281 mm", "(± up to 0.000000035526 mm)".
        String[] callouts = {"{\"type\": \"controlled-radius\", \"min\": 1.9, \"max\": 2.1}",
                "{\"type\": \"profile\", \"zone\": 0.1, \"free\": [\"x\", \"y\", \"rotation\"]}"};
        for (String callout : callouts) {
            Path f = file("perfect.json", "{" + CORNER + ", \"callout\": " + callout + ", \"points\": " + arcPoints(2.0) + "}");
            out.getBuffer().setLength(0);
            assertThat(run("inspect", f.toString(), "--compare")).isZero();
            // the notes echo the resolution as given (1e-6 by default): not a computed length
            String text = out.toString().lines().filter(l -> !l.startsWith("  note:")).collect(java.util.stream.Collectors.joining("\n"));
            assertThat(text).as(text).doesNotContainPattern("0\\.00000\\d*[1-9]");
            assertThat(text).contains("width 0.0000)").contains("step at surface a 0.0000 mm");
        }
        assertThat(out.toString()).contains("needs zone 0.0001 mm");
    }

    @Test
    void anUndecidedRowOfTheComparisonSaysSoInFull() {
        // the bracket's CR row is undecided (its windows' uncertainty straddles a limit); before: "undec"
        assertThat(run("inspect", "examples/inspect/bracket-round-r.json", "--compare")).isZero();
        assertThat(out.toString()).containsPattern("\\n    indeterminate +controlled radius");
    }

    @Test
    void aComparisonRowFailedByPointsBeyondTheSurfacesSaysSo() {
        // the housing's derived R row fails on points beyond the fitted surfaces, where no radius
        // allows them; before, its figure read "envelope none to 2.113 mm"
        run("inspect", "examples/inspect/housing-fillet-profile.json", "--compare");
        String row = out.toString().lines().filter(l -> l.contains(" radius  ") && l.contains("R 1.879-2.121")).findFirst().orElseThrow();
        assertThat(row).doesNotContain("none").containsPattern("\\d+ point\\(s\\) beyond the fitted surfaces, up to [0-9.]+ mm; largest radius [0-9.]+ mm");
    }

    @Test
    void theFittedSurfacesAreReportedBesideTheNominal() throws IOException {
        // a perfect R2 moved 0.03 along x: the surfaces' corner sits at [0.03, 0] against the nominal [0, 0]
        StringBuilder moved = new StringBuilder();
        Matcher m = Pattern.compile("\\[([-0-9.E]+), ([-0-9.E]+)\\]").matcher(arcPoints(2.0));
        while (m.find()) {
            moved.append(moved.length() == 0 ? "[" : ", ").append("[").append(Double.parseDouble(m.group(1)) + 0.03).append(", ").append(m.group(2)).append("]");
        }
        Path f = file("moved.json", "{" + CORNER + ", \"callout\": {\"type\": \"radius\", \"min\": 1.9, \"max\": 2.1}, \"points\": " + moved + "]}");
        assertThat(run("inspect", f.toString())).isZero();
        assertThat(out.toString()).contains("angle 90° (nominal 90°), corner at [0.0300, 0.0000] (nominal [0.0000, 0.0000])");
        out.getBuffer().setLength(0);
        assertThat(run("inspect", f.toString(), "--format", "json")).isZero();
        JsonNode j = new ObjectMapper().readTree(out.toString());
        assertThat(j.at("/surfaces/nominal/angle").asDouble()).isEqualTo(90.0);
        assertThat(j.at("/surfaces/nominal/vertex/0").asDouble()).isZero();
        assertThat(j.at("/surfaces/vertex/0").asDouble()).isBetween(0.03 - 1e-9, 0.03 + 1e-9);
    }

    @Test
    void everyVerdictCarriesTheReminderInTextAndJson() {
        // the project's rule: every verdict says it reads the standard's definitions and is not an
        // acceptance, deferring to the standard, company practice and the responsible engineer.
        // Before: the JSON verdict had no such field.
        for (String format : new String[] {"text", "json"}) {
            out.getBuffer().setLength(0);
            run("inspect", "examples/inspect/bracket-round-r.json", "--format", format);
            String all = out.toString().replaceAll("\\s+", " ");
            assertThat(all).as(format).contains("it is not an acceptance").contains("company's inspection practice");
        }
    }
}
