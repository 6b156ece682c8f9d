package lamella.geometry.elliptic;

import lamella.api.GeometryModel;
import lamella.api.StackKernel;
import lamella.engine.Geometries;
import lamella.engine.SpectralQuadrature;

/**
 * The two-dimensional spectral integral of {@link EllipticBeams} in polar form over one quadrant (Z and the Gaussian
 * weight are even in sx and sy separately, so only cos(sx x₀)·cos(sy y₀) survives):
 * H = (1/π²) ∫₀^{π/2} dφ ∫₀^{s_max(φ)} Z(s cos φ, s sin φ) exp(−s² W(φ)²/8) cos(s x₀ cos φ) cos(s y₀ sin φ) s ds,
 * W(φ)² = Wx² cos²φ + Wy² sin²φ. Both integrals are adaptive Gauss–Kronrod; the inner one is held to a tenth of
 * the outer tolerance so that its error does not keep the outer one refining. Far-offset signals that nearly vanish
 * are held to an absolute floor of 1e-9 of the co-axial signal's scale instead.
 */
final class EllipticModel implements GeometryModel {

    /** Beyond s_max the Gaussian weight is below exp(−25) ≈ 1.4e-11. */
    private static final double GAUSSIAN_CUTOFF = 25.0;
    /** Absolute floor relative to the co-axial scale, for signals of distant offsets. */
    private static final double ABSOLUTE_FLOOR = 1e-9;

    private final StackKernel stack;
    private final double wx2;
    private final double wy2;
    private final double x0;
    private final double y0;
    private final double tolerance;

    EllipticModel(StackKernel stack, double wx2, double wy2, double x0, double y0) {
        this(stack, wx2, wy2, x0, y0, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE);
    }

    EllipticModel(StackKernel stack, double wx2, double wy2, double x0, double y0, double tolerance) {
        this.stack = stack;
        this.wx2 = wx2;
        this.wy2 = wy2;
        this.x0 = Math.abs(x0);
        this.y0 = Math.abs(y0);
        this.tolerance = tolerance;
    }

    @Override
    public void at(double frequencyHz, double[] out) {
        double omega = 2 * Math.PI * frequencyHz;
        Geometries.requireSteadyStateExists(stack.stack(), omega, "elliptic");
        double[] features = stack.featureWavenumbers(omega);
        double[] z = new double[2];
        double[] radial = new double[2];
        // scale of the co-axial signal: |Z| where the Gaussian weight peaks, times the weight's integral
        double wMax = Math.max(wx2, wy2);
        stack.response(Math.sqrt(4 / wMax), 0, omega, z);
        double floor = ABSOLUTE_FLOOR * Math.hypot(z[0], z[1]) * 4 / Math.min(wx2, wy2);
        SpectralQuadrature inner = Geometries.innerWorkspace();
        Geometries.workspace().integrate((phi, o) -> {
            double c = Math.cos(phi);
            double s = Math.sin(phi);
            double eighthW2 = (wx2 * c * c + wy2 * s * s) / 8.0;
            double sMax = Math.sqrt(GAUSSIAN_CUTOFF / eighthW2);
            double ox = x0 * c;
            double oy = y0 * s;
            double reach = ox + oy;
            inner.integrate((k, r) -> {
                double sx = k * c;
                double sy = k * s;
                stack.response(sx, sy, omega, z);
                double w = k * Math.exp(-eighthW2 * k * k);
                if (reach > 0) {
                    w *= Math.cos(k * ox) * Math.cos(k * oy);
                }
                r[0] = z[0] * w;
                r[1] = z[1] * w;
            }, 0.0, sMax, features, reach > 0 ? 2 * Math.PI / reach : 0, tolerance / 10, floor / 10, radial);
            o[0] = radial[0];
            o[1] = radial[1];
        }, 0.0, Math.PI / 2, null, 0, tolerance, floor, out);
        out[0] /= Math.PI * Math.PI;
        out[1] /= Math.PI * Math.PI;
        Geometries.requireFinite(out, "elliptic", frequencyHz);
    }
}
