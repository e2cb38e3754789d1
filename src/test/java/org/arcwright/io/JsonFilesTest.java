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
                            "Exception", "instance of", "(code ");
                });
    }
}
