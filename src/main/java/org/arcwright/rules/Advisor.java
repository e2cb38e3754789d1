package org.arcwright.rules;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.arcwright.callout.Callout;
import org.arcwright.callout.DatumReference;
import org.arcwright.callout.Extent;
import org.arcwright.callout.ProfileTier;
import org.arcwright.io.InputProblem;
import org.arcwright.rules.CalloutPlan.CalloutKind;
import org.arcwright.tolerance.CalloutParser;
import org.arcwright.tolerance.CrescentZone;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.GeneralTolerance;
import org.arcwright.tolerance.GeneralToleranceTable;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.ToleranceForm;
import org.arcwright.tolerance.Units;

/**
 * The rule engine: evaluates every rule in force against a case, turns each rule that fires into a
 * concrete callout with its numbers, checks those numbers against the mechanics (K<sub>t</sub> at
 * the smallest radius, seating under the mating corner), adjusts the limits or demotes the rule
 * when they fail, and ranks the result. Stateless and deterministic: the same case and rule book
 * give the same advice, so one instance may serve many threads.
 */
public final class Advisor {
    /** Carried by every recommendation about stress, sealing or seating. */
    public static final String GUIDANCE_CAUTION = "Guidance only: defer to the governing standard, your company's "
            + "practice and licensed engineering judgement.";
    /** The corner angle assumed when the case does not give one ({@link DesignCase#SQUARE_CORNER}). */
    public static final double DEFAULT_ANGLE = DesignCase.SQUARE_CORNER;

    private static final double DEMOTED_SCORE_FACTOR = 0.25;
    private static final int NOTES_PER_RECOMMENDATION = 3;

    private final RuleBook book;
    private final FilletChecks checks;
    private final NoteLinker notes;

    public Advisor(RuleBook book, FilletChecks checks, NoteLinker notes) {
        this.book = Objects.requireNonNull(book, "book");
        this.checks = Objects.requireNonNull(checks, "checks");
        this.notes = Objects.requireNonNull(notes, "notes");
    }

    /**
     * The usual advisor for a pack stack: its rules and tables, the mechanics checks over the
     * published fits and the stack's bearing-seat table, and the given notes. What failed to load
     * is in {@code book().problems()}; the advisor works on the rest.
     */
    public static Advisor forStack(org.arcwright.pack.PackStack stack, NoteLinker notes) {
        return new Advisor(RuleBook.load(stack), MechanicsChecks.standard(stack), notes);
    }

    /** The rule book this advisor evaluates. */
    public RuleBook book() { return book; }

    /**
     * Advice for one case.
     *
     * @throws InputProblem when the case's own tolerance text cannot be read
     */
    public Advice advise(DesignCase c) {
        Fact[] all = Fact.values();
        Object[] facts = new Object[all.length];
        for (Fact f : all) facts[f.ordinal()] = f.valueOf(c);
        Context ctx = new Context(c);
        List<Recommendation> recs = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        for (RuleBook.Entry e : book.entries()) {
            if (!e.rule().when().holds(facts)) continue;
            Recommendation r = recommend(e, ctx, facts, warnings);
            if (r != null) recs.add(r);
        }
        recs.sort(Comparator.comparing(Recommendation::demoted)
                .thenComparing(Comparator.comparingDouble(Recommendation::score).reversed())
                .thenComparing(Recommendation::ruleId));
        List<Recommendation> distinct = new ArrayList<>(recs.size());
        Set<String> texts = new HashSet<>();
        for (Recommendation r : recs) {
            if (texts.add(r.text())) distinct.add(r);
        }
        List<String> conflicts = new ArrayList<>();
        for (int i = 0; i < distinct.size(); i++) {
            Recommendation a = distinct.get(i);
            if (a.demoted()) break;
            for (int j = i + 1; j < distinct.size(); j++) {
                Recommendation b = distinct.get(j);
                if (b.demoted() || b.score() != a.score()) break;
                if (!a.callout().typeName().equals(b.callout().typeName())) {
                    conflicts.add("'" + a.ruleId() + "' (" + a.callout().typeName() + ") and '" + b.ruleId() + "' ("
                            + b.callout().typeName() + ") rank equal at " + plain(a.score())
                            + "; they are listed by rule id, which is not a decision: choose, or ask the pack's author "
                            + "to weigh them");
                }
            }
        }
        if (distinct.isEmpty()) {
            warnings.add("No rule fired for this case; the title block's general tolerance applies unless you state one.");
        } else if (distinct.get(0).demoted()) {
            warnings.add("No control passes its checks for this case as it stands: every recommendation is demoted. "
                    + "Read the first one's cautions for what would work before putting any of them on the drawing.");
        }
        return new Advice(c, distinct, conflicts, warnings);
    }

