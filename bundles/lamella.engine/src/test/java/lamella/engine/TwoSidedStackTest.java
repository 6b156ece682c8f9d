package lamella.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.Layer;
import lamella.api.Stack;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** Heating inside the stack: layers above the heated plane take part of the heat. */
class TwoSidedStackTest {

    private static final double[] K = {0, 1e3, 3e4, 1e5, 1e6, 4e6};
    private static final double[] OMEGA = {2 * Math.PI * 1e3, 2 * Math.PI * 1e5, 2 * Math.PI * 1e7};

    /** A glass window and a water-like liquid above a metal transducer on a film and base (test values only). */
    static List<Layer> above(boolean outerFinite) {
        Layer window = Layer.isotropicInPlane("window", 5e-7, 1.3, 1.3, 1.9e6).withConductanceBelow(8e7);
        Layer liquid = Layer.isotropicInPlane("liquid", outerFinite ? 4e-6 : Double.POSITIVE_INFINITY, 0.6, 0.6,
                4.2e6).withConductanceBelow(5e7);
        return List.of(window, liquid);
    }

    static double rel(double[] out, Complex ref) {
        return Math.hypot(out[0] - ref.getReal(), out[1] - ref.getImaginary()) / ref.abs();
    }

    /**
     * Independent reference: each side by the explicit transfer-matrix product (Feldman 1999; Cahill 2004; see
     * TransferMatrixReference), the above side's layers re-listed with each interface's G on the layer nearer the
     * plane, its first boundary resistance added in series; then the plane's temperature, common to both sides,
     * with the flux dividing between them: 1/Z = 1/Z_below + 1/Z_above (derived from flux continuity at the plane).
     */
    @ParameterizedTest
    @EnumSource(BottomBoundary.class)
    void twoSidesEqualTheirTransferMatrixProductsInParallel(BottomBoundary top) {
        List<Layer> below = LayeredStackTest.threeLayers(false);
        List<Layer> up = above(top != BottomBoundary.SEMI_INFINITE);
        LayeredStack s = new LayeredStack(new Stack(below, BottomBoundary.SEMI_INFINITE, up, top));
        List<Layer> upOutward = new ArrayList<>();
        for (int i = 0; i < up.size(); i++) {
            double g = i + 1 < up.size() ? up.get(i + 1).conductanceBelow() : Double.POSITIVE_INFINITY;
            upOutward.add(up.get(i).withConductanceBelow(g));
        }
        double[] out = new double[2];
        for (double k : K) {
            for (double w : OMEGA) {
                s.radialResponse(k, w, out);
                Complex zDown = TransferMatrixReference.response(below, BottomBoundary.SEMI_INFINITE, k, w);
                Complex zUp = TransferMatrixReference.response(upOutward, top, k, w)
                        .add(1 / up.get(0).conductanceBelow());
                Complex ref = zDown.reciprocal().add(zUp.reciprocal()).reciprocal();
                assertEquals(0, rel(out, ref), 1e-11, "k=" + k + " ω=" + w);
            }
        }
    }

    /**
     * Issue 13's check, common practice, no source: an above layer that barely conducts takes no heat, so the
     * response equals the one-sided stack's. Its admittance √(Λ ωC) is some 1e-9 of the transducer's side here.
     */
    @Test
    void aNonConductingLayerAboveChangesNothing() {
        List<Layer> below = LayeredStackTest.threeLayers(false);
        LayeredStack oneSided = new LayeredStack(new Stack(below, BottomBoundary.SEMI_INFINITE));
        LayeredStack twoSided = new LayeredStack(new Stack(below, BottomBoundary.SEMI_INFINITE,
                List.of(Layer.isotropicInPlane("vacuum-like", Double.POSITIVE_INFINITY, 1e-12, 1e-12, 1e-6)),
                BottomBoundary.SEMI_INFINITE));
        double[] a = new double[2];
        double[] b = new double[2];
        for (double k : K) {
            for (double w : OMEGA) {
                oneSided.radialResponse(k, w, a);
                twoSided.radialResponse(k, w, b);
                assertEquals(0, Math.hypot(a[0] - b[0], a[1] - b[1]) / Math.hypot(a[0], a[1]), 1e-9,
                        "k=" + k + " ω=" + w);
            }
        }
    }

