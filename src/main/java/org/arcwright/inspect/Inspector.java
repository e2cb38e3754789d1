package org.arcwright.inspect;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.CrescentZone;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.tolerance.Units;
import org.arcwright.zone.Contour;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;
import org.arcwright.zone.ProfileZone;
import org.arcwright.zone.RadiusEnvelope;
import org.arcwright.zone.RadiusZone;

/**
 * Judges a measured section against its callout: the service behind {@code arcwright inspect} and the
 * desktop app's check panel. A request in, a result out; nothing printed, nothing written.
 */
public final class Inspector {

    /** Runs the inspection. @throws InputProblem for input no verdict can be given on */
    public InspectionResult inspect(InspectionRequest req) {
        PointSet pts = req.points();
        if (pts.size() == 0) throw InputProblem.ofField("points", "no points given");
        if (pts.size() < 3) throw InputProblem.ofField("points", "too few points: " + pts.size() + "; need at least 3");
        MeasuredSection section = MeasuredSection.of(req);
        InspectionResult main = judge(req, req.callout(), section, Detail.REPORT);
        if (!req.compare()) return main;
        List<Comparison> rows = compare(req, section);
        return new InspectionResult(req, main.verdict(), main.radius(), main.controlled(), main.profile(), main.tiers(),
                main.fits(), main.surfaces(), main.worst(), main.notes(), rows);
    }

    /**
     * The verdict alone: the same judgement as {@link #inspect}, for callers that judge many sections
     * and read only the verdict (the simulation). No circle fits, no comparison, no notes; the worst
     * point carries its excess but no text; a profile that passes may be reported at the first
     * placement found within the zone rather than the minimax one (the verdict is the same: the
     * minimax needs no wider zone than any placement found on the way to it).
     * @throws InputProblem for input no verdict can be given on
     */
    public InspectionResult verdict(InspectionRequest req) {
        return verdict(req, MeasuredSection.of(req));
    }

    /**
     * {@link #verdict(InspectionRequest)} on a section shared by several callouts, so that what they
     * have in common (nominal contour, fitted surfaces, stations) is computed once.
     *
     * @param section the section of {@code req}'s points and nominal
     * @throws IllegalArgumentException when {@code section} is not the request's
     * @throws InputProblem for input no verdict can be given on
     */
    public InspectionResult verdict(InspectionRequest req, MeasuredSection section) {
        if (!section.serves(req)) throw new IllegalArgumentException("the section is not the request's (other points or nominal)");
        PointSet pts = req.points();
        if (pts.size() < 3) throw InputProblem.ofField("points", "too few points: " + pts.size() + "; need at least 3");
        return judge(req, req.callout(), section, Detail.VERDICT);
    }

    /** The nominal contour the request's points are measured against (legs long enough for every point). */
    public static Contour nominalContour(InspectionRequest req) {
        return contourOf(req.nominal(), req.points());
    }

    static Contour contourOf(Nominal nominal, PointSet pts) {
        if (nominal instanceof Nominal.CornerBlend cb) return cornerContour(cb.corner(), cb.radius(), pts);
        return ((Nominal.Chain) nominal).contour();
    }

    private static Contour cornerContour(Corner corner, double radius, PointSet pts) {
        Point2 v = corner.vertex();
        double reach2 = 0;
        for (int i = 0; i < pts.size(); i++) {
            double dx = pts.xs()[i] - v.x(), dy = pts.ys()[i] - v.y();
            reach2 = Math.max(reach2, dx * dx + dy * dy);
        }
        return corner.contour(radius, 2 * Math.sqrt(reach2) + 2 * corner.tangentDistance(radius) + 1);
    }

    /**
     * The largest radius whose tangent points bound the blend for this callout: the largest limit of
     * R and CR; for a profile, the radius whose crescent reaches the zone's edge on the bisector.
     */
    private static double largestRadius(InspectionCallout c, Nominal.CornerBlend cb) {
        if (c instanceof InspectionCallout.RadiusLimits rl) return rl.max();
        double zone = c instanceof InspectionCallout.ProfileTolerance pt ? pt.zone().width()
                : ((InspectionCallout.CompositeProfile) c).tiers().get(0).zone();
        return cb.radius() + zone / 2 / CrescentZone.factor(cb.corner().includedAngleDeg());
    }

    /** How much of a judgement to work out beyond the verdict. */
    private enum Detail {
        /** Everything {@link #inspect} reports: notes, worst point in words, circle fits. */
        REPORT,
        /** The figures a comparison row shows (minimax profile zones, envelopes), no words, no fits. */
        FIGURES,
        /** The verdict and the excess it rests on; a profile registration stops once within the zone. */
        VERDICT
    }

    /** What one callout's judgement found, filled in by the judging methods below. */
    private static final class Judged {
        Verdict verdict;
        RadiusEnvelope env;
        ControlledRadiusOutcome cr;
        ProfileOutcome profile;
        List<ProfileOutcome> tiers;
        AdjacentSurfaces surfaces;
        Blend blend;
        Worst worst;
        final List<String> notes = new ArrayList<>();
    }

