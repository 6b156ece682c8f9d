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
 * ends it promptly with a CancellationException, and its worker threads stop too.
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
        assertFalse(workersAlive(), "the fit's worker threads stopped");
    }

    private static boolean workersAlive() {
        return Thread.getAllStackTraces().keySet().stream()
                .anyMatch(t -> t.isAlive() && t.getName().equals("lamella-fit"));
    }
}
