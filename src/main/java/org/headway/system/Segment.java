package org.headway.system;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.friction.FlowRegime;
import org.headway.friction.FlowRegimes;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionResult;
import org.headway.pipe.HazenWilliamsCoefficient;

/**
 * A pipe element: one straight run of a single pipe size with its fittings, from inlet to outlet.
 * Build with {@link #builder(String)}.
 *
 * <p>Law: h = (f L/D + ΣK) V|V|/(2 g) by Darcy–Weisbach with f from the system's friction method
 * or the pipe's own, each fitting's K evaluated at the pipe's own Reynolds number and bore; or,
 * where the pipe is given a Hazen–Williams C, h_f from V = 0.849 C R^0.63 S^0.54 (SI, R = D/4 the
 * hydraulic radius, S the friction slope; Williams &amp; Hazen, Hydraulic Tables, 1905, in its usual
 * SI form, e.g. Fair, Geyer &amp; Okun's Water and Wastewater Engineering, Shammas &amp; Wang 2011,
 * eq. 5.34 in US units), i.e. h_f ∝ L Q^(1/0.54) / (C^(1/0.54) D^(2.63/0.54)).
 *
 * @param id stable id, unique in its system (the name when none is given)
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
 * @param frictionOverride the pipe's own Darcy friction method, when it is not the system's
 * @param hazenWilliams the Hazen–Williams C this pipe is computed with, when it uses that method
 * @param highPoint a point along the pipe higher than both its ends, when there is one
 */
