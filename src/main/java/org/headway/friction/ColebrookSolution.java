package org.headway.friction;

/**
 * How a Colebrook–White solve ended.
 *
 * @param frictionFactor Darcy friction factor f (ratio)
 * @param iterations residual evaluations spent
 * @param relativeResidual |F(x)|/x at the last evaluated iterate x = 1/√f (ratio), at most the
 *     solver's tolerance; the returned f carries one further Newton correction from that residual
 */
public record ColebrookSolution(double frictionFactor, int iterations, double relativeResidual) {}
