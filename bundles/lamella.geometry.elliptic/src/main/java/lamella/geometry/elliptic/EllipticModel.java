package lamella.geometry.elliptic;

import lamella.api.GeometryModel;
import lamella.api.Layer;
import lamella.api.StackKernel;
import lamella.engine.Geometries;
import lamella.engine.SpectralQuadrature;

/**
 * The two-dimensional spectral integral of {@link EllipticBeams},
 * H = (1/4π²) ∬ Z(sx, sy, ω) exp(−a sx² − b sy²) cos(sx x₀ + sy y₀) dsx dsy, a = Wx²/8, b = Wy²/8. Z and the
 * weight are even in sx and sy separately, so one quadrant is integrated and only cos(sx x₀)·cos(sy y₀) survives.
 * Which angular rule is used depends on whether Z depends on the direction of the wave vector:
 *
 * <ul>
 * <li>Layers isotropic in the plane: Z depends on |s| = k only, so in polar coordinates
 * H = (1/π²) ∫₀^{k_max} Z(k) A(k) k dk with A(k) = ∫₀^{π/2} exp(−k²(a cos²φ + b sin²φ)) cos(k x₀ cos φ)
 * cos(k y₀ sin φ) dφ, the beams' own angular weight: without offset A = (π/2) e^(−k²(a+b)/2) I₀(k²|a−b|/2)
 * (the integral representation of I₀: Abramowitz & Stegun, 1964, 9.6.19), with an offset A comes from
 * {@link QuadrantTrapezoid}, which costs no evaluation of the stack. Elliptic beams then cost what round ones do.
 * <li>Layers anisotropic in the plane: the coordinates sx = ρ cos θ/√a, sy = ρ sin θ/√b turn the weight into
 * exp(−ρ²) at every angle, and H = 1/(π² √(ab)) ∫₀^5 exp(−ρ²) ρ F(ρ) dρ with F(ρ) = ∫₀^{π/2} Z cos(sx x₀) cos(sy y₀)
 * dθ; what is left of the angle in F (the anisotropy, the ellipticity as it reaches Z, offsets) is smooth and
 * periodic, and {@link QuadrantTrapezoid} integrates it.
 * </ul>
 * The radial integral is adaptive Gauss–Kronrod, as for round beams. An angular integral is held to a tenth of the
 * radial tolerance, so that its error does not keep the radial one refining. Far-offset signals that nearly vanish are
 * held to an absolute floor of 1e-9 of the co-axial signal's scale instead.
 */
final class EllipticModel implements GeometryModel {

    /** exp(−25) ≈ 1.4e-11: where the Gaussian weight ends. */
    private static final double GAUSSIAN_CUTOFF = 25.0;
    /** Absolute floor relative to the co-axial scale, for signals of distant offsets. */
    private static final double ABSOLUTE_FLOOR = 1e-9;

    private final StackKernel stack;
    private final double a;
    private final double b;
    private final double x0;
    private final double y0;
    private final double tolerance;
    private final boolean inPlaneIsotropic;

    EllipticModel(StackKernel stack, double wx2, double wy2, double x0, double y0) {
        this(stack, wx2, wy2, x0, y0, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE);
    }

    /** @param wx2 Wx², the sum of the squared 1/e² radii along x, m²; {@code wy2} likewise along y */
    EllipticModel(StackKernel stack, double wx2, double wy2, double x0, double y0, double tolerance) {
        this.stack = stack;
        this.a = wx2 / 8.0;
        this.b = wy2 / 8.0;
        this.x0 = Math.abs(x0);
        this.y0 = Math.abs(y0);
        this.tolerance = tolerance;
        this.inPlaneIsotropic = stack.stack().layers().stream().allMatch(Layer::isInPlaneIsotropic);
    }

    @Override
    public void at(double frequencyHz, double[] out) {
        double omega = 2 * Math.PI * frequencyHz;
        Geometries.requireSteadyStateExists(stack.stack(), omega, "elliptic");
        double[] z = new double[2];
        // scale of the co-axial signal: |Z| along x where the radial weight peaks (the radial response itself is
        // refused on an in-plane anisotropic stack)
        stack.response(Math.sqrt(0.5 / Math.max(a, b)), 0.0, omega, z);
        double scale = Math.hypot(z[0], z[1]);
        if (inPlaneIsotropic) {
            isotropicLayers(omega, scale, out);
        } else {
            anisotropicLayers(omega, scale, out);
        }
        Geometries.requireFinite(out, "elliptic", frequencyHz);
    }

