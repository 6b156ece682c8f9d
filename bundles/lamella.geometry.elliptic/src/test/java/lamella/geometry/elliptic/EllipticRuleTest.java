package lamella.geometry.elliptic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import lamella.api.InputException;
import lamella.api.Stack;
import lamella.api.StackKernel;
import lamella.engine.LayeredStack;
import lamella.engine.SpectralQuadrature;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The elliptic geometry's angular rules against independent computations: a nested adaptive Gauss–Kronrod
 * integration in plain polar coordinates (outer over the angle, inner over the wavenumber, both to 1e-10), written
 * here; closed forms for the angular rules themselves; the integral representation of Iₘ for its series, recurrence
 * and asymptotic forms.
 */
class EllipticRuleTest {

    /** H by the nested rule: (1/π²) ∫₀^{π/2} dφ ∫₀^{k_max} Z(k cos φ, k sin φ) e^{−k²(a cos²φ + b sin²φ)} cos cos k dk. */
    static double[] nestedPolar(Stack s, double wx2, double wy2, double x0, double y0, double f) {
        StackKernel stack = new LayeredStack(s);
        double omega = 2 * Math.PI * f;
        double a = wx2 / 8;
        double b = wy2 / 8;
        double[] features = stack.featureWavenumbers(omega);
        double[] z = new double[2];
        double[] radial = new double[2];
        double[] out = new double[2];
        SpectralQuadrature inner = new SpectralQuadrature();
        new SpectralQuadrature().integrate((phi, o) -> {
            double c = Math.cos(phi);
            double sn = Math.sin(phi);
            double e = a * c * c + b * sn * sn;
            double reach = x0 * c + y0 * sn;
            inner.integrate((k, r) -> {
                stack.response(k * c, k * sn, omega, z);
                double w = k * Math.exp(-e * k * k) * Math.cos(k * x0 * c) * Math.cos(k * y0 * sn);
                r[0] = z[0] * w;
                r[1] = z[1] * w;
            }, 0, Math.sqrt(25 / e), features, reach > 0 ? 2 * Math.PI / reach : 0, 1e-11, 0, radial);
            o[0] = radial[0];
            o[1] = radial[1];
        }, 0, Math.PI / 2, null, 0, 1e-10, 0, out);
        return new double[] {out[0] / (Math.PI * Math.PI), out[1] / (Math.PI * Math.PI)};
    }

    @ParameterizedTest(name = "film Λx={0} Λy={1}, W={2}×{3} µm, offset ({4}, {5}) µm, f={6} Hz")
    @CsvSource({
        // in-plane isotropic layers: the beams' weight integrated in closed form or by the trapezoidal rule
        "1.4, 1.4, 10, 5, 0, 0, 1e5",
        "1.4, 1.4, 10, 5, 0, 0, 1e7",
        "1.4, 1.4, 28, 2.8, 0, 0, 1e6",
        "1.4, 1.4, 10, 5, 6, 2, 1e6",
        "1.4, 1.4, 10, 5, 0, 0, 0",
        // in-plane anisotropic film, co-centred beams: the rule matched to the beams' ellipticity
        "6.0, 0.8, 10, 5, 0, 0, 1e6",
        "0.8, 6.0, 6, 6, 0, 0, 1e4",
        "6.0, 0.8, 5, 10, 0, 0, 1e3",
        "6.0, 0.8, 28, 2.8, 0, 0, 1e5",
        "0.8, 6.0, 10, 5, 0, 0, 1e7",
        "6.0, 0.8, 10, 5, 0, 0, 0",
        "100, 1, 10, 5, 0, 0, 1e4",
        // in-plane anisotropic film, offset beams: rays in coordinates that make the Gaussian round
        "6.0, 0.8, 10, 5, 4, 1, 2e5",
        "6.0, 0.8, 10, 5, 3, 0, 1e6",
    })
    void theEllipticRuleAgreesWithANestedPolarIntegration(double kx, double ky, double wxMicron, double wyMicron,
                                                          double x0Micron, double y0Micron, double f)
            throws InputException {
        Stack s = EllipticBeamsTest.threeLayers(kx, ky);
        double wx = wxMicron * 1e-6 / Math.sqrt(2);
        double wy = wyMicron * 1e-6 / Math.sqrt(2);
        double[] got = EllipticBeamsTest.at(EllipticBeamsTest.elliptic(s, wx, wy, wx, wy, x0Micron * 1e-6,
                y0Micron * 1e-6), f);
        double[] want = nestedPolar(s, 2 * wx * wx, 2 * wy * wy, x0Micron * 1e-6, y0Micron * 1e-6, f);
        double err = EllipticBeamsTest.relative(got, want);
        assertTrue(err < 1e-7, "relative difference " + err);
    }