    private InspectionResult judge(InspectionRequest req, InspectionCallout callout, MeasuredSection section, Detail detail) {
        Nominal.CornerBlend cb = req.nominal() instanceof Nominal.CornerBlend c ? c : null;
        Judged j = new Judged();
        if (callout instanceof InspectionCallout.RadiusLimits rl) {
            if (cb == null) throw InputProblem.ofField("callout.type", "a radius callout needs a corner, not a general contour");
            judgeRadius(req, rl, cb, section, detail, j);
        } else if (callout instanceof InspectionCallout.ProfileTolerance pt) {
            judgeProfile(req, pt, section, detail, j);
        } else {
            judgeComposite(req, (InspectionCallout.CompositeProfile) callout, section, detail, j);
        }
        double u = req.uncertainty();
        if (detail == Detail.REPORT && u > 0) {
            j.notes.add("verdict by the ISO 14253-1 default rule with U = " + fmt(u) + " " + req.units().symbol()
                    + ": conformance only inside the zone reduced by U, non-conformance only outside it enlarged by U");
        }
        Fits fits = null;
        if (detail == Detail.REPORT && cb != null) {
            PointSet pts = req.points();
            if (j.surfaces == null) {
                j.surfaces = section.surfaces(cb.corner(), largestRadius(callout, cb));
                j.notes.addAll(j.surfaces.notes());
            }
            Corner corner = j.surfaces.corner();
            if (j.blend == null) j.blend = blendOf(corner, cb, pts, section.stations(corner, cb.radius()), largestRadius(callout, cb));
            fits = fitsOf(corner, j.blend);
        }
        return new InspectionResult(req, j.verdict, j.env, j.cr, j.profile, j.tiers, fits, j.surfaces, j.worst,
                List.copyOf(j.notes), List.of());
    }

    /** R and CR: the radius zone on the fitted surfaces, then for CR the local radius along the blend. */
    private static void judgeRadius(InspectionRequest req, InspectionCallout.RadiusLimits rl, Nominal.CornerBlend cb,
                                    MeasuredSection section, Detail detail, Judged j) {
        PointSet pts = req.points();
        double res = req.resolution(), u = req.uncertainty();
        String unit = req.units().symbol();
        boolean explain = detail == Detail.REPORT;
        j.surfaces = section.surfaces(cb.corner(), rl.max());
        if (explain) j.notes.addAll(j.surfaces.notes());
        Corner corner = j.surfaces.corner();
        RadiusZone zone = new RadiusZone(corner, rl.min(), rl.max(), res);
        j.env = zone.evaluate(pts.xs(), pts.ys(), pts.size());
        j.verdict = j.env.pass() ? Verdict.PASS : Verdict.FAIL;
        if (u > 0) {
            int[] counts = new int[3];
            Boolean proven = zone.decide(pts.xs(), pts.ys(), pts.size(), u, counts);
            Verdict byU = proven == null ? Verdict.INDETERMINATE : proven ? Verdict.PASS : Verdict.FAIL;
            j.verdict = byU == j.verdict ? j.verdict : Verdict.INDETERMINATE;
            if (explain && counts[1] > 0) {
                j.notes.add(counts[1] + " point(s) lie within U = " + fmt(u) + " " + unit
                        + " of a limit arc (or of a surface, beyond the resolution): neither in nor out is proven there (ISO 14253-1)");
            }
        }
        j.worst = explain ? radiusWorst(pts, zone, j.env, section.stations(corner, cb.radius()), req.units()) : radiusExcess(pts, zone, j.env, unit);
        if (explain) {
            radiusNotes(rl, j.env, res, unit, j.notes);
            noiseNote(j.worst, j.surfaces, zone, rl, u, unit, j.notes);
        }
        if (rl.kind() != RadiusKind.CR) return;
        j.blend = explain ? blendOf(corner, cb, pts, section.stations(corner, cb.radius()), rl.max())
                : blendOf(corner, cb, pts, (idx, count) -> section.stationsOf(corner, cb.radius(), idx, count), rl.max());
        // a failed zone fails the CR whatever its windows say: a verdict alone need not read them
        // (the blend is still separated: a section without one is refused, as the full inspection refuses it)
        if (detail == Detail.VERDICT && j.verdict == Verdict.FAIL) return;
        ControlledRadiusOutcome cr = ControlledRadiusCheck.evaluate(corner, cb.radius(), rl.min(), rl.max(), j.env, j.blend, req.window(), res, u);
        j.cr = cr;
        Verdict byZone = j.verdict;
        j.verdict = j.verdict.and(cr.verdict());
        if (cr.worst() != null && windowIsWorse(cr, byZone, j.worst)) {
            int i = cr.worstIndex();
            j.worst = explain ? windowWorst(pts, cr, req.units()) : new Worst(i, pts.xs()[i], pts.ys()[i], cr.worstExcess(), Worst.LOCAL_RADIUS, unit, "");
        }
        if (explain) {
            j.notes.add(String.format(Locale.ROOT, "local radius from Taubin circle fits over %s %s windows along the blend, stepped by a quarter window (75 %% overlap, %d windows); "
                    + "each with its expanded uncertainty (k = 2) from the fit's residuals and the window's arc",
                    fmt(cr.windowLength()), unit, cr.windows()));
            if (!cr.indeterminate().isEmpty()) {
                j.notes.add(cr.indeterminate().size() + " window(s) straddle a limit within their uncertainty: neither pass nor fail is proven there. "
                        + "A longer window (--window, now " + fmt(cr.windowLength()) + " " + unit + "), a denser scan or a lower-noise probe would decide");
            }
        }
    }

