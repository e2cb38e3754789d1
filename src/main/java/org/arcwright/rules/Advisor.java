package org.arcwright.rules;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.arcwright.callout.Callout;
import org.arcwright.callout.CalloutFormatter;
import org.arcwright.io.InputProblem;
import org.arcwright.model.BlendFunction;
import org.arcwright.model.BlendKind;
import org.arcwright.model.DesignCase;
import org.arcwright.model.Loading;
import org.arcwright.pack.PackStack;
import org.arcwright.rules.CalloutPlan.CalloutKind;
import org.arcwright.tolerance.DrawingStyle;

/**
 * The advisor, needs first. For one case it
 * <ol>
 *   <li>derives the feature's needs ({@link Needs}: radius floor and ceiling with their numbers, form, location);</li>
 *   <li>turns every rule that fires into a candidate sized by the {@link Sizer}, moving its limits to meet the
 *       floor and ceiling where the control can and demoting it where it cannot;</li>
 *   <li>when no rule's card meets every need, adds a candidate from every control the standard allows
 *       ({@link Candidates});</li>
 *   <li>proves each candidate against each need ({@link Proof}), ranks them ({@link Ranking}) and, when nothing
 *       meets every need, says so first and proposes design changes with numbers ({@link DesignChanges}).</li>
 * </ol>
 * Stateless and deterministic: the same case and rule book give the same advice, so one instance may serve many
 * threads.
 */
public final class Advisor {
    /** Carried by every recommendation about stress, sealing or seating. */
    public static final String GUIDANCE_CAUTION = "Guidance only: defer to the governing standard, your company's "
            + "practice and licensed engineering judgement.";
    /** The corner angle assumed when the case does not give one ({@link DesignCase#SQUARE_CORNER}). */
    public static final double DEFAULT_ANGLE = DesignCase.SQUARE_CORNER;

    private static final double DEMOTED_SCORE_FACTOR = 0.25;
    private static final int NOTES_PER_RECOMMENDATION = 3;
    private static final double SLACK = 1e-9;

    private final RuleBook book;
    private final FilletChecks checks;
    private final NoteLinker notes;
    private final Sizer sizer;
    private final Candidates candidates;
    private final DesignChanges designChanges;
    /** The rules in force and their conditions, as arrays: the loop every case runs. */
    private final RuleBook.Entry[] entries;
    private final When[] whens;
    /** The facts some rule tests; only these are read from each case. */
    private final Fact[] usedFacts;
    private static final int FACT_COUNT = Fact.values().length;

    public Advisor(RuleBook book, FilletChecks checks, NoteLinker notes) {
        this.book = Objects.requireNonNull(book, "book");
        this.checks = Objects.requireNonNull(checks, "checks");
        this.notes = Objects.requireNonNull(notes, "notes");
        this.sizer = new Sizer(book);
        this.candidates = new Candidates(sizer);
        this.designChanges = new DesignChanges(checks);
        this.entries = book.entries().toArray(new RuleBook.Entry[0]);
        this.whens = new When[entries.length];
        EnumSet<Fact> used = EnumSet.noneOf(Fact.class);
        for (int i = 0; i < entries.length; i++) {
            whens[i] = entries[i].rule().when();
            used.addAll(whens[i].conditions().keySet());
        }
        this.usedFacts = used.toArray(new Fact[0]);
    }

