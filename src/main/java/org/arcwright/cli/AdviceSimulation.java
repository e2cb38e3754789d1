package org.arcwright.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.arcwright.callout.Callout;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.Advice;
import org.arcwright.rules.CapabilityTable;
import org.arcwright.services.CaseSimulations;
import org.arcwright.simulate.CalloutResult;
import org.arcwright.simulate.ProcessDefaults;
import org.arcwright.simulate.ProcessModel;
import org.arcwright.simulate.Share;
import org.arcwright.simulate.SimulationResult;

/**
 * {@code advise --simulate}: judges each card's callout over one simulated population from the
 * pack's default process model for the case's process, against the advice's radius needs. Evidence
 * on the cards only; the ranking is the advisor's and is not touched. The simulations are built and
 * run by {@link CaseSimulations} (shared with the desktop's Simulation view, so both give the same
 * figures for the same case and seed); this class only words and prints them.
 */
final class AdviceSimulation {
    /** Parts when {@code --simulate-parts} is not given: small enough for an interactive answer. */
    static final int DEFAULT_PARTS = CaseSimulations.DEFAULT_PARTS;
    /** The fixed seed: the same case gives the same figures on every run and machine. */
    static final long DEFAULT_SEED = CaseSimulations.DEFAULT_SEED;

    /**
     * One card's evidence: a result, or why there is none.
     *
     * @param result the callout's record over the population, if simulated
     * @param good parts of that population meeting the needs, if simulated
     * @param notSimulated why the callout was not simulated; null when it was
     */
    record Card(CalloutResult result, Share good, String notSimulated) {}

    /**
     * The simulation behind one advice.
     *
     * @param ran whether a population was simulated at all
     * @param process the process key whose default model was used
     * @param modelSource the table id and its source
     * @param radiusSd the radius standard deviation used, case units
     * @param radiusSdFrom where the radius scatter comes from
     * @param seed the seed
     * @param parts parts simulated
     * @param points points per measured section
     * @param noise measuring noise (1 sd), case units
     * @param units unit symbol
     * @param needs the needs judged, in words
     * @param notJudged needs not mapped, each with why
     * @param cards per recommendation, in the advice's order
     * @param notes anything else the reader must know (why nothing ran)
     */
    record Report(boolean ran, String process, String modelSource, double radiusSd, String radiusSdFrom, long seed, int parts,
                  int points, double noise, String units, String needs, List<String> notJudged, List<Card> cards,
                  List<String> notes) {
        Report {
            notJudged = List.copyOf(notJudged);
            cards = List.copyOf(cards);
            notes = List.copyOf(notes);
        }
    }

    private AdviceSimulation() {}

    /** Runs the simulation for one advice; never changes it. */
    static Report run(Advice advice, Optional<ProcessDefaults> defaults, CapabilityTable capability, int parts, long seed) {
        DesignCase c = advice.designCase();
        String u = c.units().symbol();
        List<String> notes = new ArrayList<>();
        CaseSimulations.JudgedNeeds judged = CaseSimulations.needs(advice.needs());
        List<String> notJudged = judged.notJudged();
        if (defaults.isEmpty()) {
            notes.add("not simulated: no pack provides a " + ProcessDefaults.KIND + " table");
            return empty(advice, c, u, seed, parts, notJudged, notes, "no table");
        }
        if (judged.contradictory()) {
            notes.add("not simulated: the radius floor " + DecimalText.significant(judged.floor(), 4) + " " + u + " lies above the ceiling "
                    + DecimalText.significant(judged.ceiling(), 4) + " " + u + "; no part can be functionally good");
            return empty(advice, c, u, seed, parts, notJudged, notes, defaults.get().id());
        }
        if (judged.none()) {
            notes.add("no radius floor or ceiling among the needs: every part counts as functionally good, so escapes are 0 by construction");
        }
        ProcessDefaults d = defaults.get();
        CaseSimulations.CaseProcess process;
        try {
            process = CaseSimulations.process(c, d, capability);
        } catch (InputProblem p) {
            notes.add("not simulated: " + p.getMessage());
            return empty(advice, c, u, seed, parts, notJudged, notes, d.id());
        }
        double pm = process.plusMinus();
        String sdFrom = "process capability ±" + DecimalText.significant(pm, 4) + " " + u + " / " + DecimalText.significant(d.radiusSdDivisor(), 4)
                + (process.fromCapability() ? " (capability table, " + c.process().key() + ")" : " (no capability entry: ±10 % of the nominal assumed)");
        ProcessModel caseModel = process.model();
        List<CaseSimulations.Candidate> candidates = CaseSimulations.candidates(advice.recommendations(), null, caseModel, true);
        List<CaseSimulations.Judged> judgedCards = CaseSimulations.run(candidates, judged.needs(), parts, seed);
        List<Card> cards = new ArrayList<>();
        boolean ran = false;
        boolean centred = false;
        for (CaseSimulations.Judged j : judgedCards) {
            centred |= j.candidate().aimedOff(caseModel);
            if (j.result() == null) {
                cards.add(new Card(null, null, j.notSimulated()));
                continue;
            }
            ran = true;
            cards.add(new Card(j.callout(), j.good(), null));
        }
        if (centred) {
            notes.add("radius limits off the nominal: the process aims at the middle of each card's limits (a shop centres on the "
                    + "drawn band, common practice); other cards at the nominal R" + DecimalText.significant(c.nominalRadius(), 4) + " " + u);
        }
        if (!ran) notes.add("no card's callout could be simulated");
        return new Report(ran, c.process().key(), process.source(), process.radiusSd(), sdFrom,
                seed, parts, caseModel.points(), caseModel.noise(), u, judged.needs().describe(u), notJudged, cards, notes);
    }

