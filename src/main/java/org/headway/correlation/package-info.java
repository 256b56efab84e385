/**
 * Correlations the user fitted to their own data, as value objects: evaluated with range cautions,
 * saved, and used as a friction method ({@code FittedFrictionCorrelation}) or a fitting's loss
 * coefficient ({@code FittedLossCoefficient}). Depends on {@code fitting}, {@code friction} and
 * {@code caution}.
 */
package org.headway.correlation;