    /**
     * The usual advisor for a pack stack: its rules and tables, the mechanics checks over the
     * published fits and the stack's bearing-seat table, and the given notes. What failed to load
     * is in {@code book().problems()}; the advisor works on the rest.
     */
    public static Advisor forStack(PackStack stack, NoteLinker notes) {
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
        List<String> warnings = new ArrayList<>();
        Object[] facts = new Object[FACT_COUNT];
        for (Fact f : usedFacts) facts[f.ordinal()] = f.valueOf(c);
        List<RuleBook.Entry> firing = new ArrayList<>();
        List<Needs.Added> added = List.of();
        Preference preference = Preference.NONE;
        for (int i = 0; i < entries.length; i++) {
            if (!whens[i].holds(facts)) continue;
            RuleBook.Entry e = entries[i];
            firing.add(e);
            Rule rule = e.rule();
            if (!rule.needs().isEmpty()) {
                if (added.isEmpty()) added = new ArrayList<>(2);
                for (RuleNeed n : rule.needs()) added.add(new Needs.Added(n, rule.id(), e.pack()));
            }
            if (!rule.prefer().isEmpty()) preference = preference.with(rule);
        }
        Needs needs = Needs.derive(c, checks, warnings, added);
        int places = Sizer.places(c);
        List<Recommendation> recs = new ArrayList<>();
        Map<Double, String> capabilitySources = new HashMap<>(4);
        for (RuleBook.Entry e : firing) {
            if (e.rule().recommend() == null) continue;
            Recommendation r = fromRule(e, needs, facts, places, warnings, capabilitySources, preference);
            if (r != null) recs.add(r);
        }
        boolean ruleUsable = anyUsable(recs);
        if (!ruleUsable || !preference.isEmpty()) {
            for (Candidates.Built b : candidates.build(needs, places)) {
                CalloutKind kind = b.draft().plan.callout();
                // with a usable rule card, only the preferred controls no rule card offers are worth building
                if (ruleUsable && (preference.rank(kind) == Preference.UNLISTED || offers(recs, kind))) continue;
                List<String> trace = new ArrayList<>(List.of("built from the needs: " + b.id()));
                preference.explain(kind).ifPresent(trace::add);
                recs.add(finish(b.id(), b.draft(), b.datums(), needs, Candidates.SCORE, b.because(),
                        new ArrayList<>(b.cautions()), b.references(), trace, List.of(), b.demoted()));
            }
        }
        double processBand = sizer.plusMinus(c, c.nominalRadius()).map(t -> 2 * t).orElse(Double.NaN);
        List<Ranking> ranked = new ArrayList<>(recs.size());
        for (Recommendation r : recs) ranked.add(Ranking.of(r, processBand, preference));
        ranked.sort(Ranking.ORDER);
        List<Recommendation> distinct = new ArrayList<>(ranked.size());
        List<Ranking> distinctRanks = new ArrayList<>(ranked.size());
        Set<String> texts = new HashSet<>();
        for (Ranking r : ranked) {
            if (texts.add(r.recommendation().text())) {
                distinct.add(r.recommendation());
                distinctRanks.add(r);
            }
        }
        List<String> conflicts = conflicts(distinctRanks, c.standard());
        boolean usable = anyUsable(distinct);
        double band = Double.isNaN(processBand) ? c.nominalRadius() * 0.2 : processBand;
        // only shown when nothing is usable or the nominal lies outside the needs' room: not worked out otherwise
        List<DesignChange> changes = usable && !changesNeeded(needs, c) ? List.of()
                : designChanges.propose(needs, band, places);
        if (!usable) {
            warnings.add(0, nothingMeets(needs, distinct, places));
        }
        if (Double.isFinite(needs.stepHeight()) && c.nominalRadius() > needs.stepHeight() + SLACK) {
            warnings.add(0, "R" + plain(c.nominalRadius()) + " cannot be built as drawn: it is larger than the step h = (D − d)/2 = "
                    + fmt(needs.stepHeight(), places) + " " + c.units().symbol() + ", so the fillet cannot meet the shoulder "
                    + "face tangentially. Every card below moves the radius under the step (a change of nominal); see the "
                    + "design changes.");
        }
        if (distinct.isEmpty()) {
            warnings.add("No rule fired for this case; the title block's general tolerance applies unless you state one.");
        }
        return new Advice(c, needs.list(), distinct, changes, conflicts, warnings);
    }

    private static boolean anyUsable(List<Recommendation> recs) {
        for (int i = 0; i < recs.size(); i++) if (recs.get(i).usable()) return true;
        return false;
    }