    /**
     * Whether the CR's worst window, rather than the radius zone's worst point, is the finding to report:
     * the one that decides the verdict comes first (a proven failure before an open question before a
     * pass), so a verdict never points at a finding weaker than itself. Between findings of the same
     * standing, a point beyond an adjacent surface (which no radius allows) stays, else the larger
     * excess: both are then radii, so they compare.
     */
    private static boolean windowIsWorse(ControlledRadiusOutcome cr, Verdict byZone, Worst zoneWorst) {
        if (zoneWorst == null) return true;
        int window = standing(cr.verdict()), zone = standing(byZone);
        if (window != zone) return window > zone;
        return !Worst.BEYOND_SURFACE.equals(zoneWorst.measure()) && cr.worstExcess() > zoneWorst.excess();
    }

    private static int standing(Verdict v) {
        return v == Verdict.FAIL ? 2 : v == Verdict.INDETERMINATE ? 1 : 0;
    }

    /** How many times a surface's rms a point may lie beyond it and still be read as its scatter (a normal scatter passes 4σ once in about 16,000 points). */
    static final double SCATTER_SPAN = 4;

    /**
     * When the worst point lies beyond a fitted surface by no more than {@value #SCATTER_SPAN} times
     * the rms of that surface's own points, says so: a least-squares line leaves about half its
     * points on each side, so scatter of that size alone puts points beyond it near the tangent
     * points, where the zone has no width. The verdict stands (the points as measured); the note says
     * what would judge the scatter: a stated U (ISO 14253-1 default rule) or a resolution of the order
     * of the scatter, which the request caps at a tenth of the band. A stated U covers one point at
     * about 95 %, so among hundreds of points near the tangent points a few still lie beyond it.
     */
    private static void noiseNote(Worst worst, AdjacentSurfaces surfaces, RadiusZone zone, InspectionCallout.RadiusLimits rl,
                                  double u, String unit, List<String> notes) {
        if (worst == null || !Worst.BEYOND_SURFACE.equals(worst.measure())) return;
        double[] h = legOffsets(zone.corner(), worst.x(), worst.y());
        AdjacentSurfaces.Surface s = h[0] < h[1] ? surfaces.a() : surfaces.b();
        if (!s.fitted() || !(s.rms() > 0) || worst.excess() > SCATTER_SPAN * s.rms()) return;
        double cap = InspectionRequest.RESOLUTION_SHARE * (rl.max() - rl.min());
        notes.add(String.format(Locale.ROOT, "the worst point lies %s %s beyond surface %s, within the scatter of the points fitted to surface %s "
                        + "(rms %s %s; %s times that is %s %s): noise of that size alone puts points beyond a fitted surface near the tangent points, "
                        + "where the zone has no width. %s a resolution of the order of the scatter (at most %s %s, a tenth of the band)",
                fmt(worst.excess()), unit, h[0] < h[1] ? "a" : "b", h[0] < h[1] ? "a" : "b", DecimalText.significant(s.rms(), 3), unit,
                fmt(SCATTER_SPAN), fmt(SCATTER_SPAN * s.rms()), unit,
                u > 0 ? "The stated U covers one point at about 95 %, so among hundreds of points a few still lie beyond it: to judge the part "
                        + "rather than the scatter, give"
                        : "To judge the part rather than the scatter, state the probe's expanded uncertainty (--uncertainty or \"uncertainty\": "
                        + "ISO 14253-1 default rule), or give",
                fmt(cap), unit));
    }

    private static void radiusNotes(InspectionCallout.RadiusLimits rl, RadiusEnvelope env, double res, String unit, List<String> notes) {
        notes.add("the radius zone is two arcs tangent to the adjacent surfaces fitted to the points (ASME Y14.5-2018 radius; a ± radius locates nothing); "
                + "the nominal corner only seeds the fit");
        notes.add(String.format(Locale.ROOT, "points within %s %s of a surface may be taken as on it (the zone narrows to nothing at the tangent points); limits compared with the same slack",
                fmt(res), unit));
        if (env.beyond() > 0) {
            notes.add(env.beyond() + " point(s) beyond the tangent points of the " + fmt(rl.max()) + " " + unit
                    + " arc belong to the adjacent surfaces and are not judged by the radius zone");
        }
        if (env.outside() > 0) notes.add(env.outside() + " point(s) lie outside the adjacent surfaces (beyond the sharp corner): no radius allows them");
    }

