package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.arcwright.io.InputProblem;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.model.Process;
import org.arcwright.tolerance.CalloutParser;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.LimitsReport;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.Units;

/**
 * The Decide form: the answers as typed, their validation, and the design case they make. Text is
 * kept as typed so that a half-written number is not lost; every change re-validates and fires.
 */
public final class DecideForm {
    private final Listeners listeners = new Listeners();
    private final Map<Question, String> text = new EnumMap<>(Question.class);
    private BlendKind kind = BlendKind.FILLET;
    private BlendFunction function = BlendFunction.STRESS_RELIEF;
    private Loading loading = Loading.STATIC;
    private Process process = Process.MACHINED;
    private DrawingStyle standard = DrawingStyle.ASME;
    private Units units = Units.MM;
    private boolean formMatters;
    private boolean locationMatters;
    private boolean stress;
    private boolean mating;
    private Map<Question, String> problems = Map.of();

    public DecideForm() {
        text.put(Question.ANGLE, "90");
        text.put(Question.SHAPE, "stepped-shaft");
        text.put(Question.LOAD, "bending");
        text.put(Question.STRENGTH_UNITS, "MPa");
        text.put(Question.CORNER, "chamfer");
        validate();
    }

    public Listeners listeners() { return listeners; }

    /** Fills the form from a saved case. */
    public void load(DesignCase c) {
        text.clear();
        text.put(Question.ANGLE, "90");
        text.put(Question.FEATURE, c.feature() == null ? "" : c.feature());
        text.put(Question.NOMINAL, Numbers.trim(c.nominalRadius()));
        text.put(Question.DATUMS, String.join(", ", c.datums()));
        text.put(Question.TOLERANCE, c.tolerance() == null ? "" : c.tolerance());
        kind = c.kind();
        function = c.function();
        loading = c.loading();
        process = c.process();
        standard = c.standard();
        units = c.units();
        formMatters = c.formMatters();
        locationMatters = c.locationMatters();
        text.put(Question.ANGLE, Numbers.trim(c.cornerAngleDegrees()));
        stress = c.stress() != null;
        DesignCase.StressInputs s = c.stress();
        text.put(Question.SHAPE, s == null ? "stepped-shaft" : s.shape());
        text.put(Question.LOAD, s == null ? "bending" : s.load());
        text.put(Question.BIG_D, s == null ? "" : Numbers.trim(s.bigD()));
        text.put(Question.SMALL_D, s == null ? "" : Numbers.trim(s.smallD()));
        text.put(Question.STRENGTH, s == null || s.ultimateStrength() == null ? "" : Numbers.trim(s.ultimateStrength().value()));
        text.put(Question.STRENGTH_UNITS, s == null || s.ultimateStrength() == null ? "MPa" : s.ultimateStrength().units());
        text.put(Question.TARGET_KT, s == null || s.targetKt() == null ? "" : Numbers.trim(s.targetKt()));
        mating = c.mating() != null;
        DesignCase.MatingCorner m = c.mating();
        text.put(Question.CORNER, m == null ? "chamfer" : m.corner());
        text.put(Question.CORNER_SIZE, m == null ? "" : Numbers.trim(m.size()));
        text.put(Question.CORNER_ANGLE, m == null || m.angle() == null ? "" : Numbers.trim(m.angle()));
        changed();
    }

    /**
     * Every answer as typed, valid or not: what the form keeps for a feature the user leaves
     * before keeping the answers, so that going back restores them.
     */
    public record Draft(Map<Question, String> text, BlendKind kind, BlendFunction function, Loading loading,
                        Process process, DrawingStyle standard, Units units, boolean formMatters,
                        boolean locationMatters, boolean stress, boolean mating) {
        public Draft {
            text = Map.copyOf(text);
        }
    }

    /** The answers as they stand. */
    public Draft draft() {
        return new Draft(new EnumMap<>(text), kind, function, loading, process, standard, units, formMatters,
                locationMatters, stress, mating);
    }

    /** Puts back answers taken by {@link #draft()}. */
    public void restore(Draft d) {
        text.clear();
        text.putAll(d.text());
        kind = d.kind();
        function = d.function();
        loading = d.loading();
        process = d.process();
        standard = d.standard();
        units = d.units();
        formMatters = d.formMatters();
        locationMatters = d.locationMatters();
        stress = d.stress();
        mating = d.mating();
        changed();
    }

    // ---- answers ----

    public String text(Question q) { return text.getOrDefault(q, ""); }

