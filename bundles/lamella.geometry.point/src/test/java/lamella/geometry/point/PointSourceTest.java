package lamella.geometry.point;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.Parameters;
import lamella.api.Stack;
import lamella.engine.LayeredStack;
import org.junit.jupiter.api.Test;

class PointSourceTest {

    static GeometryModel point(Stack s, double r) throws InputException {
        return new PointSource().bind(Parameters.of("geometry", Map.of(PointSource.DISTANCE, r), Map.of()),
                new LayeredStack(s));
    }

    static double[] at(GeometryModel m, double f) {
        double[] out = new double[2];
        m.at(f, out);
        return out;
    }

    /**
     * Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed. (1959), §10.3: a periodic point source of unit power on
     * the surface of a half-space gives T = e^(−q r)/(2πΛr), q = (1+i)√(ω/2D). A two-layer stack of one material
     * in perfect contact is that half-space, so the numerically integrated remainder must vanish.
     */
    @Test
    void periodicPointSourceOnAHalfSpace() throws InputException {
        double lambda = 140;
        double c = 1.63e6;
        Stack twoOfOne = new Stack(List.of(Layer.isotropicInPlane("upper", 2e-6, lambda, lambda, c),
                Layer.isotropicInPlane("lower", Double.POSITIVE_INFINITY, lambda, lambda, c)),
                BottomBoundary.SEMI_INFINITE);
        double r = 5e-6;
        for (double f : new double[] {0, 1e3, 1e5, 1e7}) {
            double w = 2 * Math.PI * f;
            double qr = Math.sqrt(w * c / (2 * lambda)) * r;
            double scale = Math.exp(-qr) / (2 * Math.PI * lambda * r);
            double[] h = at(point(twoOfOne, r), f);
            assertEquals(scale * Math.cos(qr), h[0], 1e-7 * scale, "re at f=" + f);
            assertEquals(-scale * Math.sin(qr), h[1], 1e-7 * scale, "im at f=" + f);
        }
    }

    /**
     * Far from a source on a thin transducer over a substrate, the steady temperature approaches the substrate's
     * P/(2πΛr) (Carslaw & Jaeger 1959, §10.3, ω → 0): the film changes it by about Λ₁d/(Λ₂r), here 1e-4.
     */
    @Test
    void farFieldSeesTheSubstrate() throws InputException {
        Stack s = new Stack(List.of(
                Layer.isotropicInPlane("metal", 9e-8, 200, 200, 2.45e6).withConductanceBelow(1.2e8),
                Layer.isotropicInPlane("substrate", Double.POSITIVE_INFINITY, 140, 140, 1.63e6)),
                BottomBoundary.SEMI_INFINITE);
        double r = 1e-3;
        double[] h = at(point(s, r), 0);
        double expected = 1 / (2 * Math.PI * 140 * r);
        assertEquals(expected, h[0], 1e-3 * expected);
        assertEquals(0.0, h[1], 0.0);
    }

    /** The point source's closed-form tail is the top layer's half-space alone: layers above are refused, in words. */
    @Test
    void layersAboveTheHeatedPlaneAreRefusedAtTheGeometry() {
        Layer glass = Layer.isotropic("glass", Double.POSITIVE_INFINITY, 1.3, 1.6e6);
        Layer cover = Layer.isotropic("cover", Double.POSITIVE_INFINITY, 0.6, 4.2e6);
        Stack s = new Stack(List.of(glass), BottomBoundary.SEMI_INFINITE, List.of(cover), BottomBoundary.SEMI_INFINITE);
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class, () -> point(s, 1e-5));
        assertEquals("geometry.type", e.path());
        org.junit.jupiter.api.Assertions.assertTrue(e.getMessage().contains("stack.above"), e.getMessage());
    }
}
