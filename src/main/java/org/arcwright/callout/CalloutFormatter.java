package org.arcwright.callout;

import java.util.List;
import java.util.Objects;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.RadiusCallout;
import org.arcwright.tolerance.Units;

/**
 * The advisor's one-line callout text, every number through the drawing style ({@link DrawingStyle#format} for
 * radii, {@link DrawingStyle#formatValue} for zones and offsets), so an inch ASME zone reads {@code .004} and an
 * ISO callout never carries an ASME-only mark:
 * <ul>
 *   <li>unequally disposed zone: ASME Y14.5-2018 {@code Ⓤ} with the outward value; ISO 1101:2017 {@code UZ} with
 *       the signed offset of the zone's centre (+ toward the outside of the material);</li>
 *   <li>dynamic profile: ASME's word {@code dynamic}; ISO 1101:2017 has no dynamic profile, and its unspecified
 *       offset zone {@code OZ} is written instead (from memory);</li>
 *   <li>controlled radius: ASME only; the ISO form is an R with limits ({@link DrawingStyle#format} does it).</li>
 * </ul>
 */
public final class CalloutFormatter {
    private final DrawingStyle style;
    private final Units units;

    public CalloutFormatter(DrawingStyle style, Units units) {
        this.style = Objects.requireNonNull(style, "style");
        this.units = Objects.requireNonNull(units, "units");
    }

    /** A radius callout as drawn. */
    public String radius(RadiusCallout rc) { return style.format(rc); }

    /** A zone, offset or length as the style writes it (at most four places). */
    public String value(double v) { return style.formatValue(v, units, 4); }

    /** A signed value: {@code +0.02}, {@code -0.03}, {@code 0}. */
    public String signed(double v) {
        String s = value(v);
        return v > 0 && Double.parseDouble(s) != 0 ? "+" + s : s;
    }

    /**
     * One profile frame: {@code |⌓|zone[ modifier]|A|B|}.
     *
     * @param outward the ASME unequally disposed value, or null for an equal-bilateral zone
     */
    public String frame(double zone, Double outward, List<DatumReference> datums, boolean dynamic) {
        StringBuilder sb = new StringBuilder("|\u2313|").append(value(zone));
        if (outward != null && Math.abs(outward - zone / 2) > 1e-12) {
            if (style == DrawingStyle.ISO) sb.append(" UZ").append(signed(outward - zone / 2));
            else sb.append(" \u24CA ").append(value(outward));
        }
        if (dynamic && style == DrawingStyle.ISO) sb.append(" OZ");
        sb.append('|');
        for (DatumReference r : datums) sb.append(r.text()).append('|');
        if (dynamic && style == DrawingStyle.ASME) sb.append(" dynamic");
        return sb.toString();
    }

    /** A profile or composite profile on one line, with its extent in words. */
    public String profile(Callout c) {
        if (c instanceof Callout.Profile p) return frame(p.zone(), p.outward(), p.datums(), p.dynamic()) + extent(p.extent());
        if (c instanceof Callout.CompositeProfile cp) {
            StringBuilder sb = new StringBuilder();
            for (int i = 0; i < cp.tiers().size(); i++) {
                if (i > 0) sb.append(" over ");
                sb.append(frame(cp.tiers().get(i).zone(), null, cp.tiers().get(i).datums(), false));
            }
            sb.append(style == DrawingStyle.ISO ? " stacked" : " composite").append(extent(cp.extent()));
            return sb.toString();
        }
        throw new IllegalArgumentException("not a profile: " + c.typeName());
    }

    /** Where a profile applies, in words, with a leading space. */
    public static String extent(Extent e) {
        return switch (e.kind()) {
            case THIS_RADIUS -> " on the radius, tangent to tangent";
            case WITH_ADJACENT -> " on the radius and its adjacent surfaces";
            case BETWEEN -> " between " + e.from() + " and " + e.to();
            case ALL_AROUND -> " all around";
            case ALL_OVER -> " all over";
        };
    }
}