    public void setText(Question q, String value) {
        String v = value == null ? "" : value;
        if (v.equals(text(q))) return;
        text.put(q, v);
        changed();
    }

    public BlendKind kind() { return kind; }
    public void setKind(BlendKind v) { kind = v; changed(); }
    public BlendFunction function() { return function; }
    public void setFunction(BlendFunction v) { function = v; changed(); }
    public Loading loading() { return loading; }
    public void setLoading(Loading v) { loading = v; changed(); }
    public Process process() { return process; }
    public void setProcess(Process v) { process = v; changed(); }
    public DrawingStyle standard() { return standard; }
    public void setStandard(DrawingStyle v) { standard = v; changed(); }
    public Units units() { return units; }
    public void setUnits(Units v) { units = v; changed(); }
    public boolean formMatters() { return formMatters; }
    public void setFormMatters(boolean v) { formMatters = v; changed(); }
    public boolean locationMatters() { return locationMatters; }
    public void setLocationMatters(boolean v) { locationMatters = v; changed(); }
    public boolean stressEnabled() { return stress; }
    public void setStressEnabled(boolean v) { stress = v; changed(); }
    public boolean matingEnabled() { return mating; }
    public void setMatingEnabled(boolean v) { mating = v; changed(); }

    // ---- validation ----

    /** What is wrong with each answer, empty when the form makes a valid case. */
    public Map<Question, String> problems() { return problems; }

    public Optional<String> problem(Question q) { return Optional.ofNullable(problems.get(q)); }

    public boolean isValid() { return problems.isEmpty(); }

    /** The case the answers make; empty while any answer is invalid. */
    public Optional<DesignCase> toCase() {
        if (!isValid()) return Optional.empty();
        return Optional.of(build());
    }

    /** The tolerance intent parsed and its limits at the corner angle, when it is given and valid. */
    public Optional<LimitsReport> limits() {
        if (text(Question.TOLERANCE).isBlank() || problems.containsKey(Question.TOLERANCE)
                || problems.containsKey(Question.ANGLE)) return Optional.empty();
        RadiusCallout c = CalloutParser.parse(text(Question.TOLERANCE), units, "tolerance");
        return Optional.of(LimitsReport.of(c, angle()));
    }

    /** The included corner angle in degrees (90 when the answer is not usable). */
    public double angle() {
        return Numbers.parse(text(Question.ANGLE)).filter(a -> a > 0 && a < 180).orElse(90.0);
    }

    private void changed() {
        validate();
        listeners.fire();
    }

    private void validate() {
        Map<Question, String> p = new EnumMap<>(Question.class);
        Optional<Double> nominal = Numbers.parse(text(Question.NOMINAL));
        if (text(Question.NOMINAL).isBlank()) p.put(Question.NOMINAL, "Enter the nominal radius.");
        else if (nominal.isEmpty()) p.put(Question.NOMINAL, "Not a number: '" + text(Question.NOMINAL).trim() + "'.");
        else if (nominal.get() <= 0) p.put(Question.NOMINAL, "The radius must be greater than zero.");
        for (String d : datums()) {
            if (!d.matches("[A-Z]{1,2}")) {
                p.put(Question.DATUMS, "Datum labels are one or two capital letters, got '" + d + "'.");
                break;
            }
        }
        Optional<Double> angle = Numbers.parse(text(Question.ANGLE));
        if (angle.isEmpty() || angle.get() <= 0 || angle.get() >= 180) {
            p.put(Question.ANGLE, "Enter an angle between 0 and 180 degrees.");
        }
        if (!text(Question.TOLERANCE).isBlank()) {
            try {
                RadiusCallout c = CalloutParser.parse(text(Question.TOLERANCE), units, "tolerance");
                // a tolerance that draws its own nominal must draw this one; deviations of the same sign
                // (R3 +0.3/+0.1) put it outside the limits, which is allowed. Limits alone must hold it.
                if (nominal.isPresent() && nominal.get() > 0 && c.nominal().isPresent()
                        && Math.abs(c.nominal().getAsDouble() - nominal.get()) > 1e-9 * Math.max(1, nominal.get())) {
                    p.put(Question.TOLERANCE, "This tolerance is drawn about R" + Numbers.trim(c.nominal().getAsDouble())
                            + ", not about the nominal radius " + Numbers.trim(nominal.get()) + ".");
                } else if (nominal.isPresent() && nominal.get() > 0 && c.nominal().isEmpty() && c.isFullyToleranced()
                        && (nominal.get() < c.min().getAsDouble() || nominal.get() > c.max().getAsDouble())) {
                    p.put(Question.TOLERANCE, "The nominal radius " + Numbers.trim(nominal.get())
                            + " lies outside these limits.");
                }
            } catch (InputProblem e) {
                p.put(Question.TOLERANCE, firstLine(e.problem()));
            }
        }
        if (stress) validateStress(p);
        if (mating) validateMating(p);
        if (p.isEmpty()) {
            try {
                build();
            } catch (IllegalArgumentException | InputProblem e) {
                p.put(Question.FEATURE, e.getMessage());
            }
        }
        problems = Collections.unmodifiableMap(p);
    }

