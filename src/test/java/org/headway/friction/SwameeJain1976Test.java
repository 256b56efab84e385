package org.headway.friction;

/** Contract checks for {@link SwameeJain1976}. */
class SwameeJain1976Test extends FrictionCorrelationContract {

    @Override
    FrictionCorrelation correlation() {
        return new SwameeJain1976();
    }

    @Override
    double minReynolds() {
        return 5000;
    }

    @Override
    double maxReynolds() {
        return 1e8;
    }

    @Override
    double maxRelativeRoughness() {
        return 1e-2;
    }

    // Swamee and Jain (1976) state about 1 % (from memory). Measured here up to 2.65 % (at Re 5.6e3, ε/D 9e-3), so the
    // published claim does not hold over the whole stated range; the band guards the measured behaviour.
    @Override
    double band() {
        return 0.03;
    }

    @Override
    boolean includesSmooth() {
        return false; // the authors' range starts at ε/D = 1e-6 (from memory)
    }
}
