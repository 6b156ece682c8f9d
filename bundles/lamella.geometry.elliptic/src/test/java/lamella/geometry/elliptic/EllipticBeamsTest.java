package lamella.geometry.elliptic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.Parameters;
import lamella.api.Stack;
import lamella.engine.LayeredStack;
import lamella.geometry.gaussian.GaussianBeams;
import org.junit.jupiter.api.Test;

class EllipticBeamsTest {

    static Stack threeLayers(double filmKx, double filmKy) {
        return new Stack(List.of(
                Layer.isotropicInPlane("cap", 9e-8, 200, 200, 2.45e6).withConductanceBelow(1.2e8),
                new Layer("film", 3.5e-7, 1.4, filmKx, filmKy, 1.65e6, Double.POSITIVE_INFINITY),
                Layer.isotropicInPlane("base", Double.POSITIVE_INFINITY, 140, 140, 1.63e6)),
                BottomBoundary.SEMI_INFINITE);
    }

    static Stack halfSpace(double kz, double kx, double ky) {
        return new Stack(List.of(new Layer("crystal", Double.POSITIVE_INFINITY, kz, kx, ky, 1.6e6,
                Double.POSITIVE_INFINITY)), BottomBoundary.SEMI_INFINITE);
    }

    static GeometryModel elliptic(Stack s, double px, double py, double qx, double qy, double ox, double oy)
            throws InputException {
        Map<String, Double> n = new HashMap<>();
        n.put(EllipticBeams.PUMP_X, px);
        n.put(EllipticBeams.PUMP_Y, py);
        n.put(EllipticBeams.PROBE_X, qx);
        n.put(EllipticBeams.PROBE_Y, qy);
        n.put(EllipticBeams.OFFSET_X, ox);
        n.put(EllipticBeams.OFFSET_Y, oy);
        return new EllipticBeams().bind(Parameters.of("geometry", n, Map.of()), new LayeredStack(s));
    }

    static GeometryModel gaussian(Stack s, double pump, double probe, double offset) throws InputException {
        HeatingGeometry g = new GaussianBeams();
        return g.bind(Parameters.of("geometry", Map.of("pump_radius_m", pump, "probe_radius_m", probe,
                "offset_m", offset), Map.of()), new LayeredStack(s));
    }

    static double[] at(GeometryModel m, double f) {
        double[] out = new double[2];
        m.at(f, out);
        return out;
    }

    static double relative(double[] a, double[] b) {
        return Math.hypot(a[0] - b[0], a[1] - b[1]) / Math.hypot(b[0], b[1]);
    }

    /** Equal radii and Λx = Λy: the two-dimensional integral must equal the axisymmetric one (common practice). */
    @Test
    void roundBeamsOnAnIsotropicStackEqualTheGaussianGeometry() throws InputException {
        Stack s = threeLayers(1.4, 1.4);
        for (double f : new double[] {0, 1e3, 1e5, 1e7}) {
            double err = relative(at(elliptic(s, 6e-6, 6e-6, 4e-6, 4e-6, 0, 0), f), at(gaussian(s, 6e-6, 4e-6, 0), f));
            assertTrue(err < 1e-6, "f=" + f + ": " + err);
        }
    }

    /** An offset along x on an isotropic stack equals the axisymmetric offset (Feser & Cahill 2012, eq. 2). */
    @Test
    void anOffsetAlongXEqualsTheGaussianOffset() throws InputException {
        Stack s = threeLayers(1.4, 1.4);
        for (double f : new double[] {1e4, 1e6}) {
            double err = relative(at(elliptic(s, 5e-6, 5e-6, 5e-6, 5e-6, 7e-6, 0), f),
                    at(gaussian(s, 5e-6, 5e-6, 7e-6), f));
            assertTrue(err < 1e-6, "f=" + f + ": " + err);
        }
    }

    /** Rotating the problem by 90° — x and y radii, offsets and conductivities swapped together — changes nothing. */
    @Test
    void swappingXAndYTogetherChangesNothing() throws InputException {
        double[] a = at(elliptic(threeLayers(6.0, 0.8), 8e-6, 3e-6, 5e-6, 2e-6, 4e-6, 1e-6), 2e5);
        double[] b = at(elliptic(threeLayers(0.8, 6.0), 3e-6, 8e-6, 2e-6, 5e-6, 1e-6, 4e-6), 2e5);
        assertTrue(relative(a, b) < 1e-7, "relative difference " + relative(a, b));
    }

    /**
     * Feser & Cahill, Rev. Sci. Instrum. 83, 104901 (2012): the out-of-phase signal, scanned over the probe's offset,
     * widens with the in-plane diffusivity along the scan; on an in-plane anisotropic crystal it is wider along the
     * better-conducting direction.
     */
    @Test
    void outOfPhaseWidthGrowsWithInPlaneDiffusivity() throws InputException {
        double f = 1e6;
        double lowX = halfWidth(halfSpace(10, 10, 10), f, true);
        double highX = halfWidth(halfSpace(10, 40, 10), f, true);
        double highAlongY = halfWidth(halfSpace(10, 40, 10), f, false);
        assertTrue(highX > lowX * 1.1, "width with Λx = 40: " + highX + " m, with Λx = 10: " + lowX + " m");
        assertTrue(highX > highAlongY * 1.1, "along x " + highX + " m, along y " + highAlongY + " m");
        assertEquals(lowX, halfWidth(halfSpace(10, 10, 40), f, true), 0.02 * lowX,
                "Λy does not matter much for a scan along x when beams are small");
    }

    /** The offset at which |Im H| falls to half its co-axial value, by bisection. */
    private static double halfWidth(Stack s, double f, boolean alongX) throws InputException {
        double w = 2e-6;
        double peak = Math.abs(at(elliptic(s, w, w, w, w, 0, 0), f)[1]);
        double lo = 0;
        double hi = 30e-6;
        for (int i = 0; i < 20; i++) {
            double mid = 0.5 * (lo + hi);
            double v = Math.abs(at(elliptic(s, w, w, w, w, alongX ? mid : 0, alongX ? 0 : mid), f)[1]);
            if (v > peak / 2) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
