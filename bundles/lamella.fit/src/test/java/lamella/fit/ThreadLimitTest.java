package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.AbstractExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import lamella.api.CaseDocument;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The fits share one pool of worker threads; a fit's thread setting is what bounds its parallelism: it never has more
 * tasks running at once than its setting allows (the calling thread counts as one while it computes a Jacobian's
 * first lane, and waits while Monte Carlo workers refit), and its results do not depend on the setting.
 */
class ThreadLimitTest {

    @TempDir
    Path dir;

    private CaseDocument threeFreeCase() throws Exception {
        double[] f = Synthetic.logSpaced(1e4, 2e7, 30);
        String truth = "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + "," + FitTest.BEAMS + "," + FitTest.FDTR + "}";
        Synthetic.data(dir.resolve("fdtr.csv"), "frequency_hz", f, "phase_deg",
                Synthetic.model(dir, truth, f, "phase_deg"), 0.1, 5, true);
        return Synthetic.read(dir, "{" + Synthetic.STACK.formatted(5e7, 3.0) + "," + FitTest.BEAMS + ","
                + FitTest.FDTR + ", \"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\":"
                + " \"film\", \"property\": \"k_through_w_mk\"}, {\"layer\": \"cap\", \"property\":"
                + " \"conductance_below_w_m2k\"}, {\"layer\": \"cap\", \"property\": \"thickness_m\"}]}}");
    }

    @Test
    void aFitRunsNoMoreTasksAtOnceThanItsThreadSetting() throws Exception {
        CaseDocument doc = threeFreeCase();
        for (int threads = 1; threads <= 3; threads++) {
            CountingPool pool = new CountingPool();
            FitProblem problem = FitProblem.of(doc, FitBlockReader.read(doc), Synthetic.CATALOG);
            new FitRunner(problem, pool, threads, Progress.NONE).run(24, 7);
            // with one thread the Jacobians stay on the caller and the Monte Carlo has one worker
            assertTrue(pool.peak.get() <= threads, threads + " thread(s): " + pool.peak.get() + " tasks at once");
            assertTrue(pool.submitted.get() > 0, "the Monte Carlo ran on the pool");
            if (threads == 1) {
                assertEquals(1, pool.peak.get(), "one thread: one worker");
            }
        }
    }

    @Test
    void theResultDoesNotDependOnTheThreadSetting() throws Exception {
        CaseDocument doc = threeFreeCase();
        FitOutcome one = Synthetic.fitter().fit(doc, FitSettings.defaults().withThreads(1).withMonteCarlo(40)
                .withSeed(3), Progress.NONE);
        FitOutcome three = Synthetic.fitter().fit(doc, FitSettings.defaults().withThreads(3).withMonteCarlo(40)
                .withSeed(3), Progress.NONE);
        for (int a = 0; a < 3; a++) {
            assertEquals(one.parameters().get(a).value(), three.parameters().get(a).value(), 0.0);
            assertEquals(one.parameters().get(a).sigma(), three.parameters().get(a).sigma(), 0.0);
        }
        assertArrayEquals(one.monteCarlo().orElseThrow().std(), three.monteCarlo().orElseThrow().std(), 0.0);
    }

    /** Runs each task on a thread of its own and counts how many run at once. */
    private static final class CountingPool extends AbstractExecutorService {
        final AtomicInteger running = new AtomicInteger();
        final AtomicInteger peak = new AtomicInteger();
        final AtomicInteger submitted = new AtomicInteger();

        @Override
        public void execute(Runnable task) {
            submitted.incrementAndGet();
            Thread t = new Thread(() -> {
                peak.accumulateAndGet(running.incrementAndGet(), Math::max);
                try {
                    task.run();
                } finally {
                    running.decrementAndGet();
                }
            });
            t.setDaemon(true);
            t.start();
        }

        @Override
        public void shutdown() {
        }

        @Override
        public List<Runnable> shutdownNow() {
            return List.of();
        }

        @Override
        public boolean isShutdown() {
            return false;
        }

        @Override
        public boolean isTerminated() {
            return false;
        }

        @Override
        public boolean awaitTermination(long timeout, TimeUnit unit) {
            return true;
        }
    }
}
