package org.headway.friction;

/**
 * Range of Reynolds number and relative roughness over which a correlation's author states it
 * holds (bounds inclusive).
 *
 * @param minReynolds lowest Reynolds number (ratio)
 * @param maxReynolds highest Reynolds number (ratio)
 * @param minRelativeRoughness lowest ε/D (ratio)
 * @param maxRelativeRoughness highest ε/D (ratio)
 * @param basis where the range is stated (publication and page/equation)
 */
public record ValidityRange(
        double minReynolds,
        double maxReynolds,
        double minRelativeRoughness,
        double maxRelativeRoughness,
        String basis) {

    /** Whether a point lies inside the range. */
    public boolean contains(double reynolds, double relativeRoughness) {
        return reynolds >= minReynolds
                && reynolds <= maxReynolds
                && relativeRoughness >= minRelativeRoughness
                && relativeRoughness <= maxRelativeRoughness;
    }
}
