package org.arcwright.callout;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/**
 * One datum feature reference in a feature control frame, e.g. {@code A} or {@code B(M)}.
 *
 * @param label the datum letter(s) as drawn, e.g. {@code A}
 * @param modifier material boundary modifier: null (regardless of material boundary), {@code MMB}
 *     or {@code LMB} (ASME Y14.5-2018 datum modifiers, from memory)
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record DatumReference(String label, String modifier) {

    public DatumReference {
        if (label == null || !label.matches("[A-Z]{1,2}")) {
            throw new IllegalArgumentException("a datum label is one or two capital letters, got '" + label + "'");
        }
        if (modifier != null) {
            modifier = modifier.toUpperCase(Locale.ROOT);
            if (!modifier.equals("MMB") && !modifier.equals("LMB")) {
                throw new IllegalArgumentException("datum modifier must be MMB or LMB, got '" + modifier + "'");
            }
        }
    }

    /** Reads {@code "A"}, {@code "B(M)"} / {@code "B(MMB)"}, {@code "C(L)"} or an object form. */
    @JsonCreator
    public static DatumReference parse(String text) {
        String t = text == null ? "" : text.trim().toUpperCase(Locale.ROOT);
        int open = t.indexOf('(');
        if (open < 0) return new DatumReference(t, null);
        if (!t.endsWith(")")) throw new IllegalArgumentException("unclosed modifier in datum '" + text + "'");
        String mod = t.substring(open + 1, t.length() - 1);
        mod = switch (mod) {
            case "M", "MMB" -> "MMB";
            case "L", "LMB" -> "LMB";
            default -> throw new IllegalArgumentException("datum modifier must be M/MMB or L/LMB, got '" + mod + "'");
        };
        return new DatumReference(t.substring(0, open), mod);
    }

    @JsonCreator
    static DatumReference of(@JsonProperty("label") String label, @JsonProperty("modifier") String modifier) {
        return new DatumReference(label, modifier);
    }

    /** The compact text form, {@code A} or {@code B(M)}. */
    @JsonValue
    public String text() {
        if (modifier == null) return label;
        return label + "(" + modifier.charAt(0) + ")";
    }
}
