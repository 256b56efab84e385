package org.headway.system;

import java.util.List;
import org.headway.caution.Caution;
import org.headway.correlation.FittedLossCoefficient;
import org.headway.pipe.Fitting;

/**
 * A component whose loss coefficient comes from the engineer's own fitted K-against-Re correlation
 * (a strainer, a hose coupling, a heat-exchanger pass measured on a rig), used like a catalog
 * fitting. Outside the Reynolds range it was fitted on, every result carries an extrapolation
 * caution.
 */
public final class FittedComponentLoss implements Fitting {

    private final FittedLossCoefficient fitted;
    private final String source;

    /**
     * @param fitted the fitted K(Re)
     * @param source where it was loaded from, for the sheet
     */
    public FittedComponentLoss(FittedLossCoefficient fitted, String source) {
        this.fitted = fitted;
        this.source = source;
    }

    @Override
    public String id() {
        return fitted.id();
    }

    @Override
    public String description() {
        return "fitted component " + fitted.id() + ": K = " + fitted.fit().equation();
    }

    @Override
    public String method() {
        return "fitted K(Re)";
    }

    @Override
    public String source() {
        return source;
    }

    @Override
    public double lossCoefficient(double reynolds, double innerDiameter) {
        return fitted.evaluate(reynolds).lossCoefficient();
    }

    @Override
    public List<Caution> cautions(double reynolds, double innerDiameter) {
        return fitted.evaluate(reynolds).cautions();
    }
}