    private void validateStress(Map<Question, String> p) {
        Optional<Double> big = positive(p, Question.BIG_D, true);
        Optional<Double> small = positive(p, Question.SMALL_D, true);
        if (big.isPresent() && small.isPresent() && !(big.get() > small.get())) {
            p.put(Question.SMALL_D, "d must be smaller than D.");
        }
        positive(p, Question.STRENGTH, false);
        if (!text(Question.TARGET_KT).isBlank()) {
            Optional<Double> kt = Numbers.parse(text(Question.TARGET_KT));
            if (kt.isEmpty() || kt.get() < 1) p.put(Question.TARGET_KT, "Kt is 1 or more.");
        }
    }

    private void validateMating(Map<Question, String> p) {
        positive(p, Question.CORNER_SIZE, true);
        if (!text(Question.CORNER_ANGLE).isBlank()) {
            Optional<Double> a = Numbers.parse(text(Question.CORNER_ANGLE));
            if (a.isEmpty() || a.get() <= 0 || a.get() >= 90) {
                p.put(Question.CORNER_ANGLE, "Enter an angle between 0 and 90 degrees.");
            }
        }
    }

    private Optional<Double> positive(Map<Question, String> p, Question q, boolean required) {
        String t = text(q);
        if (t.isBlank()) {
            if (required) p.put(q, "Required for this check.");
            return Optional.empty();
        }
        Optional<Double> v = Numbers.parse(t);
        if (v.isEmpty()) p.put(q, "Not a number: '" + t.trim() + "'.");
        else if (v.get() <= 0) p.put(q, "Must be greater than zero.");
        return v.filter(x -> x > 0);
    }

    private List<String> datums() {
        List<String> out = new ArrayList<>();
        for (String s : text(Question.DATUMS).split("[,;\\s]+")) if (!s.isBlank()) out.add(s.trim());
        return out;
    }

    private DesignCase build() {
        DesignCase.StressInputs s = null;
        if (stress) {
            DesignCase.Strength strength = text(Question.STRENGTH).isBlank() ? null
                    : new DesignCase.Strength(Numbers.parse(text(Question.STRENGTH)).orElseThrow(), text(Question.STRENGTH_UNITS));
            Double kt = Numbers.parse(text(Question.TARGET_KT)).orElse(null);
            s = new DesignCase.StressInputs(text(Question.SHAPE), text(Question.LOAD),
                    Numbers.parse(text(Question.BIG_D)).orElseThrow(), Numbers.parse(text(Question.SMALL_D)).orElseThrow(),
                    strength, kt);
        }
        DesignCase.MatingCorner m = null;
        if (mating) {
            m = new DesignCase.MatingCorner(text(Question.CORNER), Numbers.parse(text(Question.CORNER_SIZE)).orElseThrow(),
                    Numbers.parse(text(Question.CORNER_ANGLE)).orElse(null));
        }
        String feature = text(Question.FEATURE).isBlank() ? null : text(Question.FEATURE).trim();
        return new DesignCase(units, standard, feature, kind, Numbers.parse(text(Question.NOMINAL)).orElseThrow(), function,
                loading, formMatters, locationMatters, datums(), process, s, m, text(Question.TOLERANCE),
                angle() == DesignCase.SQUARE_CORNER ? null : angle());
    }

    private static String firstLine(String s) {
        int i = s.indexOf('\n');
        return i < 0 ? s : s.substring(0, i);
    }

    /** The choices of a closed list question, as shown. */
    public static List<String> choices(Question q) {
        switch (q) {
            case SHAPE: return List.of("stepped-shaft", "stepped-bar");
            case LOAD: return List.of("bending", "tension", "torsion");
            case STRENGTH_UNITS: return List.of("MPa", "ksi");
            case CORNER: return List.of("chamfer", "radius");
            default: return Arrays.asList();
        }
    }
}
