package org.arcwright.app.model;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.arcwright.callout.Callout;
import org.arcwright.callout.ProfileTier;
import org.arcwright.inspect.Freedom;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Inspector;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.PointSet;
import org.arcwright.inspect.PointsCsv;
import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.model.BlendKind;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.worksheet.InspectionRecord;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.zone.Corner;
import org.arcwright.zone.Point2;
import org.arcwright.zone.ProfileZone;

/**
 * Builds what the Check panel asks the inspection core. Points are always judged against the
 * selected feature's chosen callout, never against the callout an inspection file states: the
 * file's callout is only shown beside the verdict ("the file says ..."). A file whose units,
 * nominal radius or corner kind disagree with the feature is refused with the reason, or (for the
 * nominal and the kind) judged as the feature only once the engineer confirms it.
 */
public final class CheckRequests {
    /** Relative difference below which the file's nominal radius counts as the feature's. */
    private static final double SAME_NOMINAL = 1e-9;
    private final InspectionFiles files;

    public CheckRequests(JsonFiles json) {
        this.files = new InspectionFiles(json);
    }

    /** True for the file types the Check panel reads. */
    public static boolean readable(Path file) {
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return n.endsWith(".json") || n.endsWith(".csv");
    }

    /**
     * Where a CSV's points sit: the corner's vertex and the directions of its two legs, in the CSV's
     * own coordinates (the user states it; the default is the vertex at the origin, legs along +x
     * and +y).
     *
     * @param vertex the corner's vertex
     * @param legA direction of the first adjacent surface
     * @param legB direction of the second adjacent surface
     */
    public record Frame(Point2 vertex, Point2 legA, Point2 legB) {
        /** The vertex at the origin, legs along +x and +y. */
        public static final Frame STANDARD = new Frame(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1));

        public Frame {
            Objects.requireNonNull(vertex, "vertex");
            Objects.requireNonNull(legA, "legA");
            Objects.requireNonNull(legB, "legB");
        }

        /** A frame from the vertex and the legs' directions in degrees from +x, counter-clockwise. */
        public static Frame ofDegrees(double x, double y, double legADeg, double legBDeg) {
            double a = Math.toRadians(legADeg), b = Math.toRadians(legBDeg);
            return new Frame(new Point2(x, y), new Point2(Math.cos(a), Math.sin(a)), new Point2(Math.cos(b), Math.sin(b)));
        }

