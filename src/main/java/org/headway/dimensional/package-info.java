/**
 * Dimensional analysis: variables with their base-dimension exponents, Buckingham π groups and
 * the familiar named groups (Reynolds, Froude, …). Depends only on {@code caution}.
 */
package org.headway.dimensional;
