package org.arcwright.templates;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import org.arcwright.callout.Callout;
import org.arcwright.callout.Extent;
import org.arcwright.callout.ProfileTier;
import org.arcwright.model.DesignCase;
import org.arcwright.rules.NoteLink;
import org.arcwright.rules.Recommendation;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.arcwright.worksheet.InspectionRecord;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The values a note template is filled from, built from a part worksheet: exactly the fields of
 * {@link NoteFields}, as maps, lists, strings and booleans. Every number is formatted here through
 * {@link DrawingStyle} in the part's style and units.
 */
public final class NoteContext {
    private final PartWorksheet worksheet;
    private final CalloutText text;
    private final String generatedBy;

    /**
     * @param worksheet the part
     * @param generatedBy the program and version to name in the notes, e.g. {@code Arcwright 0.1.0}
     */
    public NoteContext(PartWorksheet worksheet, String generatedBy) {
        this.worksheet = Objects.requireNonNull(worksheet, "worksheet");
        this.text = new CalloutText(worksheet.standard(), worksheet.units());
        this.generatedBy = generatedBy == null ? "Arcwright" : generatedBy;
    }

    /** The context of a part-level template. */
    public Map<String, Object> forPart() {
        Map<String, Object> m = new LinkedHashMap<>();
        PartWorksheet.PartInfo p = worksheet.part();
        m.put("part", map("number", p.number(), "name", nz(p.name()), "material", nz(p.material()),
                "company", nz(p.company()), "revision", nz(p.revision())));
        boolean asme = worksheet.standard() == DrawingStyle.ASME;
        m.put("standard", asme ? "ASME Y14.5-2018" : "ISO 1101 / ISO 129-1");
        m.put("asme", asme);
        m.put("iso", !asme);
        m.put("units", worksheet.units().symbol());
        m.put("unitsWord", worksheet.units() == Units.MM ? "MILLIMETRES" : "INCHES");
        PartWorksheet.TitleBlock tb = worksheet.titleBlock();
        m.put("titleBlock", map("table", nz(tb.table()), "toleranceClass", nz(tb.toleranceClass()),
                "text", CalloutText.tableText(tb.table(), tb.toleranceClass()),
                // ISO 2768-1:1989: an internal fillet radius is a linear size (Table 1); only external radii and
                // chamfer heights are broken edges (Table 2); the standard's own advice is to say so on the drawing
                "radiiTables", tb.table() != null && tb.table().startsWith("iso2768-1")
                        ? "INTERNAL FILLET RADII AS LINEAR SIZES (ISO 2768-1 TABLE 1), EXTERNAL RADII AND CHAMFER HEIGHTS "
                        + "AS BROKEN EDGES (TABLE 2)" : ""));
        List<Map<String, Object>> all = new ArrayList<>();
        List<Map<String, Object>> decided = new ArrayList<>();
        List<Map<String, Object>> edges = new ArrayList<>();
        for (RadiusFeature f : worksheet.features()) {
            Map<String, Object> fm = feature(f);
            all.add(fm);
            if (f.chosen() != null) decided.add(fm);
            if (f.chosen() != null && f.chosen().callout() instanceof Callout.General) edges.add(fm);
        }
        m.put("featureCount", Integer.toString(all.size()));
        m.put("decidedCount", Integer.toString(decided.size()));
        m.put("openCount", Integer.toString(all.size() - decided.size()));
        m.put("features", all);
        m.put("decidedFeatures", decided);
        m.put("edgeFeatures", edges);
        m.put("hasEdgeFeatures", !edges.isEmpty());
        m.put("allDecided", decided.size() == all.size());
        m.put("generatedBy", generatedBy);
        return m;
    }

    /** The context of a per-feature template: the part's, plus {@code feature}. */
    public Map<String, Object> forFeature(RadiusFeature f) {
        Map<String, Object> m = forPart();
        m.put("feature", feature(f));
        return m;
    }