    /** True when the nominal itself lies outside the room the needs leave, so a change is worth stating. */
    private static boolean changesNeeded(Needs needs, DesignCase c) {
        return c.nominalRadius() < needs.floor() - SLACK || c.nominalRadius() > needs.ceiling() + SLACK;
    }

    private static String nothingMeets(Needs needs, List<Recommendation> recs, int places) {
        StringBuilder sb = new StringBuilder("Nothing meets every need of this feature as it stands");
        String u = " " + needs.designCase().units().symbol();
        Optional<Need> fl = needs.governingFloor();
        Optional<Need> ce = needs.governingCeiling();
        if (needs.floorUnreachable() && fl.isPresent()) {
            sb.append(": ").append(fl.get().why());
        } else if (fl.isPresent() && ce.isPresent()) {
            sb.append(fl.get().min() <= ce.get().max() ? ": too little room for the band the process holds between" : ":")
                    .append(" the floor ").append(fmt(fl.get().min(), places + 1)).append(u).append(" (")
                    .append(fl.get().why()).append(fl.get().min() <= ce.get().max() ? ") and" : ") lies above")
                    .append(" the ceiling ").append(fmt(ce.get().max(), places + 1)).append(u).append(" (")
                    .append(ce.get().why()).append(")");
        } else if (!recs.isEmpty()) {
            sb.append(": every card below misses a need or fails its checks");
        }
        sb.append(". Do not put the first card on the drawing as it stands; the design changes say what would work.");
        return sb.toString();
    }

    private List<String> conflicts(List<Ranking> ranked, DrawingStyle style) {
        List<String> conflicts = new ArrayList<>();
        for (int i = 0; i < ranked.size(); i++) {
            Ranking a = ranked.get(i);
            if (a.needsClass() != 0) break;
            for (int j = i + 1; j < ranked.size(); j++) {
                Ranking b = ranked.get(j);
                if (b.needsClass() != 0 || b.preferred() != a.preferred() || b.elements() != a.elements()
                        || b.recommendation().score() != a.recommendation().score()) break;
                if (!a.recommendation().callout().typeName().equals(b.recommendation().callout().typeName())) {
                    conflicts.add("'" + a.recommendation().ruleId() + "' ("
                            + CalloutFormatter.controlName(a.recommendation().callout(), style) + ") and '"
                            + b.recommendation().ruleId() + "' (" + CalloutFormatter.controlName(b.recommendation().callout(), style)
                            + ") rank equal at " + plain(a.recommendation().score()) + "; they are listed by rule id, which "
                            + "is not a decision: choose, or ask the pack's author to weigh them");
                }
            }
        }
        return conflicts;
    }

    /** True when a usable card of {@code kind} is already among {@code recs}. */
    private static boolean offers(List<Recommendation> recs, CalloutKind kind) {
        for (Recommendation r : recs) {
            if (r.usable() && r.callout().typeName().equals(kind.key())) return true;
        }
        return false;
    }

    private Recommendation fromRule(RuleBook.Entry e, Needs needs, Object[] facts, int places, List<String> warnings,
                                    Map<Double, String> capabilitySources, Preference preference) {
        Rule rule = e.rule();
        CalloutPlan plan = rule.recommend();
        DesignCase c = needs.designCase();
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
        Draft d = new Draft(plan, c, places);
        List<String> cautions = new ArrayList<>(rule.cautions());
        List<String> trace = new ArrayList<>();
        trace.add(e.describe());
        List<String> fired = rule.when().firedBy(facts);
        trace.add(fired.isEmpty() ? "fires on every case" : "fired by " + String.join(", ", fired));
        preference.explain(plan.callout()).ifPresent(trace::add);
        sizer.size(d, cautions, capabilitySources);
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
        if (plan.callout() == CalloutKind.GENERAL && !Sizer.iso2768Covers(c.process())
                && d.generalTable != null && d.generalTable.startsWith("iso2768-1")) {
            demoted = true;
            cautions.add("Demoted: ISO 2768-1 covers machined and sheet-metal parts, not " + c.process().key() + " ones.");
        }
        demoted |= adjustToNeeds(d, needs, cautions, trace);
        double score = demoted ? rule.weight() * DEMOTED_SCORE_FACTOR : rule.weight();
        List<NoteLink> linked = rule.noteTags().isEmpty() ? List.of()
                : notes.related(rule.noteTags(), rule.summary(), NOTES_PER_RECOMMENDATION);
        Sizer.Citations cited = sizer.citations(d, rule.because(), rule.references());
        return finish(rule.id(), d, datums, needs, score, cited.because(), cautions, cited.references(), trace, linked,
                demoted);
    }

