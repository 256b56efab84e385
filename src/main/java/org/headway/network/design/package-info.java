/**
 * Network design on top of the solver: balancing valves to their design flows (Kv, authority, the
 * index circuit and the source head it needs, settings from a maker's table), the fire flow a
 * junction can draw at a residual pressure, and the range of pressures and pump duties over pipe
 * roughness ranges and a demand multiplier (corners where they bound, seeded Monte Carlo
 * otherwise). Each runs the network solver several times; none
 * changes it.
 */
package org.headway.network.design;
