/**
 * Fitting correlations to the user's own data and dimensional analysis: least-squares fits of
 * built-in forms and user expressions (a thin adapter over Commons Math), the fitted correlation as
 * a value object usable as a friction or loss-coefficient method, and Buckingham π groups.
 * Depends only on {@code friction} and {@code caution}.
 */
package org.headway.correlation;
