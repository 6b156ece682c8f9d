package lamella.ui.panels;

import java.util.function.Consumer;
import lamella.ui.api.BackgroundWork;
import lamella.ui.api.Task;
import lamella.ui.api.Workbench;

/**
 * Background work of which only the newest request matters: a new request cancels the one under way, and a result
 * that arrives after a newer request was made is dropped, so rapid edits never draw a stale curve.
 */
final class LatestOnly<T> {

    private final Workbench workbench;
    private final String label;
    private Task running;
    private long generation;

    LatestOnly(Workbench workbench, String label) {
        this.workbench = workbench;
        this.label = label;
    }

    void submit(BackgroundWork<T> work, Consumer<T> onDone) {
        cancel();
        long mine = generation;
        running = workbench.background(label, work, result -> {
            if (mine == generation) {
                running = null;
                onDone.accept(result);
            }
        });
    }

    void cancel() {
        generation++;
        if (running != null) {
            running.cancel();
            running = null;
        }
    }
}
