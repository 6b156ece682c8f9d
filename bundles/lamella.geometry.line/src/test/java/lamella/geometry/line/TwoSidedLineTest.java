package lamella.geometry.line;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.Stack;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/** A line heater inside the stack (on glass, covered by a liquid or a second solid), and heated over a depth. */
class TwoSidedLineTest {

    static final Layer FILM = Layer.isotropicInPlane("film", 2e-7, 0.9, 0.9, 1.8e6).withConductanceBelow(4e7);
    static final Layer GLASS = Layer.isotropicInPlane("glass", Double.POSITIVE_INFINITY, LineHeaterTest.LAMBDA,
            LineHeaterTest.LAMBDA, LineHeaterTest.C);

    /**
     * Issue 13's check, common practice, no source: the same film and glass above the heater as below it (a mirror
     * image about the heated plane) halve the response at every frequency. This runs through the two-sided tail of
     * the wavenumber integral, against the one-sided tail's closed form.
     */
    @Test
    void mirrorSymmetricHeaterGivesHalfTheOneSidedResponse() throws InputException {
        Stack one = new Stack(List.of(FILM, GLASS), BottomBoundary.SEMI_INFINITE);
        Layer filmUp = Layer.isotropicInPlane("film-up", 2e-7, 0.9, 0.9, 1.8e6);
        Layer glassUp = Layer.isotropicInPlane("glass-up", Double.POSITIVE_INFINITY, LineHeaterTest.LAMBDA,
                LineHeaterTest.LAMBDA, LineHeaterTest.C).withConductanceBelow(4e7);
        Stack two = new Stack(List.of(FILM, GLASS), BottomBoundary.SEMI_INFINITE, List.of(filmUp, glassUp),
                BottomBoundary.SEMI_INFINITE);
        for (double f : new double[] {10, 1e3, 1e5}) {
            double[] a = LineHeaterTest.at(LineHeaterTest.line(one, 5e-6), f);
            double[] b = LineHeaterTest.at(LineHeaterTest.line(two, 5e-6), f);
            assertEquals(a[0] / 2, b[0], 1e-7 * Math.hypot(a[0], a[1]), "in-phase at " + f + " Hz");
            assertEquals(a[1] / 2, b[1], 1e-7 * Math.hypot(a[0], a[1]), "out-of-phase at " + f + " Hz");
        }
    }

    /** Issue 13's check, common practice, no source: a barely conducting layer above takes no heat. */
    @Test
    void aNonConductingCoverChangesNothing() throws InputException {
        Stack one = new Stack(List.of(FILM, GLASS), BottomBoundary.SEMI_INFINITE);
        Stack two = new Stack(List.of(FILM, GLASS), BottomBoundary.SEMI_INFINITE,
                List.of(Layer.isotropicInPlane("cover", Double.POSITIVE_INFINITY, 1e-12, 1e-12, 1e-6)),
                BottomBoundary.SEMI_INFINITE);
        for (double f : new double[] {10, 1e3, 1e5}) {
            double[] a = LineHeaterTest.at(LineHeaterTest.line(one, 5e-6), f);
            double[] b = LineHeaterTest.at(LineHeaterTest.line(two, 5e-6), f);
            assertEquals(a[0], b[0], 1e-7 * Math.hypot(a[0], a[1]), "in-phase at " + f + " Hz");
            assertEquals(a[1], b[1], 1e-7 * Math.hypot(a[0], a[1]), "out-of-phase at " + f + " Hz");
        }
    }

    /**
     * A heater between glass and a liquid with a boundary conductance to the liquid, against an independent
     * quadrature (Commons Math Gauss–Legendre, half-period by half-period) of the defining integral
     * (1/π)∫₀^∞ Z(k) sin²(kb)/(kb)² dk with Z from the half-space forms of Carslaw &amp; Jaeger (1959, §2.6,
     * transformed: 1/(Λ q), q = √(k² + iωC/Λ)) put in parallel, the liquid's behind 1/G (derived).
     */
    @Test
    void heaterBetweenGlassAndLiquidAgreesWithAnIndependentQuadrature() throws InputException {
        double b = 10e-6;
        double g = 2e6;
        Layer liquid = Layer.isotropicInPlane("liquid", Double.POSITIVE_INFINITY, 0.6, 0.6, 4.2e6)
                .withConductanceBelow(g);
        Stack s = new Stack(List.of(GLASS), BottomBoundary.SEMI_INFINITE, List.of(liquid),
                BottomBoundary.SEMI_INFINITE);
        for (double f : new double[] {30, 3e3}) {
            double w = 2 * Math.PI * f;
            double[] h = LineHeaterTest.at(LineHeaterTest.line(s, b), f);
            double[] ref = new double[2];
            int halfPeriods = 2000;
            for (int part = 0; part < 2; part++) {
                int p = part;
                IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(10, 1e-12, 1e-15);
                double sum = 0;
                for (int m = 0; m < halfPeriods; m++) {
                    sum += gl.integrate(10_000_000, k -> {
                        Complex zg = new Complex(k * k, w * LineHeaterTest.C / LineHeaterTest.LAMBDA).sqrt()
                                .multiply(LineHeaterTest.LAMBDA);
                        Complex zl = new Complex(k * k, w * 4.2e6 / 0.6).sqrt().multiply(0.6).reciprocal()
                                .add(1 / g);
                        Complex z = zg.add(zl.reciprocal()).reciprocal();
                        double sinc = k * b < 1e-4 ? 1 : Math.sin(k * b) / (k * b);
                        return (p == 0 ? z.getReal() : z.getImaginary()) * sinc * sinc;
                    }, m * Math.PI / b, (m + 1) * Math.PI / b);
                }
                // beyond X = 2000π the glass alone answers 1/(Λ k) (k ≫ G/Λ): ∫ sin²u/u³ from X ≈ 1/(4X²)
                double x = halfPeriods * Math.PI;
                ref[part] = (sum + (p == 0 ? 1 / (LineHeaterTest.LAMBDA * 4 * x * x) : 0)) / Math.PI;
            }
            assertEquals(ref[0], h[0], 1e-6 * Math.hypot(ref[0], ref[1]), "in-phase at " + f + " Hz");
            assertEquals(ref[1], h[1], 1e-6 * Math.hypot(ref[0], ref[1]), "out-of-phase at " + f + " Hz");
        }
    }

    /**
     * Issue 13's check, common practice, no source: heating spread over a vanishing depth (1e-15 m) of the top layer
     * is heating at the surface. The line integrates such a stack's tail numerically; here against the one-sided
     * closed-form tail.
     */
    @Test
    void vanishingAbsorptionDepthIsSurfaceHeating() throws InputException {
        Stack one = new Stack(List.of(FILM, GLASS), BottomBoundary.SEMI_INFINITE);
        Stack deep = one.withOptics(lamella.api.OpticalDepths.absorbing(1e-15));
        for (double f : new double[] {10, 1e3, 1e5}) {
            double[] a = LineHeaterTest.at(LineHeaterTest.line(one, 5e-6), f);
            double[] b = LineHeaterTest.at(LineHeaterTest.line(deep, 5e-6), f);
            assertEquals(a[0], b[0], 1e-7 * Math.hypot(a[0], a[1]), "in-phase at " + f + " Hz");
            assertEquals(a[1], b[1], 1e-7 * Math.hypot(a[0], a[1]), "out-of-phase at " + f + " Hz");
        }
    }
}
