package org.headway.correlation;

/**
 * The summary statistics a fitted correlation keeps from its fit.
 *
 * @param residualSumOfSquares weighted RSS (units of the response squared)
 * @param residualStandardDeviation √(RSS/ν) (units of the response)
 * @param rSquared coefficient of determination (ratio)
 * @param adjustedRSquared R² adjusted for the number of parameters (ratio)
 * @param degreesOfFreedom ν = points − parameters
 * @param pointCount number of points fitted
 */
public record FitStatistics(
        double residualSumOfSquares,
        double residualStandardDeviation,
        double rSquared,
        double adjustedRSquared,
        int degreesOfFreedom,
        int pointCount) {}