    private static void judgeProfile(InspectionRequest req, InspectionCallout.ProfileTolerance pt, MeasuredSection section,
                                     Detail detail, Judged j) {
        double u = req.uncertainty();
        double stop = detail == Detail.VERDICT ? acceptAt(pt.zone(), u) : Double.NEGATIVE_INFINITY;
        j.profile = profileCheck(req, section).evaluate(req.points(), pt.zone(), pt.free(), pt.dynamic(), stop);
        j.verdict = profileVerdict(j.profile, u);
        j.worst = profileWorst(req.points(), j.profile, req.units(), detail == Detail.REPORT);
        if (detail == Detail.REPORT) {
            j.notes.add("deviation is positive toward air (the side where added material would put the surface)");
            if (pt.free().isEmpty() && !pt.dynamic()) j.notes.add("located profile: judged in the nominal (datum) frame, where the points were measured");
        }
    }

    private static void judgeComposite(InspectionRequest req, InspectionCallout.CompositeProfile comp, MeasuredSection section,
                                       Detail detail, Judged j) {
        double u = req.uncertainty();
        List<ProfileOutcome> tiers = new ArrayList<>();
        j.verdict = Verdict.PASS;
        ProfileCheck check = profileCheck(req, section);
        for (InspectionCallout.Tier t : comp.tiers()) {
            ProfileZone tz = ProfileZone.bilateral(t.zone());
            double stop = detail == Detail.VERDICT ? acceptAt(tz, u) : Double.NEGATIVE_INFINITY;
            ProfileOutcome o = check.evaluate(req.points(), tz, t.free(), false, stop);
            tiers.add(o);
            j.verdict = j.verdict.and(profileVerdict(o, u));
            Worst w = profileWorst(req.points(), o, req.units(), detail == Detail.REPORT);
            if (j.worst == null || w.excess() > j.worst.excess()) j.worst = w;
        }
        j.tiers = List.copyOf(tiers);
        if (detail == Detail.REPORT) j.notes.add("each tier's zone is placed on its own within the freedom it leaves; the surface must lie in every tier's zone");
    }

    /**
     * The required zone at or below which a registration may stop with the verdict already known to
     * be a pass. With no uncertainty: the zone's width, since the minimax needs no wider zone than a
     * placement found on the way, and a required zone within the width puts every point within the
     * zone. With an uncertainty {@code u} (ISO 14253-1), every excess is at most
     * {@code min(f, 1 - f) · (required - width)} for the disposition {@code f} (each side's excess is
     * its share of the shortfall), so {@code required <= width - u / min(f, 1 - f)} proves the pass;
     * a one-sided zone never stops early.
     */
    private static double acceptAt(ProfileZone zone, double u) {
        if (u <= 0) return zone.width();
        double share = Math.min(zone.fraction(), 1 - zone.fraction());
        return share > 0 ? zone.width() - u / share : Double.NEGATIVE_INFINITY;
    }

    /**
     * A profile's verdict: within the zone (no stated uncertainty), or by the ISO 14253-1 default
     * rule: the worst excess at the minimax placement is exactly the worst excess against a zone
     * reduced (or enlarged) by {@code u} on each side, less (plus) {@code u}, since shrinking both
     * sides alike moves every excess by the same amount and leaves the minimax placement unchanged.
     */
    public static Verdict profileVerdict(ProfileOutcome o, double u) {
        if (u <= 0) return o.pass() ? Verdict.PASS : Verdict.FAIL;
        double slack = PROFILE_SLACK;
        if (o.worstExcess() <= -u + slack) return Verdict.PASS;
        if (o.worstExcess() > u + slack) return Verdict.FAIL;
        return Verdict.INDETERMINATE;
    }

    /** Rounding slack of a profile verdict, drawing units: the solver's, not a tolerance. */
    public static final double PROFILE_SLACK = 1e-9;

    /**
     * Each point's station along the contour of the nominal radius on {@code corner}, measured from
     * that arc's tangent point on surface a (negative along surface a): what {@code s} means in
     * messages and what CR windows are laid along.
     */
    static double[] stationsAlong(Corner corner, double radius, PointSet pts) {
        Contour c = cornerContour(corner, radius, pts);
        double[] st = new double[pts.size()];
        c.measureAll(pts.xs(), pts.ys(), pts.size(), null, null, null, st);
        double offset = c.segments().get(0).length();
        for (int i = 0; i < st.length; i++) st[i] -= offset;
        return st;
    }

    /** As {@link #stationsAlong(Corner, double, PointSet)} for the points {@code indices[0..count-1]} alone, into {@code into}. */
    static void stationsAlong(Corner corner, double radius, PointSet pts, int[] indices, int count, double[] into) {
        Contour c = cornerContour(corner, radius, pts);
        double offset = c.segments().get(0).length();
        double[] out = new double[4], work = new double[5];
        for (int k = 0; k < count; k++) {
            int i = indices[k];
            c.measure(pts.xs()[i], pts.ys()[i], out, work);
            into[k] = out[3] - offset;
        }
    }