    private Recommendation recommend(RuleBook.Entry e, Context ctx, Object[] facts, List<String> warnings) {
        Rule rule = e.rule();
        CalloutPlan plan = rule.recommend();
        DesignCase c = ctx.c;
        if (plan.callout() == CalloutKind.CONTROLLED_RADIUS && c.standard() == DrawingStyle.ISO) {
            warnings.add("Rule '" + rule.id() + "' recommends a controlled radius, an ASME Y14.5 concept with no ISO "
                    + "equivalent; it was skipped for this ISO drawing.");
            return null;
        }
        List<String> datums = plan.datums().pick(c.datums());
        if (plan.datums() != CalloutPlan.DatumChoice.NONE && datums.isEmpty()) {
            warnings.add("Rule '" + rule.id() + "' references datums but the case lists none; it was skipped.");
            return null;
        }
        Draft d = new Draft(plan, c, ctx.places);
        List<String> cautions = new ArrayList<>(rule.cautions());
        List<String> trace = new ArrayList<>();
        trace.add(e.describe());
        List<String> fired = rule.when().firedBy(facts);
        trace.add(fired.isEmpty() ? "fires on every case" : "fired by " + String.join(", ", fired));
        size(d, plan, ctx, cautions);
        trace.add("tolerance from " + d.source);
        if (plan.callout() == CalloutKind.PROFILE || plan.callout() == CalloutKind.COMPOSITE_PROFILE) {
            d.zoneFromBand();
        }
        boolean demoted = false;
        if (d.generalMissing != null) {
            demoted = true;
            cautions.add("Demoted: " + d.generalMissing + "; the title block does not cover this radius, so state its "
                    + "tolerance on the drawing.");
        }
        Map<String, Object> mech = new LinkedHashMap<>();
        boolean stressCase = c.stress() != null && c.kind() == BlendKind.FILLET;
        boolean matingCase = c.mating() != null && c.kind() == BlendKind.FILLET;
        Optional<FilletChecks.MinimumRadiusFigure> minR = stressCase ? ctx.minimumRadius() : Optional.empty();
        if (minR.isPresent()) {
            FilletChecks.MinimumRadiusFigure m = minR.get();
            if (!m.found()) {
                demoted = true;
                cautions.add("Demoted: " + m.message());
            } else if (d.lo() < m.radius() - 1e-9) {
                String why = "the smallest radius the callout allows, " + fmt(d.lo(), d.places) + ", gives "
                        + m.factor() + " over the target " + plain(m.target()) + " (the smallest radius that meets it is "
                        + fmt(m.radius(), d.places + 1) + ")";
                double bandBefore = d.hi() - d.lo();
                if (d.raiseLowerEnd(m.radius(), ctx.stepHeight())) {
                    cautions.add("Limits adjusted: " + why + "; the lower end was raised to " + fmt(d.lo(), d.places) + ".");
                    trace.add("adjusted for the stress target: " + d.describeRange());
                    Optional<String> tooTight = tooTight(d, ctx, bandBefore);
                    if (tooTight.isPresent()) {
                        demoted = true;
                        cautions.add("Demoted: to meet the " + m.factor() + " target " + plain(m.target()) + " the "
                                + d.describeRange() + (d.isProfile() ? " leaves" : " leave") + " a band of " + fmt(d.hi() - d.lo(), d.places)
                                + " under the step height h = " + fmt(ctx.stepHeight(), d.places) + ", " + tooTight.get()
                                + ". What would work: a larger step (a larger D or a smaller d, so a larger radius fits"
                                + " under h), a relief groove or undercut with its own larger radius, relaxing the target"
                                + " where the fatigue analysis allows it (a material or surface treatment with more fatigue"
                                + " strength, e.g. rolled or shot-peened fillets), or a finishing process that holds the band"
                                + " (e.g. form grinding; ask the shop).");
                        trace.add("demoted: the adjusted band is narrower than the process holds");
                    } else if (d.hi() - d.lo() < bandBefore - 1e-9) {
                        cautions.add("The band had to shrink to " + fmt(d.hi() - d.lo(), d.places) + " to stay under the step "
                                + "height h = " + fmt(ctx.stepHeight(), d.places) + ": check the shop can hold it, or "
                                + "consider a relief groove, an undercut or a larger step.");
                    }
                } else {
                    demoted = true;
                    Optional<Double> room = roomUnderStep(m.radius(), ctx);
                    cautions.add("Demoted: " + why + "; this control cannot be tightened to suit. " + (room.isPresent()
                            ? "Own limits would not help either: from " + fmt(m.radius(), d.places) + " up to the step "
                            + "height h = " + fmt(ctx.stepHeight(), d.places) + " leaves a band of "
                            + fmt(ctx.stepHeight() - m.radius(), d.places) + ", less than the " + fmt(room.get(), d.places)
                            + " the process holds there; a larger step, a relief groove or a relaxed target is needed."
                            : "Give the radius its own limits with the minimum at or above " + fmt(m.radius(), d.places) + "."));
                }
            }
        }
        Optional<FilletChecks.SeatingFigure> seat = matingCase ? checks.seating(c, d.hi()) : Optional.empty();
        if (matingCase) {
            if (seat.isPresent() && !seat.get().seats()) {
                FilletChecks.SeatingFigure s = seat.get();
                String why = "the largest radius the callout allows, " + fmt(d.hi(), d.places)
                        + ", fouls the mating corner (" + s.message() + ")";
                double floor = minR.filter(FilletChecks.MinimumRadiusFigure::found)
                        .map(FilletChecks.MinimumRadiusFigure::radius).orElse(0.0);
                double bandBefore = d.hi() - d.lo();
                if (d.lowerUpperEnd(s.largestRadius(), floor)) {
                    cautions.add("Limits adjusted: " + why + "; the upper end was lowered to " + fmt(d.hi(), d.places) + ".");
                    trace.add("adjusted for seating: " + d.describeRange());
                    seat = checks.seating(c, d.hi());
                    Optional<String> tooTight = tooTight(d, ctx, bandBefore);
                    if (tooTight.isPresent()) {
                        demoted = true;
                        cautions.add("Demoted: to seat the mating part" + (floor > 0 ? " and meet the stress target" : "")
                                + " the " + d.describeRange() + (d.isProfile() ? " leaves" : " leave") + " a band of " + fmt(d.hi() - d.lo(), d.places) + ", "
                                + tooTight.get() + ". What would work: a larger chamfer on the mating part, a smaller"
                                + " nominal" + (floor > 0 ? " with a relaxed stress target, a relief groove or undercut" : "")
                                + ", or a finishing process that holds the band (ask the shop).");
                        trace.add("demoted: the adjusted band is narrower than the process holds");
                    }
                } else {
                    demoted = true;
                    cautions.add("Demoted: " + why + "; no limits of this control both seat and meet the other checks. "
                            + "Reduce the nominal below " + fmt(s.largestRadius(), d.places)
                            + " or ask for a larger chamfer on the mating part.");
                }
            }
        }
        if (stressCase) {
            checks.stress(c, d.lo(), d.hi()).ifPresent(sf -> {
                mech.put("ktAtMin", round(sf.ktAtMin()));
                mech.put("ktAtMax", round(sf.ktAtMax()));
                if (sf.kfAtMin() != null) mech.put("kfAtMin", round(sf.kfAtMin()));
                if (sf.kfAtMax() != null) mech.put("kfAtMax", round(sf.kfAtMax()));
                mech.put("stressMethod", sf.method());
                for (String n : sf.notes()) trace.add("stress: " + n);
                if (!sf.withinFit()) cautions.add("A stress figure lies outside its curve fit's range and is extrapolated.");
                if (c.stress().targetKt() == null && c.loading() == Loading.FATIGUE) {
                    cautions.add("No target given: " + (sf.kfAtMin() != null ? "Kf" : "Kt") + " at the smallest radius is "
                            + plain(round2(sf.governingAtMin())) + ". Set stress.targetKt to have the minimum checked.");
                }
            });
            minR.ifPresent(m -> {
                mech.put("target" + m.factor(), m.target());
                if (m.found()) mech.put("minRadiusForTarget", round(m.radius()));
            });
            cautions.addAll(withoutPlainDeference(checks.stressCautions()));
        }
        if (matingCase) {
            seat.ifPresent(s -> {
                mech.put("seats", s.seats());
                mech.put("seatingMargin", round(s.margin()));
                mech.put("largestSeatingRadius", round(s.largestRadius()));
                trace.add("seating: " + s.message());
            });
            cautions.addAll(withoutPlainDeference(checks.seatingCautions()));
        }
        Callout callout = d.callout(datums);
        String text = d.text(callout);
        if (callout instanceof Callout.CompositeProfile && c.standard() == DrawingStyle.ISO) {
            cautions.add("On an ISO drawing write the tiers as two profile frames stacked on one leader (ISO 1101), the "
                    + "upper with the datums, the lower without; the composite frame is ASME's form (common practice).");
        }
        Map<String, Object> numbers = d.numbers();
        numbers.putAll(mech);
        trace.add("numbers: " + summary(numbers));
        if (!(c.function() == BlendFunction.COSMETIC && c.loading() == Loading.NONE)) cautions.add(GUIDANCE_CAUTION);
        List<NoteLink> linked = rule.noteTags().isEmpty() ? List.of()
                : notes.related(rule.noteTags(), rule.summary(), NOTES_PER_RECOMMENDATION);
        double score = demoted ? rule.weight() * DEMOTED_SCORE_FACTOR : rule.weight();
        return new Recommendation(rule.id(), callout, text, score, rule.because(), dedupe(cautions), rule.references(),
                numbers, trace, linked, demoted);
    }

