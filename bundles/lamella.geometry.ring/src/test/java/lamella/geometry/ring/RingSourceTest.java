package lamella.geometry.ring;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

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

class RingSourceTest {

    static final double LAMBDA = 1.38;
    static final Stack GLASS = new Stack(List.of(Layer.isotropicInPlane("glass", Double.POSITIVE_INFINITY, LAMBDA,
            LAMBDA, 1.6e6)), BottomBoundary.SEMI_INFINITE);

    static GeometryModel ring(Stack s, double radius, double width, double probe) throws InputException {
        return new RingSource().bind(Parameters.of("geometry", Map.of(RingSource.RADIUS, radius, RingSource.WIDTH,
                width, RingSource.PROBE, probe), Map.of()), new LayeredStack(s));
    }

    static double[] at(GeometryModel m, double f) {
        double[] out = new double[2];
        m.at(f, out);
        return out;
    }

    /**
     * Steady point source on a half-space, P/(2πΛr) (Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed., 1959,
     * §10.3), summed around a thin ring: every part of the ring is R from the centre, so the centre rises by
     * P/(2πΛR). A probe of radius 0.02 R changes that by about (w₁/R)²/… ≈ 1e-4.
     */
    @Test
    void thinRingCentreTemperature() throws InputException {
        double r = 20e-6;
        double[] h = at(ring(GLASS, r, 0, 0.02 * r), 0);
        double expected = 1 / (2 * Math.PI * LAMBDA * r);
        assertEquals(expected, h[0], 1e-3 * expected);
    }

    /**
     * Periodic version (Carslaw & Jaeger 1959, §10.3): the centre of a thin ring sees e^(−qR)/(2πΛR),
     * q = (1+i)√(ω/2D), the phase lag growing with the ring's radius.
     */
    @Test
    void periodicRingCentreTemperature() throws InputException {
        double r = 10e-6;
        double f = 2e4;
        double d = LAMBDA / 1.6e6;
        double qr = Math.sqrt(2 * Math.PI * f / (2 * d)) * r;
        double scale = Math.exp(-qr) / (2 * Math.PI * LAMBDA * r);
        double[] h = at(ring(GLASS, r, 0, 0.01 * r), f);
        assertEquals(scale * Math.cos(qr), h[0], 2e-3 * scale);
        assertEquals(-scale * Math.sin(qr), h[1], 2e-3 * scale);
    }

    /** A wider ring, blurred by a Gaussian, moves heat both nearer and farther; the centre changes little. */
    @Test
    void aNarrowWidthBarelyChangesTheCentre() throws InputException {
        double thin = at(ring(GLASS, 20e-6, 0, 1e-6), 0)[0];
        double wide = at(ring(GLASS, 20e-6, 2e-6, 1e-6), 0)[0];
        assertTrue(Math.abs(wide / thin - 1) < 0.01, "thin " + thin + " wide " + wide);
    }

    @Test
    void aWidthAsLargeAsTheRadiusIsRejected() {
        InputException e = assertThrows(InputException.class, () -> ring(GLASS, 5e-6, 5e-6, 1e-6));
        assertEquals("geometry.ring_width_m", e.path());
    }
}
