package org.headway.friction;

/** Contract checks for {@link Blasius1913}. */
class Blasius1913Test extends FrictionCorrelationContract {

    @Override
    FrictionCorrelation correlation() {
        return new Blasius1913();
    }

    @Override
    double minReynolds() {
        return 4000;
    }

    @Override
    double maxReynolds() {
        return 1e5;
    }

    @Override
    double maxRelativeRoughness() {
        return 0.0;
    }

    // Against the smooth-pipe Colebrook–White curve; no published band we can cite. Measured here up to 2.84 % (Re
    // 1.7e4).
    @Override
    double band() {
        return 0.03;
    }

    @Override
    boolean dependsOnRoughness() {
        return false;
    }
}
