package lamella.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.OpticalDepths;
import lamella.api.Stack;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/** Heating spread as exp(−z/δ) through the first layer and the probe's reading weighted by exp(−z/δₛ). */
class OpticalDepthTest {

    private static final double[] K = {0, 1e4, 3e5, 2e6, 1e7, 5e7};
    private static final double[] OMEGA = {0.0, 2 * Math.PI * 1e3, 2 * Math.PI * 1e5, 2 * Math.PI * 1e7};

    static double rel(double[] out, Complex ref) {
        return Math.hypot(out[0] - ref.getReal(), out[1] - ref.getImaginary()) / ref.abs();
    }

    static Complex at(Stack s, double k, double w) {
        double[] out = new double[2];
        new LayeredStack(s).radialResponse(k, w, out);
        return new Complex(out[0], out[1]);
    }

    /**
     * Issue 13's check, common practice, no source: as δ → 0 the heating and the reading gather at the plane and the
     * response becomes the surface-heated one (here δ = 1e-15 m, so the difference, of order |q|δ, stays below 1e-7).
     * Checked with a layer above and a boundary below, so that both faces' reflections take part.
     */
    @Test
    void vanishingDepthsGiveSurfaceHeating() {
        Layer cap = Layer.isotropicInPlane("cap", 9e-8, 200, 200, 2.45e6).withConductanceBelow(1.2e8);
        Layer base = Layer.isotropicInPlane("base", Double.POSITIVE_INFINITY, 140, 140, 1.63e6);
        Layer window = Layer.isotropicInPlane("window", Double.POSITIVE_INFINITY, 1.3, 1.3, 1.9e6)
                .withConductanceBelow(8e7);
        for (Stack surface : List.of(new Stack(List.of(cap, base), BottomBoundary.SEMI_INFINITE),
                new Stack(List.of(cap, base), BottomBoundary.SEMI_INFINITE, List.of(window),
                        BottomBoundary.SEMI_INFINITE),
                new Stack(List.of(cap.withConductanceBelow(Double.POSITIVE_INFINITY)), BottomBoundary.ADIABATIC))) {
            Stack deep = surface.withOptics(OpticalDepths.absorbing(1e-15));
            Stack readDeep = surface.withOptics(new OpticalDepths(0, 1e-15, false));
            for (double k : K) {
                for (double w : OMEGA) {
                    if (w == 0 && (k == 0 || surface.bottom() == BottomBoundary.ADIABATIC)) {
                        continue;
                    }
                    Complex ref = at(surface, k, w);
                    assertEquals(0, rel(toArray(at(deep, k, w)), ref), 1e-7, "k=" + k + " ω=" + w);
                    assertEquals(0, rel(toArray(at(readDeep, k, w)), ref), 1e-7, "k=" + k + " ω=" + w);
                }
            }
        }
    }

    /**
     * A half-space heated as β e^{−βz} and read as σ e^{−σz}, with an adiabatic surface. Derived for this test from
     * the half-space's Green's function by the method of images, (e^{−q|z−z'|} + e^{−q(z+z')})/(2Λq) (Carslaw &amp;
     * Jaeger, Conduction of Heat in Solids, 2nd ed., 1959, the image source for an insulated surface), integrated
     * over both profiles: T = σβ(σ + β + q) / (Λ q (σ + q)(β + q)(σ + β)), which for σ = β is
     * β(2β + q)/(2Λq(β + q)²) and tends to 1/(Λq) as β, σ → ∞. Written here independently of the engine's general
     * finite-layer form.
     */
    @Test
    void halfSpaceHeatedInDepthFollowsItsClosedForm() {
        double lambda = 1.4;
        double c = 1.65e6;
        Layer solid = Layer.isotropicInPlane("solid", Double.POSITIVE_INFINITY, lambda, lambda, c);
        double[][] depths = {{1e-6, 1e-6}, {8e-8, 3e-7}, {2e-6, 5e-8}};
        for (double[] dd : depths) {
            Stack s = new Stack(List.of(solid), BottomBoundary.SEMI_INFINITE)
                    .withOptics(new OpticalDepths(dd[0], dd[1], dd[0] == dd[1]));
            double b = 1 / dd[0];
            double sg = 1 / dd[1];
            for (double k : K) {
                for (double w : OMEGA) {
                    if (k == 0 && w == 0) {
                        continue;
                    }
                    Complex q = new Complex(k * k, w * c / lambda).sqrt();
                    Complex ref = q.add(sg + b).multiply(sg * b).divide(q.multiply(lambda).multiply(q.add(sg))
                            .multiply(q.add(b)).multiply(sg + b));
                    assertEquals(0, rel(toArray(at(s, k, w)), ref), 1e-12, "δ=" + dd[0] + " δs=" + dd[1]
                            + " k=" + k + " ω=" + w);
                }
            }
        }
    }