    private void size(Draft d, CalloutPlan plan, Context ctx, List<String> cautions) {
        DesignCase c = ctx.c;
        double mmPer = c.units().millimetres();
        double nomMm = c.nominalRadius() * mmPer;
        CalloutPlan.Sizing s = plan.size();
        if (s.basis() == CalloutPlan.Basis.INTENT && c.tolerance() != null) {
            RadiusCallout rc = CalloutParser.parse(c.tolerance(), c.units(), "tolerance");
            if (rc.isFullyToleranced()) {
                d.fromIntent(rc);
                return;
            }
            cautions.add("The tolerance given (" + c.tolerance() + ") does not bound both ends; the process capability "
                    + "sizes it instead.");
        }
        if (s.basis() == CalloutPlan.Basis.GENERAL || plan.callout() == CalloutKind.GENERAL) {
            String tableId = plan.table() == null ? "iso2768-1-radius-chamfer" : plan.table();
            String cls = plan.toleranceClass() == null ? "m" : plan.toleranceClass();
            Optional<GeneralToleranceTable> table = book.generalTables().byId(tableId);
            if (table.isPresent()) {
                try {
                    GeneralTolerance g = table.get().lookup(cls, nomMm);
                    String label = generalLabel(table.get(), cls);
                    d.fromPlusMinus(g.plusMinus() * s.factor() / mmPer, CalloutPlan.Disposition.EQUAL,
                            label + " ±" + plain(g.plusMinus()) + " mm (" + table.get().source() + ")");
                    d.general(tableId, cls, label);
                    return;
                } catch (InputProblem p) {
                    d.generalMissing = "the general tolerance " + generalLabel(table.get(), cls) + " gives no value at R"
                            + plain(c.nominalRadius()) + " " + c.units().symbol() + " (" + p.problem() + ")";
                }
                d.general(tableId, cls, generalLabel(table.get(), cls));
            } else {
                d.generalMissing = "no general-tolerance table '" + tableId + "' is loaded";
                d.general(tableId, cls, tableId + " class " + cls);
            }
            if (plan.callout() != CalloutKind.GENERAL) {
                cautions.add("Sized from the process capability instead: " + d.generalMissing + ".");
                d.generalMissing = null;
            }
        }
        CapabilityTable cap = book.capability();
        Optional<Double> t = cap == null ? Optional.empty() : cap.plusMinusMm(c.process(), nomMm);
        if (t.isPresent()) {
            d.fromPlusMinus(t.get() * s.factor() / mmPer, s.disposition(), ctx.capabilitySource(t.get(), s.factor(), cap));
        } else {
            d.fromPlusMinus(c.nominalRadius() * 0.1 * s.factor(), s.disposition(),
                    "10% of the nominal: no process capability entry for " + c.process().key());
            cautions.add("No process capability entry for " + c.process().key() + "; the tolerance is 10% of the nominal. "
                    + "Ask the shop what it holds.");
        }
    }

