package lamella.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import lamella.api.EvaluationCancelledException;
import lamella.api.ModelEvaluationException;
import org.junit.jupiter.api.Test;

class SpectralQuadratureTest {

    /**
     * The 21-point Kronrod rule integrates polynomials up to degree 31 exactly and its embedded 10-point Gauss rule up
     * to degree 19 (Piessens et al., QUADPACK, Springer 1983, §2.2): a check that every digit of the tables is right.
     */
    @Test
    void kronrodAndGaussTablesAreExactForTheirDegrees() {
        double weightSum = SpectralQuadrature.WGK[10];
        double gaussSum = 0;
        for (int j = 0; j < 10; j++) {
            weightSum += 2 * SpectralQuadrature.WGK[j];
        }
        for (int j = 0; j < 5; j++) {
            gaussSum += 2 * SpectralQuadrature.WG[j];
        }
        assertEquals(2.0, weightSum, 1e-15);
        assertEquals(2.0, gaussSum, 1e-15);
        for (int p = 0; p <= 31; p += 2) {
            double k = SpectralQuadrature.WGK[10] * (p == 0 ? 1 : 0);
            double g = 0;
            for (int j = 0; j < 10; j++) {
                double x = Math.pow(SpectralQuadrature.XGK[j], p);
                k += 2 * SpectralQuadrature.WGK[j] * x;
                if ((j & 1) == 1) {
                    g += 2 * SpectralQuadrature.WG[j >> 1] * x;
                }
            }
            double exact = 2.0 / (p + 1);
            assertEquals(exact, k, 1e-14, "Kronrod, degree " + p);
            if (p <= 19) {
                assertEquals(exact, g, 1e-14, "Gauss, degree " + p);
            }
        }
    }

    /** ∫₀^∞ e^(−x²) dx = √π/2 and ∫₀^1 √x dx = 2/3, an endpoint singularity (common practice, no source). */
    @Test
    void adaptiveIntegrationMeetsItsTolerance() {
        SpectralQuadrature q = new SpectralQuadrature();
        double[] out = new double[2];
        q.integrate((x, o) -> {
            o[0] = Math.exp(-x * x);
            o[1] = x * Math.exp(-x * x);
        }, 0, 9, null, 0, 1e-12, 0, out);
        assertEquals(Math.sqrt(Math.PI) / 2, out[0], 1e-14);
        assertEquals(0.5, out[1], 1e-14);
        q.integrate((x, o) -> {
            o[0] = Math.sqrt(x);
            o[1] = 0;
        }, 0, 1, null, 0, 1e-10, 0, out);
        assertEquals(2.0 / 3.0, out[0], 1e-10);
        assertTrue(q.evaluations() > 21, "the singularity forces refinement");
    }

    @Test
    void aNonFiniteIntegrandIsAnError() {
        SpectralQuadrature q = new SpectralQuadrature();
        double[] out = new double[2];
        assertThrows(ModelEvaluationException.class, () -> q.integrate((x, o) -> {
            o[0] = Double.NaN;
            o[1] = 0;
        }, 0, 1, null, 0, 1e-9, 0, out));
    }

    /** Noise that no rule integrates: every panel's error estimate stays large (common practice, no source). */
    private static void noise(double x, double[] o) {
        long bits = Double.doubleToLongBits(x) * 0x9E3779B97F4A7C15L;
        o[0] = (bits >>> 11) * 0x1.0p-53 - 0.5;
        o[1] = 0;
    }

    @Test
    void workIsBoundedAndEndsWithAMessageSayingWhere() {
        SpectralQuadrature q = new SpectralQuadrature();
        double[] out = new double[2];
        long start = System.nanoTime();
        ModelEvaluationException e = assertThrows(ModelEvaluationException.class,
                () -> q.integrate(SpectralQuadratureTest::noise, 0, 1, null, 0, 1e-9, 0, out));
        assertTrue(e.getMessage().contains("within " + SpectralQuadrature.MAX_PANELS + " panels"), e.getMessage());
        assertTrue(e.getMessage().contains("hardest near"), e.getMessage());
        assertEquals(21 + 42 * (SpectralQuadrature.MAX_PANELS - 1), q.evaluations(),
                "the cap is the documented one: each refinement evaluates two halves");
        assertTrue(System.nanoTime() - start < 60e9, "bounded, not minutes");
    }

    /**
     * ∫₀^{2000π} cos x dx = 0: the panels cancel, so a relative tolerance of the vanishing sum cannot be met; the
     * integral stops at the rounding of its panels' magnitudes instead of refining to the cap.
     */
    @Test
    void cancellingPanelsStopAtTheirRounding() {
        SpectralQuadrature q = new SpectralQuadrature();
        double[] out = new double[2];
        q.integrate((x, o) -> {
            o[0] = Math.cos(x);
            o[1] = 0;
        }, 0, 2000 * Math.PI, null, Math.PI, 1e-12, 0, out);
        assertEquals(0.0, out[0], 1e-10);
        assertTrue(q.evaluations() < 100_000, q.evaluations() + " evaluations");
    }

    /**
     * The cancellation contract: an integral whose thread is interrupted mid-way ends within one panel's work
     * with EvaluationCancelledException and leaves the flag set.
     */
    @Test
    void anInterruptedIntegralEndsPromptly() throws Exception {
        AtomicReference<Throwable> ended = new AtomicReference<>();
        AtomicBoolean flagKept = new AtomicBoolean();
        Thread worker = new Thread(() -> {
            SpectralQuadrature q = new SpectralQuadrature();
            double[] out = new double[2];
            try {
                q.integrate((x, o) -> {
                    double busy = 0;
                    for (int i = 0; i < 2000; i++) {
                        busy += Math.sin(x + i);
                    }
                    noise(x + busy * 1e-30, o);
                }, 0, 1, null, 0, 1e-9, 0, out);
            } catch (RuntimeException e) {
                ended.set(e);
                flagKept.set(Thread.currentThread().isInterrupted());
            }
        });
        worker.start();
        Thread.sleep(200);
        assertTrue(worker.isAlive(), "still working when interrupted");
        long at = System.nanoTime();
        worker.interrupt();
        worker.join(5000);
        assertFalse(worker.isAlive(), "ended after the interrupt");
        assertTrue((System.nanoTime() - at) / 1e6 < 5000);
        assertInstanceOf(EvaluationCancelledException.class, ended.get());
        assertTrue(flagKept.get(), "the interrupt flag stays set for the caller");
    }
}
