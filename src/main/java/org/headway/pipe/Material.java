package org.headway.pipe;

import java.util.Optional;

/**
 * A pipe material and condition with its absolute roughness.
 *
 * @param id stable id used in project files, e.g. {@code steel-commercial-new}
 * @param name plain-words name
 * @param roughness typical absolute roughness ε (m)
 * @param roughnessLow low end of the published range (m)
 * @param roughnessHigh high end of the published range (m)
 * @param condition "new", "aged", … as the source states
 * @param sizeTable id of the size table this material's nominal sizes come from (e.g. {@code
 *     asme-b36.10m}), empty if none
 * @param source publication the roughness comes from, or "from memory"/"common practice, no source"
 * @param hazenWilliams the material's Hazen–Williams C with its source, when the catalog gives one
 */
public record Material(
        String id,
        String name,
        double roughness,
        double roughnessLow,
        double roughnessHigh,
        String condition,
        String sizeTable,
        String source,
        Optional<HazenWilliamsCoefficient> hazenWilliams) {

    public Material {
        hazenWilliams = hazenWilliams == null ? Optional.empty() : hazenWilliams;
    }
}