    /**
     * Issue 13's check, common practice, no source: a stack that is its own mirror image about the heated plane
     * sends half the heat each way, so the plane's response is half the one-sided one, for every bottom condition.
     */
    @ParameterizedTest
    @EnumSource(BottomBoundary.class)
    void aMirrorSymmetricStackGivesHalfTheOneSidedResponse(BottomBoundary end) {
        List<Layer> below = LayeredStackTest.threeLayers(end != BottomBoundary.SEMI_INFINITE);
        // the mirror: the same layers from the plane up, each interface's G now on the layer farther from the plane
        List<Layer> mirror = new ArrayList<>();
        for (int i = 0; i < below.size(); i++) {
            double g = i == 0 ? Double.POSITIVE_INFINITY : below.get(i - 1).conductanceBelow();
            Layer l = below.get(i);
            mirror.add(new Layer(l.name() + "-mirror", l.thickness(), l.kThrough(), l.kInPlaneX(), l.kInPlaneY(),
                    l.heatCapacity(), g));
        }
        LayeredStack oneSided = new LayeredStack(new Stack(below, end));
        LayeredStack symmetric = new LayeredStack(new Stack(below, end, mirror, end));
        double[] a = new double[2];
        double[] b = new double[2];
        for (double k : K) {
            for (double w : OMEGA) {
                oneSided.radialResponse(k, w, a);
                symmetric.radialResponse(k, w, b);
                assertEquals(a[0] / 2, b[0], 1e-12 * Math.hypot(a[0], a[1]), "k=" + k + " ω=" + w);
                assertEquals(a[1] / 2, b[1], 1e-12 * Math.hypot(a[0], a[1]), "k=" + k + " ω=" + w);
            }
        }
    }

    /**
     * Two half-spaces in contact through a boundary conductance G, heated at the boundary by a uniform periodic
     * flux (k = 0). Each half-space alone answers θ = F/√(iωΛC) (Carslaw &amp; Jaeger, Conduction of Heat in Solids,
     * 2nd ed., 1959, §2.6, the periodic surface flux on a semi-infinite solid); derived here: the heated side's
     * temperature is shared, the other side sits behind 1/G, so Z = 1 / (√(iωΛ₁C₁) + 1/(1/G + 1/√(iωΛ₂C₂))).
     * With G → ∞ the two effusivities simply add.
     */
    @Test
    void twoHalfSpacesInContactAtUniformPeriodicHeating() {
        double l1 = 23.0;
        double c1 = 2.4e6;
        double l2 = 0.19;
        double c2 = 1.7e6;
        for (double g : new double[] {Double.POSITIVE_INFINITY, 3e7, 2e5}) {
            Layer lower = Layer.isotropic("lower", Double.POSITIVE_INFINITY, l1, c1);
            Layer upper = Layer.isotropic("upper", Double.POSITIVE_INFINITY, l2, c2).withConductanceBelow(g);
            LayeredStack s = new LayeredStack(new Stack(List.of(lower), BottomBoundary.SEMI_INFINITE, List.of(upper),
                    BottomBoundary.SEMI_INFINITE));
            double[] out = new double[2];
            for (double w : OMEGA) {
                s.radialResponse(0.0, w, out);
                Complex e1 = new Complex(0, w * l1 * c1).sqrt();
                Complex e2 = new Complex(0, w * l2 * c2).sqrt();
                Complex upperSide = e2.reciprocal().add(Double.isInfinite(g) ? 0 : 1 / g);
                Complex ref = e1.add(upperSide.reciprocal()).reciprocal();
                assertEquals(0, rel(out, ref), 1e-13, "G=" + g + " ω=" + w);
            }
        }
    }

