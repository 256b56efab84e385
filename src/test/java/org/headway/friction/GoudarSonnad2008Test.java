package org.headway.friction;

/** Contract checks for {@link GoudarSonnad2008}. */
class GoudarSonnad2008Test extends FrictionCorrelationContract {

    @Override
    FrictionCorrelation correlation() {
        return new GoudarSonnad2008();
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

    // Goudar and Sonnad (2008) report agreement with the iterated equation to near machine precision (from memory);
    // measured here up to 1.04e-12 in double precision.
    @Override
    double band() {
        return 1e-11;
    }
}
