package lamella.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.EvaluationCancelledException;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.Stack;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

class RadialIntegralTest {

    private static final double LAMBDA = 1.4;
    private static final double C = 1.65e6;
    private static final LayeredStack HALF_SPACE = new LayeredStack(new Stack(List.of(
            Layer.isotropic("glass", Double.POSITIVE_INFINITY, LAMBDA, C)), BottomBoundary.SEMI_INFINITE));

    /** The transform of a uniform disc of radius a and unit power, 2 J₁(ka)/(ka) (Hankel transform of order 0). */
    private static RadialWeight disc(double a) {
        return k -> k * a < 1e-8 ? 1.0 : 2 * Bessel.j1(k * a) / (k * a);
    }

    /**
     * A uniform disc of radius a and power P on a half-space, its mean temperature read over the same disc, steady:
     * 8P/(3π² Λ a), the spreading resistance of a uniformly heated disc (from memory; it follows from the point
     * source P/(2πΛr) of Carslaw & Jaeger 1959, §10.2, and ∫₀^∞ J₁(u)²/u² du = 4/(3π), A&S 11.4.33 with μ = ν = 1,
     * λ = 2). The weight decays like k⁻³: a tail bound of 10⁴/a leaves ~1e-8.
     */
    @Test
    void uniformDiscOnAHalfSpaceHasTheSpreadingResistance() {
        double a = 5e-6;
        RadialWeight disc = disc(a);
        RadialIntegral integral = RadialIntegral.of("disc", k -> disc.at(k) * disc.at(k), 1e4 / a)
                .oscillating(2 * Math.PI / a).breaks(1 / a).tolerance(1e-9, 0.0);
        double[] out = new double[2];
        integral.at(HALF_SPACE, 0.0, out);
        double expected = 8.0 / (3 * Math.PI * Math.PI * LAMBDA * a);
        assertEquals(expected, out[0], 1e-6 * expected);
        assertEquals(0.0, out[1], 0.0);
    }

    /**
     * The same disc read at its centre under periodic heating: superposing Carslaw & Jaeger's periodic point source
     * on a half-space, P e^{−σr}/(2πΛr) with σ = √(iωC/Λ) (Carslaw & Jaeger 1959, §10.2), over the disc gives
     * T(0) = (P/(π a² Λ)) (1 − e^{−σa})/σ. The weight 2J₁(ka)/(ka) decays only like k^{−3/2}, so the tail bound is
     * far out (the truncated tail is ~(k_max a)^{−3/2}).
     */
    @Test
    void uniformDiscCentreUnderPeriodicHeatingMatchesThePointSourceSum() {
        double a = 3e-6;
        double f = 2e5;
        double kMax = 4e4 / a;
        RadialIntegral integral = RadialIntegral.of("disc", disc(a), kMax).oscillating(2 * Math.PI / a)
                .tolerance(1e-8, 0.0);
        double[] out = new double[2];
        integral.at(HALF_SPACE, f, out);
        Complex sigma = new Complex(0, 2 * Math.PI * f * C / LAMBDA).sqrt();
        Complex expected = Complex.ONE.subtract(sigma.multiply(-a).exp()).divide(sigma)
                .multiply(1.0 / (Math.PI * a * a * LAMBDA));
        double err = Math.hypot(out[0] - expected.getReal(), out[1] - expected.getImaginary()) / expected.abs();
        assertTrue(err < 2e-6, "relative error " + err);
        assertTrue(out[1] < 0, "the temperature lags the heating");
    }

    /**
     * The Gaussian helper is a radial integral of its weight: steady, co-axial, on a half-space it gives
     * 1/(√(2π) Λ W) with W² = w₀² + w₁² (Lax, J. Appl. Phys. 48, 3919, 1977, centre temperature of a Gaussian
     * beam, averaged by a Gaussian probe).
     */
    @Test
    void gaussianHelperGivesTheSteadyGaussianOnAHalfSpace() {
        double w2 = 6e-6 * 6e-6 + 4e-6 * 4e-6;
        double[] out = new double[2];
        GaussianHankel.of("gaussian", w2, 0.0, 1e-9).at(HALF_SPACE, 0.0, out);
        double expected = 1.0 / (Math.sqrt(2 * Math.PI) * LAMBDA * Math.sqrt(w2));
        assertEquals(expected, out[0], 1e-9 * expected);
        assertEquals(0.0, out[1], 0.0);
    }

