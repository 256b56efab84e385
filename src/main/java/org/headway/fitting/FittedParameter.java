package org.headway.fitting;

/**
 * One fitted parameter with its uncertainty.
 *
 * @param name parameter name as it appears in the model
 * @param value least-squares estimate (units implied by the model)
 * @param standardError asymptotic standard error, from σ²(JᵀJ)⁻¹ at the solution (same units)
 * @param ci95Low lower end of the 95 % confidence interval, value − t(0.975, ν)·SE (Student t)
 * @param ci95High upper end of the 95 % confidence interval
 */
public record FittedParameter(String name, double value, double standardError, double ci95Low, double ci95High) {}
