package org.headway.system;

import org.headway.friction.FlowRegime;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.friction.FrictionResult;
import org.headway.friction.ValidityRange;

/**
 * A friction method for the high end of the uncertainty band: in transitional flow it takes the
 * larger of the run's method and Colebrook–White, i.e. it assumes the flow has already become
 * turbulent — the conservative design choice where f is uncertain (common practice, no source).
 * Elsewhere it is the run's method unchanged.
 */
final class TransitionalUpperBound implements FrictionCorrelation {

    private final FrictionCorrelation method;
    private final FrictionCorrelation turbulent = FrictionMethods.byId("colebrook");

    TransitionalUpperBound(FrictionCorrelation method) {
        this.method = method;
    }

    @Override
    public String id() {
        return method.id();
    }

    @Override
    public String displayName() {
        return method.displayName() + ", turbulent in the transitional range";
    }

    @Override
    public String citation() {
        return method.citation();
    }

    @Override
    public String equation() {
        return method.equation();
    }

    @Override
    public ValidityRange validity() {
        return method.validity();
    }

    @Override
    public FrictionResult evaluate(double reynolds, double relativeRoughness) {
        FrictionResult r = method.evaluate(reynolds, relativeRoughness);
        if (r.regime() != FlowRegime.TRANSITIONAL) {
            return r;
        }
        double f = turbulent.evaluate(reynolds, relativeRoughness).frictionFactor();
        if (f <= r.frictionFactor()) {
            return r;
        }
        return new FrictionResult(f, reynolds, relativeRoughness, r.regime(), "colebrook", 0, r.cautions());
    }

    @Override
    public double frictionFactor(double reynolds, double relativeRoughness) {
        return evaluate(reynolds, relativeRoughness).frictionFactor();
    }
}
