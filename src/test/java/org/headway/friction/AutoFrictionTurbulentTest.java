package org.headway.friction;

/** Contract checks for {@link AutoFriction}. */
class AutoFrictionTurbulentTest extends FrictionCorrelationContract {

    @Override
    FrictionCorrelation correlation() {
        return new AutoFriction();
    }

    @Override
    double minReynolds() {
        return 4000;
    }

    @Override
    double maxReynolds() {
        return 1e8;
    }

    @Override
    double maxRelativeRoughness() {
        return 0.05;
    }

    // In turbulent flow auto is the Colebrook–White solve, whose stated accuracy is 1e-14 relative.
    @Override
    double band() {
        return 1e-14;
    }
}
