package org.headway.system;

import org.headway.caution.InputException;

/**
 * Condition at one end of a run: a free surface some height above the adjacent pipe end, with a
 * gauge pressure acting on it (0 for an open tank), or simply a gauge pressure at the pipe end
 * (level 0). Velocity at the ends is taken as negligible (large tanks or headers); a discharge into
 * a tank needs its exit loss (K = 1) listed as a fitting.
 *
 * @param level free-surface height above the adjacent pipe end (m); negative if below
 * @param pressure gauge pressure on the surface or at the pipe end (Pa)
 */
public record EndCondition(double level, double pressure) {

    /** An open tank at atmospheric pressure with its surface at the pipe end. */
    public static final EndCondition OPEN_AT_PIPE_END = new EndCondition(0.0, 0.0);

    public EndCondition {
        InputException.requireFinite("level", level);
        InputException.requireFinite("pressure", pressure);
        if (Math.abs(level) > 1e5 || Math.abs(pressure) > 1e9) {
            throw new InputException(
                    Math.abs(level) > 1e5 ? "level" : "pressure",
                    "value beyond the plausible limits (±100 km, ±1 GPa); check the number and its unit");
        }
    }

    /**
     * Head of this end relative to the adjacent pipe end.
     *
     * @param density fluid density (kg/m³)
     * @return level + p/(ρ g) (m)
     */
    public double head(double density) {
        return level + pressure / (density * Gravity.STANDARD);
    }
}
