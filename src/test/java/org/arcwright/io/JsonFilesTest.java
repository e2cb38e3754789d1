package org.arcwright.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading JSON: every failure located and said in the user's terms. */
class JsonFilesTest {
    record Sample(@JsonProperty("units") String units, @JsonProperty("zone") Double zone,
                  @JsonProperty("datums") List<String> datums, @JsonProperty("inner") Inner inner) {}

    record Inner(@JsonProperty("r") Double r) {}

    /** A record that checks its values in its constructor, as the inspection and case records do. */
    record Checked(@JsonProperty("units") String units, @JsonProperty("zone") Double zone, @JsonProperty("inner") Inner inner) {
        Checked {
            if (zone != null && zone > 1) throw InputProblem.ofField("zone", "is more than 1");
            if (inner != null && inner.r() != null && inner.r() < 0) {
                throw new IllegalArgumentException("inner.r must be zero or more, got " + inner.r());
            }
        }
    }

    record Holder(@JsonProperty("items") List<Checked> items) {}

    private final JsonFiles json = new JsonFiles();

    @Test
    void aFileOfJustNullIsALocatedProblem(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("case.json");
        Files.writeString(f, "null\n");
        assertThatThrownBy(() -> json.read(f, Sample.class))
                .isInstanceOf(InputProblem.class).hasMessageContaining("case.json:1:1").hasMessageContaining("null");
        assertThatThrownBy(() -> json.readTree(f)).isInstanceOf(InputProblem.class);
    }

    @Test
    void anEmptyStringForANumberIsBadInputNotAbsent() {
        assertThatThrownBy(() -> json.parse("{\"zone\": \"\"}", "s.json", Sample.class))
                .isInstanceOf(InputProblem.class)
                .satisfies(e -> assertThat(((InputProblem) e).field()).isEqualTo("zone"))
                .hasMessageContaining("a number");
        assertThatThrownBy(() -> json.parse("{\"zone\": \"  \"}", "s.json", Sample.class)).isInstanceOf(InputProblem.class);
        assertThatThrownBy(() -> json.parse("{\"inner\": \"\"}", "s.json", Sample.class)).isInstanceOf(InputProblem.class);
    }