    /**
     * Moves the candidate's limits to meet the floor and ceiling where its control can; true when it had to be
     * demoted (it cannot, or the band left is narrower than the process holds).
     */
    private boolean adjustToNeeds(Draft d, Needs needs, List<String> cautions, List<String> trace) {
        boolean demoted = false;
        double floor = needs.floor();
        double ceiling = needs.ceiling();
        double h = needs.stepHeight();
        Optional<Need> fl = needs.governingFloor();
        if (needs.floorUnreachable() && fl.isPresent()) {
            cautions.add("Demoted: " + fl.get().why() + ".");
            return true;
        }
        if (fl.isPresent() && d.lo() < floor - SLACK) {
            String why = "the smallest radius the callout allows, " + fmt(d.lo(), d.places) + ", is under the floor "
                    + fmt(floor, d.places + 1) + " (" + fl.get().why() + ")";
            double bandBefore = d.hi() - d.lo();
            if (d.raiseLowerEnd(floor, ceiling)) {
                cautions.add("Limits adjusted: " + why + "; the lower end was raised to " + fmt(d.lo(), d.places) + ".");
                trace.add("adjusted for the floor: " + d.describeRange());
                Optional<String> tooTight = sizer.tooTight(d, bandBefore);
                if (tooTight.isPresent()) {
                    demoted = true;
                    cautions.add("Demoted: to meet the floor " + fmt(floor, d.places + 1) + " the " + d.describeRange()
                            + (d.isProfile() ? " leaves" : " leave") + " a band of " + fmt(d.hi() - d.lo(), d.places)
                            + (Double.isFinite(h) ? " under the step height h = " + fmt(h, d.places) : "") + ", "
                            + tooTight.get() + ". What would work: a larger step (a larger D or a smaller d, so a larger "
                            + "radius fits under h), a relief groove or undercut with its own larger radius, relaxing the "
                            + "target where the fatigue analysis allows it (a material or surface treatment with more fatigue "
                            + "strength, e.g. rolled or shot-peened fillets), or a finishing process that holds the band "
                            + "(e.g. form grinding; ask the shop).");
                    trace.add("demoted: the adjusted band is narrower than the process holds");
                } else if (d.hi() - d.lo() < bandBefore - SLACK && Double.isFinite(h)) {
                    cautions.add("The band had to shrink to " + fmt(d.hi() - d.lo(), d.places) + " to stay under the "
                            + "ceiling " + fmt(ceiling, d.places) + ": check the shop can hold it, or consider a relief "
                            + "groove, an undercut or a larger step.");
                }
            } else {
                demoted = true;
                Optional<Double> room = sizer.roomUnderStep(d.c, floor, h);
                cautions.add("Demoted: " + why + "; this control cannot be tightened to suit. " + (floor > ceiling + SLACK
                        ? "No radius is both at least " + fmt(floor, d.places) + " and at most " + fmt(ceiling, d.places)
                        + ": see the design changes."
                        : room.isPresent() ? "Own limits would not help either: from " + fmt(floor, d.places) + " up to the step "
                        + "height h = " + fmt(h, d.places) + " leaves a band of " + fmt(h - floor, d.places) + ", less than the "
                        + fmt(room.get(), d.places) + " the process holds there; a larger step, a relief groove or a relaxed "
                        + "target is needed."
                        : "Give the radius its own limits with the minimum at or above " + fmt(floor, d.places) + "."));
            }
        }
        Optional<Needs.Bound> ce = needs.governing(Need.Kind.RADIUS_CEILING);
        if (ce.isPresent() && d.hi() > ceiling + SLACK) {
            boolean seating = ce.get().origin() == Needs.Origin.MATING;
            String why = "the largest radius the callout allows, " + fmt(d.hi(), d.places) + ", "
                    + (seating ? "fouls the mating corner" : ce.get().origin() == Needs.Origin.STEP
                    ? "exceeds the step height" : "exceeds the ceiling of " + ce.get().label()) + " ("
                    + ce.get().need().why() + ")";
            double bandBefore = d.hi() - d.lo();
            if (d.lowerUpperEnd(ceiling, floor)) {
                cautions.add("Limits adjusted: " + why + "; the upper end was lowered to " + fmt(d.hi(), d.places) + ".");
                trace.add("adjusted for the ceiling: " + d.describeRange());
                Optional<String> tooTight = sizer.tooTight(d, bandBefore);
                if (tooTight.isPresent()) {
                    demoted = true;
                    cautions.add("Demoted: to stay under the ceiling" + (floor > 0 ? " and above the floor" : "") + " the "
                            + d.describeRange() + (d.isProfile() ? " leaves" : " leave") + " a band of "
                            + fmt(d.hi() - d.lo(), d.places) + ", " + tooTight.get() + ". What would work: "
                            + (seating ? "a larger chamfer on the mating part or a spacer"
                            : ce.get().origin() == Needs.Origin.STEP ? "a larger step"
                            : "a review of " + ce.get().label() + " with its owner")
                            + (floor > 0 ? ", a relief groove or undercut" : ", a smaller nominal")
                            + ", or a finishing process that holds the band (ask the shop).");
                    trace.add("demoted: the adjusted band is narrower than the process holds");
                }
            } else {
                demoted = true;
                cautions.add("Demoted: " + why + "; no limits of this control both stay under it and meet the other needs"
                        + (floor > ceiling + SLACK ? ": the floor " + fmt(floor, d.places) + " is above the ceiling; see the "
                        + "design changes." : ". Give the radius its own limits at or under " + fmt(ceiling, d.places) + "."));
            }
        }
        return demoted;
    }

