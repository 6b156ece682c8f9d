package lamella.ui.workbench;

import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.Semaphore;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import lamella.api.fit.Progress;
import lamella.ui.api.BackgroundWork;
import lamella.ui.api.Messages;
import lamella.ui.api.Task;
import lamella.ui.api.WorkResult;
import org.eclipse.swt.widgets.Display;

/**
 * Model and fit work off the UI thread. At most two pieces of work compute at once (the machines this runs on have
 * few cores, and the UI keeps one). Cancelling sets the work's flag and interrupts its thread, and frees its place at
 * once: work that does not stop promptly (a plug-in that ignores the interrupt) never holds up the next request.
 * Results, failures and stops are handed back on the UI thread.
 */
final class BackgroundTasks {

    private static final int AT_ONCE = 2;

    private final ExecutorService threads;
    private final Semaphore places = new Semaphore(AT_ONCE, true);
    private final Display display;
    private final Messages messages;
    private final Runnable onChange;
    private final Set<Running<?>> running = ConcurrentHashMap.newKeySet();

    BackgroundTasks(Display display, Messages messages, Runnable onChange) {
        this.display = display;
        this.messages = messages;
        this.onChange = onChange;
        AtomicInteger n = new AtomicInteger();
        this.threads = Executors.newCachedThreadPool(r -> {
            Thread t = new Thread(r, "lamella-background-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
    }

    <T> Task submit(String label, BackgroundWork<T> work, WorkResult<T> result) {
        Running<T> task = new Running<>(label, work, result);
        running.add(task);
        task.future = threads.submit(task::run);
        changed();
        return task;
    }

    /** One line for the status bar: what is running, with the progress of the first. */
    String summary() {
        if (running.isEmpty()) {
            return "";
        }
        Running<?> first = running.iterator().next();
        String more = running.size() > 1 ? " (+" + (running.size() - 1) + " more)" : "";
        return first.describe() + more;
    }

    boolean busy() {
        return !running.isEmpty();
    }

    /** Stops every piece of work under way, as the status line's Stop button does. */
    void cancelAll() {
        running.forEach(Running::cancel);
    }

    void shutdown() {
        running.forEach(Running::cancel);
        threads.shutdownNow();
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
    private final class Running<T> implements Task, Progress {
        private final String label;
        private final BackgroundWork<T> work;
        private final WorkResult<T> result;
        private final AtomicBoolean told = new AtomicBoolean();
        private boolean placeHeld;
        private volatile Future<?> future;
        private volatile boolean cancelled;
        private volatile boolean done;
        private volatile String stage = "";
        private volatile int count;
        private volatile int total;

        Running(String label, BackgroundWork<T> work, WorkResult<T> result) {
            this.label = label;
            this.work = work;
            this.result = result;
        }

        void run() {
            try {
                places.acquire();
                synchronized (this) {
                    if (cancelled) {
                        places.release();
                        return;
                    }
                    placeHeld = true;
                }
                T value = work.run(this);
                finish(() -> {
                    if (cancelled) {
                        result.stopped();
                    } else {
                        result.done(value);
                    }
                });
            } catch (Exception | LinkageError e) {
                if (cancelled || Failures.isCancellation(e)) {
                    finish(result::stopped);
                } else {
                    String words = Failures.words(e);
                    messages.error(label + " failed: " + words, e);
                    finish(() -> result.failed(words, e));
                }
            } finally {
                Thread.interrupted();
            }
        }

        private void finish(Runnable tell) {
            release();
            done = true;
            running.remove(this);
            tell(tell);
            changed();
        }

        /** The result, the failure or the stop is told once. */
        private void tell(Runnable r) {
            if (told.compareAndSet(false, true)) {
                onUi(r);
            }
        }

        private synchronized void release() {
            if (placeHeld) {
                placeHeld = false;
                places.release();
            }
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
            if (done || cancelled) {
                return;
            }
            cancelled = true;
            Future<?> f = future;
            if (f != null) {
                f.cancel(true);
            }
            // The place is free now; the thread, if its work ignores the interrupt, ends when that work does.
            release();
            running.remove(this);
            tell(result::stopped);
            changed();
        }

        @Override
        public boolean done() {
            return done || cancelled;
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
