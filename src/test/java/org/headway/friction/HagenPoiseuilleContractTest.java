package org.headway.friction;

/** Contract checks for {@link HagenPoiseuille}. */
class HagenPoiseuilleContractTest extends FrictionCorrelationContract {

    @Override
    FrictionCorrelation correlation() {
        return new HagenPoiseuille();
    }

    @Override
    double minReynolds() {
        return 1;
    }

    @Override
    double maxReynolds() {
        return 2300;
    }

    @Override
    double maxRelativeRoughness() {
        return 0.05;
    }

    // Against the Hagen–Poiseuille law in dimensional form (below): Δp = 32 μ L V/D², f = 2 Δp D/(L ρ V²); rounding of
    // a few operations only.
    @Override
    double band() {
        return 1e-13;
    }

    @Override
    boolean dependsOnRoughness() {
        return false;
    }

    @Override
    double reference(double reynolds, double relativeRoughness) {
        double diameter = 0.05; // m
        double density = 998.0; // kg/m³
        double viscosity = 1.0e-3; // Pa·s
        double length = 12.0; // m
        double velocity = reynolds * viscosity / (density * diameter); // m/s
        double pressureDrop = 32.0 * viscosity * length * velocity / (diameter * diameter); // Pa
        return 2.0 * pressureDrop * diameter / (length * density * velocity * velocity);
    }
}
