package lamella.geometry.gaussian;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.Parameters;
import lamella.api.Stack;
import lamella.engine.LayeredStack;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.Test;

class GaussianBeamsTest {

    static final Layer CAP = Layer.isotropicInPlane("cap", 9e-8, 200, 200, 2.45e6).withConductanceBelow(1.2e8);
    static final Layer FILM = Layer.isotropicInPlane("film", 3.5e-7, 1.4, 1.4, 1.65e6);
    static final Layer BASE = Layer.isotropicInPlane("base", Double.POSITIVE_INFINITY, 140, 140, 1.63e6);
    static final Stack THREE = new Stack(List.of(CAP, FILM, BASE), BottomBoundary.SEMI_INFINITE);

    static GeometryModel beams(Stack s, double pump, double probe, double offset) throws InputException {
        Parameters p = Parameters.of("geometry", Map.of(GaussianBeams.PUMP, pump, GaussianBeams.PROBE, probe,
                GaussianBeams.OFFSET, offset), Map.of());
        return new GaussianBeams().bind(p, new LayeredStack(s));
    }

    static double[] at(GeometryModel m, double f) {
        double[] out = new double[2];
        m.at(f, out);
        return out;
    }

    static Stack halfSpace(double kz, double kr, double c) {
        return new Stack(List.of(new Layer("solid", Double.POSITIVE_INFINITY, kz, kr, kr, c,
                Double.POSITIVE_INFINITY)), BottomBoundary.SEMI_INFINITE);
    }

    /**
     * Lax, J. Appl. Phys. 48, 3919 (1977): the steady centre temperature of a half-space under a Gaussian spot of
     * total power P and 1/e² radius w₀ is P/(√(2π) Λ w₀); a Gaussian probe of radius w₁ replaces w₀ by √(w₀²+w₁²).
     */
    @Test
    void steadyCentreTemperatureOfAHalfSpace() throws InputException {
        double lambda = 1.38;
        for (double[] radii : new double[][] {{10e-6, 1e-9}, {6e-6, 4e-6}}) {
            double w = Math.hypot(radii[0], radii[1]);
            double expected = 1 / (Math.sqrt(2 * Math.PI) * lambda * w);
            double[] h = at(beams(halfSpace(lambda, lambda, 1.6e6), radii[0], radii[1], 0), 0.0);
            assertEquals(expected, h[0], 1e-9 * expected);
            assertEquals(0.0, h[1], 0.0);
        }
    }

    /**
     * An anisotropic half-space in steady state responds as an isotropic one of conductivity √(Λz Λr) (coordinate
     * scaling z' = z √(Λr/Λz); Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed., 1959, §1.17).
     */
    @Test
    void anisotropicHalfSpaceRespondsAsGeometricMean() throws InputException {
        double[] a = at(beams(halfSpace(0.4, 12.0, 1.6e6), 5e-6, 5e-6, 0), 0.0);
        double[] b = at(beams(halfSpace(Math.sqrt(0.4 * 12.0), Math.sqrt(0.4 * 12.0), 1.6e6), 5e-6, 5e-6, 0), 0.0);
        assertEquals(b[0], a[0], 1e-9 * b[0]);
    }

    /**
     * With beams far wider than the thermal penetration depth, heat flow is one-dimensional: H → Z(k=0) · 2/(π(w₀²+w₁²)),
     * the probe-averaged flux density times the 1D layered response (Cahill 2004, the k → 0 limit).
     */
    @Test
    void wideBeamsGiveTheOneDimensionalSolution() throws InputException {
        double w = 5e-3;
        double f = 1e6;
        double[] z = new double[2];
        new LayeredStack(THREE).radialResponse(0, 2 * Math.PI * f, z);
        double[] h = at(beams(THREE, w, w, 0), f);
        double flux = 2 / (Math.PI * 2 * w * w);
        assertEquals(z[0] * flux, h[0], 1e-6 * Math.hypot(z[0], z[1]) * flux);
        assertEquals(z[1] * flux, h[1], 1e-6 * Math.hypot(z[0], z[1]) * flux);
    }

    /** Cutting a layer into two identical halves changes nothing (common practice, no source). */
    @Test
    void splitLayerGivesTheSameSignal() throws InputException {
        Layer a = FILM.withThickness(FILM.thickness() / 2);
        Layer b = new Layer("film-b", FILM.thickness() / 2, 1.4, 1.4, 1.4, 1.65e6, Double.POSITIVE_INFINITY);
        Stack split = new Stack(List.of(CAP, a, b, BASE), BottomBoundary.SEMI_INFINITE);
        for (double f : new double[] {1e3, 1e5, 1e7}) {
            double[] x = at(beams(THREE, 6e-6, 4e-6, 0), f);
            double[] y = at(beams(split, 6e-6, 4e-6, 0), f);
            assertEquals(0, Math.hypot(x[0] - y[0], x[1] - y[1]) / Math.hypot(x[0], x[1]), 1e-9);
        }
    }

