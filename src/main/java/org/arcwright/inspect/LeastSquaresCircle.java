package org.arcwright.inspect;

/**
 * Geometric least-squares circle: minimises the sum of squared distances {@code Σ(|pᵢ - c| - r)²}.
 *
 * @param circle the fit
 * @param rms root-mean-square of the residuals
 * @param iterations Levenberg-Marquardt steps taken after the algebraic start
 */
public record LeastSquaresCircle(Circle circle, double rms, int iterations) {}