        Corner corner(BlendKind kind) { return new Corner(vertex, legA, legB, kind); }
    }

    /** What became of an attempt to check a file for the selected feature: a closed family. */
    public sealed interface Binding permits Ready, NeedsConfirmation, Refused {}

    /**
     * The points judged against the feature's chosen callout.
     *
     * @param featureId the feature judged
     * @param chosen its chosen recommendation at the time (a verdict is kept only while it stands)
     * @param request the request with the feature's callout
     * @param fileSays the callout the file states, or null for a CSV
     */
    public record Ready(String featureId, Recommendation chosen, InspectionRequest request, String fileSays)
            implements Binding {}

    /**
     * The file disagrees with the feature in its nominal radius or its corner kind; judged as the
     * feature only if the engineer confirms.
     *
     * @param mismatches one sentence per disagreement
     * @param ifConfirmed what is checked once confirmed: the feature's nominal and kind at the file's corner
     */
    public record NeedsConfirmation(String featureId, List<String> mismatches, Ready ifConfirmed) implements Binding {
        public NeedsConfirmation {
            mismatches = List.copyOf(mismatches);
        }
    }

    /** The file cannot be judged for this feature (or no feature is selected); {@code reason} says why and what would do. */
    public record Refused(String featureId, String reason) implements Binding {}

    /**
     * Reads {@code file} and binds it to {@code feature}: an inspection file (.json) whose corner and
     * points are judged against the feature's chosen callout, or a points CSV in {@code frame}.
     *
     * @throws InputProblem when the file cannot be read
     */
    public Binding read(Path file, RadiusFeature feature, Frame frame) {
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (n.endsWith(".json")) return bind(feature, files.read(file));
        if (n.endsWith(".csv")) {
            Refused r = cannotJudge(feature);
            if (r != null) return r;
            return forFeature(feature, PointsCsv.read(file), frame);
        }
        throw new InputProblem(file.toString(), 0, 0, null, "not an inspection file (.json) or a points file (.csv)");
    }

    /** Binds an inspection file's request to {@code feature} (null when none is selected). */
    public static Binding bind(RadiusFeature feature, InspectionRequest fromFile) {
        Refused r = cannotJudge(feature);
        if (r != null) return r;
        String id = feature.id();
        String fileSays = fromFile.callout().describe();
        var c = feature.designCase();
        if (fromFile.units() != c.units()) {
            return new Refused(id, "The file is in " + fromFile.units().symbol() + " and " + id + " in " + c.units().symbol()
                    + ": not checked. Export the points in " + c.units().symbol() + ", or check them with a feature in "
                    + fromFile.units().symbol() + ".");
        }
        if (!(fromFile.nominal() instanceof Nominal.CornerBlend)) {
            return new Refused(id, "The file's nominal is a general contour, not a blended corner: " + id
                    + " is a " + c.kind().key() + " of R" + num(c.nominalRadius()) + " " + c.units().symbol()
                    + ". Check it from the command line (arcwright inspect).");
        }
        Nominal.CornerBlend blend = (Nominal.CornerBlend) fromFile.nominal();
        BlendKind kind = c.kind();
        List<String> mismatches = new ArrayList<>();
        if (Math.abs(blend.radius() - c.nominalRadius()) > SAME_NOMINAL * Math.max(1, c.nominalRadius())) {
            mismatches.add("The file's nominal radius is " + num(blend.radius()) + " " + c.units().symbol() + "; "
                    + id + "'s is " + num(c.nominalRadius()) + " " + c.units().symbol() + ".");
        }
        if (blend.corner().kind() != kind) {
            mismatches.add("The file's corner is a " + blend.corner().kind().key() + "; " + id + " is a " + c.kind().key() + ".");
        }
        Corner corner = new Corner(blend.corner().vertex(), blend.corner().legA(), blend.corner().legB(), kind);
        InspectionRequest req = new InspectionRequest(c.units(), new Nominal.CornerBlend(corner, c.nominalRadius()),
                callout(feature), fromFile.points(), fromFile.resolution(), fromFile.window(), true, fromFile.uncertainty());
        Ready ready = new Ready(id, feature.chosen(), req, fileSays);
        return mismatches.isEmpty() ? ready : new NeedsConfirmation(id, mismatches, ready);
    }

    /** Points judged against the feature's chosen callout, at the corner the frame places. */
    public static Ready forFeature(RadiusFeature f, PointSet points, Frame frame) {
        Corner corner = frame.corner(f.designCase().kind());
        InspectionRequest req = new InspectionRequest(f.designCase().units(),
                new Nominal.CornerBlend(corner, f.designCase().nominalRadius()), callout(f), points,
                f.designCase().units().resolution() * 1000, Double.NaN, true);
        return new Ready(f.id(), f.chosen(), req, null);
    }

    /** Points judged against the feature's chosen callout at the standard corner (vertex at the origin). */
    public static InspectionRequest forFeature(RadiusFeature f, PointSet points) {
        return forFeature(f, points, Frame.STANDARD).request();
    }

    /** Why {@code f} cannot be judged at all, or null when it can. */
    private static Refused cannotJudge(RadiusFeature f) {
        if (f == null) {
            return new Refused(null, "Select the feature these points belong to: they are judged against its chosen callout.");
        }
        if (f.chosen() == null || f.chosen().callout() == null) {
            return new Refused(f.id(), f.id() + " has no callout chosen yet, so there is nothing to judge the points "
                    + "against: decide it first (Decide, Alt+2).");
        }
        if (f.chosen().callout() instanceof Callout.General) {
            return new Refused(f.id(), f.id() + " is held by the title block's general tolerance (" + f.chosen().text()
                    + "): the Check view judges R, CR and profile callouts. Choose one of those to check a measured contour.");
        }
        return null;
    }


    /** The feature's chosen callout as the inspection core states it. */
    static InspectionCallout callout(RadiusFeature f) {
        Callout c = f.chosen() == null ? null : f.chosen().callout();
        if (c instanceof Callout.Radius r) return new InspectionCallout.RadiusLimits(RadiusKind.R, r.min(), r.max());
        if (c instanceof Callout.ControlledRadius r) return new InspectionCallout.RadiusLimits(RadiusKind.CR, r.min(), r.max());
        if (c instanceof Callout.Profile p) {
            ProfileZone zone = new ProfileZone(p.zone(), p.outward() == null ? p.zone() / 2 : p.outward());
            return new InspectionCallout.ProfileTolerance(zone, p.datums().isEmpty() ? Freedom.all() : Freedom.none(), p.dynamic());
        }
        if (c instanceof Callout.CompositeProfile cp) {
            // ASME Y14.5-2018 11.6 (from memory): the upper tier locates to its datums; a lower tier
            // with datums holds orientation only (translation free); a tier without datums floats.
            List<InspectionCallout.Tier> tiers = new ArrayList<>();
            for (int i = 0; i < cp.tiers().size(); i++) {
                ProfileTier t = cp.tiers().get(i);
                Set<Freedom> free = t.datums().isEmpty() ? Freedom.all()
                        : i == 0 ? Freedom.none() : EnumSet.of(Freedom.X, Freedom.Y);
                tiers.add(new InspectionCallout.Tier(t.zone(), free));
            }
            return new InspectionCallout.CompositeProfile(tiers);
        }
        throw InputProblem.ofField("callout", f.id() + " has no radius or profile callout chosen yet: decide it first");
    }

    /** What the worksheet keeps of a result: the verdict against the callout judged, with its units. */
    public static InspectionRecord record(InspectionResult r, String source, LocalDate on) {
        Map<String, Object> figures = new LinkedHashMap<>();
        figures.put("callout", r.request().callout().describe());
        figures.put("units", r.request().units().symbol());
        if (r.worst() != null) {
            // the finding in words with its unit and what it measures: a bare excess read as a length it is not
            figures.put("worst", Inspector.worstLabel(r));
        }
        if (r.radius() != null) {
            figures.put("smallestRadius", round(r.radius().smallest()));
            figures.put("largestRadius", round(r.radius().largest()));
        }
        if (r.fits() != null && r.fits().leastSquares() != null) {
            figures.put("fittedRadius", round(r.fits().leastSquares().circle().r()));
        }
        if (r.profile() != null) figures.put("requiredZone", round(r.profile().requiredZone()));
        if (r.request().uncertainty() > 0) figures.put("uncertainty", r.request().uncertainty());
        return new InspectionRecord(r.verdict().key(), source, on.toString(), figures);
    }

    private static double round(double v) { return Math.round(v * 1e6) / 1e6; }

    private static String num(double v) { return DecimalText.exact(v); }
}