    /** The mechanics figures, the callout and its text, the proof, the cautions: one card. */
    private Recommendation finish(String id, Draft d, List<String> datums, Needs needs, double score,
                                  List<String> because, List<String> cautions, List<String> references,
                                  List<String> trace, List<NoteLink> linked, boolean demoted) {
        DesignCase c = d.c;
        boolean fillet = c.kind() == BlendKind.FILLET;
        AdviceFigures figures = d.figures();
        Double ktMin = null, ktMax = null, kfMin = null, kfMax = null, minR = null, margin = null, largest = null;
        String method = null;
        Boolean seats = null;
        if (c.stress() != null && fillet) {
            if (d.lo() > needs.stepHeight() + SLACK) {
                cautions.add("No stress figures: the smallest radius " + fmt(d.lo(), d.places) + " is larger than the step "
                        + "h = " + fmt(needs.stepHeight(), d.places) + ", so the fillet cannot be built as drawn.");
            } else {
                Optional<FilletChecks.StressFigures> sf = checks.stress(c, d.lo(), d.hi());
                if (sf.isPresent() && !Double.isNaN(sf.get().ktAtMin())) {
                    FilletChecks.StressFigures f = sf.get();
                    ktMin = round(f.ktAtMin());
                    ktMax = round(f.ktAtMax());
                    kfMin = f.kfAtMin() == null ? null : round(f.kfAtMin());
                    kfMax = f.kfAtMax() == null ? null : round(f.kfAtMax());
                    method = f.method();
                    for (String n : f.notes()) trace.add("stress: " + n);
                    if (!f.withinFit()) cautions.add("A stress figure lies outside its curve fit's range and is extrapolated.");
                    if (c.stress().targetKt() == null && c.stress().targetKf() == null && c.loading() == Loading.FATIGUE) {
                        cautions.add("No target given: " + (f.kfAtMin() != null ? "Kf" : "Kt") + " at the smallest radius is "
                                + plain(roundTo(f.governingAtMin(), 2, RoundingMode.HALF_EVEN)) + ". Set stress.targetKt (or "
                                + "stress.targetKf with a strength) to have the minimum checked.");
                    }
                }
            }
            double floor = needs.floor();
            if (!needs.stressFloors().isEmpty() && !needs.floorUnreachable()) minR = round(floor);
            cautions.addAll(withoutPlainDeference(checks.stressCautions()));
        }
        if (c.mating() != null && fillet) {
            Optional<FilletChecks.SeatingFigure> seat = checks.seating(c, d.hi());
            if (seat.isPresent()) {
                seats = seat.get().seats();
                margin = round(seat.get().margin());
                largest = round(seat.get().largestRadius());
                trace.add("seating: " + seat.get().message());
            }
            cautions.addAll(withoutPlainDeference(checks.seatingCautions()));
        }
        Double targetKt = c.stress() == null ? null : c.stress().targetKt();
        Double targetKf = c.stress() == null ? null : c.stress().targetKf();
        figures = figures.withMechanics(new AdviceFigures(null, null, null, null, null, null, null, null, null, null, null,
                null, null, null, ktMin, ktMax, kfMin, kfMax, method, targetKt, targetKf, minR, seats, margin, largest));
        Callout callout = d.callout(datums);
        String text = d.text(callout);
        if (callout instanceof Callout.CompositeProfile && c.standard() == DrawingStyle.ISO) {
            cautions.add("On an ISO drawing write the tiers as two profile frames stacked on one leader (ISO 1101), the "
                    + "upper with the datums, the lower without; ISO has no single frame of two tiers (common practice).");
        }
        Proof proof = Proof.of(needs, callout, d.refinement, d.lo(), d.hi(), d.places);
        List<String> allCautions = new ArrayList<>(proof.unmet().size() + cautions.size() + 1);
        allCautions.addAll(proof.unmet());
        allCautions.addAll(cautions);
        if (!(c.function() == BlendFunction.COSMETIC && c.loading() == Loading.NONE) || !proof.meetsAll()) {
            allCautions.add(GUIDANCE_CAUTION);
        }
        return new Recommendation(id, callout, d.refinement, text, score, because, dedupe(allCautions), references,
                figures, trace, linked, demoted, proof.meets(), proof.meetsAll());
    }

