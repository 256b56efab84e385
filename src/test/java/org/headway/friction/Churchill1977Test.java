package org.headway.friction;

/** Contract checks for {@link Churchill1977}. */
class Churchill1977Test extends FrictionCorrelationContract {

    @Override
    FrictionCorrelation correlation() {
        return new Churchill1977();
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

    // No published band we can cite for the turbulent range; measured here up to 3.15 % (Re 4.3e3, ε/D 0.016). The band
    // guards that measurement.
    @Override
    double band() {
        return 0.035;
    }
}
