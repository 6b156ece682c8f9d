package lamella.geometry.gaussian;

import lamella.api.GeometryModel;
import lamella.api.StackKernel;
import lamella.engine.GaussianHankel;
import lamella.engine.RadialIntegral;
import lamella.engine.SpectralQuadrature;

/** The bound Gaussian-beam response; see {@link GaussianBeams}. */
final class GaussianModel implements GeometryModel {

    private final StackKernel stack;
    private final RadialIntegral integral;

    GaussianModel(StackKernel stack, double pumpRadius, double probeRadius, double offset) {
        this(stack, pumpRadius, probeRadius, offset, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE);
    }

    GaussianModel(StackKernel stack, double pumpRadius, double probeRadius, double offset, double tolerance) {
        this.stack = stack;
        this.integral = GaussianHankel.of("gaussian", pumpRadius * pumpRadius + probeRadius * probeRadius, offset,
                tolerance);
    }

    @Override
    public void at(double frequencyHz, double[] out) {
        // the steady-state, finiteness and failure guards are RadialIntegral's
        integral.at(stack, frequencyHz, out);
    }
}