    /** The fields of one feature, as {@link NoteFields#FEATURE} lists them. */
    public Map<String, Object> feature(RadiusFeature f) {
        DesignCase c = f.designCase();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", f.id());
        m.put("label", c.feature() == null ? f.id() : c.feature());
        m.put("kind", c.kind().key());
        m.put("function", c.function().key());
        m.put("process", c.process().key());
        m.put("nominal", text.value(c.nominalRadius()));
        m.put("status", f.status().label());
        Recommendation r = f.chosen();
        m.put("decided", r != null);
        m.put("undecided", r == null);
        for (String k : List.of("callout", "calloutUnicode", "calloutWords", "controlName", "min", "max", "zone",
                "outward", "isoOffset", "datums", "extent", "extentFrom", "extentTo", "table", "toleranceClass",
                "edgeNote", "ruleId")) {
            m.put(k, "");
        }
        for (String k : List.of("isRadius", "isControlledRadius", "isProfile", "isComposite", "isGeneral", "unequal",
                "dynamic", "hasDatums", "allAround", "allOver", "between", "hasEdgeNote", "inspected")) {
            m.put(k, false);
        }
        m.put("tiers", List.of());
        m.put("because", List.of());
        m.put("cautions", List.of());
        m.put("references", List.of());
        m.put("figures", List.of());
        m.put("notes", List.of());
        if (r != null) {
            Callout co = r.callout();
            m.put("callout", text.line(co, false));
            m.put("calloutUnicode", text.line(co, true));
            m.put("calloutWords", text.words(co));
            m.put("controlName", CalloutText.controlName(co));
            m.put("ruleId", nz(r.ruleId()));
            calloutFields(co, m);
            m.put("because", r.because());
            m.put("cautions", r.cautions());
            m.put("references", r.references());
            m.put("figures", figures(r.numbers().asMap()));
            List<Map<String, Object>> notes = new ArrayList<>();
            for (NoteLink n : r.notes()) notes.add(map("id", nz(n.id()), "title", nz(n.title()), "pack", nz(n.pack())));
            m.put("notes", notes);
        }
        InspectionRecord ins = f.inspection();
        m.put("inspected", ins != null);
        if (ins != null) {
            Map<String, Object> im = map("verdict", ins.verdict(), "source", nz(ins.source()),
                    "measuredOn", nz(ins.measuredOn()));
            im.put("passed", ins.passed());
            im.put("indeterminate", ins.undecided());
            im.put("figures", figures(ins.figures()));
            m.put("inspection", im);
        }
        return m;
    }

    private void calloutFields(Callout co, Map<String, Object> m) {
        m.put("isRadius", co instanceof Callout.Radius);
        m.put("isControlledRadius", co instanceof Callout.ControlledRadius);
        m.put("isProfile", co instanceof Callout.Profile);
        m.put("isComposite", co instanceof Callout.CompositeProfile);
        m.put("isGeneral", co instanceof Callout.General);
        if (co instanceof Callout.Radius r) {
            String[] pair = text.limits(r.min(), r.max());
            m.put("min", pair[0]);
            m.put("max", pair[1]);
        } else if (co instanceof Callout.ControlledRadius r) {
            String[] pair = text.limits(r.min(), r.max());
            m.put("min", pair[0]);
            m.put("max", pair[1]);
        } else if (co instanceof Callout.Profile p) {
            m.put("zone", text.value(p.zone()));
            m.put("unequal", p.isUnequal());
            if (p.isUnequal()) {
                m.put("outward", text.value(p.outward()));
                m.put("isoOffset", text.signed(p.isoOffset()));
            }
            m.put("dynamic", p.dynamic());
            m.put("datums", CalloutText.datumList(p.datums()));
            m.put("hasDatums", !p.datums().isEmpty());
            extentFields(p.extent(), m);
        } else if (co instanceof Callout.CompositeProfile cp) {
            m.put("zone", text.value(cp.tiers().get(0).zone()));
            m.put("datums", CalloutText.datumList(cp.allDatums()));
            m.put("hasDatums", !cp.allDatums().isEmpty());
            List<Map<String, Object>> tiers = new ArrayList<>();
            for (ProfileTier t : cp.tiers()) {
                Map<String, Object> tm = map("zone", text.value(t.zone()), "datums", CalloutText.datumList(t.datums()));
                tm.put("hasDatums", !t.datums().isEmpty());
                tiers.add(tm);
            }
            m.put("tiers", tiers);
            extentFields(cp.extent(), m);
        } else if (co instanceof Callout.General g) {
            m.put("table", nz(g.table()));
            m.put("toleranceClass", nz(g.toleranceClass()));
            m.put("edgeNote", nz(g.edgeNote()));
            m.put("hasEdgeNote", g.edgeNote() != null);
        }
    }

    private static void extentFields(Extent e, Map<String, Object> m) {
        m.put("extent", CalloutText.extentWords(e));
        m.put("allAround", e.kind() == Extent.Kind.ALL_AROUND);
        m.put("allOver", e.kind() == Extent.Kind.ALL_OVER);
        m.put("between", e.kind() == Extent.Kind.BETWEEN);
        m.put("extentFrom", nz(e.from()));
        m.put("extentTo", nz(e.to()));
    }

    /** Labelled, formatted figures from a recommendation's or an inspection's numbers. */
    public List<Map<String, Object>> figures(Map<String, Object> numbers) {
        List<Map<String, Object>> out = new ArrayList<>();
        for (Figures.Figure f : Figures.of(numbers, text)) out.add(map("label", f.label(), "value", f.value()));
        return out;
    }

    private static Map<String, Object> map(Object... kv) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int i = 0; i < kv.length; i += 2) m.put((String) kv[i], kv[i + 1]);
        return m;
    }

    private static String nz(String s) { return s == null ? "" : s; }

    static String lower(String s) { return s.toLowerCase(Locale.ROOT); }
}