    /**
     * Why the band left by an adjustment cannot be made, if it cannot: it shrank below both what the rule asked
     * ({@code bandBefore}) and the band the process capability table says the process holds at that size. A band
     * the rule itself set tighter than the table (a team's deliberate choice) is not second-guessed.
     */
    private Optional<String> tooTight(Draft d, Context ctx, double bandBefore) {
        double band = d.hi() - d.lo();
        if (!(band < bandBefore - 1e-9)) return Optional.empty();
        CapabilityTable cap = book.capability();
        DesignCase c = ctx.c;
        double mmPer = c.units().millimetres();
        double sizeMm = d.hi() * mmPer;
        Optional<Double> t = cap == null ? Optional.empty() : cap.plusMinusMm(c.process(), sizeMm);
        if (t.isEmpty()) return Optional.empty();
        double holds = 2 * t.get() / mmPer;
        if (!(band < Math.min(holds, bandBefore) - 1e-9)) return Optional.empty();
        return Optional.of("narrower than " + c.process().key() + " radii near R" + fmt(d.hi(), d.places) + " are held (±"
                + plain(t.get()) + " mm, a band of " + fmt(holds, d.places) + "; " + cap.source() + ")");
    }

    /**
     * The band the process holds near the step height, when it is wider than the room between {@code minRadius}
     * and the step height (so no limits fit); empty when limits can fit or nothing says what the process holds.
     */
    private Optional<Double> roomUnderStep(double minRadius, Context ctx) {
        double h = ctx.stepHeight();
        CapabilityTable cap = book.capability();
        if (!Double.isFinite(h) || cap == null) return Optional.empty();
        double mmPer = ctx.c.units().millimetres();
        return cap.plusMinusMm(ctx.c.process(), h * mmPer).map(t -> 2 * t / mmPer).filter(band -> band > h - minRadius + 1e-9);
    }

