package lamella.geometry.ring;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.Parameters;
import lamella.api.Stack;
import lamella.engine.LayeredStack;
import org.junit.jupiter.api.Test;

class RingSourceTest {

    static final double LAMBDA = 1.38;
    static final Stack GLASS = new Stack(List.of(Layer.isotropicInPlane("glass", Double.POSITIVE_INFINITY, LAMBDA,
            LAMBDA, 1.6e6)), BottomBoundary.SEMI_INFINITE);

    static GeometryModel ring(Stack s, double radius, double width, double probe) throws InputException {
        return new RingSource().bind(Parameters.of("geometry", Map.of(RingSource.RADIUS, radius, RingSource.WIDTH,
                width, RingSource.PROBE, probe), Map.of()), new LayeredStack(s));
    }

    static double[] at(GeometryModel m, double f) {
        double[] out = new double[2];
        m.at(f, out);
        return out;
    }

    /**
     * Steady point source on a half-space, P/(2πΛr) (Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed., 1959,
     * §10.3), summed around a thin ring: every part of the ring is R from the centre, so the centre rises by
     * P/(2πΛR). A probe of radius 0.02 R changes that by about (w₁/R)²/… ≈ 1e-4.
     */
    @Test
    void thinRingCentreTemperature() throws InputException {
        double r = 20e-6;
        double[] h = at(ring(GLASS, r, 0, 0.02 * r), 0);
        double expected = 1 / (2 * Math.PI * LAMBDA * r);
        assertEquals(expected, h[0], 1e-3 * expected);
    }

    /**
     * Periodic version (Carslaw & Jaeger 1959, §10.3): the centre of a thin ring sees e^(−qR)/(2πΛR),
     * q = (1+i)√(ω/2D), the phase lag growing with the ring's radius.
     */
    @Test
    void periodicRingCentreTemperature() throws InputException {
        double r = 10e-6;
        double f = 2e4;
        double d = LAMBDA / 1.6e6;
        double qr = Math.sqrt(2 * Math.PI * f / (2 * d)) * r;
        double scale = Math.exp(-qr) / (2 * Math.PI * LAMBDA * r);
        double[] h = at(ring(GLASS, r, 0, 0.01 * r), f);
        assertEquals(scale * Math.cos(qr), h[0], 2e-3 * scale);
        assertEquals(-scale * Math.sin(qr), h[1], 2e-3 * scale);
    }

    /**
     * Steady point source on a half-space, P/(2πΛρ) (Carslaw & Jaeger 1959, §10.3), integrated directly over the
     * annulus: every element at radius r is r from the centre, so the centre rises by (1/(Λ N)) ∫₀^∞ g(r) dr with
     * g(r) = exp(−2(r − R)²/w²) and N = ∫₀^∞ g(r) 2πr dr, both in closed form by erf (common practice, no source).
     * A probe of radius 1e-3 R changes the centre by about (w₁/R)²/8 ≈ 1e-7 (1e-2 R where the profile reaches the
     * centre: its transform decays only like k⁻³, so a tinier probe costs many wavenumbers; there the probe's own
     * effect, a few 1e-5, sets the 1e-4 tolerance). Covers both
     * quadratures: a ring clear of the centre and one whose profile reaches it.
     */
    @Test
    void annulusCentreTemperatureMatchesDirectIntegration() throws InputException {
        for (double[] rw : new double[][] {{15e-6, 2e-6}, {20e-6, 1e-6}, {2e-6, 2e-6}}) {
            double r = rw[0];
            double w = rw[1];
            boolean clear = r >= AnnulusTransform.CLEAR * w;
            double erfTerm = 1 + org.apache.commons.math3.special.Erf.erf(Math.sqrt(2) * r / w);
            double lineIntegral = 0.5 * w * Math.sqrt(Math.PI / 2) * erfTerm;
            double norm = 2 * Math.PI * (w * w / 4 * Math.exp(-2 * r * r / (w * w)) + r * lineIntegral);
            double expected = lineIntegral / (LAMBDA * norm);
            double[] h = at(ring(GLASS, r, w, (clear ? 1e-3 : 1e-2) * r), 0);
            assertEquals(expected, h[0], (clear ? 1e-6 : 1e-4) * expected, "R " + r + " w " + w);
        }
    }

