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

    /** Several overlays as one: points and curves in the order given. */
    public static FrictionOverlay combine(java.util.Collection<FrictionOverlay> parts) {
        java.util.List<FrictionChart.RigPoint> points = new java.util.ArrayList<>();
        java.util.List<FrictionChart.FittedCurve> curves = new java.util.ArrayList<>();
        for (FrictionOverlay o : parts) {
            points.addAll(o.rigPoints());
            curves.addAll(o.fitted());
        }
        return new FrictionOverlay(points, curves);
    }

    public FrictionOverlay {
        rigPoints = List.copyOf(rigPoints);
        fitted = List.copyOf(fitted);
    }
}
