/**
 * The pipe-run engine: segments from source to delivery, head loss for a flow, flow for an
 * available head, size for limits, system and pump curves, operating point, NPSH available and the
 * uncertainty band. Quantities are SI doubles.
 */
package org.headway.system;