    private static String generalLabel(GeneralToleranceTable table, String cls) {
        if (table.id().startsWith("iso2768-1")) return "ISO 2768-" + cls;
        return table.title() + ", class " + cls;
    }

    /** The case's facts that many rules share, computed once. */
    private final class Context {
        final DesignCase c;
        final int places;
        private Optional<FilletChecks.MinimumRadiusFigure> minimumRadius;

        Context(DesignCase c) {
            this.c = c;
            int nominalPlaces = Math.max(0, BigDecimal.valueOf(c.nominalRadius()).stripTrailingZeros().scale());
            this.places = Math.max(c.units() == Units.INCH ? 3 : 2, nominalPlaces);
        }

        private final Map<Double, String> capabilitySources = new java.util.HashMap<>(4);

        /** Where a capability-sized tolerance came from, in words; built once per factor. */
        String capabilitySource(double plusMinusMm, double factor, CapabilityTable cap) {
            return capabilitySources.computeIfAbsent(factor, f -> "process capability, " + c.process().key() + " at R"
                    + plain(c.nominalRadius() * c.units().millimetres()) + " mm: ±" + plain(plusMinusMm) + " mm"
                    + (f == 1 ? "" : " × " + plain(f)) + " (" + cap.source() + ")");
        }

        /** The largest fillet tangent to both faces of the shoulder, h = (D - d)/2; infinite without a section. */
        double stepHeight() {
            return c.stress() == null ? Double.POSITIVE_INFINITY : (c.stress().bigD() - c.stress().smallD()) / 2;
        }

        Optional<FilletChecks.MinimumRadiusFigure> minimumRadius() {
            if (minimumRadius == null) {
                minimumRadius = c.stress() != null && c.stress().targetKt() != null ? checks.minimumRadius(c)
                        : Optional.empty();
            }
            return minimumRadius;
        }
    }

    /** A recommendation being worked out: the band, then the control, then its adjustments. */
    private static final class Draft {
        final CalloutPlan plan;
        final DesignCase c;
        final int places;
        final double angle;
        final double k;
        double nominal;
        double min;
        double max;
        String source;
        RadiusCallout intent;
        boolean adjusted;
        double[] zones;
        String generalTable;
        String generalClass;
        String generalLabel;
        /** Why the title-block table gives no value here, or null. */
        String generalMissing;

        Draft(CalloutPlan plan, DesignCase c, int places) {
            this.plan = plan;
            this.c = c;
            this.places = places;
            this.nominal = c.nominalRadius();
            this.angle = c.cornerAngleDegrees();
            this.k = CrescentZone.factor(angle);
        }

        boolean isProfile() { return zones != null; }

        void fromIntent(RadiusCallout rc) {
            intent = rc;
            min = rc.min().getAsDouble();
            max = rc.max().getAsDouble();
            nominal = Math.min(Math.max(rc.nominalOrMean(), min), max);
            source = "the engineer's tolerance " + c.tolerance();
        }

