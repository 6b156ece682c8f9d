package lamella.fit;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.SynchronousQueue;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The worker threads of every fit in the process, kept between fits: a fit's Jacobian columns and Monte Carlo
 * refits run here. A pool made per fit started its threads cold — new threads and empty per-thread quadrature
 * workspaces — which cost a short fit more than its second thread saved. The pool itself sets no limit; each fit
 * submits no more tasks than its thread setting allows (the calling thread counts as one). Idle threads end after
 * {@link #IDLE_SECONDS}, and they are daemons, so nothing keeps the process alive.
 */
final class FitThreads {

    static final int IDLE_SECONDS = 30;

    private static final AtomicInteger NUMBER = new AtomicInteger();

    static final ExecutorService POOL = new ThreadPoolExecutor(0, Integer.MAX_VALUE, IDLE_SECONDS, TimeUnit.SECONDS,
            new SynchronousQueue<>(), r -> {
                Thread t = new Thread(r, "lamella-fit-" + NUMBER.incrementAndGet());
                t.setDaemon(true);
                return t;
            });

    private FitThreads() {
    }
}