    /**
     * Convergence against an independent reference: Commons Math's iterative Legendre–Gauss integration of the same
     * Hankel integral (with Commons Math's J₀ for the offset), to 1e-12. The adaptive result must agree to 1e-6 from
     * 1 kHz to 100 GHz, co-axial and offset.
     */
    @Test
    void spectralIntegralConvergesToAnIndependentReference() throws InputException {
        LayeredStack kernel = new LayeredStack(THREE);
        for (double offset : new double[] {0, 8e-6}) {
            GeometryModel m = beams(THREE, 6e-6, 4e-6, offset);
            for (double f : new double[] {1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e11}) {
                double[] ref = legendreGaussReference(kernel, f, 6e-6 * 6e-6 + 4e-6 * 4e-6, offset);
                double[] h = at(m, f);
                double err = Math.hypot(h[0] - ref[0], h[1] - ref[1]) / Math.hypot(ref[0], ref[1]);
                assertTrue(err < 1e-6, "f=" + f + " offset=" + offset + " relative error " + err);
            }
        }
    }

    /**
     * The convergence itself: as the tolerance tightens from 1e-3 to 1e-9 the error against the same independent
     * reference (Commons Math Legendre–Gauss, see above) stays below the tolerance at every frequency.
     */
    @Test
    void errorFallsWithTheTolerance() throws InputException {
        LayeredStack kernel = new LayeredStack(THREE);
        double[] freqs = {1e3, 1e5, 1e7};
        for (double tol : new double[] {1e-3, 1e-5, 1e-7, 1e-9}) {
            for (double f : freqs) {
                GaussianModel m = new GaussianModel(kernel, 6e-6, 4e-6, 0, tol);
                double[] h = at(m, f);
                double[] ref = legendreGaussReference(kernel, f, 6e-6 * 6e-6 + 4e-6 * 4e-6, 0);
                double err = Math.hypot(h[0] - ref[0], h[1] - ref[1]) / Math.hypot(ref[0], ref[1]);
                assertTrue(err < tol, "tolerance " + tol + " f=" + f + " error " + err);
            }
        }
    }

    static double[] legendreGaussReference(LayeredStack kernel, double f, double w2, double offset) {
        double omega = 2 * Math.PI * f;
        double kMax = Math.sqrt(40 * 8 / w2);
        double[] ref = new double[2];
        for (int part = 0; part < 2; part++) {
            final int p = part;
            IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(32, 1e-13, 1e-300, 3, 64);
            double[] z = new double[2];
            double sum = 0;
            int pieces = 400;
            for (int i = 0; i < pieces; i++) {
                double lo = kMax * Math.pow((double) i / pieces, 2);
                double hi = kMax * Math.pow((double) (i + 1) / pieces, 2);
                sum += integrator.integrate(1_000_000, k -> {
                    kernel.radialResponse(k, omega, z);
                    double j0 = offset > 0 ? BesselJ.value(0, k * offset) : 1.0;
                    return z[p] * k * Math.exp(-k * k * w2 / 8) * j0;
                }, lo, hi);
            }
            ref[part] = sum / (2 * Math.PI);
        }
        return ref;
    }

    /** Under exp(+iωt) the surface temperature lags the heating: negative phase (CONVENTIONS). */
    @Test
    void temperatureLagsTheHeating() throws InputException {
        for (double f : new double[] {1e3, 1e6, 1e8}) {
            double[] h = at(beams(THREE, 6e-6, 4e-6, 0), f);
            assertTrue(h[1] < 0 && h[0] > 0, "f=" + f);
        }
    }

    @Test
    void anInPlaneAnisotropicLayerIsAClearError() {
        Stack s = new Stack(List.of(new Layer("xy", Double.POSITIVE_INFINITY, 1, 2, 3, 1e6,
                Double.POSITIVE_INFINITY)), BottomBoundary.SEMI_INFINITE);
        InputException e = assertThrows(InputException.class, () -> beams(s, 5e-6, 5e-6, 0));
        assertEquals("geometry.type", e.path());
        assertTrue(e.getMessage().contains("axisymmetric"), e.getMessage());
    }

    @Test
    void steadyStateOnAnAdiabaticStackIsAnError() throws InputException {
        Stack s = new Stack(List.of(FILM.withThickness(1e-6)), BottomBoundary.ADIABATIC);
        GeometryModel m = beams(s, 5e-6, 5e-6, 0);
        assertThrows(ModelEvaluationException.class, () -> at(m, 0));
        assertTrue(Double.isFinite(at(m, 1e3)[0]));
    }
}
