package org.headway.friction;

/** Contract checks for {@link Colebrook1939}. */
class Colebrook1939ContractTest extends FrictionCorrelationContract {

    @Override
    FrictionCorrelation correlation() {
        return Colebrook1939.solver();
    }

    @Override
    double minReynolds() {
        return 2000;
    }

    @Override
    double maxReynolds() {
        return 1e10;
    }

    @Override
    double maxRelativeRoughness() {
        return 0.1;
    }

    // The solver's stated accuracy, 1e-14 relative, against an independent fixed-point solve; the 60-digit reference
    // values are checked in Colebrook1939Test.
    @Override
    double band() {
        return 1e-14;
    }
}