    private static Worst radiusWorst(PointSet pts, RadiusZone zone, RadiusEnvelope env, double[] stations, Units units) {
        String unit = units.symbol();
        int i = env.worst();
        if (i < 0) return null;
        double x = pts.xs()[i], y = pts.ys()[i];
        Corner c = zone.corner();
        double[] h = legOffsets(c, x, y);
        double ha = h[0], hb = h[1];
        String where = String.format(Locale.ROOT, "point #%d (s = %s %s along the contour from the tangent point on surface a)", i,
                coordinate(stations[i], units), unit);
        if (Math.min(ha, hb) < -zone.resolution()) {
            double depth = -Math.min(ha, hb);
            String text = String.format(Locale.ROOT, "%s %s beyond surface %s (outside the sharp corner: no radius allows it) at %s",
                    fmt(depth), unit, ha < hb ? "a" : "b", where);
            return new Worst(i, x, y, depth, Worst.BEYOND_SURFACE, unit, text);
        }
        double e = env.worstExcess();
        double r = c.blendRadiusThrough(x, y);
        String limit = e >= 0 || r > zone.max() ? "largest" : "smallest";
        boolean high = r - zone.max() >= zone.min() - r;
        String text = String.format(Locale.ROOT, "%s: the blend through it has radius %s %s; %s limit %s %s, %s by %s %s of radius",
                where, fmt(r), unit, high ? "largest" : "smallest", fmt(high ? zone.max() : zone.min()), unit,
                e > 0 ? "beyond it" : "within it", fmt(Math.abs(e)), unit);
        if (Math.min(ha, hb) <= zone.resolution()) {
            text = String.format(Locale.ROOT, "%s lies on surface %s within the resolution and allows radii up to %s %s; %s limit %s %s, %s by %s %s of radius",
                    where, ha < hb ? "a" : "b", fmt(zone.min() - e), unit, limit, fmt(zone.min()), unit,
                    e > 0 ? "short of it" : "within it", fmt(Math.abs(e)), unit);
        }
        return new Worst(i, x, y, e, Worst.RADIUS, unit, text);
    }

    /**
     * The worst point in a few words, for a label beside it on a plot or a view: what its figure
     * measures and against what, with the unit, never a bare excess that reads as a distance from
     * the part ({@code outside by 4.665 mm (local radius)} read as a point 4.7 mm out, when the
     * window's local radius was 6.765 mm against a 2.1 mm limit). Empty when there is no worst point.
     */
    public static String worstLabel(InspectionResult r) {
        Worst w = r.worst();
        if (w == null) return "";
        String u = w.unit().isEmpty() ? "" : " " + w.unit();
        double e = w.excess();
        switch (w.measure()) {
            case Worst.LOCAL_RADIUS: {
                ControlledRadiusOutcome cr = r.controlled();
                ControlledRadiusOutcome.LocalWindow lw = cr == null ? null : cr.worst();
                if (lw == null) break;
                String head = "worst #" + w.index() + " (window " + lw.number() + "): ";
                if (lw.reversed()) return head + "curves against the blend (a reversal)";
                if (!Double.isFinite(lw.radius()) || lw.radius() < 0) return head + "flat, limit " + fmt(cr.worstLimit()) + u;
                return head + "local radius " + fmt(lw.radius()) + u + " ± " + length(lw.uncertainty(), r.request().units()) + u
                        + ", limit " + fmt(cr.worstLimit()) + u;
            }
            case Worst.RADIUS:
                return "worst #" + w.index() + ": " + (e > 0 ? "beyond a limit" : "within the limits") + " by " + fmt(Math.abs(e)) + u + " of radius";
            case Worst.BEYOND_SURFACE:
                return "worst #" + w.index() + ": " + fmt(e) + u + " beyond a fitted surface (no radius allows it)";
            case Worst.DISTANCE:
                return "worst #" + w.index() + ": " + fmt(Math.abs(e)) + u + (e > 0 ? " outside" : " inside") + " the zone";
            default:
                break;
        }
        return "worst #" + w.index() + ": " + (e > 0 ? "beyond" : "within") + " by " + fmt(Math.abs(e)) + u + " (" + w.measure() + ")";
    }

    /** The worst point of a radius zone with its excess alone, as {@link #radiusWorst} measures it, without words. */
    private static Worst radiusExcess(PointSet pts, RadiusZone zone, RadiusEnvelope env, String unit) {
        int i = env.worst();
        if (i < 0) return null;
        double x = pts.xs()[i], y = pts.ys()[i];
        double[] h = legOffsets(zone.corner(), x, y);
        double nearest = Math.min(h[0], h[1]);
        if (nearest < -zone.resolution()) return new Worst(i, x, y, -nearest, Worst.BEYOND_SURFACE, unit, "");
        return new Worst(i, x, y, env.worstExcess(), Worst.RADIUS, unit, "");
    }

