package lamella.geometry.ring;

import static org.junit.jupiter.api.Assertions.assertEquals;

import lamella.engine.Bessel;
import org.junit.jupiter.api.Test;

class AnnulusTransformTest {

    /**
     * G(k) against an independent composite Simpson integration (400 000 panels) of ∫ g(r) J₀(kr) 2πr dr / ∫ g(r) 2πr dr (common
     * practice, no source), from k = 0 to k w = 14 (beyond which the probe's and profile's Gaussians leave less than
     * exp(−25)), for rings clear of the centre and reaching it; 1e-9 absolute (G(0) = 1).
     */
    @Test
    void transformMatchesDirectRadialIntegration() {
        for (double[] rw : new double[][] {{15e-6, 2e-6}, {1e-3, 2e-6}, {5e-6, 3e-6}, {1e-6, 2e-6}}) {
            double r = rw[0];
            double w = rw[1];
            AnnulusTransform g = new AnnulusTransform(r, w);
            // in units of the half-width (t = r/w), so that the absolute accuracy means the same at every size
            RingSourceTest.Simpson s = RingSourceTest::simpson;
            double lo = Math.max(0, r / w - 7);
            double hi = r / w + 7;
            double norm = s.integrate(t -> RingSourceTest.prof(t * w, r, w) * t, lo, hi);
            for (double kw : new double[] {0, 0.1, 1, 3, 7, 10, 14}) {
                double k = kw / w;
                double direct = s.integrate(t -> RingSourceTest.prof(t * w, r, w) * t
                        * Bessel.j0(kw * t), lo, hi) / norm;
                assertEquals(direct, g.at(k), 1e-9, "R " + r + " w " + w + " kw " + kw);
            }
        }
    }

    /** Gauss rules integrate what they must: Legendre 10 exactly to degree 19, Hermite n: ∫ x² e^(−x²) = √π/2. */
    @Test
    void gaussRulesAreExact() {
        double[][] l = GaussRules.legendre(10);
        double s = 0;
        for (int i = 0; i < 10; i++) {
            s += l[1][i] * Math.pow(l[0][i], 18);
        }
        assertEquals(2.0 / 19, s, 1e-14);
        for (int n : new int[] {16, 48, 96}) {
            double[][] h = GaussRules.hermite(n);
            double m0 = 0;
            double m2 = 0;
            for (int i = 0; i < n; i++) {
                m0 += h[1][i];
                m2 += h[1][i] * h[0][i] * h[0][i];
            }
            assertEquals(Math.sqrt(Math.PI), m0, 1e-13, "n " + n);
            assertEquals(Math.sqrt(Math.PI) / 2, m2, 1e-13, "n " + n);
        }
    }
}