        void fromPlusMinus(double t, CalloutPlan.Disposition disposition, String why) {
            double tol = Math.max(roundTo(t, places, RoundingMode.HALF_UP), unit());
            switch (disposition) {
                case PLUS_ONLY -> { min = nominal; max = nominal + 2 * tol; }
                case MINUS_ONLY -> { min = nominal - 2 * tol; max = nominal; }
                default -> { min = nominal - tol; max = nominal + tol; }
            }
            if (min <= 0) min = roundTo(nominal / 2, places, RoundingMode.HALF_UP);
            min = roundTo(min, places, RoundingMode.HALF_EVEN);
            max = roundTo(max, places, RoundingMode.HALF_EVEN);
            source = why;
        }

        void general(String table, String cls, String label) {
            generalTable = table;
            generalClass = cls;
            generalLabel = label;
        }

        /** Sizes the profile zone(s) to hold the same radius band at the corner: the crescent's equivalent zone. */
        void zoneFromBand() {
            double base = CrescentZone.of(min, nominal, max, angle).equalBilateralProfile();
            List<Double> factors = plan.tiers() == null ? List.of(1.0) : plan.tiers();
            zones = new double[factors.size()];
            for (int i = 0; i < zones.length; i++) {
                zones[i] = Math.max(roundTo(base * factors.get(i), places, RoundingMode.CEILING), unit());
            }
        }

        double unit() { return Math.pow(10, -places); }

        /** Smallest radius the control admits at the corner. */
        double lo() {
            if (!isProfile()) return min;
            return Math.max(nominal - zones[zones.length - 1] / 2 / k, nominal * 0.01);
        }

        /** Largest radius the control admits at the corner. */
        double hi() {
            if (!isProfile()) return max;
            return nominal + zones[zones.length - 1] / 2 / k;
        }

        /**
         * Raises the smallest admitted radius to at least {@code floor}, keeping the largest at most
         * {@code ceiling}; false when this control cannot.
         */
        boolean raiseLowerEnd(double floor, double ceiling) {
            if (plan.callout() == CalloutKind.GENERAL || plan.callout() == CalloutKind.COMPOSITE_PROFILE) return false;
            if (isProfile()) {
                if (!(nominal > floor)) return false;
                double z = roundTo(2 * k * (nominal - floor), places, RoundingMode.FLOOR);
                if (z < unit()) return false;
                zones[0] = z;
            } else {
                double band = max - min;
                double newMin = roundTo(floor, places, RoundingMode.CEILING);
                double newMax = Math.max(max, roundTo(newMin + band, places, RoundingMode.HALF_EVEN));
                if (newMax > ceiling) newMax = roundTo(ceiling, places, RoundingMode.FLOOR);
                if (!(newMax > newMin)) return false;
                min = newMin;
                max = newMax;
                nominal = Math.min(Math.max(nominal, min), max);
            }
            adjusted = true;
            return true;
        }

        /** Lowers the largest admitted radius to at most {@code ceiling}, keeping the lower end above {@code floor}. */
        boolean lowerUpperEnd(double ceiling, double floor) {
            if (plan.callout() == CalloutKind.GENERAL || plan.callout() == CalloutKind.COMPOSITE_PROFILE) return false;
            if (isProfile()) {
                if (!(ceiling > nominal)) return false;
                double z = roundTo(2 * k * (ceiling - nominal), places, RoundingMode.FLOOR);
                if (z < unit() || nominal - z / 2 / k < floor) return false;
                zones[0] = z;
            } else {
                double band = max - min;
                double newMax = roundTo(ceiling, places, RoundingMode.FLOOR);
                double newMin = Math.max(roundTo(newMax - band, places, RoundingMode.HALF_EVEN),
                        roundTo(floor, places, RoundingMode.CEILING));
                if (!(newMin > 0 && newMin < newMax)) return false;
                min = newMin;
                max = newMax;
                nominal = Math.min(Math.max(nominal, min), max);
            }
            adjusted = true;
            return true;
        }

        String describeRange() {
            return isProfile() ? "zone " + fmt(zones[0], places) : "limits " + fmt(min, places) + " to " + fmt(max, places);
        }

