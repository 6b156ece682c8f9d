package lamella.geometry.gaussian;

import lamella.api.GeometryModel;
import lamella.api.StackKernel;
import lamella.engine.Bessel;
import lamella.engine.Geometries;
import lamella.engine.SpectralQuadrature;

/** The bound Gaussian-beam response; see {@link GaussianBeams}. */
final class GaussianModel implements GeometryModel {

    /** Beyond k_max the Gaussian weight is below exp(−25) ≈ 1.4e-11, far under the 1e-6 the integral must meet. */
    private static final double GAUSSIAN_CUTOFF = 25.0;

    private final StackKernel stack;
    private final double eighthW2;
    private final double offset;
    private final double kMax;
    private final double tolerance;

    GaussianModel(StackKernel stack, double pumpRadius, double probeRadius, double offset) {
        this(stack, pumpRadius, probeRadius, offset, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE);
    }

    GaussianModel(StackKernel stack, double pumpRadius, double probeRadius, double offset, double tolerance) {
        this.tolerance = tolerance;
        this.stack = stack;
        double w2 = pumpRadius * pumpRadius + probeRadius * probeRadius;
        this.eighthW2 = w2 / 8.0;
        this.offset = offset;
        this.kMax = Math.sqrt(GAUSSIAN_CUTOFF / eighthW2);
    }

    @Override
    public void at(double frequencyHz, double[] out) {
        double omega = 2 * Math.PI * frequencyHz;
        Geometries.requireSteadyStateExists(stack.stack(), omega, "gaussian");
        SpectralQuadrature q = Geometries.workspace();
        double[] z = new double[2];
        q.integrate((k, o) -> {
            stack.radialResponse(k, omega, z);
            double w = k * Math.exp(-eighthW2 * k * k) * (offset > 0 ? Bessel.j0(k * offset) : 1.0);
            o[0] = z[0] * w;
            o[1] = z[1] * w;
        }, 0.0, kMax, stack.featureWavenumbers(omega), offset > 0 ? 2 * Math.PI / offset : 0,
                tolerance, 0.0, out);
        out[0] /= 2 * Math.PI;
        out[1] /= 2 * Math.PI;
        Geometries.requireFinite(out, "gaussian", frequencyHz);
    }
}