    @Test
    void aWeightThatThrowsBecomesAModelEvaluationExceptionNamingGeometryAndFrequency() {
        IllegalStateException cause = new IllegalStateException("table index out of range");
        RadialIntegral integral = RadialIntegral.of("flat-top", k -> {
            if (k > 1e5) {
                throw cause;
            }
            return 1.0;
        }, 1e6);
        ModelEvaluationException e = assertThrows(ModelEvaluationException.class,
                () -> integral.at(HALF_SPACE, 1e4, new double[2]));
        assertTrue(e.getMessage().startsWith("geometry 'flat-top' at 10000.0 Hz: its weight w(k) failed at k = "),
                e.getMessage());
        assertTrue(e.getMessage().contains("table index out of range"), e.getMessage());
        assertSame(cause, e.getCause().getCause());
    }

    @Test
    void aWeightThatIsNotFiniteIsRefused() {
        RadialIntegral integral = RadialIntegral.of("flat-top", k -> k > 1e5 ? Double.NaN : 1.0, 1e6);
        ModelEvaluationException e = assertThrows(ModelEvaluationException.class,
                () -> integral.at(HALF_SPACE, 1e4, new double[2]));
        assertTrue(e.getMessage().contains("geometry 'flat-top' at 10000.0 Hz: its weight w(k) is NaN"),
                e.getMessage());
    }

    /** A chirp sin(k²/k₀²) cannot be resolved: the quadrature's bound ends it with words (common practice). */
    @Test
    void anIntegralThatCannotConvergeFailsWithinItsBoundNamingTheGeometry() {
        RadialIntegral integral = RadialIntegral.of("chirp", k -> Math.sin(k * k * 1e-8), 1e7)
                .tolerance(1e-10, 0.0);
        ModelEvaluationException e = assertThrows(ModelEvaluationException.class,
                () -> integral.at(HALF_SPACE, 1e3, new double[2]));
        assertTrue(e.getMessage().startsWith("geometry 'chirp' at 1000.0 Hz: the spectral integral"),
                e.getMessage());
        assertTrue(e.getMessage().contains(SpectralQuadrature.MAX_PANELS + " panels"), e.getMessage());
    }

    @Test
    void anInPlaneAnisotropicStackIsRefusedNamingTheLayer() {
        LayeredStack stack = new LayeredStack(new Stack(List.of(
                new Layer("quartz-x", Double.POSITIVE_INFINITY, 6.2, 10.4, 6.2, 1.9e6, Double.POSITIVE_INFINITY)),
                BottomBoundary.SEMI_INFINITE));
        ModelEvaluationException e = assertThrows(ModelEvaluationException.class,
                () -> GaussianHankel.of("gaussian", 1e-11, 0, 1e-6).at(stack, 1e6, new double[2]));
        assertTrue(e.getMessage().startsWith("geometry 'gaussian' at 1000000.0 Hz: a radial (axisymmetric)"
                + " response was asked of a stack whose layer 'quartz-x'"), e.getMessage());
    }

    @Test
    void noSteadyStateOnAnAdiabaticStack() {
        LayeredStack stack = new LayeredStack(new Stack(List.of(Layer.isotropic("slab", 1e-3, 1.4, C)),
                BottomBoundary.ADIABATIC));
        ModelEvaluationException e = assertThrows(ModelEvaluationException.class,
                () -> GaussianHankel.of("disc", 1e-11, 0, 1e-6).at(stack, 0.0, new double[2]));
        assertTrue(e.getMessage().contains("geometry 'disc': no steady state exists"), e.getMessage());
    }

    @Test
    void cancellationPassesThroughUnchanged() {
        RadialIntegral integral = GaussianHankel.of("gaussian", 1e-11, 0, 1e-6);
        Thread.currentThread().interrupt();
        try {
            RuntimeException e = assertThrows(RuntimeException.class,
                    () -> integral.at(HALF_SPACE, 1e6, new double[2]));
            assertInstanceOf(EvaluationCancelledException.class, e);
            assertTrue(Thread.currentThread().isInterrupted(), "the flag stays set");
        } finally {
            Thread.interrupted();
        }
    }

    @Test
    void aTailBoundThatIsNotAWavenumberIsAProgrammingError() {
        assertThrows(IllegalArgumentException.class, () -> RadialIntegral.of("disc", k -> 1.0, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> RadialIntegral.of("disc", k -> 1.0, 0.0));
        assertThrows(IllegalArgumentException.class,
                () -> RadialIntegral.of("disc", k -> 1.0, 1e6).oscillating(-1.0));
    }
}