        Callout callout(List<String> datumLabels) {
            List<DatumReference> refs = datumLabels.stream().map(l -> new DatumReference(l, null)).toList();
            Extent extent = plan.extent() == Extent.Kind.BETWEEN
                    ? Extent.between(plan.between().get(0), plan.between().get(1)) : new Extent(plan.extent(), null, null);
            return switch (plan.callout()) {
                case GENERAL -> new Callout.General(generalTable, generalClass,
                        plan.edgeNote() && c.kind() == BlendKind.ROUND ? edgeNote() : null);
                case RADIUS -> new Callout.Radius(min, max, nominalInside());
                case CONTROLLED_RADIUS -> new Callout.ControlledRadius(min, max, nominalInside());
                case PROFILE -> new Callout.Profile(zones[0], null, refs, plan.dynamic(), extent);
                case COMPOSITE_PROFILE -> {
                    List<ProfileTier> tiers = new ArrayList<>();
                    List<DatumReference> lower = refs.subList(0, Math.min(refs.size(),
                            plan.lowerTierDatums().pick(datumLabels).size()));
                    for (int i = 0; i < zones.length; i++) tiers.add(new ProfileTier(zones[i], i == 0 ? refs : lower));
                    yield new Callout.CompositeProfile(tiers, extent);
                }
            };
        }

        private Double nominalInside() {
            return nominal > min && nominal < max ? nominal : null;
        }

        private String edgeNote() {
            return "ISO 13715 edge −" + fmt(min, places) + "/−" + fmt(max, places);
        }

        String text(Callout callout) {
            DrawingStyle style = c.standard();
            if (callout instanceof Callout.Radius || callout instanceof Callout.ControlledRadius) {
                RadiusKind kind = callout instanceof Callout.ControlledRadius ? RadiusKind.CR : RadiusKind.R;
                return style.format(radiusCallout(kind));
            }
            if (callout instanceof Callout.General g) {
                String s = style.format(new RadiusCallout(RadiusKind.R, c.units(),
                        new ToleranceForm.Untoleranced(BigDecimal.valueOf(nominal).stripTrailingZeros())))
                        + (generalMissing != null ? " (" + generalLabel + " gives no value at this size)"
                        : " (general tolerance " + generalLabel + ": " + fmt(min, places) + " to " + fmt(max, places) + ")");
                return g.edgeNote() == null ? s : s + "; " + g.edgeNote();
            }
            StringBuilder sb = new StringBuilder();
            if (callout instanceof Callout.Profile p) {
                sb.append(frame(p.zone(), p.datums()));
                if (p.dynamic()) sb.append(" dynamic");
                sb.append(extentText(p.extent()));
            } else if (callout instanceof Callout.CompositeProfile cp) {
                for (int i = 0; i < cp.tiers().size(); i++) {
                    if (i > 0) sb.append(" over ");
                    sb.append(frame(cp.tiers().get(i).zone(), cp.tiers().get(i).datums()));
                }
                sb.append(" composite").append(extentText(cp.extent()));
            }
            return sb.toString();
        }

        private RadiusCallout radiusCallout(RadiusKind kind) {
            if (intent != null && !adjusted) return intent.withKind(kind);
            BigDecimal nom = BigDecimal.valueOf(nominal).stripTrailingZeros();
            if (nom.scale() < 0) nom = nom.setScale(0);
            BigDecimal lo = BigDecimal.valueOf(min).setScale(places, RoundingMode.HALF_EVEN);
            BigDecimal hi = BigDecimal.valueOf(max).setScale(places, RoundingMode.HALF_EVEN);
            if (adjusted || nominal < min || nominal > max) {
                return new RadiusCallout(kind, c.units(), new ToleranceForm.Limits(lo, hi));
            }
            BigDecimal plus = hi.subtract(nom).stripTrailingZeros();
            BigDecimal minus = lo.subtract(nom).stripTrailingZeros();
            if (plus.compareTo(minus.negate()) == 0) {
                return new RadiusCallout(kind, c.units(), new ToleranceForm.EqualBilateral(nom, plus));
            }
            return new RadiusCallout(kind, c.units(), new ToleranceForm.Deviations(nom, plus, minus));
        }

        private String frame(double zone, List<DatumReference> datums) {
            StringBuilder sb = new StringBuilder("|⌓|").append(plain(zone)).append('|');
            for (DatumReference r : datums) sb.append(r.text()).append('|');
            return sb.toString();
        }

        private static String extentText(Extent e) {
            return switch (e.kind()) {
                case THIS_RADIUS -> " on the radius, tangent to tangent";
                case WITH_ADJACENT -> " on the radius and its adjacent surfaces";
                case BETWEEN -> " between " + e.from() + " and " + e.to();
                case ALL_AROUND -> " all around";
                case ALL_OVER -> " all over";
            };
        }

