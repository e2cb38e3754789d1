package org.arcwright.rules;

import org.arcwright.model.DesignCase;
import org.arcwright.model.BlendKind;
import org.arcwright.model.Process;
import org.arcwright.model.Loading;
import org.arcwright.model.BlendFunction;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * A fact about a {@link DesignCase} that a rule's {@code when} block can test. The names are the
 * case's own field names, nested ones with a dot ({@code stress.load}); a rule naming anything else
 * is rejected with the list of these names.
 */
public enum Fact {
    UNITS("units", Type.TEXT, List.of("mm", "in"), c -> c.units().symbol()),
    STANDARD("standard", Type.TEXT, List.of("asme", "iso"), c -> c.standard().key()),
    FEATURE("feature", Type.TEXT, List.of(), DesignCase::feature),
    KIND("kind", Type.TEXT, keys(BlendKind.values(), BlendKind::key), c -> c.kind().key()),
    NOMINAL_RADIUS("nominalRadius", Type.NUMBER, List.of(), DesignCase::nominalRadius),
    /** The nominal radius in millimetres, so that one rule serves inch and metric drawings. */
    NOMINAL_RADIUS_MM("nominalRadiusMm", Type.NUMBER, List.of(), c -> c.nominalRadius() * c.units().millimetres()),
    FUNCTION("function", Type.TEXT, keys(BlendFunction.values(), BlendFunction::key), c -> c.function().key()),
    LOADING("loading", Type.TEXT, keys(Loading.values(), Loading::key), c -> c.loading().key()),
    FORM_MATTERS("formMatters", Type.BOOLEAN, List.of(), DesignCase::formMatters),
    LOCATION_MATTERS("locationMatters", Type.BOOLEAN, List.of(), DesignCase::locationMatters),
    /** Present when the adjacent surfaces can reference at least one datum feature. */
    DATUMS("datums", Type.PRESENCE, List.of(), c -> c.hasDatums() ? Boolean.TRUE : null),
    DATUMS_COUNT("datums.count", Type.NUMBER, List.of(), c -> (double) c.datums().size()),
    PROCESS("process", Type.TEXT, keys(Process.values(), Process::key), c -> c.process().key()),
    STRESS("stress", Type.PRESENCE, List.of(), c -> c.stress() == null ? null : Boolean.TRUE),
    STRESS_SHAPE("stress.shape", Type.TEXT, List.of("stepped-shaft", "stepped-bar"),
            c -> c.stress() == null ? null : c.stress().shape()),
    STRESS_LOAD("stress.load", Type.TEXT, List.of("tension", "bending", "torsion"),
            c -> c.stress() == null ? null : c.stress().load()),
    STRESS_BIG_D("stress.D", Type.NUMBER, List.of(), c -> c.stress() == null ? null : c.stress().bigD()),
    STRESS_SMALL_D("stress.d", Type.NUMBER, List.of(), c -> c.stress() == null ? null : c.stress().smallD()),
    STRESS_STRENGTH("stress.ultimateStrength", Type.NUMBER, List.of(),
            c -> c.stress() == null || c.stress().ultimateStrength() == null ? null
                    : c.stress().ultimateStrength().megapascals()),
    STRESS_TARGET_KT("stress.targetKt", Type.NUMBER, List.of(), c -> c.stress() == null ? null : c.stress().targetKt()),
    STRESS_TARGET_KF("stress.targetKf", Type.NUMBER, List.of(), c -> c.stress() == null ? null : c.stress().targetKf()),
    MATING("mating", Type.PRESENCE, List.of(), c -> c.mating() == null ? null : Boolean.TRUE),
    MATING_CORNER("mating.corner", Type.TEXT, List.of("chamfer", "radius", "bearing"),
            c -> c.mating() == null ? null : c.mating().corner()),
    MATING_SIZE("mating.size", Type.NUMBER, List.of(), c -> c.mating() == null ? null : c.mating().size()),
    TOLERANCE("tolerance", Type.TEXT, List.of(), DesignCase::tolerance);

    /** What kind of value a fact holds, which decides the conditions it accepts. */
    public enum Type {
        /** A word; when the fact lists its allowed values, a condition naming another is an error. */
        TEXT,
        NUMBER,
        BOOLEAN,
        /** Only present or absent. */
        PRESENCE
    }

    private final String key;
    private final Type type;
    private final List<String> allowed;
    private final Function<DesignCase, Object> extractor;

    Fact(String key, Type type, List<String> allowed, Function<DesignCase, Object> extractor) {
        this.key = key;
        this.type = type;
        this.allowed = allowed;
        this.extractor = extractor;
    }

    public String key() { return key; }

    public Type type() { return type; }

    /** The values a {@link Type#TEXT} fact can take, or empty when it is free text. */
    public List<String> allowed() { return allowed; }

    /** The fact's value for a case: a String, Double or Boolean, or null when absent. */
    public Object valueOf(DesignCase c) {
        Object v = extractor.apply(c);
        if (v instanceof Number n && !(v instanceof Double)) return n.doubleValue();
        return v;
    }

    /** The fact with this name. */
    public static Optional<Fact> byKey(String key) {
        for (Fact f : values()) if (f.key.equals(key)) return Optional.of(f);
        return Optional.empty();
    }

    /** Every fact name, for error messages. */
    public static String knownNames() {
        return Arrays.stream(values()).map(Fact::key).collect(Collectors.joining(", "));
    }

    private static <E> List<String> keys(E[] values, Function<E, String> key) {
        return Arrays.stream(values).map(key).toList();
    }
}