    @Test
    void aBomBeforeJsonIsAccepted(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("case.json");
        Files.write(f, ("\uFEFF{\"units\": \"mm\"}").getBytes(StandardCharsets.UTF_8));
        assertThat(json.read(f, Sample.class).units()).isEqualTo("mm");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "{\"zone\": \"abc\"}                 | zone   | expected a number",
            "{\"zone\": NaN}                     | zone   | NaN and Infinity are not numbers",
            "{\"zone\": [1]}                     | zone   | expected a number",
            "{\"inner\": \"abc\"}                | inner  | expected an object",
            "{\"inner\": [1]}                    | inner  | expected an object",
            "{\"datums\": {\"a\": 1}}            | datums | expected a list",
            "{\"units\": \"mm\", \"units\": \"in\"} |     | given twice",
            "{\"units\": 'mm'}                   |        | double quotes",
            "{\"units\": \"mm\",}                |        | field name",
            "{\"units\": \"mm\"                  |        | ends too early",
            "[1, 2]                              |        | expected an object",
            "{\"zone\": 1.0} {}                  |        | ",
            "{\"colour\": 1}                     | colour | unknown field 'colour'",
            "{\"zone\": 1.5f}                    | zone   | a comma between fields",
            "{\"units\": tru}                    | units  | unexpected 'tru'",
            "{\"units\" \"mm\"}                  | units  | a colon after the field name",
            "{\"zone\": -}                       | zone   | not a valid JSON number",
            "{\"units\": \"mm\"}}                 |        | a closing } or ] with nothing open",
            "{\"units\": \"\\q\"}                 | units  | backslash",
            "{\"zone\": 1e999}                   | zone   | too large",
            "{\"zone\": -1e999}                  | zone   | too large",
    })
    void failuresAreLocatedAndSpeakNoJava(String text, String field, String expected) {
        assertThatThrownBy(() -> json.parse(text, "s.json", Sample.class))
                .isInstanceOf(InputProblem.class)
                .satisfies(e -> {
                    InputProblem p = (InputProblem) e;
                    assertThat(p.getMessage()).startsWith("s.json:1:");
                    if (field != null) assertThat(p.field()).isEqualTo(field);
                    if (expected != null) assertThat(p.problem()).contains(expected);
                    assertThat(p.problem()).doesNotContain("java.", "org.arcwright", "com.fasterxml", "Json", "`",
                            "Exception", "instance of", "(code ", "was expecting", "token", "JSON String", "CTRL-CHAR");
                });
    }

    @Test
    void aProblemRaisedByARecordsConstructorNamesTheLineAndColumnOfItsField() {
        String text = "{\n  \"units\": \"mm\",\n  \"zone\": 2.5,\n  \"inner\": {\"r\": 1}\n}\n";
        InputProblem p = catchProblem(() -> json.parse(text, "c.json", Checked.class));
        // the value 2.5 starts on line 3, column 11 (not the end of the object, where the parser stopped)
        assertThat(p.getMessage()).startsWith("c.json:3:11: zone: is more than 1");
        String inList = "{\"items\": [\n  {\"zone\": 0.5},\n  {\"zone\": 0.5, \"inner\": {\"r\": -1}}\n]}";
        InputProblem q = catchProblem(() -> json.parse(inList, "l.json", Holder.class));
        assertThat(q.field()).isEqualTo("items[1].inner.r");
        assertThat(q.line()).isEqualTo(3);
        assertThat(q.column()).isEqualTo(32);
        assertThat(q.problem()).isEqualTo("must be zero or more, got -1.0");
    }

    @Test
    void aProblemFoundAfterReadingIsLocatedByItsFieldOrItsEnclosingObject() {
        String text = "{\n  \"units\": \"mm\",\n  \"inner\": {\n    \"r\": 7\n  }\n}\n";
        InputProblem tooBig = JsonFiles.locate(InputProblem.ofField("inner.r", "is too large").in("c.json"), text);
        assertThat(tooBig.getMessage()).isEqualTo("c.json:4:10: inner.r: is too large");
        // a field that is missing is shown at the object that should hold it
        InputProblem missing = JsonFiles.locate(InputProblem.ofField("inner.q", "missing").in("c.json"), text);
        assertThat(missing.getMessage()).isEqualTo("c.json:3:12: inner.q: missing");
        InputProblem top = JsonFiles.locate(InputProblem.ofField("zone", "missing").in("c.json"), text);
        assertThat(top.getMessage()).isEqualTo("c.json:1:1: zone: missing");
        // already located, or text that is not JSON: unchanged
        InputProblem located = new InputProblem("c.json", 2, 3, "units", "x");
        assertThat(JsonFiles.locate(located, text)).isSameAs(located);
        InputProblem plain = InputProblem.ofField("units", "x").in("c.json");
        assertThat(JsonFiles.locate(plain, "not json {").getMessage()).isEqualTo("c.json: units: x");
    }

    private static InputProblem catchProblem(Runnable r) {
        try {
            r.run();
        } catch (InputProblem p) {
            return p;
        }
        throw new AssertionError("no input problem");
    }

    @Test
    void theParsersOwnLimitsAreSaidInTheUsersTermsAndLocated() {
        // Jackson's read constraints (from memory: 1,000 digits in a number, 1,000 levels of nesting) spoke of
        // StreamReadConstraints and gave no line
        String longNumber = "{\"units\": \"mm\",\n \"zone\": " + "9".repeat(1500) + "}";
        InputProblem n = catchProblem(() -> json.parse(longNumber, "n.json", Sample.class));
        assertThat(n.getMessage()).startsWith("n.json:2:10: ").contains("1500 digits", "at most 1000");
        String deep = "{\"units\": \"mm\", \"x\":\n" + "[".repeat(1200) + "]".repeat(1200) + "}";
        InputProblem d = catchProblem(() -> json.parse(deep, "d.json", com.fasterxml.jackson.databind.JsonNode.class));
        assertThat(d.getMessage()).startsWith("d.json:2:").contains("nested", "at most 1000");
        for (InputProblem p : List.of(n, d)) {
            assertThat(p.getMessage()).doesNotContain("StreamReadConstraints", "`", "()", "java.");
        }
    }

    record Counted(@JsonProperty("weight") Integer weight) {}

    @Test
    void aWholeNumberOutOfRangeIsSaidWithoutJavaTypeNames() {
        InputProblem p = catchProblem(() -> json.parse("{\"weight\": 1e999}", "w.json", Counted.class));
        assertThat(p.getMessage()).startsWith("w.json:1:").contains("weight", "too large for a whole number")
                .doesNotContain(" int ", "out of range of");
    }
}
