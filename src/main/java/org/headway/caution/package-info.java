/**
 * Structured cautions attached to every result, and the one error type for bad input.
 *
 * <p>Every engine reports what a reviewer should know (transitional flow, use outside a validity
 * range, cavitation risk…) as {@link org.headway.caution.Caution} values; bad input raises {@link
 * org.headway.caution.InputException} naming where the value came from.
 */
package org.headway.caution;