    /**
     * Periodic point source on a half-space, e^(−qρ)/(2πΛρ), q = (1+i)√(ω/2D) (Carslaw & Jaeger 1959, §10.3),
     * integrated directly over the annulus: the centre sees (1/(Λ N)) ∫ g(r) e^(−qr) dr, here by an independent
     * composite Simpson integration in r (400 000 panels), against the spectral model with a probe of 1e-4 R (its
     * effect, about (w₁|q|)²/8, stays below 1e-7); 1e-8 of the steady response's scale.
     */
    @Test
    void periodicAnnulusCentreMatchesDirectIntegration() throws InputException {
        double r = 15e-6;
        double w = 2e-6;
        double d = LAMBDA / 1.6e6;
        for (double f : new double[] {1e3, 1e5, 1e6}) {
            double a = Math.sqrt(2 * Math.PI * f / (2 * d));
            // in units of the half-width (t = r/w): ∫ … dr = w ∫ … dt, N = w² ∫ g 2πt dt
            Simpson simpson = RingSourceTest::simpson;
            double lo = Math.max(0, r / w - 7);
            double hi = r / w + 7;
            double aw = a * w;
            double re = w * simpson.integrate(t -> prof(t * w, r, w) * Math.exp(-aw * t)
                    * Math.cos(aw * t), lo, hi);
            double im = -w * simpson.integrate(t -> prof(t * w, r, w) * Math.exp(-aw * t)
                    * Math.sin(aw * t), lo, hi);
            double norm = w * w * simpson.integrate(t -> prof(t * w, r, w) * 2 * Math.PI * t, lo, hi);
            double[] h = at(ring(GLASS, r, w, 1e-4 * r), f);
            // the centre's response falls as e^(−R/d) with frequency: compared on the steady response's scale
            double scale = 1 / (2 * Math.PI * LAMBDA * r);
            assertEquals(re / (LAMBDA * norm), h[0], 1e-8 * scale, "re at " + f);
            assertEquals(im / (LAMBDA * norm), h[1], 1e-8 * scale, "im at " + f);
        }
    }

    /**
     * Rings of a millimetre (annular beams, ring heaters): the thin ring against e^(−qR)/(2πΛR) and the annulus of
     * half-width 2 µm against the direct integration above (Carslaw & Jaeger 1959, §10.3), from steady to 1 kHz, where
     * the centre's response has fallen to e^(−60) of the steady one; both to 1e-6 of the steady response's scale. A probe
     * of 0.3 µm changes the centre by about (w₁|q|)²/8 ≤ 1e-7 at these frequencies.
     */
    @Test
    void ringsOfAMillimetreAreAccurate() throws InputException {
        double r = 1e-3;
        double w = 2e-6;
        double d = LAMBDA / 1.6e6;
        double scale = 1 / (2 * Math.PI * LAMBDA * r);
        GeometryModel thin = ring(GLASS, r, 0, 0.3e-6);
        GeometryModel wide = ring(GLASS, r, w, 0.3e-6);
        for (double f : new double[] {0, 1, 10, 100, 1e3}) {
            double a = Math.sqrt(2 * Math.PI * f / (2 * d));
            double[] h = at(thin, f);
            assertEquals(scale * Math.exp(-a * r) * Math.cos(a * r), h[0], 1e-6 * scale, "thin re at " + f);
            assertEquals(-scale * Math.exp(-a * r) * Math.sin(a * r), h[1], 1e-6 * scale, "thin im at " + f);
            double lo = r / w - 7;
            double hi = r / w + 7;
            double aw = a * w;
            double re = w * simpson(t -> prof(t * w, r, w) * Math.exp(-aw * t) * Math.cos(aw * t), lo, hi);
            double im = -w * simpson(t -> prof(t * w, r, w) * Math.exp(-aw * t) * Math.sin(aw * t), lo, hi);
            double norm = w * w * simpson(t -> prof(t * w, r, w) * 2 * Math.PI * t, lo, hi);
            h = at(wide, f);
            assertEquals(re / (LAMBDA * norm), h[0], 1e-6 * scale, "annulus re at " + f);
            assertEquals(im / (LAMBDA * norm), h[1], 1e-6 * scale, "annulus im at " + f);
        }
    }

