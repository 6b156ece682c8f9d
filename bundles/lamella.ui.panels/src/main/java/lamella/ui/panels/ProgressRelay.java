package lamella.ui.panels;

import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BiConsumer;
import lamella.api.fit.Progress;
import org.eclipse.swt.widgets.Display;

/**
 * Passes a worker's progress to the UI thread, at most every 50 ms so that a fast loop never floods the event
 * queue; cancellation is the background task's own.
 */
final class ProgressRelay implements Progress {

    private static final long EVERY_NANOS = 50_000_000L;

    private final Progress task;
    private final Display display;
    private final BiConsumer<String, Double> show;
    private final AtomicLong last = new AtomicLong();

    ProgressRelay(Progress task, Display display, BiConsumer<String, Double> show) {
        this.task = task;
        this.display = display;
        this.show = show;
    }

    @Override
    public void update(String stage, int done, int total) {
        task.update(stage, done, total);
        long now = System.nanoTime();
        long before = last.get();
        if (now - before < EVERY_NANOS || !last.compareAndSet(before, now)) {
            return;
        }
        double fraction = total > 0 ? Math.min(1, (double) done / total) : Double.NaN;
        if (!display.isDisposed()) {
            display.asyncExec(() -> show.accept(stage, fraction));
        }
    }

    @Override
    public boolean cancelled() {
        return task.cancelled();
    }
}
