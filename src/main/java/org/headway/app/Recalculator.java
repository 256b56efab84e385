package org.headway.app;

import java.util.function.Consumer;
import java.util.function.Supplier;

/**
 * Runs recalculations. The desktop waits for typing to pause, runs the work off the FX thread and
 * drops results of runs that a newer request made stale; tests run it at once.
 */
public interface Recalculator {

    /**
     * @param work the recalculation
     * @param done receives the outcome of the newest request only, on the thread the view uses
     */
    void request(Supplier<Recalculation.Outcome> work, Consumer<Recalculation.Outcome> done);

    /** Whether a recalculation is waiting or running. */
    default boolean busy() {
        return false;
    }

    /** A recalculator that runs each request at once on the calling thread. */
    static Recalculator immediate() {
        return (work, done) -> done.accept(work.get());
    }
}
