package org.arcwright.inspect;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import org.arcwright.io.InputProblem;
import org.arcwright.tolerance.CrescentZone;
import org.arcwright.tolerance.RadiusKind;
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
        Contour contour = contourOf(req.nominal(), pts);
        double[] stations = new double[pts.size()];
        contour.measureAll(pts.xs(), pts.ys(), pts.size(), null, null, null, stations);
        List<String> notes = new ArrayList<>();
        InspectionResult main = judge(req, req.callout(), contour, stations, notes, true);
        if (!req.compare()) return main;
        List<Comparison> rows = compare(req, contour, stations);
        return new InspectionResult(req, main.pass(), main.radius(), main.controlled(), main.profile(), main.tiers(),
                main.fits(), main.worst(), main.notes(), rows);
    }

    /**
     * The verdict alone: the same judgement as {@link #inspect}, without the circle fits and the
     * comparison, for callers that judge many sections and read only the verdict (the simulation).
     * @throws InputProblem for input no verdict can be given on
     */
    public InspectionResult verdict(InspectionRequest req) {
        PointSet pts = req.points();
        if (pts.size() < 3) throw InputProblem.ofField("points", "too few points: " + pts.size() + "; need at least 3");
        Contour contour = contourOf(req.nominal(), pts);
        double[] stations = new double[pts.size()];
        contour.measureAll(pts.xs(), pts.ys(), pts.size(), null, null, null, stations);
        return judge(req, req.callout(), contour, stations, new ArrayList<>(), false);
    }

    /** The nominal contour the request's points are measured against (legs long enough for every point). */
    public static Contour nominalContour(InspectionRequest req) {
        return contourOf(req.nominal(), req.points());
    }

    private static Contour contourOf(Nominal nominal, PointSet pts) {
        if (nominal instanceof Nominal.CornerBlend cb) {
            Point2 v = cb.corner().vertex();
            double reach = 0;
            for (int i = 0; i < pts.size(); i++) reach = Math.max(reach, Math.hypot(pts.xs()[i] - v.x(), pts.ys()[i] - v.y()));
            return cb.corner().contour(cb.radius(), 2 * reach + 2 * cb.corner().tangentDistance(cb.radius()) + 1);
        }
        return ((Nominal.Chain) nominal).contour();
    }

    private InspectionResult judge(InspectionRequest req, InspectionCallout callout, Contour contour, double[] stations,
                                   List<String> notes, boolean withFits) {
        PointSet pts = req.points();
        double res = req.resolution();
        Nominal.CornerBlend cb = req.nominal() instanceof Nominal.CornerBlend c ? c : null;
        RadiusEnvelope env = null;
        ControlledRadiusOutcome cr = null;
        ProfileOutcome profile = null;
        List<ProfileOutcome> tiers = null;
        Worst worst;
        boolean pass;
        Blend blend = null;
        if (callout instanceof InspectionCallout.RadiusLimits rl) {
            if (cb == null) throw InputProblem.ofField("callout.type", "a radius callout needs a corner, not a general contour");
            env = new RadiusZone(cb.corner(), rl.min(), rl.max(), res).evaluate(pts.xs(), pts.ys(), pts.size());
            pass = env.pass();
            worst = worstOf(pts, env.worst(), env.worstExcess(), "radius");
            notes.add(String.format(Locale.ROOT, "points within %s %s of a leg may be taken as on it (the zone narrows to nothing at the tangent points); limits compared with the same slack",
                    fmt(res), req.units().symbol()));
            if (env.beyond() > 0) {
                notes.add(env.beyond() + " point(s) beyond the tangent points of the " + fmt(rl.max())
                        + " arc belong to the adjacent surfaces and are not judged by the radius zone");
            }
            if (env.outside() > 0) notes.add(env.outside() + " point(s) lie outside the adjacent surfaces (beyond the sharp corner): no radius allows them");
            if (rl.kind() == RadiusKind.CR) {
                blend = blendOf(cb, pts, stations, rl.max());
                cr = ControlledRadiusCheck.evaluate(cb.corner(), cb.radius(), rl.min(), rl.max(), env, blend,
                        req.window(), res);
                pass = cr.pass();
                if (cr.worstIndex() >= 0 && (worst == null || cr.worstExcess() > worst.excess())) {
                    worst = worstOf(pts, cr.worstIndex(), cr.worstExcess(), "local radius");
                }
                notes.add(String.format(Locale.ROOT, "local radius from Taubin circle fits over %s-long windows along the blend, stepped by a quarter window (%d windows)",
                        fmt(cr.windowLength()), cr.windows()));
            }
        } else if (callout instanceof InspectionCallout.ProfileTolerance pt) {
            profile = profileCheck(req, contour).evaluate(pts, pt.zone(), pt.free(), pt.dynamic());
            pass = profile.pass();
            worst = worstOf(pts, profile.worst(), profile.worstExcess(), "distance");
            notes.add("deviation is positive toward air (the side where added material would put the surface)");
        } else {
            InspectionCallout.CompositeProfile comp = (InspectionCallout.CompositeProfile) callout;
            tiers = new ArrayList<>();
            pass = true;
            worst = null;
            ProfileCheck check = profileCheck(req, contour);
            for (InspectionCallout.Tier t : comp.tiers()) {
                ProfileOutcome o = check.evaluate(pts, ProfileZone.bilateral(t.zone()), t.free(), false);
                tiers.add(o);
                pass &= o.pass();
                Worst w = worstOf(pts, o.worst(), o.worstExcess(), "distance");
                if (worst == null || w.excess() > worst.excess()) worst = w;
            }
            tiers = List.copyOf(tiers);
            notes.add("each tier's zone is placed on its own within the freedom it leaves; the surface must lie in every tier's zone");
        }
        Fits fits = null;
        if (withFits && cb != null) {
            if (blend == null) {
                double limit = callout instanceof InspectionCallout.RadiusLimits rl ? rl.max() : cb.radius();
                blend = blendOf(cb, pts, stations, limit);
            }
            fits = fitsOf(cb.corner(), blend);
        }
        return new InspectionResult(req, pass, env, cr, profile, tiers, fits, worst, List.copyOf(notes), List.of());
    }

    private static ProfileCheck profileCheck(InspectionRequest req, Contour contour) {
        Point2 pivot = req.nominal() instanceof Nominal.CornerBlend cb ? cb.corner().vertex() : contour.segments().get(0).start();
        return new ProfileCheck(contour, pivot.x(), pivot.y(), req.resolution());
    }

    private static Blend blendOf(Nominal.CornerBlend cb, PointSet pts, double[] stations, double limit) {
        double reach = cb.corner().tangentDistance(Math.max(limit, 3 * cb.radius()));
        return Blend.of(cb.corner(), cb.radius(), pts, stations, reach);
    }

    /** Least-squares and minimum-zone circles of the blend, and the step at each leg. */
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

    private static Worst worstOf(PointSet pts, int i, double excess, String measure) {
        if (i < 0) return null;
        return new Worst(i, pts.xs()[i], pts.ys()[i], excess, measure);
    }

    /** The same points under every applicable callout; limits not stated are derived and marked so. */
    private List<Comparison> compare(InspectionRequest req, Contour contour, double[] stations) {
        InspectionCallout c = req.callout();
        List<Comparison> rows = new ArrayList<>();
        Nominal.CornerBlend cb = req.nominal() instanceof Nominal.CornerBlend x ? x : null;
        double zone;
        double rMin = Double.NaN, rMax = Double.NaN;
        boolean radiusGiven = c instanceof InspectionCallout.RadiusLimits;
        if (c instanceof InspectionCallout.RadiusLimits rl) {
            rMin = rl.min();
            rMax = rl.max();
            double nom = Math.max(rMin, Math.min(rMax, cb.radius()));
            zone = CrescentZone.of(rMin, nom, rMax, cb.corner().includedAngleDeg()).equalBilateralProfile();
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
                InspectionResult r = judge(req.withCallout(k), k, contour, stations, new ArrayList<>(), false);
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
        if (r.controlled() != null) {
            ControlledRadiusOutcome cr = r.controlled();
            figure = "local radius " + fmt(cr.localMin()) + " to " + fmt(cr.localMax()) + ", " + cr.reversals().size()
                    + " reversal(s), " + cr.flats() + " flat window(s)";
        } else if (r.radius() != null) {
            figure = "envelope " + fmt(r.radius().smallest()) + " to " + fmt(r.radius().largest());
        } else if (r.profile() != null) {
            required = r.profile().requiredZone();
            figure = "needs zone " + fmt(required);
        } else {
            StringBuilder sb = new StringBuilder("needs zones");
            for (ProfileOutcome t : r.tiers()) sb.append(' ').append(fmt(t.requiredZone()));
            figure = sb.toString();
        }
        return new Comparison(name(k), k.describe(), derived, r.pass(), figure, required);
    }

    /** Derived limits are shown and judged to 4 significant digits, as a drawing would state them. */
    private static double round4(double v) {
        if (!Double.isFinite(v) || v == 0) return v;
        return new java.math.BigDecimal(v).round(new java.math.MathContext(4)).doubleValue();
    }

    static String fmt(double v) {
        if (Double.isNaN(v)) return "none";
        if (Double.isInfinite(v)) return "infinite (flat)";
        return new java.math.BigDecimal(v).round(new java.math.MathContext(5)).stripTrailingZeros().toPlainString();
    }
}