    /**
     * The same two half-spaces at steady state and wavenumber k in perfect contact: each answers 1/(Λ k) (the
     * transform of the steady point source on a half-space, P/(2πΛr); Carslaw &amp; Jaeger 1959, from memory), so
     * the pair answers 1/((Λ₁ + Λ₂) k): the point source at the interface of two solids, P/(2π(Λ₁+Λ₂)r).
     */
    @Test
    void twoHalfSpacesInPerfectContactAtSteadyStateAddConductivities() {
        LayeredStack s = new LayeredStack(new Stack(List.of(Layer.isotropic("lower", Double.POSITIVE_INFINITY, 23, 2.4e6)),
                BottomBoundary.SEMI_INFINITE, List.of(Layer.isotropic("upper", Double.POSITIVE_INFINITY, 0.19, 1.7e6)),
                BottomBoundary.SEMI_INFINITE));
        double[] out = new double[2];
        for (double k : new double[] {1e2, 1e5, 1e8}) {
            s.radialResponse(k, 0.0, out);
            assertEquals(1 / ((23 + 0.19) * k), out[0], 1e-14 / k);
            assertEquals(0.0, out[1], 0.0);
        }
    }

    /** The high-wavenumber limit is what the stack's response reaches once the deeper layers no longer show. */
    @Test
    void highWavenumberLimitIsTheTwoFirstLayersHalfSpaces() {
        Stack stack = new Stack(LayeredStackTest.threeLayers(false), BottomBoundary.SEMI_INFINITE, above(false),
                BottomBoundary.SEMI_INFINITE);
        LayeredStack s = new LayeredStack(stack);
        double k = TopLayer.halfSpaceWavenumber(stack);
        assertEquals(20 / 9e-8, k, 1e-6 * k, "the thinner first layer (the cap, 90 nm) decides");
        double[] z = new double[2];
        double[] zInf = new double[2];
        for (double w : OMEGA) {
            s.radialResponse(k, w, z);
            s.topHalfSpaceRadialResponse(k, w, zInf);
            assertEquals(0, Math.hypot(z[0] - zInf[0], z[1] - zInf[1]) / Math.hypot(z[0], z[1]), 1e-15);
        }
    }

    /** With heat leaving through the top, a steady state exists on an adiabatic bottom; with neither, none does. */
    @Test
    void steadyStateNeedsAHeatSinkOnEitherSide() {
        List<Layer> below = LayeredStackTest.threeLayers(true);
        Stack sinkAbove = new Stack(below, BottomBoundary.ADIABATIC, above(false), BottomBoundary.SEMI_INFINITE);
        Stack noSink = new Stack(below, BottomBoundary.ADIABATIC, above(true), BottomBoundary.ADIABATIC);
        assertTrue(sinkAbove.hasHeatSink());
        Geometries.requireSteadyStateExists(sinkAbove, 0.0, "gaussian");
        assertThrows(lamella.api.ModelEvaluationException.class,
                () -> Geometries.requireSteadyStateExists(noSink, 0.0, "gaussian"));
        double[] out = new double[2];
        new LayeredStack(sinkAbove).radialResponse(1e5, 0.0, out);
        assertTrue(out[0] > 0 && Double.isFinite(out[0]));
    }

    @Test
    void stackRulesForTheSideAbove() {
        List<Layer> below = LayeredStackTest.threeLayers(false);
        assertThrows(IllegalArgumentException.class, () -> new Stack(below, BottomBoundary.SEMI_INFINITE, List.of(),
                BottomBoundary.SEMI_INFINITE), "a top condition without layers above");
        assertThrows(IllegalArgumentException.class, () -> new Stack(below, BottomBoundary.SEMI_INFINITE,
                above(true), BottomBoundary.SEMI_INFINITE), "semi-infinite top, outermost layer with a thickness");
        assertThrows(IllegalArgumentException.class, () -> new Stack(below, BottomBoundary.SEMI_INFINITE,
                List.of(Layer.isotropic("film", 1e-6, 1, 1e6)), BottomBoundary.ADIABATIC), "a name used twice");
    }
}
