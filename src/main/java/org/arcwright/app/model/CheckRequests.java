package org.arcwright.app.model;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.arcwright.callout.Callout;
import org.arcwright.inspect.Freedom;
import org.arcwright.inspect.InspectionCallout;
import org.arcwright.inspect.InspectionFiles;
import org.arcwright.inspect.InspectionRequest;
import org.arcwright.inspect.InspectionResult;
import org.arcwright.inspect.Nominal;
import org.arcwright.inspect.PointSet;
import org.arcwright.inspect.PointsCsv;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.model.BlendKind;
import org.arcwright.tolerance.RadiusKind;
import org.arcwright.worksheet.InspectionRecord;
import org.arcwright.worksheet.RadiusFeature;
import org.arcwright.zone.Corner;
import org.arcwright.zone.CornerKind;
import org.arcwright.zone.Point2;
import org.arcwright.zone.ProfileZone;

/**
 * Builds what the Check panel asks the inspection core: a whole inspection file (corner, callout,
 * points) as it stands, or a CSV of points judged against the selected feature's chosen callout at
 * a corner with its vertex at the origin and its legs along +x and +y (the convention the CSV must
 * follow). Every request also compares the points under every applicable callout.
 */
public final class CheckRequests {
    private final InspectionFiles files;

    public CheckRequests(JsonFiles json) {
        this.files = new InspectionFiles(json);
    }

    /** True for the file types the Check panel reads. */
    public static boolean readable(Path file) {
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return n.endsWith(".json") || n.endsWith(".csv");
    }

    /** The request in {@code file}: an inspection JSON file, or a points CSV judged for {@code feature}. */
    public InspectionRequest read(Path file, RadiusFeature feature) {
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (n.endsWith(".json")) return files.read(file).withCompare(true);
        if (n.endsWith(".csv")) {
            if (feature == null) throw new InputProblem(file.toString(), 0, 0, null, "select a feature to judge the points against");
            return forFeature(feature, PointsCsv.read(file));
        }
        throw new InputProblem(file.toString(), 0, 0, null, "not an inspection file (.json) or a points file (.csv)");
    }

    /** Points judged against the feature's chosen callout at the standard corner. */
    public static InspectionRequest forFeature(RadiusFeature f, PointSet points) {
        CornerKind kind = f.designCase().kind() == BlendKind.ROUND ? CornerKind.ROUND : CornerKind.FILLET;
        Corner corner = new Corner(new Point2(0, 0), new Point2(1, 0), new Point2(0, 1), kind);
        InspectionCallout callout = callout(f);
        return new InspectionRequest(f.designCase().units(), new Nominal.CornerBlend(corner, f.designCase().nominalRadius()),
                callout, points, f.designCase().units().resolution() * 1000, Double.NaN, true);
    }

    static InspectionCallout callout(RadiusFeature f) {
        Callout c = f.chosen() == null ? null : f.chosen().callout();
        if (c instanceof Callout.Radius r) return new InspectionCallout.RadiusLimits(RadiusKind.R, r.min(), r.max());
        if (c instanceof Callout.ControlledRadius r) return new InspectionCallout.RadiusLimits(RadiusKind.CR, r.min(), r.max());
        if (c instanceof Callout.Profile p) {
            ProfileZone zone = new ProfileZone(p.zone(), p.outward() == null ? p.zone() / 2 : p.outward());
            return new InspectionCallout.ProfileTolerance(zone, p.datums().isEmpty() ? Freedom.all() : Freedom.none(), p.dynamic());
        }
        throw InputProblem.ofField("callout", f.id() + " has no radius or profile callout chosen yet: decide it first");
    }

    /** What the worksheet keeps of a result. */
    public static InspectionRecord record(InspectionResult r, String source, LocalDate on) {
        Map<String, Object> figures = new LinkedHashMap<>();
        figures.put("callout", r.request().callout().describe());
        if (r.worst() != null) {
            figures.put("worstExcess", round(r.worst().excess()));
            figures.put("worstMeasure", r.worst().measure());
        }
        if (r.radius() != null) {
            figures.put("smallestRadius", round(r.radius().smallest()));
            figures.put("largestRadius", round(r.radius().largest()));
        }
        if (r.fits() != null && r.fits().leastSquares() != null) {
            figures.put("fittedRadius", round(r.fits().leastSquares().circle().r()));
        }
        if (r.profile() != null) figures.put("requiredZone", round(r.profile().requiredZone()));
        return new InspectionRecord(r.pass() ? "pass" : "fail", source, on.toString(), figures);
    }

    private static double round(double v) { return Math.round(v * 1e6) / 1e6; }
}
