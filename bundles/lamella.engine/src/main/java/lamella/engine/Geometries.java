package lamella.engine;

import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.Stack;

/** Checks shared by geometry bundles. */
public final class Geometries {

    /** One workspace per thread: geometries are shared across fitting and Monte Carlo threads. */
    private static final ThreadLocal<SpectralQuadrature> WORKSPACE = ThreadLocal.withInitial(SpectralQuadrature::new);
    /** A second one for the inner integral of a two-dimensional spectral integral. */
    private static final ThreadLocal<SpectralQuadrature> INNER = ThreadLocal.withInitial(SpectralQuadrature::new);

    private Geometries() {
    }

    /** This thread's quadrature workspace. */
    public static SpectralQuadrature workspace() {
        return WORKSPACE.get();
    }

    /** This thread's workspace for an integral nested inside one done with {@link #workspace()}. */
    public static SpectralQuadrature innerWorkspace() {
        return INNER.get();
    }

    /** Axisymmetric geometries use one radial conductivity per layer, so Λx must equal Λy everywhere. */
    public static void requireInPlaneIsotropy(Stack stack, String geometryPath, String type) throws InputException {
        for (Layer l : stack.allLayers()) {
            if (!l.isInPlaneIsotropic()) {
                throw InputException.at(geometryPath + ".type", "geometry '" + type + "' is axisymmetric, but layer '"
                        + l.name() + "' conducts differently along x (" + l.kInPlaneX() + " W/mK) and y ("
                        + l.kInPlaneY() + " W/mK); use a geometry that resolves both in-plane directions");
            }
        }
    }

    /** With no heat sink on either side, a steady (zero-frequency) temperature rise grows without bound. */
    public static void requireSteadyStateExists(Stack stack, double omega, String type) {
        if (omega == 0 && !stack.hasHeatSink()) {
            throw new ModelEvaluationException("geometry '" + type + "': no steady state exists on a stack with an"
                    + " adiabatic bottom" + (stack.heatsBothWays() ? " and an adiabatic top" : "")
                    + " (no heat can leave); use a modulation frequency above zero or a"
                    + " semi-infinite or isothermal " + (stack.heatsBothWays() ? "bottom or top" : "bottom"));
        }
    }

    /** Fails with the geometry's name when its result is not a finite number. */
    public static void requireFinite(double[] out, String type, double frequencyHz) {
        if (!Double.isFinite(out[0]) || !Double.isFinite(out[1])) {
            throw new ModelEvaluationException("geometry '" + type + "' gave a non-finite response at "
                    + frequencyHz + " Hz");
        }
    }
}