    private void isotropicLayers(double omega, double scale, double[] out) {
        double[] z = new double[2];
        double[] features = stack.featureWavenumbers(omega);
        double[] breaks = new double[features.length + 2];
        System.arraycopy(features, 0, breaks, 0, features.length);
        // where the weight turns from the wide axis's Gaussian to the narrow one's
        breaks[features.length] = 1 / Math.sqrt(a);
        breaks[features.length + 1] = 1 / Math.sqrt(b);
        double kMax = Math.sqrt(GAUSSIAN_CUTOFF / Math.min(a, b));
        boolean offset = x0 > 0 || y0 > 0;
        // ∫ A(k) k dk over all k is π/(4√(ab)): the radial integral's co-axial scale
        double floor = ABSOLUTE_FLOOR * scale * Math.PI / (4 * Math.sqrt(a * b));
        QuadrantTrapezoid angles = offset ? new QuadrantTrapezoid() : null;
        double[] weight = new double[2];
        Geometries.workspace().integrate((k, o) -> {
            double k2 = k * k;
            double coaxial = 0.5 * Math.PI * Math.exp(-k2 * Math.min(a, b))
                    * ScaledBesselI0.of(0.5 * k2 * Math.abs(a - b));
            double w = coaxial;
            if (offset) {
                angles.integrate((c, s, g) -> {
                    g[0] = Math.exp(-k2 * (a * c * c + b * s * s)) * Math.cos(k * x0 * c) * Math.cos(k * y0 * s);
                    g[1] = 0;
                }, tolerance / 10, ABSOLUTE_FLOOR * coaxial, weight);
                w = weight[0];
            }
            stack.radialResponse(k, omega, z);
            o[0] = z[0] * w * k;
            o[1] = z[1] * w * k;
        }, 0.0, kMax, breaks, offset ? 2 * Math.PI / (x0 + y0) : 0, tolerance, floor, out);
        out[0] /= Math.PI * Math.PI;
        out[1] /= Math.PI * Math.PI;
    }

    private void anisotropicLayers(double omega, double scale, double[] out) {
        double[] z = new double[2];
        double[] angular = new double[2];
        double rootA = Math.sqrt(a);
        double rootB = Math.sqrt(b);
        // a wavenumber k of a feature of Z lies at ρ between k√a and k√b, depending on the angle
        double[] features = stack.featureWavenumbers(omega);
        double[] breaks = new double[2 * features.length];
        for (int i = 0; i < features.length; i++) {
            breaks[2 * i] = features[i] * rootA;
            breaks[2 * i + 1] = features[i] * rootB;
        }
        // ∫ exp(−ρ²) ρ dρ (π/2) is π/4: the radial integral's co-axial scale
        double floor = ABSOLUTE_FLOOR * scale * Math.PI / 4;
        // the offsets' phases per unit ρ along x and y
        double px = x0 / rootA;
        double py = y0 / rootB;
        double reach = px + py;
        QuadrantTrapezoid angles = new QuadrantTrapezoid();
        Geometries.workspace().integrate((rho, o) -> {
            double sxPerCos = rho / rootA;
            double syPerSin = rho / rootB;
            angles.integrate((c, s, g) -> {
                stack.response(sxPerCos * c, syPerSin * s, omega, z);
                double w = reach > 0 ? Math.cos(rho * px * c) * Math.cos(rho * py * s) : 1.0;
                g[0] = z[0] * w;
                g[1] = z[1] * w;
            }, tolerance / 10, floor / 5, angular);
            double w = rho * Math.exp(-rho * rho);
            o[0] = angular[0] * w;
            o[1] = angular[1] * w;
        }, 0.0, Math.sqrt(GAUSSIAN_CUTOFF), breaks, reach > 0 ? 2 * Math.PI / reach : 0, tolerance, floor, out);
        double prefactor = Math.PI * Math.PI * rootA * rootB;
        out[0] /= prefactor;
        out[1] /= prefactor;
    }
}