    /** Closed forms derived by ψ = 2θ: ∫₀^{π/2} e^{t cos 2θ} dθ = (π/2) I₀(t); ∫₀^{π/2} dθ/(1 − e cos 2θ) = π/(2√(1−e²)). */
    @Test
    void theAngularRuleMeetsClosedForms() {
        QuadrantTrapezoid rule = new QuadrantTrapezoid();
        double[] out = new double[2];
        for (double t : new double[] {0.3, 4, 30}) {
            rule.integrate((c, s, g) -> {
                g[0] = Math.exp(t * (c * c - s * s) - t);
                g[1] = 0;
            }, 1e-12, 0, out);
            assertEquals(0.5 * Math.PI * integralI0(t), out[0], 1e-11 * out[0], "t=" + t);
        }
        for (double e : new double[] {0.1, 0.6, 0.95}) {
            rule.integrate((c, s, g) -> {
                g[0] = 1 / (1 - e * (c * c - s * s));
                g[1] = e;
            }, 1e-12, 0, out);
            assertEquals(0.5 * Math.PI / Math.sqrt(1 - e * e), out[0], 1e-11 * out[0], "e=" + e);
            assertEquals(0.5 * Math.PI * e, out[1], 1e-13, "a constant part is exact");
        }
    }

    /**
     * The matched rule against closed forms derived by ψ = 2φ from Iₘ(z) = (1/π) ∫₀^π e^{z cos ψ} cos mψ dψ
     * (Abramowitz & Stegun 9.6.19): with Z = e^{β cos 2φ} + i, ∫₀^{π/2} e^{−k²(a cos²φ + b sin²φ)} Z dφ =
     * (π/2) e^{−k²(a+b)/2} (I₀(β − k²(a−b)/2) + i I₀(k²(a−b)/2)); and without a weight (a = b = 0)
     * ∫₀^{π/2} dφ/(1 − e cos 2φ) = π/(2√(1−e²)).
     */
    @Test
    void theMatchedRuleMeetsClosedForms() {
        double[] out = new double[2];
        for (double[] abk : new double[][] {{2, 1, 1.5}, {1, 3, 1}, {1e-12, 0.2e-12, 8e5}}) {
            double a = abk[0];
            double b = abk[1];
            double k = abk[2];
            double t = 0.5 * k * k * (a - b);
            for (double beta : new double[] {0.5, 3}) {
                new MatchedAngularRule(a, b).integrate(directional((c2, g) -> {
                    g[0] = Math.exp(beta * c2);
                    g[1] = 1;
                }), k, 1.0, 1e-13, 0, out);
                double envelope = 0.5 * Math.PI * Math.exp(-0.5 * k * k * (a + b));
                double re = envelope * Math.exp(Math.abs(beta - t)) * integralI0(Math.abs(beta - t));
                double im = envelope * Math.exp(Math.abs(t)) * integralI0(Math.abs(t));
                assertEquals(re, out[0], 1e-11 * re, "a=" + a + " b=" + b + " β=" + beta);
                assertEquals(im, out[1], 1e-11 * im, "a=" + a + " b=" + b + " β=" + beta);
            }
        }
        for (double e : new double[] {0.1, 0.6}) {
            new MatchedAngularRule(0, 0).integrate(directional((c2, g) -> {
                g[0] = 1 / (1 - e * c2);
                g[1] = 0;
            }), 1.0, 1.0, 1e-13, 0, out);
            assertEquals(0.5 * Math.PI / Math.sqrt(1 - e * e), out[0], 1e-12, "e=" + e);
        }
    }

