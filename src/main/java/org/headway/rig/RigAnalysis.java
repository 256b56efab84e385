package org.headway.rig;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.SplittableRandom;
import java.util.function.Consumer;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.friction.ConvergenceException;
import org.headway.friction.FlowRegime;
import org.headway.friction.FlowRegimes;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.ValidityRange;

/**
 * Rig friction data against a friction correlation: per point the velocity, Reynolds number,
 * measured friction factor, relative roughness, regime, deviation from the correlation and the
 * propagated uncertainty; over the data set a one-pass summary and the effective roughness.
 *
 * <p>Equations, with Q the flow (m³/s), Δp the pressure drop between the taps (Pa), D the bore (m),
 * L the tap spacing (m), ρ the density (kg/m³), μ the viscosity (Pa·s): V = 4Q/(πD²); Re = ρVD/μ;
 * Darcy–Weisbach solved for the friction factor, f = 2ΔpD/(ρV²L) (H. Darcy 1857, J. Weisbach 1845;
 * the definition of the Darcy friction factor, common practice); deviation = f/f_ref − 1.
 * Uncertainty by {@link RigUncertaintyPropagation}; roughness by {@link EffectiveRoughnessFit}.
 *
 * <p>Streaming: {@link #analyse(Iterator, int, Consumer)} reads each point once, hands each result
 * to a sink, keeps only the first {@code keepPoints} results and, for the roughness fit, the Re and f
 * of turbulent points (16 bytes each, at most {@value #MAX_FIT_POINTS}; beyond that a fixed-seed
 * uniform reservoir sample of that size, with a note). Summary statistics are running sums, so a data set of a
 * million rows needs no list of its points.
 */
public final class RigAnalysis {

    /**
     * Most turbulent points kept for the roughness fit; beyond, a uniform sample of this size. The
     * fit evaluates Colebrook–White about 130 times per point; 10⁵ points keep it near a second
     * while the interval from them is already narrower than any systematic error of a rig.
     */
    public static final int MAX_FIT_POINTS = 100_000;

    private static final long SAMPLE_SEED = 20_261_201L;
    private static final UncertaintySource[] SOURCES = UncertaintySource.values();

    private final RigDescription description;

    private RigAnalysis(RigDescription description) {
        this.description = Objects.requireNonNull(description, "description");
    }

    /**
     * @param description the rig
     * @return an analysis of data measured on that rig
     */
    public static RigAnalysis of(RigDescription description) {
        return new RigAnalysis(description);
    }

    /** The rig. */
    public RigDescription description() {
        return description;
    }

    /**
     * Analyses one point on its own.
     *
     * @param point the measured point
     * @return velocity, Re, f, deviation and uncertainty at the point
     */
    public RigPointResult analysePoint(RigPoint point) {
        double[] fShares = new double[SOURCES.length];
        double[] reShares = new double[SOURCES.length];
        return analysePoint(point, fShares, reShares);
    }

    private RigPointResult analysePoint(RigPoint point, double[] fShares, double[] reShares) {
        double diameter = description.innerDiameter();
        double area = Math.PI * diameter * diameter / 4.0;
        double velocity = point.flow() / area;
        double density = point.fluid().density();
        double viscosity = point.fluid().dynamicViscosity();
        double reynolds = density * velocity * diameter / viscosity;
        double friction =
                2.0 * point.pressureDrop() * diameter / (density * velocity * velocity * description.tapSpacing());
        if (!(reynolds > 0) || !(friction > 0) || Double.isInfinite(reynolds) || Double.isInfinite(friction)) {
            throw new InputException(
                    "point at line " + point.line(),
                    "Re = " + reynolds + " and f = " + friction + " cannot be computed from flow " + point.flow()
                            + " m³/s and pressure drop " + point.pressureDrop() + " Pa");
        }
        double relativeRoughness = description.relativeRoughness();
        FrictionCorrelation comparison = description.comparison();
        OptionalDouble reference = OptionalDouble.empty();
        OptionalDouble deviation = OptionalDouble.empty();
        try {
            double fRef = comparison.frictionFactor(reynolds, relativeRoughness);
            reference = OptionalDouble.of(fRef);
            deviation = OptionalDouble.of(friction / fRef - 1.0);
        } catch (InputException | ConvergenceException e) {
            // Reported as a point the correlation could not evaluate.
        }
        boolean inside = comparison.validity().contains(reynolds, relativeRoughness);
        RigUncertaintyPropagation.contributions(point, description, fShares, reShares);
        PointUncertainty uncertainty = RigUncertaintyPropagation.summarise(fShares, reShares, reynolds, friction);
        return new RigPointResult(
                point.line(),
                point.flow(),
                point.pressureDrop(),
                point.temperature(),
                density,
                viscosity,
                velocity,
                reynolds,
                friction,
                relativeRoughness,
                FlowRegimes.of(reynolds),
                reference,
                deviation,
                inside,
                uncertainty,
                point.carried());
    }

