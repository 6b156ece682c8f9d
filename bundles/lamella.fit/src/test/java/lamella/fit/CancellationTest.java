package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicReference;
import lamella.api.CaseDocument;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The cancellation contract for fits: interrupting the thread that runs a fit — here deep in a long Monte Carlo —
 * ends it promptly with a CancellationException, and its work on the shared worker threads stops too (the threads
 * themselves stay, idle, for the next fit).
 */
class CancellationTest {

    @TempDir
    Path dir;

    @Test
    void anInterruptedMonteCarloEndsPromptlyAndLeavesNoWorkers() throws Exception {
        double[] f = Synthetic.logSpaced(1e4, 2e7, 30);
        String truth = "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + "," + FitTest.BEAMS + "," + FitTest.FDTR + "}";
        Synthetic.data(dir.resolve("fdtr.csv"), "frequency_hz", f, "phase_deg",
                Synthetic.model(dir, truth, f, "phase_deg"), 0.1, 3, true);
        CaseDocument doc = Synthetic.read(dir, "{" + Synthetic.STACK.formatted(5e7, 3.0) + "," + FitTest.BEAMS + ","
                + FitTest.FDTR + ", \"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\":"
                + " \"film\", \"property\": \"k_through_w_mk\"}, {\"layer\": \"cap\", \"property\":"
                + " \"conductance_below_w_m2k\"}]}}");
        AtomicReference<Throwable> ended = new AtomicReference<>();
        Thread caller = new Thread(() -> {
            try {
                Synthetic.fitter().fit(doc, FitSettings.defaults().withMonteCarlo(1_000_000).withThreads(2),
                        Progress.NONE);
            } catch (Exception | Error e) {
                ended.set(e);
            }
        });
        caller.start();
        Thread.sleep(1500);
        assertTrue(caller.isAlive(), "still fitting when interrupted");
        caller.interrupt();
        caller.join(3000);
        assertFalse(caller.isAlive(), "ended within three seconds of the interrupt");
        assertInstanceOf(CancellationException.class, ended.get());
        long deadline = System.nanoTime() + 3_000_000_000L;
        while (workersAlive() && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
        assertFalse(workersAlive(), "no worker thread still refits");
    }

    /** A worker thread of the fits that is running a refit or a model evaluation, not waiting for work. */
    private static boolean workersAlive() {
        return Thread.getAllStackTraces().entrySet().stream()
                .filter(e -> e.getKey().isAlive() && e.getKey().getName().startsWith("lamella-fit-"))
                .anyMatch(e -> java.util.Arrays.stream(e.getValue())
                        .anyMatch(f -> f.getClassName().startsWith("lamella.")));
    }
}
