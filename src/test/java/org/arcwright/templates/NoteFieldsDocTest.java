package org.arcwright.templates;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The developer guide lists every field a template may name, so template writers need not read code. */
class NoteFieldsDocTest {

    private static void names(String prefix, FieldSchema s, List<String> out) {
        for (var e : s.fields().entrySet()) {
            String name = prefix + e.getKey();
            out.add(name);
            FieldSchema f = e.getValue();
            if (name.equals("feature") || name.equals("decidedFeatures") || name.equals("edgeFeatures")) continue;
            if (f.kind() == FieldSchema.Kind.OBJECT) names(name + ".", f, out);
            if (f.kind() == FieldSchema.Kind.LIST && f.element() != null) names(name + "[].", f.element(), out);
        }
    }

    @Test
    void developersGuideDocumentsEveryTemplateField() throws Exception {
        String guide = Files.readString(Path.of("DEVELOPERS.md"));
        List<String> all = new ArrayList<>();
        names("", NoteFields.ROOT, all);
        assertThat(all).hasSizeGreaterThan(60);
        for (String n : all) assertThat(guide).as("DEVELOPERS.md documents `%s`", n).contains("| `" + n + "` |");
    }
}
