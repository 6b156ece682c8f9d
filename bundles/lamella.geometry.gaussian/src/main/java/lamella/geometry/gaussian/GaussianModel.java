package lamella.geometry.gaussian;

import lamella.api.GeometryModel;
import lamella.api.StackKernel;
import lamella.engine.GaussianHankel;
import lamella.engine.Geometries;
import lamella.engine.SpectralQuadrature;

/** The bound Gaussian-beam response; see {@link GaussianBeams}. */
final class GaussianModel implements GeometryModel {

    private final StackKernel stack;
    private final double w2;
    private final double offset;
    private final double tolerance;

    GaussianModel(StackKernel stack, double pumpRadius, double probeRadius, double offset) {
        this(stack, pumpRadius, probeRadius, offset, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE);
    }

    GaussianModel(StackKernel stack, double pumpRadius, double probeRadius, double offset, double tolerance) {
        this.stack = stack;
        this.w2 = pumpRadius * pumpRadius + probeRadius * probeRadius;
        this.offset = offset;
        this.tolerance = tolerance;
    }

    @Override
    public void at(double frequencyHz, double[] out) {
        double omega = 2 * Math.PI * frequencyHz;
        Geometries.requireSteadyStateExists(stack.stack(), omega, "gaussian");
        GaussianHankel.integrate(stack, omega, w2, offset, tolerance, out);
        Geometries.requireFinite(out, "gaussian", frequencyHz);
    }
}