    /**
     * Analyses a list of points and keeps every per-point result.
     *
     * @param points the measured points
     * @return summary, per-point results, effective roughness and cautions
     */
    public RigReport analyse(List<RigPoint> points) {
        return analyse(points.iterator(), Integer.MAX_VALUE, r -> {});
    }

    /**
     * Analyses points one at a time.
     *
     * @param points the measured points, read once
     * @param keepPoints how many per-point results to keep in the report (the first ones), ≥ 0
     * @param sink receives every per-point result in order, e.g. to write it out
     * @return summary, the kept per-point results, effective roughness and cautions
     * @throws InputException if there are no points, or a point cannot be analysed
     */
    public RigReport analyse(Iterator<RigPoint> points, int keepPoints, Consumer<RigPointResult> sink) {
        if (keepPoints < 0) {
            throw new InputException("keep points", "must not be negative, got " + keepPoints);
        }
        Accumulator acc = new Accumulator(keepPoints);
        double[] fShares = new double[SOURCES.length];
        double[] reShares = new double[SOURCES.length];
        while (points.hasNext()) {
            RigPointResult result = analysePoint(points.next(), fShares, reShares);
            acc.add(result, fShares);
            sink.accept(result);
        }
        if (acc.count == 0) {
            throw new InputException("data", "there are no data points");
        }
        return acc.finish();
    }

    /** Running sums of one pass. */
    private final class Accumulator {
        private final int keepLimit;
        private final List<RigPointResult> kept = new ArrayList<>();
        private final SplittableRandom sampler = new SplittableRandom(SAMPLE_SEED);
        private final double[] shareSums = new double[SOURCES.length];
        private double[] fitReynolds = new double[1024];
        private double[] fitFriction = new double[1024];
        private int fitCount;
        private long turbulentSeen;
        private long count;
        private long laminar;
        private long transitional;
        private long turbulent;
        private long compared;
        private long outside;
        private long notEvaluated;
        private long significant;
        private double deviationSum;
        private double deviationSquares;
        private double maxDeviation;
        private long maxDeviationLine;
        private double minReynolds = Double.POSITIVE_INFINITY;
        private double maxReynolds = 0;
        private double fUncertaintySum;
        private double fUncertaintyMax;
        private double reUncertaintySum;
        private double reUncertaintyMax;
        private double varianceStated;

        Accumulator(int keepLimit) {
            this.keepLimit = keepLimit;
        }

        void add(RigPointResult r, double[] fShares) {
            count++;
            if (kept.size() < keepLimit) {
                kept.add(r);
            }
            switch (r.regime()) {
                case LAMINAR -> laminar++;
                case TRANSITIONAL -> transitional++;
                case TURBULENT -> {
                    turbulent++;
                    keepForFit(r.reynolds(), r.frictionFactor());
                }
            }
            minReynolds = Math.min(minReynolds, r.reynolds());
            maxReynolds = Math.max(maxReynolds, r.reynolds());
            PointUncertainty u = r.uncertainty();
            double uf = u.frictionExpandedRelative();
            double ure = u.reynoldsExpandedRelative();
            fUncertaintySum += uf;
            reUncertaintySum += ure;
            fUncertaintyMax = Math.max(fUncertaintyMax, uf);
            reUncertaintyMax = Math.max(reUncertaintyMax, ure);
            double variance = 0;
            for (double s : fShares) {
                variance += s;
            }
            if (variance > 0) {
                varianceStated++;
                for (int i = 0; i < fShares.length; i++) {
                    shareSums[i] += fShares[i] / variance;
                }
            }
            if (r.deviation().isEmpty()) {
                notEvaluated++;
            } else if (r.regime() == FlowRegime.TRANSITIONAL) {
                // No correlation describes intermittent flow; these points stay out of the statistics.
            } else if (!r.insideValidity()) {
                outside++;
            } else {
                double d = r.deviation().getAsDouble();
                compared++;
                deviationSum += d;
                deviationSquares += d * d;
                if (Math.abs(d) > Math.abs(maxDeviation) || compared == 1) {
                    maxDeviation = d;
                    maxDeviationLine = r.line();
                }
                // |f/f_ref − 1| against U(f)/f of the measurement alone, to first order.
                if (uf > 0 && Math.abs(d) > uf * (1.0 + d)) {
                    significant++;
                }
            }
        }

