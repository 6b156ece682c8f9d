package lamella.ui.workbench;

import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import lamella.api.fit.Progress;
import lamella.ui.api.BackgroundWork;
import lamella.ui.api.Messages;
import lamella.ui.api.Task;
import org.eclipse.swt.widgets.Display;

/**
 * Model and fit work off the UI thread: two daemon workers (the machines this runs on have few cores, and the UI
 * keeps one), results and failures handed back to the UI thread.
 */
final class BackgroundTasks {

    private static final int WORKERS = 2;

    private final ExecutorService workers;
    private final Display display;
    private final Messages messages;
    private final Runnable onChange;
    private final Set<Running> running = ConcurrentHashMap.newKeySet();

    BackgroundTasks(Display display, Messages messages, Runnable onChange) {
        this.display = display;
        this.messages = messages;
        this.onChange = onChange;
        AtomicInteger n = new AtomicInteger();
        this.workers = Executors.newFixedThreadPool(WORKERS, r -> {
            Thread t = new Thread(r, "lamella-background-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
    }

    <T> Task submit(String label, BackgroundWork<T> work, Consumer<T> onDone) {
        Running task = new Running(label);
        running.add(task);
        changed();
        workers.execute(() -> {
            try {
                T result = work.run(task);
                onUi(() -> {
                    if (!task.cancelled()) {
                        onDone.accept(result);
                    }
                });
            } catch (Exception | LinkageError e) {
                if (!task.cancelled()) {
                    messages.error(label + " failed", e);
                }
            } finally {
                task.done = true;
                running.remove(task);
                changed();
            }
        });
        return task;
    }

    /** One line for the status bar: what is running, with the progress of the first. */
    String summary() {
        if (running.isEmpty()) {
            return "";
        }
        Running first = running.iterator().next();
        String more = running.size() > 1 ? " (+" + (running.size() - 1) + " more)" : "";
        return first.describe() + more;
    }

    void shutdown() {
        running.forEach(Running::cancel);
        workers.shutdownNow();
    }

    private void changed() {
        onUi(onChange);
    }

    private void onUi(Runnable r) {
        if (!display.isDisposed()) {
            display.asyncExec(() -> {
                if (!display.isDisposed()) {
                    r.run();
                }
            });
        }
    }

    /** A task as seen from both sides: the work reports progress and checks cancellation; the UI cancels. */
    private final class Running implements Task, Progress {
        private final String label;
        private volatile boolean cancelled;
        private volatile boolean done;
        private volatile String stage = "";
        private volatile int count;
        private volatile int total;

        Running(String label) {
            this.label = label;
        }

        @Override
        public void update(String stage, int done, int total) {
            this.stage = stage;
            this.count = done;
            this.total = total;
            changed();
        }

        @Override
        public boolean cancelled() {
            return cancelled;
        }

        @Override
        public void cancel() {
            cancelled = true;
        }

        @Override
        public boolean done() {
            return done;
        }

        String describe() {
            String s = label;
            if (!stage.isEmpty()) {
                s += " — " + stage;
            }
            if (total > 0) {
                s += " " + count + "/" + total;
            }
            return s;
        }
    }
}