        Map<String, Object> numbers() {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("units", c.units().symbol());
            m.put("nominal", round(nominal));
            double lo = lo();
            double hi = hi();
            m.put("min", round(lo));
            m.put("max", round(hi));
            m.put("band", round(hi - lo));
            m.put("angle", angle);
            CrescentZone z = CrescentZone.of(lo, Math.min(Math.max(nominal, lo), hi), hi, angle);
            m.put("crescentWidth", round(z.width()));
            m.put("equivalentProfileZone", round(z.equalBilateralProfile()));
            if (isProfile()) {
                m.put("zone", zones[0]);
                if (zones.length > 1) {
                    List<Double> list = new ArrayList<>();
                    for (double v : zones) list.add(v);
                    m.put("tierZones", list);
                }
            }
            m.put("toleranceSource", source);
            m.put("adjusted", adjusted);
            return m;
        }
    }

    private static final double[] POW10 = {1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9};
    /** Slack for binary fractions such as 2.2 - 0.1 when rounding toward a decimal grid. */
    private static final double GRID_SLACK = 1e-9;

    /** {@code v} on the decimal grid of {@code places}; plain arithmetic, as BigDecimal costs too much per case. */
    static double roundTo(double v, int places, RoundingMode mode) {
        if (!Double.isFinite(v) || places < 0 || places >= POW10.length || Math.abs(v) > 1e9) {
            return BigDecimal.valueOf(v).setScale(places, mode).doubleValue();
        }
        double scale = POW10[places];
        double x = v * scale;
        double n = switch (mode) {
            case CEILING -> Math.ceil(x - GRID_SLACK);
            case FLOOR -> Math.floor(x + GRID_SLACK);
            case HALF_UP -> Math.floor(Math.abs(x) + 0.5 + GRID_SLACK) * Math.signum(x);
            default -> Math.rint(x);
        };
        return n / scale;
    }

    private static double round(double v) {
        return roundTo(v, 6, RoundingMode.HALF_EVEN);
    }

    private static double round2(double v) {
        return roundTo(v, 2, RoundingMode.HALF_EVEN);
    }

    /** {@code v} with exactly {@code places} decimals. */
    static String fmt(double v, int places) {
        if (!Double.isFinite(v) || places >= POW10.length || Math.abs(v) > 1e9) {
            return BigDecimal.valueOf(v).setScale(places, RoundingMode.HALF_EVEN).toPlainString();
        }
        long n = Math.round(Math.rint(v * POW10[places]));
        boolean negative = n < 0;
        String digits = Long.toString(Math.abs(n));
        if (places == 0) return (negative ? "-" : "") + digits;
        StringBuilder sb = new StringBuilder(digits.length() + 3);
        if (negative) sb.append('-');
        if (digits.length() <= places) {
            sb.append("0.");
            for (int i = digits.length(); i < places; i++) sb.append('0');
            sb.append(digits);
        } else {
            sb.append(digits, 0, digits.length() - places).append('.').append(digits, digits.length() - places, digits.length());
        }
        return sb.toString();
    }

    /** {@code v} to at most six decimals, trailing zeros dropped. */
    static String plain(double v) {
        String s = fmt(v, 6);
        if (s.indexOf('.') < 0) return s;
        int end = s.length();
        while (s.charAt(end - 1) == '0') end--;
        if (s.charAt(end - 1) == '.') end--;
        return s.substring(0, end);
    }

    /** The figures that decide a recommendation, for the trace; the full set is in its numbers. */
    private static final List<String> DECIDING = List.of("min", "max", "zone", "ktAtMin", "kfAtMin",
            "minRadiusForTarget", "seats", "seatingMargin");

    private static String summary(Map<String, Object> numbers) {
        StringBuilder sb = new StringBuilder(80);
        for (String k : DECIDING) {
            Object v = numbers.get(k);
            if (v == null) continue;
            if (sb.length() > 0) sb.append(", ");
            sb.append(k).append('=').append(v instanceof Double dv ? plain(dv) : v.toString());
        }
        return sb.toString();
    }

    /** The mechanics' cautions less a bare deference line, which {@link #GUIDANCE_CAUTION} already gives. */
    private static List<String> withoutPlainDeference(List<String> cautions) {
        List<String> out = new ArrayList<>(cautions.size());
        for (String c : cautions) {
            if (!c.startsWith("Defer to the governing standard")) out.add(c);
        }
        return out;
    }

    private static List<String> dedupe(List<String> list) {
        return List.copyOf(new java.util.LinkedHashSet<>(list));
    }
}