    /** The signed distances of (x, y) from legs a and b, positive into the angle between them. */
    private static double[] legOffsets(Corner c, double x, double y) {
        Point2 v = c.vertex();
        double qx = x - v.x(), qy = y - v.y();
        return new double[] {qx * c.inwardNormalA().x() + qy * c.inwardNormalA().y(),
                qx * c.inwardNormalB().x() + qy * c.inwardNormalB().y()};
    }

    private static Worst windowWorst(PointSet pts, ControlledRadiusOutcome cr, Units units) {
        String unit = units.symbol();
        ControlledRadiusOutcome.LocalWindow w = cr.worst();
        int i = cr.worstIndex();
        String span = String.format(Locale.ROOT, "window %d (s = %s to %s %s from the tangent point on surface a)", w.number(),
                coordinate(w.fromStation(), units), coordinate(w.toStation(), units), unit);
        String text;
        if (w.reversed()) {
            text = span + " curves against the blend (a reversal, local radius " + fmt(Math.abs(w.radius())) + " " + unit + " the wrong way)";
        } else if (Double.isInfinite(w.radius()) || w.radius() < 0) {
            text = span + " is flat: no measurable curvature; largest limit " + fmt(cr.worstLimit()) + " " + unit;
        } else {
            text = String.format(Locale.ROOT, "local radius %s %s ± %s %s over %s; limit %s %s", fmt(w.radius()), unit, length(w.uncertainty(), units),
                    unit, span, fmt(cr.worstLimit()), unit);
        }
        return new Worst(i, pts.xs()[i], pts.ys()[i], cr.worstExcess(), Worst.LOCAL_RADIUS, unit, text);
    }

    private static Worst profileWorst(PointSet pts, ProfileOutcome o, Units units, boolean explain) {
        String unit = units.symbol();
        int i = o.worst();
        if (i < 0) return null;
        double d = o.deviations()[i], e = o.worstExcess();
        if (!explain) return new Worst(i, pts.xs()[i], pts.ys()[i], e, Worst.DISTANCE, unit, "");
        String text = String.format(Locale.ROOT, "point #%d lies %s %s %s the zone (deviation %s %s %s after registration)", i, fmt(Math.abs(e)),
                unit, e > 0 ? "outside" : "inside", length(Math.abs(d), units), unit, d >= 0 ? "toward air" : "into the material");
        return new Worst(i, pts.xs()[i], pts.ys()[i], e, Worst.DISTANCE, unit, text);
    }

    private static ProfileCheck profileCheck(InspectionRequest req, MeasuredSection section) {
        Contour contour = section.contour();
        Point2 pivot = req.nominal() instanceof Nominal.CornerBlend cb ? cb.corner().vertex() : contour.segments().get(0).start();
        return new ProfileCheck(contour, pivot.x(), pivot.y(), Math.min(req.resolution(), PROFILE_SLACK));
    }

    private static Blend blendOf(Corner corner, Nominal.CornerBlend cb, PointSet pts, double[] stations, double limit) {
        double reach = corner.tangentDistance(Math.max(limit, 3 * cb.radius()));
        return Blend.of(corner, cb.radius(), pts, stations, reach);
    }

    private static Blend blendOf(Corner corner, Nominal.CornerBlend cb, PointSet pts, Blend.Stations stations, double limit) {
        double reach = corner.tangentDistance(Math.max(limit, 3 * cb.radius()));
        return Blend.of(corner, cb.radius(), pts, stations, reach);
    }

    /**
     * Least-squares and minimum-zone circles of the blend, and the step at each tangent point: the
     * gap between the least-squares arc and the (fitted) adjacent surface, {@code |distance(centre,
     * surface) - r|}.
     */
    static Fits fitsOf(Corner corner, Blend blend) {
        PointSet b = blend.points();
        LeastSquaresCircle ls = CircleFits.leastSquares(b.xs(), b.ys(), b.size());
        MinimumZoneCircle mz = CircleFits.minimumZone(b.xs(), b.ys(), b.size(), ls.circle());
        Point2 v = corner.vertex();
        double qx = ls.circle().cx() - v.x(), qy = ls.circle().cy() - v.y();
        double da = Math.abs(qx * corner.inwardNormalA().x() + qy * corner.inwardNormalA().y());
        double db = Math.abs(qx * corner.inwardNormalB().x() + qy * corner.inwardNormalB().y());
        return new Fits(ls, mz, Math.abs(da - ls.circle().r()), Math.abs(db - ls.circle().r()), b.size());
    }