    /**
     * Issue 13's check: the first layer split into thin sublayers with the heat distributed over them. Independent
     * of the engine: N + 1 sheets 0, h, …, d carry the heat and the reading by the trapezoid rule (their shares
     * normalised), joined by slabs of thickness h whose end fluxes are γ(θ₁ coth qh − θ₂ csch qh) (the slab's
     * two-port, from its cosh/sinh solution; Carslaw &amp; Jaeger 1959, from memory); the faces see the window
     * (1/G + 1/γ) and the base (1/G + 1/γ) as half-spaces. The tridiagonal system is solved for N = 400 and 800 and
     * extrapolated in 1/N² (Richardson), common practice, no source.
     */
    @Test
    void aLayerSplitIntoThinSheetsWithTheHeatDistributedAgrees() {
        double d = 2e-7;
        Layer film = Layer.isotropicInPlane("film", d, 30, 30, 2.2e6).withConductanceBelow(2e8);
        Layer base = Layer.isotropicInPlane("base", Double.POSITIVE_INFINITY, 140, 140, 1.63e6);
        Layer window = Layer.isotropicInPlane("window", Double.POSITIVE_INFINITY, 1.3, 1.3, 1.9e6)
                .withConductanceBelow(8e7);
        double absorption = 5e-8;
        double sensing = 1.2e-7;
        Stack s = new Stack(List.of(film, base), BottomBoundary.SEMI_INFINITE, List.of(window),
                BottomBoundary.SEMI_INFINITE, new OpticalDepths(absorption, sensing, false));
        for (double k : new double[] {1e3, 1e6, 1e7}) {
            for (double w : new double[] {2 * Math.PI * 1e4, 2 * Math.PI * 1e7}) {
                Complex coarse = sheets(film, base, window, absorption, sensing, 400, k, w);
                Complex fine = sheets(film, base, window, absorption, sensing, 800, k, w);
                Complex ref = fine.multiply(4).subtract(coarse).divide(3);
                assertEquals(0, rel(toArray(at(s, k, w)), ref), 1e-8, "k=" + k + " ω=" + w);
            }
        }
    }

    private static Complex gamma(Layer l, double k, double w) {
        return new Complex(l.kInPlaneX() * k * k, w * l.heatCapacity()).divide(l.kThrough()).sqrt()
                .multiply(l.kThrough());
    }

    private static Complex sheets(Layer film, Layer base, Layer window, double absorption, double sensing, int n,
                                  double k, double w) {
        double d = film.thickness();
        double h = d / n;
        Complex g = gamma(film, k, w);
        Complex qh = g.divide(film.kThrough()).multiply(h);
        // the slab's two-port: a = γ coth qh, b = γ csch qh; a − b = γ tanh(qh/2) kept apart, as a ≈ b ≈ Λ/h
        Complex b = g.divide(qh.sinh());
        Complex excess = g.multiply(qh.divide(2).tanh());
        Complex yAbove = gamma(window, k, w).reciprocal().add(1 / window.conductanceBelow()).reciprocal();
        Complex yBelow = gamma(base, k, w).reciprocal().add(1 / film.conductanceBelow()).reciprocal();
        double[] heat = new double[n + 1];
        double[] read = new double[n + 1];
        double sumHeat = 0;
        double sumRead = 0;
        for (int j = 0; j <= n; j++) {
            double weight = j == 0 || j == n ? 0.5 : 1.0;
            heat[j] = weight * Math.exp(-j * h / absorption);
            read[j] = weight * Math.exp(-j * h / sensing);
            sumHeat += heat[j];
            sumRead += read[j];
        }
        // rows: (2a) θ_j − b θ_{j−1} − b θ_{j+1} = heat_j inside, a + Y on the faces' diagonals. Thomas algorithm
        // with each pivot written as b + e_j (e₀ = (a − b) + Y_above, e_j = 2(a − b) + b e_{j−1}/(b + e_{j−1})), so
        // that no two numbers near Λ/h are subtracted; the last pivot is (a − b) + Y_below + b e/(b + e).
        Complex[] pivot = new Complex[n + 1];
        Complex[] dPrime = new Complex[n + 1];
        Complex e = excess.add(yAbove);
        pivot[0] = b.add(e);
        dPrime[0] = new Complex(heat[0] / sumHeat).divide(pivot[0]);
        for (int j = 1; j <= n; j++) {
            Complex carried = b.multiply(e).divide(b.add(e));
            if (j < n) {
                e = excess.multiply(2).add(carried);
                pivot[j] = b.add(e);
            } else {
                pivot[j] = excess.add(yBelow).add(carried);
            }
            dPrime[j] = b.multiply(dPrime[j - 1]).add(heat[j] / sumHeat).divide(pivot[j]);
        }
        Complex[] theta = new Complex[n + 1];
        theta[n] = dPrime[n];
        for (int j = n - 1; j >= 0; j--) {
            theta[j] = dPrime[j].add(b.divide(pivot[j]).multiply(theta[j + 1]));
        }
        Complex t = Complex.ZERO;
        for (int j = 0; j <= n; j++) {
            t = t.add(theta[j].multiply(read[j] / sumRead));
        }
        return t;
    }

    /** A stack heated in depth has no closed-form half-space limit; the kernel says so instead of a wrong value. */
    @Test
    void noHalfSpaceLimitWhenHeatedInDepth() {
        Stack s = new Stack(List.of(Layer.isotropic("solid", Double.POSITIVE_INFINITY, 1.4, 1.6e6)),
                BottomBoundary.SEMI_INFINITE).withOptics(OpticalDepths.absorbing(1e-7));
        assertThrows(ModelEvaluationException.class,
                () -> new LayeredStack(s).topHalfSpaceRadialResponse(1e6, 1e6, new double[2]));
    }

    @Test
    void opticalDepthRules() {
        assertThrows(IllegalArgumentException.class, () -> new OpticalDepths(-1e-7, 0, false));
        assertThrows(IllegalArgumentException.class, () -> new OpticalDepths(1e-7, 2e-7, true));
        OpticalDepths tied = OpticalDepths.absorbing(1e-7);
        assertEquals(3e-7, tied.withAbsorption(3e-7).sensing(), "a sensing depth stated once follows");
        assertEquals(2e-7, tied.withSensing(2e-7).withAbsorption(3e-7).sensing(), 0.0, "one stated apart stays");
    }

    private static double[] toArray(Complex c) {
        return new double[] {c.getReal(), c.getImaginary()};
    }
}
