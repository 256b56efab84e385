package org.headway.app;

import java.util.List;
import org.headway.chart.FrictionChart;

/**
 * What the engineer's own data add to the friction chart: measured points and fitted curves.
 *
 * @param rigPoints measured (Re, f) points with their uncertainties
 * @param fitted fitted correlations f(Re), drawn solid over their fitted range and dashed beyond
 */
public record FrictionOverlay(List<FrictionChart.RigPoint> rigPoints, List<FrictionChart.FittedCurve> fitted) {

    /** Nothing to add. */
    public static final FrictionOverlay NONE = new FrictionOverlay(List.of(), List.of());

    public FrictionOverlay {
        rigPoints = List.copyOf(rigPoints);
        fitted = List.copyOf(fitted);
    }
}
