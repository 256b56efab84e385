/**
 * Pipe materials and roughness, nominal sizes and schedules, fittings and their loss-coefficient
 * methods, loaded from the catalog files in {@code fluids-data/}.
 */
package org.headway.pipe;
