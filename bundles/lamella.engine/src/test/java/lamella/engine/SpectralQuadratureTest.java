package lamella.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
        assertThrows(ArithmeticException.class, () -> q.integrate((x, o) -> {
            o[0] = Double.NaN;
            o[1] = 0;
        }, 0, 1, null, 0, 1e-9, 0, out));
    }
}
