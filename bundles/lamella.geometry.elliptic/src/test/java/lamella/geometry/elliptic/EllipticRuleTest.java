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
 * here; closed forms for the angular rule itself; the integral representation of I₀ for its series and asymptotic
 * forms.
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
        // in-plane anisotropic film: the rule in coordinates that make the Gaussian round
        "6.0, 0.8, 10, 5, 0, 0, 1e6",
        "6.0, 0.8, 10, 5, 4, 1, 2e5",
        "0.8, 6.0, 6, 6, 0, 0, 1e4",
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
