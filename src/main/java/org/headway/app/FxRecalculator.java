package org.headway.app;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javafx.animation.PauseTransition;
import javafx.concurrent.Task;
import javafx.util.Duration;

/**
 * Recalculates after typing pauses for {@value #DEBOUNCE_MS} ms, in a {@link Task} on one
 * background thread; a newer request cancels the older task and its result is dropped.
 */
final class FxRecalculator implements Recalculator {

    /** Pause before recalculating (ms): long enough to skip keystrokes, short enough to feel live. */
    static final int DEBOUNCE_MS = 250;

    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "headway-recalculation");
        t.setDaemon(true);
        return t;
    });
    private final PauseTransition pause = new PauseTransition(Duration.millis(DEBOUNCE_MS));
    private Supplier<Recalculation.Outcome> pending;
    private Consumer<Recalculation.Outcome> pendingDone;
    private Task<Recalculation.Outcome> running;

    /** While true, requests wait (the window start holds the first solve until its first frame is drawn). */
    private boolean held;

    FxRecalculator() {
        pause.setOnFinished(e -> start());
    }

    /** Holds requests until {@link #release()}: the newest is kept and started then. */
    void hold() {
        held = true;
    }

    /** Lets held requests go: the newest one starts after the usual pause. */
    void release() {
        held = false;
        if (pending != null) {
            pause.playFromStart();
        }
    }

    @Override
    public void request(Supplier<Recalculation.Outcome> work, Consumer<Recalculation.Outcome> done) {
        pending = work;
        pendingDone = done;
        if (!held) {
            pause.playFromStart();
        }
    }

    @Override
    public boolean busy() {
        // The task's FX-side state, not FutureTask.isDone(): onSucceeded can run before the worker
        // thread has marked the future done, which would leave "recalculating" showing for good.
        return pending != null || (running != null && running.isRunning());
    }

    private void start() {
        if (running != null) {
            running.cancel(true);
        }
        Supplier<Recalculation.Outcome> work = pending;
        Consumer<Recalculation.Outcome> done = pendingDone;
        pending = null;
        if (work == null) {
            return;
        }
        Task<Recalculation.Outcome> task = new Task<>() {
            @Override
            protected Recalculation.Outcome call() {
                return work.get();
            }
        };
        running = task;
        task.setOnSucceeded(e -> {
            if (task == running && !task.isCancelled()) {
                done.accept(task.getValue());
            }
        });
        task.setOnFailed(e -> {
            if (task == running) {
                Throwable t = task.getException();
                done.accept(new Recalculation.Outcome(
                        null, null, null, "internal error (please report): " + t, null, null, null));
            }
        });
        worker.execute(task);
    }
}