    /** Z as a function of cos 2φ = (sx² − sy²)/(sx² + sy²) alone, through a stack kernel. */
    private static StackKernel directional(java.util.function.BiConsumer<Double, double[]> z) {
        return new StackKernel() {
            @Override
            public Stack stack() {
                throw new UnsupportedOperationException();
            }

            @Override
            public void response(double sx, double sy, double omega, double[] out) {
                z.accept((sx * sx - sy * sy) / (sx * sx + sy * sy), out);
            }

            @Override
            public void radialResponse(double k, double omega, double[] out) {
                throw new UnsupportedOperationException();
            }

            @Override
            public void topHalfSpaceRadialResponse(double k, double omega, double[] out) {
                throw new UnsupportedOperationException();
            }

            @Override
            public double[] featureWavenumbers(double omega) {
                return new double[0];
            }
        };
    }

    /**
     * The scaled Bessel functions of all orders, in each of their three methods, against
     * e^{−x} Iₘ(x) = (1/π) ∫₀^π e^{x(cos ψ − 1)} cos mψ dψ (Abramowitz & Stegun 9.6.19) by a fine midpoint rule.
     */
    @ParameterizedTest
    @CsvSource({"0", "5e-4", "2e-3", "1", "20", "100", "499", "501", "5000"})
    void scaledBesselOrdersMeetTheirIntegralRepresentation(double x) {
        double[] got = new double[65];
        ScaledBesselOrders.of(x, 64, got);
        for (int m = 0; m <= 64; m++) {
            int n = 200_000;
            double sum = 0;
            for (int i = 0; i < n; i++) {
                double psi = Math.PI * (i + 0.5) / n;
                sum += Math.exp(x * (Math.cos(psi) - 1)) * Math.cos(m * psi);
            }
            assertEquals(sum / n, got[m], 2e-12 * got[0], "x=" + x + " m=" + m);
        }
    }

    /**
     * The two rules for in-plane anisotropic layers agree: rays with an offset far below a wavelength of the heat
     * (1 pm) against the matched rule without one (common practice, no source).
     */
    @Test
    void raysWithAVanishingOffsetAgreeWithTheMatchedRule() throws InputException {
        Stack s = EllipticBeamsTest.threeLayers(6.0, 0.8);
        for (double f : new double[] {1e3, 1e6}) {
            double[] matched = EllipticBeamsTest.at(EllipticBeamsTest.elliptic(s, 8e-6, 4e-6, 5e-6, 3e-6, 0, 0), f);
            double[] rays = EllipticBeamsTest.at(EllipticBeamsTest.elliptic(s, 8e-6, 4e-6, 5e-6, 3e-6, 1e-12, 0), f);
            double err = EllipticBeamsTest.relative(rays, matched);
            assertTrue(err < 1e-8, "f=" + f + ": relative difference " + err);
        }
    }

    /** e^{−x} I₀(x) = (1/π) ∫₀^π e^{x(cos ψ − 1)} dψ (Abramowitz & Stegun 9.6.19), by a fine midpoint rule. */
    @ParameterizedTest
    @CsvSource({"0", "0.5", "1", "5", "19.99", "20.01", "50", "1000", "1e5"})
    void scaledBesselI0MeetsItsIntegralRepresentation(double x) {
        double want = integralI0(x);
        assertEquals(want, ScaledBesselI0.of(x), 1e-12 * want, "x=" + x);
    }

    /** Abramowitz & Stegun (1964) Table 9.8: e^{−1} I₀(1) = 0.4657596076 (from memory). */
    @Test
    void scaledBesselI0AtOne() {
        assertEquals(0.4657596076, ScaledBesselI0.of(1), 1e-10);
    }

    private static double integralI0(double x) {
        int n = 200_000;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double psi = Math.PI * (i + 0.5) / n;
            sum += Math.exp(x * (Math.cos(psi) - 1));
        }
        return sum / n;
    }
}
