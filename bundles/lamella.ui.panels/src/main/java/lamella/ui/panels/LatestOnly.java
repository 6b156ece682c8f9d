package lamella.ui.panels;

import java.util.function.Consumer;
import lamella.ui.api.BackgroundWork;
import lamella.ui.api.Task;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkResult;

/**
 * Background work of which only the newest request matters: a new request cancels the one under way (its thread is
 * interrupted, so the engine stops), and whatever arrives for an older request is dropped, so rapid edits never draw
 * a stale curve. What becomes of the newest request is told to its view, including that it is taking a while.
 */
final class LatestOnly<T> {

    /** After this long without a result, what the panel shows is marked as out of date. */
    static final int SLOW_MS = 250;

    /** What a panel does with each outcome of its newest request; called on the UI thread. */
    interface View<T> {
        void done(T result);

        /** The work failed; problem says why in words. */
        void problem(String problem);

        /** The user stopped the work. */
        void stopped();

        /** The work is still running after {@link #SLOW_MS}: what is shown belongs to earlier values. */
        void slow();
    }

    private final Workbench workbench;
    private final String label;
    private Task running;
    private long generation;

    LatestOnly(Workbench workbench, String label) {
        this.workbench = workbench;
        this.label = label;
    }

    void submit(BackgroundWork<T> work, Consumer<T> onDone) {
        submit(work, new View<T>() {
            @Override
            public void done(T result) {
                onDone.accept(result);
            }

            @Override
            public void problem(String problem) {
            }

            @Override
            public void stopped() {
            }

            @Override
            public void slow() {
            }
        });
    }

    void submit(BackgroundWork<T> work, View<T> view) {
        cancel();
        long mine = generation;
        Task task = workbench.start(label, work, new WorkResult<T>() {
            @Override
            public void done(T result) {
                if (mine == generation) {
                    running = null;
                    view.done(result);
                }
            }

            @Override
            public void failed(String problem, Throwable cause) {
                if (mine == generation) {
                    running = null;
                    view.problem(problem);
                }
            }

            @Override
            public void stopped() {
                if (mine == generation) {
                    running = null;
                    view.stopped();
                }
            }
        });
        if (mine == generation && !task.done()) {
            running = task;
            workbench.display().timerExec(SLOW_MS, () -> {
                if (mine == generation && running == task && !task.done()) {
                    view.slow();
                }
            });
        }
    }

    /** True while the newest request is under way. */
    boolean busy() {
        return running != null && !running.done();
    }

    void cancel() {
        generation++;
        if (running != null) {
            running.cancel();
            running = null;
        }
    }
}