public record Segment(
        String id,
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
        double elevationChange,
        Optional<FrictionCorrelation> frictionOverride,
        Optional<HazenWilliamsCoefficient> hazenWilliams,
        Optional<HighPoint> highPoint)
        implements Element {

    /** Hazen–Williams SI coefficient k of V = k C R^0.63 S^0.54 (Williams &amp; Hazen 1905, SI form). */
    public static final double HAZEN_WILLIAMS_SI = 0.849;

    /** Hazen–Williams exponent of the hydraulic radius. */
    public static final double HAZEN_WILLIAMS_RADIUS_EXPONENT = 0.63;

    /** Hazen–Williams exponent of the friction slope. */
    public static final double HAZEN_WILLIAMS_SLOPE_EXPONENT = 0.54;

    /** Smallest bore Hazen–Williams is usually applied to (m): 2 in (common practice, no source). */
    public static final double HAZEN_WILLIAMS_MIN_DIAMETER = 0.05;

    /** Ordinary water temperatures Hazen–Williams was fitted to (K): about 5–25 °C (from memory). */
    public static final double HAZEN_WILLIAMS_MIN_TEMPERATURE = 278.15;

    /** Upper end of the ordinary temperature range (K). */
    public static final double HAZEN_WILLIAMS_MAX_TEMPERATURE = 298.15;

    /**
     * A point along a pipe above both its ends (a main over a ridge).
     *
     * @param distance distance from the inlet along the pipe (m), 0 ≤ distance ≤ length
     * @param rise elevation of the point above the pipe's inlet (m)
     */
    public record HighPoint(double distance, double rise) {
        public HighPoint {
            InputException.requireNonNegative("high point distance", distance);
            InputException.requireFinite("high point rise", rise);
        }
    }

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
        id = id == null || id.isBlank() ? name : id;
        frictionOverride = frictionOverride == null ? Optional.empty() : frictionOverride;
        hazenWilliams = hazenWilliams == null ? Optional.empty() : hazenWilliams;
        highPoint = highPoint == null ? Optional.empty() : highPoint;
        InputException.requireNonNegative("length", length);
        InputException.requirePositive("inner diameter", innerDiameter);
        requireAtMost("length", length, MAX_LENGTH, "m");
        // After the length's own checks, so that a bad length is reported as the length.
        if (highPoint.isPresent() && highPoint.get().distance() > length) {
            throw new InputException(
                    "high point distance",
                    "the high point lies " + highPoint.get().distance() + " m along a pipe of " + length + " m");
        }
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

    /**
     * A copy with another bore and roughness of unknown nominal size: Darby 3-K fittings fall back
     * to the inner diameter.
     */
    public Segment withPipe(double newInnerDiameter, double newRoughness, double low, double high, String description) {
        return withPipe(newInnerDiameter, newRoughness, low, high, description, OptionalDouble.empty());
    }

    /**
     * A copy with another pipe (used by sizing): bore, roughness and the nominal size its fittings
     * are evaluated at.
     *
     * @param newInnerDiameter inner diameter (m)
     * @param newRoughness absolute roughness (m)
     * @param low low end of the roughness range (m)
     * @param high high end of the roughness range (m)
     * @param description the pipe in words
     * @param nominalDiameter nominal diameter (m), empty when unknown
     */
    public Segment withPipe(
            double newInnerDiameter,
            double newRoughness,
            double low,
            double high,
            String description,
            OptionalDouble nominalDiameter) {
        List<FittingUse> resized = new ArrayList<>();
        for (FittingUse use : fittings) {
            resized.add(use.atNominalSize(nominalDiameter));
        }
        return new Segment(
                id,
                name,
                length,
                newInnerDiameter,
                newRoughness,
                low,
                high,
                roughnessSource,
                description,
                pipeCondition,
                resized,
                extraLossCoefficient,
                elevationChange,
                frictionOverride,
                hazenWilliams,
                highPoint);
    }

    /** A copy with the roughness moved to another value inside or at the ends of its range. */
    public Segment withRoughness(double newRoughness) {
        return new Segment(
                id,
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
                elevationChange,
                frictionOverride,
                hazenWilliams,
                highPoint);
    }

    @Override
    public String kind() {
        return "pipe";
    }

    @Override
    public double rise() {
        return elevationChange;
    }

    /** A copy with another id (used when a format-1 project names two segments alike). */
    public Segment withId(String newId) {
        return new Segment(
                newId,
                name,
                length,
                innerDiameter,
                roughness,
                roughnessLow,
                roughnessHigh,
                roughnessSource,
                pipeDescription,
                pipeCondition,
                fittings,
                extraLossCoefficient,
                elevationChange,
                frictionOverride,
                hazenWilliams,
                highPoint);
    }

    /** The friction method this pipe uses with a system default. */
    public FrictionCorrelation frictionMethod(FrictionCorrelation systemDefault) {
        return frictionOverride.orElse(systemDefault);
    }

    /**
     * The pipe's hydraulics at a flow magnitude, with the cautions of its friction method and
     * fittings (the design-limit cautions are the run's business).
     *
     * @param flow volumetric flow magnitude (m³/s), ≥ 0
     * @param context fluid and default friction method
     * @return velocity, Reynolds number, friction factor, losses
     */
    public PipeFlow flowAt(double flow, FlowContext context) {
        List<Caution> cautions = new ArrayList<>();
        double velocity = velocity(flow);
        double velocityHead = velocityHead(velocity);
        double reynolds = reynolds(context, velocity);
        if (flow == 0) {
            return new PipeFlow(
                    velocity,
                    reynolds,
                    0,
                    "none (no flow)",
                    0,
                    FlowRegime.LAMINAR,
                    0,
                    extraLossCoefficient,
                    0,
                    velocityHead,
                    cautions);
        }
        double f;
        String method;
        int iterations;
        FlowRegime regime;
        double major;
        if (hazenWilliams.isPresent()) {
            major = frictionLoss(flow, Double.NaN, velocityHead);
            f = length == 0 ? 0 : major * innerDiameter / (length * velocityHead);
            method = "hazen-williams";
            iterations = 0;
            regime = FlowRegimes.of(reynolds);
            hazenWilliamsCautions(context, velocity, reynolds, major, cautions);
        } else {
            FrictionResult fr = evaluateFriction(context, reynolds);
            f = fr.frictionFactor();
            method = fr.method();
            iterations = fr.iterations();
            regime = fr.regime();
            for (Caution c : fr.cautions()) {
                cautions.add(c.about(name));
            }
            major = frictionLoss(flow, f, velocityHead);
        }
        double kTotal = lossCoefficient(reynolds);
        for (FittingUse use : fittings) {
            for (Caution c : use.fitting().cautions(reynolds, innerDiameter)) {
                cautions.add(c.about(name));
            }
        }
        double minor = kTotal * velocityHead;
        return new PipeFlow(
                velocity, reynolds, f, method, iterations, regime, major, kTotal, minor, velocityHead, cautions);
    }

    /**
     * Friction plus fitting loss at a flow magnitude without results or cautions (the hot path of
     * system curves and root finding). The same formulas as {@link #flowAt} (velocity, Reynolds
     * number, friction and fitting loss are computed by the methods both share), so it equals
     * {@code flowAt(flow, context).headLoss()} exactly whenever the friction method's
     * {@link FrictionCorrelation#frictionFactor} and {@link FrictionCorrelation#evaluate} give the same
     * factor (explicit methods, Hazen–Williams); an iterative method's fast route may differ in the
     * last bits, within its stated accuracy.
     *
     * @param flow volumetric flow magnitude (m³/s), ≥ 0
     * @param context fluid and default friction method
     * @return head loss (m)
     */
    public double headLossMagnitude(double flow, FlowContext context) {
        if (flow == 0) {
            return 0;
        }
        double velocity = velocity(flow);
        double velocityHead = velocityHead(velocity);
        double reynolds = reynolds(context, velocity);
        double f = hazenWilliams.isPresent() ? Double.NaN : frictionFactorOnly(context, reynolds);
        return frictionLoss(flow, f, velocityHead) + lossCoefficient(reynolds) * velocityHead;
    }

    // The pipe's loss formulas, shared by flowAt (full results) and headLossMagnitude (the hot path) so
    // that both compute the same numbers; none allocates.

    /** Mean velocity V = Q/A (m/s) at a flow magnitude (m³/s). */
    private double velocity(double flow) {
        return flow / area();
    }

    /** Velocity head V²/(2g) (m) at a velocity (m/s). */
    private static double velocityHead(double velocity) {
        return velocity * velocity / (2 * Gravity.STANDARD);
    }

    /** Reynolds number ρVD/μ (ratio) at a velocity (m/s). */
    private double reynolds(FlowContext context, double velocity) {
        return context.fluid().density()
                * velocity
                * innerDiameter
                / context.fluid().dynamicViscosity();
    }

    /**
     * Friction loss (m): Hazen–Williams when the pipe has a C, else Darcy–Weisbach h_f = f (L/D) V²/(2g).
     *
     * @param flow flow magnitude (m³/s)
     * @param frictionFactor Darcy friction factor (ratio); not used by Hazen–Williams
     * @param velocityHead V²/(2g) (m)
     */
    private double frictionLoss(double flow, double frictionFactor, double velocityHead) {
        if (hazenWilliams.isPresent()) {
            return hazenWilliamsLoss(flow);
        }
        return length == 0 ? 0 : frictionFactor * length / innerDiameter * velocityHead;
    }

    /** ΣK of the fittings at a Reynolds number plus the explicit K (ratio). */
    private double lossCoefficient(double reynolds) {
        return extraLossCoefficient + fittingK(reynolds);
    }

    @Override
    public double headLoss(double flow, FlowContext context) {
        Element.requireFiniteFlow(this, flow);
        return Math.signum(flow) * headLossMagnitude(Math.abs(flow), context);
    }

    /**
     * dh/dQ, exact: for Q ≠ 0, with q = |Q|, h_v = V²/(2 g), h = (f L/D + K) h_v,
     * dh/dQ = (f L/D + K) 2 h_v/q + (f′ L/D + K′) Re h_v/q, where f′ = df/dRe and K′ = dK/dRe (Re ∝ q);
     * by Hazen–Williams the friction part is h_f/(0.54 q). At Q = 0 the limit: 32 μ L/(ρ g D² A)
     * for a method with a laminar branch, plus Σ K₁ μ/(2 g ρ D A) for the 1/Re part of 2-K and 3-K
     * fittings; zero for the quadratic parts.
     */
    @Override
    public double headLossSlope(double flow, FlowContext context) {
        Element.requireFiniteFlow(this, flow);
        double rho = context.fluid().density();
        double mu = context.fluid().dynamicViscosity();
        double g = Gravity.STANDARD;
        double area = area();
        double q = Math.abs(flow);
        if (q == 0) {
            double slope = 0;
            if (hazenWilliams.isEmpty() && frictionMethod(context.friction()).laminarAtLowReynolds()) {
                slope += 32.0 * mu * length / (rho * g * innerDiameter * innerDiameter * area);
            }
            double k1 = 0;
            for (FittingUse use : fittings) {
                k1 += use.count() * use.fitting().laminarCoefficient();
            }
            return slope + k1 * mu / (2.0 * g * rho * innerDiameter * area);
        }
        double velocity = q / area;
        double velocityHead = velocity * velocity / (2 * g);
        double reynolds = rho * velocity * innerDiameter / mu;
        double k = extraLossCoefficient + fittingK(reynolds);
        double kSlope = 0;
        for (FittingUse use : fittings) {
            kSlope += use.count() * use.fitting().lossCoefficientSlope(reynolds, innerDiameter);
        }
        double slope = k * 2.0 * velocityHead / q + kSlope * reynolds * velocityHead / q;
        if (hazenWilliams.isPresent()) {
            slope += hazenWilliamsLoss(q) / (HAZEN_WILLIAMS_SLOPE_EXPONENT * q);
        } else if (length > 0) {
            FrictionCorrelation method = frictionMethod(context.friction());
            double f = frictionFactorOnly(context, reynolds);
            double fSlope;
            try {
                // Held below NEARLY_STILL_REYNOLDS: f does not change there.
                fSlope = heldStill(method, reynolds) ? 0 : method.frictionFactorSlope(reynolds, relativeRoughness());
            } catch (InputException e) {
                throw e.at("pipe " + id + ", ");
            }
            double lengthRatio = length / innerDiameter;
            slope += f * lengthRatio * 2.0 * velocityHead / q + fSlope * lengthRatio * reynolds * velocityHead / q;
        }
        return slope;
    }

    @Override
    public ElementResult evaluate(double flow, FlowContext context) {
        Element.requireFiniteFlow(this, flow);
        return evaluate(flow, flowAt(Math.abs(flow), context), context);
    }

    /**
     * The element result at a flow whose pipe flow is already known, so that a caller who needs
     * both (the network solver's report) evaluates the friction law once.
     *
     * @param flow signed flow (m³/s)
     * @param p {@code flowAt(|flow|, context)}
     * @param context fluid and default friction method
     */
    public ElementResult evaluate(double flow, PipeFlow p, FlowContext context) {
        double h = Math.signum(flow) * p.headLoss();
        String law = hazenWilliams.isPresent()
                ? String.format(
                        Locale.ROOT,
                        "Hazen–Williams C %.4g",
                        hazenWilliams.get().value())
                : DARCY_LAWS.computeIfAbsent(p.frictionMethod(), m -> "Darcy–Weisbach, f by " + m);
        return new ElementResult(
                id, kind(), flow, h, context.fluid().density() * Gravity.STANDARD * h, law, p.cautions());
    }

    /**
     * The Darcy–Weisbach law text of each friction method, made once: a network of 10⁶ pipes would
     * otherwise hold 10⁶ copies of a few strings in its results.
     */
    private static final java.util.concurrent.ConcurrentHashMap<String, String> DARCY_LAWS =
            new java.util.concurrent.ConcurrentHashMap<>();

    /**
     * Hazen–Williams friction loss h_f = L S with S = (V/(k C R^0.63))^(1/0.54), R = D/4.
     *
     * @param flow flow magnitude (m³/s), ≥ 0
     * @return friction loss (m)
     */
    double hazenWilliamsLoss(double flow) {
        if (length == 0 || flow == 0) {
            return 0;
        }
        double c = hazenWilliams.orElseThrow().value();
        double velocity = flow / area();
        double radius = innerDiameter / 4.0;
        double slope = Math.pow(
                velocity / (HAZEN_WILLIAMS_SI * c * Math.pow(radius, HAZEN_WILLIAMS_RADIUS_EXPONENT)),
                1.0 / HAZEN_WILLIAMS_SLOPE_EXPONENT);
        return length * slope;
    }

    private void hazenWilliamsCautions(
            FlowContext context, double velocity, double reynolds, double major, List<Caution> cautions) {
        String basis = "Hazen–Williams is an empirical law for water in ordinary pipes; common practice, no source";
        String fluidId = context.fluid().fluid();
        if (fluidId == null || !fluidId.toLowerCase(Locale.ROOT).startsWith("water")) {
            cautions.add(Caution.warning(
                            "hazen-williams-fluid",
                            "Hazen–Williams was fitted to water; for " + fluidId
                                    + " its loss may be badly wrong — use Darcy–Weisbach",
                            basis)
                    .about(name));
        }
        double t = context.fluid().temperature();
        if (Double.isFinite(t) && (t < HAZEN_WILLIAMS_MIN_TEMPERATURE - 5 || t > HAZEN_WILLIAMS_MAX_TEMPERATURE + 5)) {
            cautions.add(Caution.warning(
                            "hazen-williams-temperature",
                            String.format(
                                    Locale.ROOT,
                                    "water at %.1f °C is far from the ordinary temperatures Hazen–Williams was fitted"
                                            + " to; C does not follow the change of viscosity — use Darcy–Weisbach",
                                    t - 273.15),
                            basis)
                    .about(name));
        }
        if (innerDiameter < HAZEN_WILLIAMS_MIN_DIAMETER) {
            cautions.add(Caution.warning(
                            "hazen-williams-small-bore",
                            String.format(
                                    Locale.ROOT,
                                    "bore %.1f mm is below the 50 mm Hazen–Williams is usually applied down to",
                                    innerDiameter * 1000),
                            basis)
                    .about(name));
        }
        if (reynolds < FlowRegimes.TURBULENT_LIMIT) {
            cautions.add(Caution.warning(
                            "hazen-williams-not-turbulent",
                            String.format(
                                    Locale.ROOT,
                                    "Re = %.0f is not fully turbulent; Hazen–Williams has no laminar or transitional"
                                            + " branch — use Darcy–Weisbach",
                                    reynolds),
                            basis)
                    .about(name));
        }
        if (length > 0 && reynolds >= org.headway.friction.Colebrook1939.MIN_SOLVABLE_REYNOLDS) {
            double fDarcy = org.headway.friction.Colebrook1939.solver().frictionFactor(reynolds, relativeRoughness());
            double darcy = fDarcy * length / innerDiameter * velocity * velocity / (2 * Gravity.STANDARD);
            cautions.add(Caution.note(
                            "hazen-williams-vs-darcy",
                            String.format(
                                    Locale.ROOT,
                                    "Hazen–Williams friction loss %.4g m; Darcy–Weisbach with Colebrook–White at"
                                            + " ε = %.3g mm gives %.4g m (%+.1f %%)",
                                    major,
                                    roughness * 1000,
                                    darcy,
                                    darcy > 0 ? (darcy / major - 1) * 100 : 0.0),
                            "comparison at the same flow, bore and roughness")
                    .about(name));
        }
    }

    /**
     * Below this Reynolds number a pipe under a turbulent-only method (one without the laminar law)
     * takes the friction factor at it: Colebrook–White has no solution much below Re 1, and a nearly
     * still pipe in a network must still have a loss that is continuous and rises with its flow (∝ Q²
     * here). The explicit approximations hold theirs from Re 100 already (FrictionChecks).
     */
    static final double NEARLY_STILL_REYNOLDS = org.headway.friction.Colebrook1939.MIN_SOLVABLE_REYNOLDS;

    private static boolean heldStill(FrictionCorrelation method, double reynolds) {
        return reynolds < NEARLY_STILL_REYNOLDS && !method.laminarAtLowReynolds();
    }

    private FrictionResult evaluateFriction(FlowContext context, double reynolds) {
        try {
            FrictionCorrelation method = frictionMethod(context.friction());
            if (!heldStill(method, reynolds)) {
                return method.evaluate(reynolds, relativeRoughness());
            }
            FrictionResult atFloor = method.evaluate(NEARLY_STILL_REYNOLDS, relativeRoughness());
            List<Caution> cautions = new ArrayList<>(atFloor.cautions());
            cautions.add(Caution.warning(
                            "friction-held-nearly-still",
                            String.format(
                                    Locale.ROOT,
                                    "Re = %s: the pipe is nearly still; %s is a turbulent-flow method, so f is held at"
                                            + " its Re 1 value (choose auto for the laminar law)",
                                    org.headway.caution.Figures.significant(reynolds),
                                    method.displayName()),
                            "nearly still pipe under a turbulent-only method (common practice, no source)")
                    .about(name));
            return new FrictionResult(
                    atFloor.frictionFactor(),
                    reynolds,
                    atFloor.relativeRoughness(),
                    org.headway.friction.FlowRegimes.of(reynolds),
                    atFloor.method(),
                    atFloor.iterations(),
                    cautions);
        } catch (InputException e) {
            throw e.at("segment " + name + ", ");
        }
    }

    private double frictionFactorOnly(FlowContext context, double reynolds) {
        try {
            FrictionCorrelation method = frictionMethod(context.friction());
            return method.frictionFactor(
                    heldStill(method, reynolds) ? NEARLY_STILL_REYNOLDS : reynolds, relativeRoughness());
        } catch (InputException e) {
            throw e.at("segment " + name + ", ");
        }
    }

    private double fittingK(double reynolds) {
        double k = 0;
        for (FittingUse use : fittings) {
            k += use.count() * use.fitting().lossCoefficient(reynolds, innerDiameter);
        }
        return k;
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
        private String id;
        private Optional<FrictionCorrelation> frictionOverride = Optional.empty();
        private Optional<HazenWilliamsCoefficient> hazenWilliams = Optional.empty();
        private Optional<HighPoint> highPoint = Optional.empty();

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

        /** @param value stable id (the name when not given) */
        public Builder id(String value) {
            id = value;
            return this;
        }

        /** @param method the pipe's own Darcy friction method */
        public Builder friction(FrictionCorrelation method) {
            frictionOverride = Optional.of(method);
            return this;
        }

        /** @param coefficient compute this pipe by Hazen–Williams with this C */
        public Builder hazenWilliams(HazenWilliamsCoefficient coefficient) {
            hazenWilliams = Optional.of(coefficient);
            return this;
        }

        /**
         * @param distance distance of the high point from the inlet (m)
         * @param rise its elevation above the inlet (m)
         */
        public Builder highPoint(double distance, double rise) {
            highPoint = Optional.of(new HighPoint(distance, rise));
            return this;
        }

        public Segment build() {
            if (Double.isNaN(innerDiameter)) {
                throw new InputException(name, "no inner diameter given");
            }
            double low = Double.isNaN(roughnessLow) ? roughness : roughnessLow;
            double high = Double.isNaN(roughnessHigh) ? roughness : roughnessHigh;
            return new Segment(
                    id,
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
                    elevationChange,
                    frictionOverride,
                    hazenWilliams,
                    highPoint);
        }
    }
}