    /** The same points under every applicable callout; limits not stated are derived and marked so. */
    private List<Comparison> compare(InspectionRequest req, MeasuredSection section) {
        InspectionCallout c = req.callout();
        List<Comparison> rows = new ArrayList<>();
        Nominal.CornerBlend cb = req.nominal() instanceof Nominal.CornerBlend x ? x : null;
        double zone;
        double rMin = Double.NaN, rMax = Double.NaN;
        boolean radiusGiven = c instanceof InspectionCallout.RadiusLimits;
        if (c instanceof InspectionCallout.RadiusLimits rl) {
            rMin = rl.min();
            rMax = rl.max();
            // about the drawn nominal, the true profile of the derived profile rows, even when it lies
            // outside the limits (deviations of the same sign: R3 +0.3/+0.1 needs 0.2485 at 90°)
            zone = CrescentZone.of(rMin, cb.radius(), rMax, cb.corner().includedAngleDeg()).equalBilateralProfile();
        } else if (c instanceof InspectionCallout.ProfileTolerance pt) {
            zone = pt.zone().width();
        } else {
            zone = ((InspectionCallout.CompositeProfile) c).tiers().get(0).zone();
        }
        if (cb != null && !radiusGiven) {
            // the radius limits whose crescent stays inside the equal-bilateral zone on the bisector
            double k = CrescentZone.factor(cb.corner().includedAngleDeg());
            rMin = Math.max(0, cb.radius() - zone / 2 / k);
            rMax = cb.radius() + zone / 2 / k;
        }
        if (!radiusGiven) {
            rMin = round4(rMin);
            rMax = round4(rMax);
        }
        if (!(c instanceof InspectionCallout.ProfileTolerance)) zone = round4(zone);
        if (cb != null && zone <= 0) zone = Double.NaN;
        List<InspectionCallout> list = new ArrayList<>();
        if (cb != null) {
            list.add(new InspectionCallout.RadiusLimits(RadiusKind.R, rMin, rMax));
            list.add(new InspectionCallout.RadiusLimits(RadiusKind.CR, rMin, rMax));
        }
        if (!Double.isNaN(zone) && zone > 0) {
            list.add(new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(zone), Freedom.none(), false));
            list.add(new InspectionCallout.ProfileTolerance(ProfileZone.bilateral(zone), Freedom.all(), false));
        }
        if (c instanceof InspectionCallout.CompositeProfile) {
            list.add(c);
        } else if (!Double.isNaN(zone) && zone > 0) {
            list.add(new InspectionCallout.CompositeProfile(List.of(new InspectionCallout.Tier(zone, Freedom.none()),
                    new InspectionCallout.Tier(zone / 2, EnumSet.allOf(Freedom.class)))));
        }
        for (InspectionCallout k : list) {
            boolean derived = !sameCallout(k, c);
            try {
                InspectionResult r = judge(req.withCallout(k), k, section, Detail.FIGURES);
                rows.add(row(k, derived, r));
            } catch (InputProblem p) {
                rows.add(new Comparison(name(k), k.describe(), derived, false, "cannot judge: " + p.problem(), Double.NaN));
            }
        }
        return List.copyOf(rows);
    }

    private static boolean sameCallout(InspectionCallout a, InspectionCallout b) {
        if (a.equals(b)) return true;
        return a instanceof InspectionCallout.RadiusLimits ra && b instanceof InspectionCallout.RadiusLimits rb
                && ra.kind() == rb.kind() && ra.min() == rb.min() && ra.max() == rb.max();
    }

    private static String name(InspectionCallout k) {
        if (k instanceof InspectionCallout.RadiusLimits rl) return rl.kind() == RadiusKind.CR ? "controlled radius" : "radius";
        if (k instanceof InspectionCallout.ProfileTolerance pt) {
            return pt.free().isEmpty() ? "profile, located" : pt.free().size() == 3 ? "profile, floating" : "profile";
        }
        return "composite profile";
    }

    private static Comparison row(InspectionCallout k, boolean derived, InspectionResult r) {
        String figure;
        double required = Double.NaN;
        Units units = r.request().units();
        String u = " " + units.symbol();
        if (r.controlled() != null) {
            ControlledRadiusOutcome cr = r.controlled();
            figure = "local radius " + fmt(cr.localMin()) + " to " + fmt(cr.localMax()) + u + " (± up to " + length(cr.uncertainty(), units) + u + "), "
                    + cr.reversals().size() + " reversal(s), " + cr.flats() + " flat window(s)"
                    + (cr.indeterminate().isEmpty() ? "" : ", " + cr.indeterminate().size() + " window(s) undecided");
        } else if (r.radius() != null) {
            double res = r.request().resolution();
            RadiusEnvelope e = r.radius();
            figure = e.outside() > 0 && r.worst() != null && Worst.BEYOND_SURFACE.equals(r.worst().measure())
                    ? e.outside() + " point(s) beyond the fitted surfaces, up to " + fmt(r.worst().excess()) + u + "; largest radius " + up(e.largest(), res) + u
                    : "envelope " + down(e.smallest(), res) + " to " + up(e.largest(), res) + u;
        } else if (r.profile() != null) {
            required = r.profile().requiredZone();
            figure = "needs zone " + lengthUp(required, PROFILE_SLACK, units) + u;
        } else {
            StringBuilder sb = new StringBuilder("needs zones");
            for (ProfileOutcome t : r.tiers()) sb.append(' ').append(lengthUp(t.requiredZone(), PROFILE_SLACK, units));
            figure = sb.append(u).toString();
        }
        return new Comparison(name(k), k.describe(), derived, r.verdict(), figure, required);
    }

    /**
     * {@code v} to 5 significant digits for the smallest radius of an envelope, rounded down unless
     * the nearest figure lies within {@code slack} above it: a callout at the figure shown then still
     * passes, since the verdict allows the same slack.
     */
    public static String down(double v, double slack) {
        String near = rounded(v, RoundingMode.HALF_EVEN);
        return Double.isFinite(v) && Double.parseDouble(near) - v <= slack ? near : rounded(v, RoundingMode.FLOOR);
    }

    /** {@code v} to 5 significant digits for the largest radius or a zone needed: up, unless the nearest is within {@code slack} below. */
    public static String up(double v, double slack) {
        String near = rounded(v, RoundingMode.HALF_EVEN);
        return Double.isFinite(v) && v - Double.parseDouble(near) <= slack ? near : rounded(v, RoundingMode.CEILING);
    }

    private static String rounded(double v, RoundingMode mode) {
        if (Double.isNaN(v)) return "none";
        if (Double.isInfinite(v)) return "infinite (flat)";
        return new BigDecimal(v).round(new MathContext(5, mode)).stripTrailingZeros().toPlainString();
    }

    /** Derived limits are shown and judged to 4 significant digits, as a drawing would state them. */
    private static double round4(double v) {
        if (!Double.isFinite(v) || v == 0) return v;
        return new BigDecimal(v).round(new MathContext(4)).doubleValue();
    }

    /** Decimal places of a coordinate in millimetres: 0.1 µm. */
    public static final int MM_COORDINATE_PLACES = 4;
    /** Decimal places of a coordinate in inches: 0.00001 in (0.25 µm), the same reach as in millimetres. */
    public static final int INCH_COORDINATE_PLACES = 5;

    /**
     * A coordinate of a point, a centre or a surface's position in a report, or a station s along the
     * contour: fixed places by unit, as a CMM report lists its points (common practice), so positions
     * side by side line up and read at one resolution: {@code [4.1310, 0.0002]}, not {@code [4.131, 0.0002465]}. Significant digits would make
     * a coordinate near the origin look a thousand times more precise than one across the part. A tenth
     * of a micrometre (mm) or a hundred-thousandth of an inch lies below any probe's uncertainty, so the
     * rounding hides nothing a verdict rests on; deviations and radii keep their significant digits.
     * NaN (no fit) reads {@code none}.
     */
    public static String coordinate(double v, Units units) {
        if (Double.isNaN(v)) return "none";
        return DecimalText.fixed(v, units == Units.INCH ? INCH_COORDINATE_PLACES : MM_COORDINATE_PLACES);
    }

    /**
     * A computed length in the report's words (a residual, a deviation, a width, a step, an
     * uncertainty): {@link #fmt}'s 5 significant digits, except that a length below half the last
     * place of a coordinate ({@link #coordinate}: 0.0001 mm, 0.00001 in) reads as zero at that place,
     * {@code 0.0000}. The residual of a perfect fit (1e-17) or a solver's round-off (1e-9) lies far
     * below any probe's uncertainty, and a report states lengths no finer than its coordinates
     * (common practice). Not for an excess a verdict rests on: that keeps {@link #fmt}, so that a
     * point failing by less than the last place still says by how much.
     */
    public static String length(double v, Units units) {
        return length(v, units, 5);
    }

    /** {@link #length(double, Units)} to {@code digits} significant digits above the last place (a plot's 4). */
    public static String length(double v, Units units, int digits) {
        if (!Double.isFinite(v)) return fmt(v);
        int places = units == Units.INCH ? INCH_COORDINATE_PLACES : MM_COORDINATE_PLACES;
        if (Math.abs(v) < 0.5 * Math.pow(10, -places)) return DecimalText.fixed(0, places);
        return DecimalText.significant(v, digits);
    }

    /**
     * A length needed (a profile zone) in words, rounded outward as {@link #up} rounds it, and never
     * below the last place of a coordinate: a need of 5e-9 mm reads {@code 0.0001}, a zone that would
     * pass, where {@link #length} would print a zone of nothing.
     */
    public static String lengthUp(double v, double slack, Units units) {
        if (!Double.isFinite(v) || v <= 0) return up(v, slack);
        int places = units == Units.INCH ? INCH_COORDINATE_PLACES : MM_COORDINATE_PLACES;
        double last = Math.pow(10, -places);
        return v < last ? DecimalText.fixed(last, places) : up(v, slack);
    }

    /**
     * A computed length or count in the report's words, to 5 significant digits: one more than
     * {@link DecimalText#significant}'s usual 4, since a deviation is read against a limit a few
     * micrometres away. Rounded as the value prints ({@link DecimalText}), so a figure the user typed
     * (a window, a tolerance) reads back as typed. NaN and infinity are states of the fit, said in words.
     */
    static String fmt(double v) {
        if (Double.isNaN(v)) return "none";
        if (Double.isInfinite(v)) return "infinite (flat)";
        return DecimalText.significant(v, 5);
    }
}