    /**
     * The same frequencies in any order, and again, give the same values: what is kept between integrals for the
     * annulus changes nothing but the cost (common practice, no source).
     */
    @Test
    void keptTransformValuesChangeNothing() throws InputException {
        double[] fs = {1e6, 1e3, 3e5, 0, 1e7, 2e4};
        double[][] fresh = new double[fs.length][];
        for (int i = 0; i < fs.length; i++) {
            fresh[i] = at(ring(GLASS, 40e-6, 2e-6, 3e-6), fs[i]);
        }
        GeometryModel reused = ring(GLASS, 40e-6, 2e-6, 3e-6);
        for (int pass = 0; pass < 2; pass++) {
            for (int i = fs.length - 1; i >= 0; i--) {
                double[] h = at(reused, fs[i]);
                assertEquals(fresh[i][0], h[0], 1e-15 * Math.abs(fresh[i][0]) + 1e-300, "re at " + fs[i]);
                assertEquals(fresh[i][1], h[1], 1e-15 * Math.abs(fresh[i][1]) + 1e-300, "im at " + fs[i]);
            }
        }
    }

    interface Simpson {
        double integrate(java.util.function.DoubleUnaryOperator f, double lo, double hi);
    }

    /** Composite Simpson rule with 400 000 panels: error of order h⁴, far below the checks here. */
    static double simpson(java.util.function.DoubleUnaryOperator f, double lo, double hi) {
        int n = 400_000;
        double h = (hi - lo) / n;
        double sum = f.applyAsDouble(lo) + f.applyAsDouble(hi);
        for (int i = 1; i < n; i++) {
            sum += (i % 2 == 1 ? 4 : 2) * f.applyAsDouble(lo + i * h);
        }
        return sum * h / 3;
    }

    static double prof(double x, double r, double w) {
        double u = (x - r) / w;
        return Math.exp(-2 * u * u);
    }

    /**
     * As the width goes to zero the annulus becomes the thin ring, J₀(kR): the difference is O(w²/R²), compared on the
     * scale of the steady response (at high frequency the centre's response is exponentially small, e^(−R/d), and
     * both integrals end at rounding of that scale).
     */
    @Test
    void aVanishingWidthIsTheThinRing() throws InputException {
        for (double f : new double[] {0, 1e4, 1e6, 1e7}) {
            double[] thin = at(ring(GLASS, 15e-6, 0, 3e-6), f);
            double[] narrow = at(ring(GLASS, 15e-6, 1e-9, 3e-6), f);
            double scale = 1 / (2 * Math.PI * LAMBDA * 15e-6);
            assertEquals(thin[0], narrow[0], 1e-7 * scale, "re at " + f);
            assertEquals(thin[1], narrow[1], 1e-7 * scale, "im at " + f);
        }
    }

    /**
     * A 2 µm wide ring at 15 µm is not a blurred thin ring: the exact annulus and the blur exp(−k²w²/8) J₀(kR)
     * differ by more than the quadrature's error (common practice, no source: the blur is exact only for w ≪ R).
     */
    @Test
    void theAnnulusDiffersFromABlurredThinRing() throws InputException {
        double f = 1e6;
        double[] exact = at(ring(GLASS, 15e-6, 2e-6, 3e-6), f);
        double[] blurred = at(ring(GLASS, 15e-6, 0, Math.sqrt(9e-12 + 4e-12)), f);
        double phaseExact = Math.toDegrees(Math.atan2(exact[1], exact[0]));
        double phaseBlurred = Math.toDegrees(Math.atan2(blurred[1], blurred[0]));
        assertTrue(Math.abs(phaseExact - phaseBlurred) > 1e-3, phaseExact + " vs " + phaseBlurred);
    }

    /** A ring wider than its radius is a legitimate annulus that reaches the centre. */
    @Test
    void aWidthAsLargeAsTheRadiusIsAnAnnulusThatReachesTheCentre() throws InputException {
        double[] h = at(ring(GLASS, 5e-6, 5e-6, 1e-6), 0);
        assertTrue(h[0] > 0 && Double.isFinite(h[0]));
    }
}