        private void keepForFit(double reynolds, double friction) {
            turbulentSeen++;
            if (fitCount < MAX_FIT_POINTS) {
                if (fitCount == fitReynolds.length) {
                    int grown = (int) Math.min(MAX_FIT_POINTS, 2L * fitReynolds.length);
                    fitReynolds = Arrays.copyOf(fitReynolds, grown);
                    fitFriction = Arrays.copyOf(fitFriction, grown);
                }
                fitReynolds[fitCount] = reynolds;
                fitFriction[fitCount] = friction;
                fitCount++;
                return;
            }
            // Reservoir sampling (Vitter's algorithm R): each turbulent point kept with equal chance.
            long slot = sampler.nextLong(turbulentSeen);
            if (slot < MAX_FIT_POINTS) {
                fitReynolds[(int) slot] = reynolds;
                fitFriction[(int) slot] = friction;
            }
        }

        RigReport finish() {
            Map<UncertaintySource, Double> shares = new EnumMap<>(UncertaintySource.class);
            Optional<UncertaintySource> dominant = Optional.empty();
            double bestShare = 0;
            for (int i = 0; i < SOURCES.length; i++) {
                double share = varianceStated > 0 ? shareSums[i] / varianceStated : 0.0;
                shares.put(SOURCES[i], share);
                if (share > bestShare) {
                    bestShare = share;
                    dominant = Optional.of(SOURCES[i]);
                }
            }
            RigSummary summary = new RigSummary(
                    count,
                    laminar,
                    transitional,
                    turbulent,
                    description.comparison().id(),
                    compared,
                    outside,
                    notEvaluated,
                    compared > 0 ? OptionalDouble.of(deviationSum / compared) : OptionalDouble.empty(),
                    compared > 0 ? OptionalDouble.of(Math.sqrt(deviationSquares / compared)) : OptionalDouble.empty(),
                    compared > 0 ? OptionalDouble.of(maxDeviation) : OptionalDouble.empty(),
                    maxDeviationLine,
                    significant,
                    minReynolds,
                    maxReynolds,
                    fUncertaintySum / count,
                    fUncertaintyMax,
                    reUncertaintySum / count,
                    reUncertaintyMax,
                    dominant,
                    shares);
            EffectiveRoughness roughness =
                    EffectiveRoughnessFit.fit(fitReynolds, fitFriction, fitCount, description.innerDiameter());
            List<Caution> cautions = cautions(summary, roughness);
            return new RigReport(description, summary, kept, kept.size() == count, roughness, cautions);
        }

