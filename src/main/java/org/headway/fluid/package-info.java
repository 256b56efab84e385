/**
 * Liquid property models: water by the IAPWS formulations, seawater, glycol solutions, a mineral
 * oil and user-defined fluids, each value with its source.
 */
package org.headway.fluid;