    private static Report empty(Advice advice, DesignCase c, String u, long seed, int parts, List<String> notJudged,
                                List<String> notes, String source) {
        List<Card> cards = new ArrayList<>();
        for (int i = 0; i < advice.recommendations().size(); i++) cards.add(new Card(null, null, notes.get(notes.size() - 1)));
        return new Report(false, c.process().key(), source, Double.NaN, "", seed, parts, 0, Double.NaN, u, "", notJudged,
                cards, notes);
    }

    /** The inspection callout judging the same thing, or null when there is none (the shared mapping). */
    static InspectionCallout toInspection(Callout callout) { return CaseSimulations.toInspection(callout); }

    /** Adds {@code simulation} to each recommendation of an advice's JSON and the run's note at the top. */
    static void addJson(ObjectNode adviceNode, Report r) {
        ObjectNode top = adviceNode.putObject("simulation");
        top.put("ran", r.ran());
        top.put("processModel", r.process());
        top.put("table", r.modelSource());
        top.put("seed", r.seed());
        top.put("parts", r.parts());
        if (r.ran()) {
            top.put("points", r.points());
            top.put("noise", r.noise());
            top.put("radiusSd", r.radiusSd());
            top.put("radiusSdFrom", r.radiusSdFrom());
            top.put("units", r.units());
            top.put("needs", r.needs());
        }
        ArrayNode nj = top.putArray("needsNotJudged");
        r.notJudged().forEach(nj::add);
        ArrayNode notes = top.putArray("notes");
        r.notes().forEach(notes::add);
        top.put("evidenceOnly", "the simulation does not change the ranking");
        top.put("caution", SimulationResult.CAUTION);
        ArrayNode recs = (ArrayNode) adviceNode.get("recommendations");
        for (int i = 0; i < recs.size() && i < r.cards().size(); i++) {
            Card c = r.cards().get(i);
            ObjectNode s = ((ObjectNode) recs.get(i)).putObject("simulation");
            s.put("simulated", c.result() != null);
            if (c.result() == null) {
                s.put("reason", c.notSimulated());
                continue;
            }
            s.put("callout", c.result().text());
            s.put("parts", c.result().parts());
            share(s.putObject("good"), c.good());
            share(s.putObject("accepted"), c.result().acceptedShare());
            share(s.putObject("escapes"), c.result().escapeShare());
            share(s.putObject("falseRejects"), c.result().falseRejectShare());
            if (c.result().indeterminate() > 0) share(s.putObject("indeterminate"), c.result().indeterminateShare());
            remark(c).ifPresent(t -> s.put("remark", t));
        }
    }

    /**
     * A remark when most functionally good parts are rejected: then the simulated inspection (measuring
     * noise, scan density, the engine's slack) rather than the process limits the callout, and the
     * figure says more about the inspection model than about the parts.
     */
    static Optional<String> remark(Card c) {
        if (c.result() == null || c.good() == null || c.good().count() == 0) return Optional.empty();
        if (2 * c.result().falseRejects() <= c.good().count()) return Optional.empty();
        return Optional.of("more than half the functionally good parts are rejected: the simulated inspection (measuring noise, "
                + "points per section) rather than the process limits this callout; check how the shop inspects it before reading this as scrap");
    }

    private static void share(ObjectNode n, Share s) {
        n.put("count", s.count());
        n.put("share", s.share());
        n.putArray("interval95").add(s.low()).add(s.high());
    }

    /** The run's note, printed once above the cards. */
    static void printHeader(PrintWriter out, Report r) {
        out.println();
        if (r.ran()) {
            out.printf("Simulated (evidence only, ranking unchanged): %d parts, seed %d, default %s process model, "
                            + "%d points per section, measuring noise %s %s; radius sd %s %s from %s%n",
                    r.parts(), r.seed(), r.process(), r.points(), DecimalText.significant(r.noise(), 4), r.units(),
                    DecimalText.fixed(r.radiusSd(), 4), r.units(), r.radiusSdFrom());
            out.println("  table     " + r.modelSource());
            out.println("  needs     " + r.needs());
        } else {
            out.println("Simulation: not run.");
        }
        for (String s : r.notJudged()) out.println("  not judged " + s);
        for (String s : r.notes()) out.println("  note      " + s);
        out.println("  caution   " + SimulationResult.CAUTION);
    }

    /** The lines for card {@code i}. */
    static List<String> cardLines(Report r, int i) {
        if (i >= r.cards().size()) return List.of();
        Card c = r.cards().get(i);
        if (c.result() == null) return List.of("simulated not simulated: " + c.notSimulated());
        CalloutResult x = c.result();
        List<String> lines = new ArrayList<>();
        lines.add("simulated " + x.text() + ": accepted " + cell(x.acceptedShare()) + "; escapes " + cell(x.escapeShare())
                + "; false rejects " + cell(x.falseRejectShare()));
        lines.add("          (shares of " + x.parts() + " parts, 95 % Wilson interval; " + cell(c.good()) + " of them meet the needs)");
        if (x.indeterminate() > 0) lines.add("simulated no verdict on " + cell(x.indeterminateShare()));
        remark(c).ifPresent(t -> lines.add("simulated " + t));
        return lines;
    }

    /** A share and its 95 % interval, in percent to 2 places. */
    static String cell(Share s) {
        return DecimalText.percent(s.share(), 2) + " % [" + DecimalText.percent(s.low(), 2) + "-" + DecimalText.percent(s.high(), 2) + " %]";
    }
}
