/**
 * Darcy friction-factor correlations for full circular pipes, the flow-regime rule, and the
 * iterative Colebrook–White solver. Depends only on {@code caution}.
 */
package org.headway.friction;
