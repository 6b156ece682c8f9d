package lamella.geometry.gaussian;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.Stack;
import org.junit.jupiter.api.Test;

/** Beams heating a plane inside the stack, heat flowing both ways. */
class TwoSidedBeamsTest {

    /**
     * Two half-spaces in perfect contact, heated at their boundary: at steady state each answers 1/(Λ k), so the
     * pair answers 1/((Λ₁ + Λ₂) k), and the Gaussian form of Lax (J. Appl. Phys. 48, 3919, 1977) becomes
     * P/(√(2π) (Λ₁ + Λ₂) √(w₀² + w₁²)) (derived: the half-space form with the conductivities added).
     */
    @Test
    void steadyTemperatureBetweenTwoHalfSpacesInContact() throws InputException {
        double l1 = 1.38;
        double l2 = 0.6;
        Stack s = new Stack(List.of(Layer.isotropic("glass", Double.POSITIVE_INFINITY, l1, 1.6e6)),
                BottomBoundary.SEMI_INFINITE, List.of(Layer.isotropic("liquid", Double.POSITIVE_INFINITY, l2, 4.2e6)),
                BottomBoundary.SEMI_INFINITE);
        double w = Math.hypot(6e-6, 4e-6);
        double expected = 1 / (Math.sqrt(2 * Math.PI) * (l1 + l2) * w);
        double[] h = GaussianBeamsTest.at(GaussianBeamsTest.beams(s, 6e-6, 4e-6, 0), 0.0);
        assertEquals(expected, h[0], 1e-9 * expected);
    }

    /**
     * Issue 13's check, common practice, no source: the demo-like three-layer stack mirrored about the heated plane
     * halves the probe-averaged response at every modulation frequency.
     */
    @Test
    void mirroredStackHalvesTheBeamResponse() throws InputException {
        Layer capUp = Layer.isotropicInPlane("cap-up", 9e-8, 200, 200, 2.45e6);
        Layer filmUp = Layer.isotropicInPlane("film-up", 3.5e-7, 1.4, 1.4, 1.65e6).withConductanceBelow(1.2e8);
        Layer baseUp = Layer.isotropicInPlane("base-up", Double.POSITIVE_INFINITY, 140, 140, 1.63e6);
        Stack two = new Stack(GaussianBeamsTest.THREE.layers(), BottomBoundary.SEMI_INFINITE,
                List.of(capUp, filmUp, baseUp), BottomBoundary.SEMI_INFINITE);
        for (double f : new double[] {1e4, 1e6, 2e7}) {
            double[] a = GaussianBeamsTest.at(GaussianBeamsTest.beams(GaussianBeamsTest.THREE, 6e-6, 4e-6, 0), f);
            double[] b = GaussianBeamsTest.at(GaussianBeamsTest.beams(two, 6e-6, 4e-6, 0), f);
            assertEquals(a[0] / 2, b[0], 1e-8 * Math.hypot(a[0], a[1]), "in-phase at " + f + " Hz");
            assertEquals(a[1] / 2, b[1], 1e-8 * Math.hypot(a[0], a[1]), "out-of-phase at " + f + " Hz");
        }
    }
}