    private static final double[] POW10 = {1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9};
    /** Slack for binary fractions such as 2.2 - 0.1 when rounding toward a decimal grid. */
    private static final double GRID_SLACK = 1e-9;

    /** {@code v} on the decimal grid of {@code places}; plain arithmetic, as BigDecimal costs too much per case. */
    static double roundTo(double v, int places, RoundingMode mode) {
        if (!Double.isFinite(v)) return v;
        if (places < 0 || places >= POW10.length || Math.abs(v) > 1e9) {
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

    static double round(double v) {
        return roundTo(v, 6, RoundingMode.HALF_EVEN);
    }

    /** {@code v} with exactly {@code places} decimals. */
    static String fmt(double v, int places) {
        if (!Double.isFinite(v)) return Double.isNaN(v) ? "n/a" : v > 0 ? "∞" : "-∞";
        if (places >= POW10.length || Math.abs(v) > 1e9) {
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

    /** The mechanics' cautions less a bare deference line, which {@link #GUIDANCE_CAUTION} already gives. */
    private static List<String> withoutPlainDeference(List<String> cautions) {
        List<String> out = new ArrayList<>(cautions.size());
        for (String c : cautions) {
            if (!c.startsWith("Defer to the governing standard")) out.add(c);
        }
        return out;
    }

    private static List<String> dedupe(List<String> list) {
        return List.copyOf(new LinkedHashSet<>(list));
    }
}
