package org.arcwright.simulate;

import org.arcwright.io.DecimalText;
import org.arcwright.io.InputProblem;

/**
 * What the function asks of the true blend (the advisor's needs), judged on the generator's true
 * geometry, never on the measurement.
 *
 * @param minRadius smallest local radius allowed anywhere on the blend, the corners of a flat
 *     included (local radius 0 there); 0 for no lower limit
 * @param maxRadius largest blend radius allowed; infinite for no upper limit
 * @param maxPositionError largest distance of the blend from its nominal place; NaN: not a need
 * @param maxStep largest step where the blend meets a surface; NaN: not a need
 */
public record Needs(double minRadius, double maxRadius, double maxPositionError, double maxStep) {
    public Needs {
        if (!(minRadius >= 0) || !Double.isFinite(minRadius)) throw InputProblem.ofField("minRadius", "must be zero or more, got " + DecimalText.exact(minRadius));
        if (!(maxRadius > 0)) throw InputProblem.ofField("maxRadius", "must be above zero, got " + DecimalText.exact(maxRadius));
        if (maxRadius < minRadius) throw InputProblem.ofField("maxRadius", "is smaller than minRadius (" + DecimalText.exact(maxRadius) + " < " + DecimalText.exact(minRadius) + ")");
        if (!Double.isNaN(maxPositionError) && !(maxPositionError >= 0)) throw InputProblem.ofField("maxPositionError", "must be zero or more, got " + DecimalText.exact(maxPositionError));
        if (!Double.isNaN(maxStep) && !(maxStep >= 0)) throw InputProblem.ofField("maxStep", "must be zero or more, got " + DecimalText.exact(maxStep));
    }

    /** Whether the true part meets every need. */
    public boolean metBy(Part p) {
        if (p.minLocalRadius() < minRadius) return false;
        if (p.radius() > maxRadius) return false;
        if (!Double.isNaN(maxPositionError) && p.positionError() > maxPositionError) return false;
        return Double.isNaN(maxStep) || p.step() <= maxStep;
    }

    /** The needs in words, for reports. */
    public String describe(String unit) {
        StringBuilder sb = new StringBuilder("local radius >= ").append(num(minRadius)).append(' ').append(unit)
                .append(" everywhere (corners of a flat count as 0)");
        if (Double.isFinite(maxRadius)) sb.append(", radius <= ").append(num(maxRadius)).append(' ').append(unit);
        if (!Double.isNaN(maxPositionError)) sb.append(", position error <= ").append(num(maxPositionError)).append(' ').append(unit);
        if (!Double.isNaN(maxStep)) sb.append(", step <= ").append(num(maxStep)).append(' ').append(unit);
        return sb.toString();
    }

    static String num(double v) {
        return DecimalText.exact(v);
    }
}
