package org.headway.system;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.headway.caution.InputException;

/**
 * One straight run of a single pipe size with its fittings, from inlet to outlet. Build with
 * {@link #builder(String)}.
 *
 * @param name the name the engineer gave it, shown on every result
 * @param length pipe length (m), ≥ 0
 * @param innerDiameter inner diameter D (m), > 0
 * @param roughness absolute roughness ε used for the nominal result (m), 0 ≤ ε &lt; D
 * @param roughnessLow low end of the roughness range for the uncertainty band (m)
 * @param roughnessHigh high end of the roughness range for the uncertainty band (m)
 * @param roughnessSource where ε comes from (catalog source or "given")
 * @param pipeDescription material, nominal size and schedule in words, or "explicit bore"
 * @param pipeCondition condition of the pipe as the catalog gives it ("new", "aged", or empty)
 * @param fittings fittings and valves with counts
 * @param extraLossCoefficient an explicit additional K (ratio), ≥ 0
 * @param elevationChange outlet elevation minus inlet elevation (m)
 */
public record Segment(
        String name,
        double length,
        double innerDiameter,
        double roughness,
        double roughnessLow,
        double roughnessHigh,
        String roughnessSource,
        String pipeDescription,
        String pipeCondition,
        List<FittingUse> fittings,
        double extraLossCoefficient,
        double elevationChange) {

    /** Longest segment accepted (m): 10,000 km, far beyond any real run; guards against typos like 1e308. */
    public static final double MAX_LENGTH = 1e7;
    /** Largest bore accepted (m). */
    public static final double MAX_DIAMETER = 100;
    /** Largest elevation change accepted (m), about the depth of the deepest ocean trench ×10. */
    public static final double MAX_ELEVATION_CHANGE = 1e5;
    /** Largest explicit loss coefficient accepted (ratio). */
    public static final double MAX_LOSS_COEFFICIENT = 1e6;

    public Segment {
        Objects.requireNonNull(name, "name");
        InputException.requireNonNegative("length", length);
        InputException.requirePositive("inner diameter", innerDiameter);
        requireAtMost("length", length, MAX_LENGTH, "m");
        requireAtMost("inner diameter", innerDiameter, MAX_DIAMETER, "m");
        requireAtMost("elevation change", Math.abs(elevationChange), MAX_ELEVATION_CHANGE, "m");
        requireAtMost("loss coefficient", extraLossCoefficient, MAX_LOSS_COEFFICIENT, "");
        InputException.requireNonNegative("roughness", roughness);
        InputException.requireNonNegative("roughness low", roughnessLow);
        InputException.requireNonNegative("roughness high", roughnessHigh);
        if (roughness >= innerDiameter) {
            throw new InputException(
                    "roughness",
                    "roughness " + roughness + " m is not smaller than the inner diameter " + innerDiameter + " m");
        }
        if (roughnessLow > roughness || roughnessHigh < roughness) {
            throw new InputException(
                    "roughness",
                    "range " + roughnessLow + "–" + roughnessHigh + " m does not contain the value " + roughness
                            + " m");
        }
        if (roughnessHigh >= innerDiameter) {
            throw new InputException(
                    "roughness high",
                    "roughness " + roughnessHigh + " m is not smaller than the inner diameter " + innerDiameter + " m");
        }
        InputException.requireNonNegative("loss coefficient", extraLossCoefficient);
        InputException.requireFinite("elevation change", elevationChange);
        fittings = List.copyOf(fittings);
        roughnessSource = roughnessSource == null ? "" : roughnessSource;
        pipeDescription = pipeDescription == null ? "" : pipeDescription;
        pipeCondition = pipeCondition == null ? "" : pipeCondition;
    }

    private static void requireAtMost(String field, double value, double max, String unit) {
        if (value > max) {
            throw new InputException(
                    field,
                    "value " + value + (unit.isEmpty() ? "" : " " + unit) + " is beyond the plausible limit of " + max
                            + (unit.isEmpty() ? "" : " " + unit) + "; check the number and its unit");
        }
    }

    /** Relative roughness ε/D (ratio). */
    public double relativeRoughness() {
        return roughness / innerDiameter;
    }

    /** Flow area π D²/4 (m²). */
    public double area() {
        return Math.PI * innerDiameter * innerDiameter / 4.0;
    }

    /** A copy with another bore and roughness (used by sizing). */
    public Segment withPipe(double newInnerDiameter, double newRoughness, double low, double high, String description) {
        return new Segment(
                name,
                length,
                newInnerDiameter,
                newRoughness,
                low,
                high,
                roughnessSource,
                description,
                pipeCondition,
                fittings,
                extraLossCoefficient,
                elevationChange);
    }

    /** A copy with another length (used to check that loss scales with length). */
    public Segment withLength(double newLength) {
        return new Segment(
                name,
                newLength,
                innerDiameter,
                roughness,
                roughnessLow,
                roughnessHigh,
                roughnessSource,
                pipeDescription,
                pipeCondition,
                fittings,
                extraLossCoefficient,
                elevationChange);
    }

    /** A copy with the roughness moved to another value inside or at the ends of its range. */
    public Segment withRoughness(double newRoughness) {
        return new Segment(
                name,
                length,
                innerDiameter,
                newRoughness,
                Math.min(roughnessLow, newRoughness),
                Math.max(roughnessHigh, newRoughness),
                roughnessSource,
                pipeDescription,
                pipeCondition,
                fittings,
                extraLossCoefficient,
                elevationChange);
    }

    /** Starts a segment description. */
    public static Builder builder(String name) {
        return new Builder(name);
    }

    /** Step-by-step construction so that no caller fills a dozen positional arguments. */
    public static final class Builder {
        private final String name;
        private double length;
        private double innerDiameter = Double.NaN;
        private double roughness;
        private double roughnessLow = Double.NaN;
        private double roughnessHigh = Double.NaN;
        private String roughnessSource = "given";
        private String pipeDescription = "explicit bore";
        private String pipeCondition = "";
        private final List<FittingUse> fittings = new ArrayList<>();
        private double extraLossCoefficient;
        private double elevationChange;

        private Builder(String name) {
            this.name = name;
        }

        /** @param value pipe length (m) */
        public Builder length(double value) {
            length = value;
            return this;
        }

        /**
         * @param diameter inner diameter (m)
         * @param absoluteRoughness absolute roughness (m)
         */
        public Builder bore(double diameter, double absoluteRoughness) {
            innerDiameter = diameter;
            roughness = absoluteRoughness;
            return this;
        }

        /**
         * @param low low end of the roughness range (m)
         * @param high high end of the roughness range (m)
         */
        public Builder roughnessRange(double low, double high) {
            roughnessLow = low;
            roughnessHigh = high;
            return this;
        }

        public Builder roughnessSource(String value) {
            roughnessSource = value;
            return this;
        }

        public Builder pipeDescription(String value) {
            pipeDescription = value;
            return this;
        }

        public Builder pipeCondition(String value) {
            pipeCondition = value;
            return this;
        }

        public Builder fitting(FittingUse use) {
            fittings.add(use);
            return this;
        }

        /** @param k additional loss coefficient (ratio) */
        public Builder extraLossCoefficient(double k) {
            extraLossCoefficient = k;
            return this;
        }

        /** @param rise outlet minus inlet elevation (m) */
        public Builder elevationChange(double rise) {
            elevationChange = rise;
            return this;
        }

        public Segment build() {
            if (Double.isNaN(innerDiameter)) {
                throw new InputException(name, "no inner diameter given");
            }
            double low = Double.isNaN(roughnessLow) ? roughness : roughnessLow;
            double high = Double.isNaN(roughnessHigh) ? roughness : roughnessHigh;
            return new Segment(
                    name,
                    length,
                    innerDiameter,
                    roughness,
                    low,
                    high,
                    roughnessSource,
                    pipeDescription,
                    pipeCondition,
                    fittings,
                    extraLossCoefficient,
                    elevationChange);
        }
    }
}
