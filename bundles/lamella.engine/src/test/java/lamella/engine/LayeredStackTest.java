package lamella.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.Stack;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class LayeredStackTest {

    private static final double[] K = {0, 1e3, 3e4, 1e5, 1e6, 4e6};
    private static final double[] OMEGA = {2 * Math.PI * 1e3, 2 * Math.PI * 1e5, 2 * Math.PI * 1e7};

    static List<Layer> threeLayers(boolean lastFinite) {
        Layer cap = Layer.isotropicInPlane("cap", 9e-8, 200, 200, 2.45e6).withConductanceBelow(1.2e8);
        Layer film = Layer.isotropicInPlane("film", 3.5e-7, 1.4, 1.1, 1.65e6).withConductanceBelow(3e8);
        Layer base = Layer.isotropicInPlane("base", lastFinite ? 2e-5 : Double.POSITIVE_INFINITY, 140, 140, 1.63e6);
        return List.of(cap, film, base);
    }

    /** Reference: explicit transfer-matrix product (Feldman 1999; Cahill 2004), see TransferMatrixReference. */
    @ParameterizedTest
    @EnumSource(BottomBoundary.class)
    void impedanceRecursionEqualsTransferMatrixProduct(BottomBoundary bottom) {
        List<Layer> layers = threeLayers(bottom != BottomBoundary.SEMI_INFINITE);
        LayeredStack s = new LayeredStack(new Stack(layers, bottom));
        double[] out = new double[2];
        for (double k : K) {
            for (double w : OMEGA) {
                s.radialResponse(k, w, out);
                Complex ref = TransferMatrixReference.response(layers, bottom, k, w);
                assertEquals(0, Math.hypot(out[0] - ref.getReal(), out[1] - ref.getImaginary()) / ref.abs(), 1e-11,
                        "k=" + k + " ω=" + w);
            }
        }
    }

    /** One-layer half-space: Z = 1/(Λ q), q = √(k² + iωC/Λ) (Carslaw & Jaeger 1959, §2.6, transformed). */
    @Test
    void halfSpaceIsOneOverLambdaQ() {
        double lambda = 1.4;
        double c = 1.65e6;
        LayeredStack s = new LayeredStack(new Stack(List.of(
                Layer.isotropicInPlane("glass", Double.POSITIVE_INFINITY, lambda, lambda, c)),
                BottomBoundary.SEMI_INFINITE));
        double[] out = new double[2];
        double k = 2e5;
        double w = 2 * Math.PI * 1e6;
        s.radialResponse(k, w, out);
        Complex expected = Complex.ONE.divide(new Complex(k * k, w * c / lambda).sqrt().multiply(lambda));
        assertEquals(expected.getReal(), out[0], 1e-13 * expected.abs());
        assertEquals(expected.getImaginary(), out[1], 1e-13 * expected.abs());
        assertTrue(out[1] < 0, "a lagging temperature has a negative imaginary part under exp(+iωt)");
    }

    /**
     * 1 mm of a 400 W/mK solid at 100 MHz: cosh(qd) ≈ exp(1800) overflows a matrix product, the impedance form must
     * not. So thick, the layer is a half-space to the surface: Z = 1/(Λ q) (common practice, no source).
     */
    @Test
    void thickConductiveLayerAtHighFrequencyStaysFinite() {
        Layer copper = Layer.isotropicInPlane("thick", 1e-3, 400, 400, 3.45e6);
        Layer base = Layer.isotropicInPlane("base", Double.POSITIVE_INFINITY, 1.4, 1.4, 1.65e6);
        LayeredStack s = new LayeredStack(new Stack(List.of(copper, base), BottomBoundary.SEMI_INFINITE));
        double w = 2 * Math.PI * 1e8;
        double[] out = new double[2];
        for (double k : new double[] {0, 1e4, 1e6, 1e9}) {
            s.radialResponse(k, w, out);
            assertTrue(Double.isFinite(out[0]) && Double.isFinite(out[1]), "finite at k=" + k);
            Complex expected = Complex.ONE.divide(new Complex(k * k, w * 3.45e6 / 400).sqrt().multiply(400));
            assertEquals(0, Math.hypot(out[0] - expected.getReal(), out[1] - expected.getImaginary())
                    / expected.abs(), 1e-12);
        }
        for (BottomBoundary b : new BottomBoundary[] {BottomBoundary.ADIABATIC, BottomBoundary.ISOTHERMAL}) {
            LayeredStack finite = new LayeredStack(new Stack(List.of(copper, base.withThickness(1e-3)), b));
            finite.radialResponse(0, w, out);
            assertTrue(Double.isFinite(out[0]) && Double.isFinite(out[1]), "finite with bottom " + b);
        }
    }

    /** A layer cut into two identical halves in perfect contact is the same layer (common practice, no source). */
    @Test
    void splittingALayerChangesNothing() {
        List<Layer> whole = threeLayers(false);
        Layer film = whole.get(1);
        Layer upper = new Layer("film-a", film.thickness() / 2, film.kThrough(), film.kInPlaneX(), film.kInPlaneY(),
                film.heatCapacity(), Double.POSITIVE_INFINITY);
        Layer lower = new Layer("film-b", film.thickness() / 2, film.kThrough(), film.kInPlaneX(), film.kInPlaneY(),
                film.heatCapacity(), film.conductanceBelow());
        LayeredStack a = new LayeredStack(new Stack(whole, BottomBoundary.SEMI_INFINITE));
        LayeredStack b = new LayeredStack(new Stack(List.of(whole.get(0), upper, lower, whole.get(2)),
                BottomBoundary.SEMI_INFINITE));
        double[] za = new double[2];
        double[] zb = new double[2];
        for (double k : K) {
            for (double w : OMEGA) {
                a.radialResponse(k, w, za);
                b.radialResponse(k, w, zb);
                assertEquals(0, Math.hypot(za[0] - zb[0], za[1] - zb[1]) / Math.hypot(za[0], za[1]), 1e-12);
            }
        }
    }

    /** The high-wavenumber limit of any stack is the top layer's half-space (common practice, no source). */
    @Test
    void deepWavenumbersSeeOnlyTheTopLayer() {
        LayeredStack s = new LayeredStack(new Stack(threeLayers(false), BottomBoundary.SEMI_INFINITE));
        double[] z = new double[2];
        double[] zInf = new double[2];
        double k = TopLayer.halfSpaceWavenumber(s.stack());
        s.radialResponse(k, OMEGA[1], z);
        s.topHalfSpaceRadialResponse(k, OMEGA[1], zInf);
        assertEquals(0, Math.hypot(z[0] - zInf[0], z[1] - zInf[1]) / Math.hypot(z[0], z[1]), 1e-15);
    }

    /** Direction matters in-plane: sx probes Λx and sy probes Λy (common practice, no source). */
    @Test
    void inPlaneAnisotropyUsesEachDirection() {
        Layer a = new Layer("aniso", Double.POSITIVE_INFINITY, 2.0, 8.0, 0.5, 1.6e6, Double.POSITIVE_INFINITY);
        LayeredStack s = new LayeredStack(new Stack(List.of(a), BottomBoundary.SEMI_INFINITE));
        double w = 2 * Math.PI * 1e5;
        double[] alongX = new double[2];
        double[] alongY = new double[2];
        s.response(1e5, 0, w, alongX);
        // Λx sx² = 8 · (1e5)² equals Λy sy² = 0.5 · (4e5)²
        s.response(0, 4e5, w, alongY);
        assertEquals(alongX[0], alongY[0], 1e-14 * Math.abs(alongX[0]));
        assertEquals(alongX[1], alongY[1], 1e-14 * Math.abs(alongX[1]));
    }

    /**
     * An axisymmetric response has no meaning on a layer that conducts differently along x and y: both radial entry
     * points refuse it, naming the layer, instead of quietly using Λx; the directional response still answers.
     */
    @Test
    void radialEntryPointsRefuseAnInPlaneAnisotropicStack() {
        Layer cap = Layer.isotropic("cap", 9e-8, 200, 2.45e6);
        Layer film = new Layer("graphite-film", 2e-6, 6.0, 400.0, 30.0, 1.6e6, Double.POSITIVE_INFINITY);
        Layer base = Layer.isotropic("base", Double.POSITIVE_INFINITY, 140, 1.63e6);
        LayeredStack s = new LayeredStack(new Stack(List.of(cap, film, base), BottomBoundary.SEMI_INFINITE));
        double[] out = new double[2];
        for (Runnable radial : List.<Runnable>of(() -> s.radialResponse(1e5, OMEGA[1], out),
                () -> s.topHalfSpaceRadialResponse(1e5, OMEGA[1], out))) {
            ModelEvaluationException e = assertThrows(ModelEvaluationException.class, radial::run);
            assertTrue(e.getMessage().contains("layer 'graphite-film'"), e.getMessage());
            assertTrue(e.getMessage().contains("400.0") && e.getMessage().contains("30.0"), e.getMessage());
        }
        s.response(1e5, 0, OMEGA[1], out);
        assertTrue(Double.isFinite(out[0]) && out[1] < 0);
    }
}