        private List<Caution> cautions(RigSummary s, EffectiveRoughness roughness) {
            List<Caution> cautions = new ArrayList<>();
            FrictionCorrelation comparison = description.comparison();
            if (s.transitionalCount() > 0) {
                cautions.add(Caution.warning(
                        "transitional-flow",
                        s.transitionalCount() + " point" + plural(s.transitionalCount())
                                + (s.transitionalCount() == 1 ? " lies" : " lie") + " in the transitional"
                                + " range (2300 ≤ Re < 4000): the flow may switch between laminar and turbulent, so no"
                                + " correlation describes them reliably; they are left out of the deviation statistics and the"
                                + " roughness fit",
                        FlowRegimes.BASIS));
            }
            if (s.outsideValidityCount() > 0) {
                ValidityRange v = comparison.validity();
                cautions.add(Caution.warning(
                        "outside-validity-range",
                        s.outsideValidityCount() + " point" + plural(s.outsideValidityCount())
                                + (s.outsideValidityCount() == 1 ? " lies" : " lie") + " outside the validity range of "
                                + comparison.displayName() + " ("
                                + number(v.minReynolds()) + " ≤ Re ≤ " + number(v.maxReynolds()) + ", "
                                + number(v.minRelativeRoughness()) + " ≤ ε/D ≤ " + number(v.maxRelativeRoughness())
                                + "): their deviation is an extrapolation of the correlation, shown per point but"
                                + " left out of the deviation statistics",
                        v.basis()));
            }
            if (s.notEvaluatedCount() > 0) {
                cautions.add(Caution.warning(
                        "not-evaluated",
                        comparison.displayName() + " gives no value at " + s.notEvaluatedCount() + " point"
                                + plural(s.notEvaluatedCount()) + "; they have no deviation",
                        "common practice, no source"));
            }
            if (s.comparedCount() == 0) {
                cautions.add(Caution.warning(
                        "nothing-compared",
                        "no point lies inside the validity range of " + comparison.displayName()
                                + "; there are no deviation statistics (choose another comparison method)",
                        comparison.validity().basis()));
            }
            if (description.relativeRoughness() > EffectiveRoughnessFit.MAX_RELATIVE_ROUGHNESS) {
                cautions.add(Caution.warning(
                        "roughness-beyond-chart",
                        "the roughness estimate ε/D = " + number(description.relativeRoughness())
                                + " is beyond the usual chart range (ε/D ≤ 0.05); correlations are extrapolated",
                        "common practice, no source"));
            }
            if (!description.uncertainty().isStated()) {
                cautions.add(Caution.note(
                        "uncertainty-not-stated",
                        "no instrument uncertainty was stated, so every expanded uncertainty is shown as zero",
                        "JCGM 100:2008 (GUM), 7.1.4: a measurement result is complete only with its uncertainty"));
            } else if (s.significantDeviationCount() > 0) {
                cautions.add(Caution.note(
                        "deviation-beyond-uncertainty",
                        s.significantDeviationCount() + " of " + s.comparedCount() + " compared point"
                                + plural(s.comparedCount())
                                + (s.significantDeviationCount() == 1 ? " deviates" : " deviate") + " from "
                                + comparison.displayName()
                                + " by more than the expanded uncertainty (k = 2) of the measured f",
                        "JCGM 100:2008 (GUM), 6.2.1 and 6.3.3: expanded uncertainty, coverage factor 2"));
            }
            if (fitCount < turbulentSeen) {
                cautions.add(Caution.note(
                        "roughness-fit-sampled",
                        "the roughness was fitted to a uniform sample of " + fitCount + " of the " + turbulentSeen
                                + " turbulent points",
                        "common practice, no source"));
            }
            cautions.addAll(roughness.cautions());
            double diameterShare = description.uncertainty().innerDiameter().relativeAt(description.innerDiameter());
            double lengthShare = description.uncertainty().tapSpacing().relativeAt(description.tapSpacing());
            double systematic = Math.hypot(
                    RigUncertaintyPropagation.FRICTION_DIAMETER_EXPONENT * diameterShare,
                    RigUncertaintyPropagation.FRICTION_LENGTH_EXPONENT * lengthShare);
            if (roughness.status() != EffectiveRoughness.Status.NOT_ENOUGH_DATA && systematic > 0) {
                cautions.add(Caution.note(
                        "roughness-interval-scatter-only",
                        "the roughness interval reflects the scatter of the points only; the bore and tap spacing"
                                + " uncertainties shift every measured f together by "
                                + String.format(
                                        Locale.ROOT,
                                        "%.2g",
                                        100 * RigUncertaintyPropagation.COVERAGE_FACTOR * systematic)
                                + " % (k = 2), which moves the fitted roughness but not its scatter",
                        "JCGM 100:2008 (GUM), 5.2: correlated input quantities; common practice, no source"));
            }
            return cautions;
        }
    }

    private static String plural(long n) {
        return n == 1 ? "" : "s";
    }

    private static String number(double value) {
        return String.format(Locale.ROOT, "%.4g", value);
    }

    /** Regimes in report order (used by edges that print counts). */
    public static List<FlowRegime> regimes() {
        return List.of(FlowRegime.LAMINAR, FlowRegime.TRANSITIONAL, FlowRegime.TURBULENT);
    }
}
