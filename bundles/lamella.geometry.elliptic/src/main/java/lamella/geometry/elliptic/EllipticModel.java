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
 * <li>Layers anisotropic in the plane, co-centred beams: in the same polar coordinates
 * H = (1/π²) ∫₀^{k_max} A(k) k dk with A(k) = ∫₀^{π/2} exp(−k²(a cos²φ + b sin²φ)) Z(k cos φ, k sin φ) dφ, from
 * {@link MatchedAngularRule}: Z interpolated over the angle, and the weight times each term of the interpolant
 * integrated in closed form (Bessel functions Iₘ), so that the stack is evaluated at as many angles as Z's own
 * dependence on the direction needs (5 for a film of Λx/Λy = 7.5), however elliptic the beams. Its angular error is
 * held at each k to a tenth of the radial tolerance, relative to A(k) or, if looser, to the co-axial scale spread
 * over k k_max, so that the whole angular error stays below a tenth of the radial tolerance.
 * <li>Layers anisotropic in the plane, offset beams: the coordinates sx = ρ cos θ/√a, sy = ρ sin θ/√b turn the
 * weight into exp(−ρ²) at every angle, and H = 1/(π² √(ab)) ∫₀^{π/2} F(θ) dθ over rays,
 * F(θ) = ∫₀^5 exp(−ρ²) ρ Z cos(sx x₀) cos(sy y₀) dρ, each ray's radial integral with the stack's feature
 * wavenumbers where that ray meets them; F is smooth and periodic, and {@link QuadrantTrapezoid} integrates it.
 * </ul>
 * The radial integrals are adaptive Gauss–Kronrod, as for round beams. An angular integral is held to a tenth of the
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
        } else if (x0 == 0 && y0 == 0) {
            coCentredOnAnisotropicLayers(omega, scale, out);
        } else {
            offsetOnAnisotropicLayers(omega, scale, out);
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

    private void coCentredOnAnisotropicLayers(double omega, double scale, double[] out) {
        double[] breaks = stack.featureWavenumbers(omega);
        double kMax = Math.sqrt(GAUSSIAN_CUTOFF / Math.min(a, b));
        // ∫ A(k) k dk over all k is about scale π/(4√(ab)): the radial integral's co-axial scale
        double coaxial = scale * Math.PI / (4 * Math.sqrt(a * b));
        // an angular error below coaxial·τ/(10 k k_max) at every k adds at most coaxial·τ/10 to the radial integral
        double angularBudget = tolerance / 10 * coaxial / kMax;
        MatchedAngularRule angles = new MatchedAngularRule(a, b);
        double[] angular = new double[2];
        Geometries.workspace().integrate((k, o) -> {
            angles.integrate(stack, k, omega, tolerance / 10, angularBudget / k, angular);
            o[0] = angular[0] * k;
            o[1] = angular[1] * k;
        }, 0.0, kMax, breaks, 0, tolerance, ABSOLUTE_FLOOR * coaxial, out);
        out[0] /= Math.PI * Math.PI;
        out[1] /= Math.PI * Math.PI;
    }

    private void offsetOnAnisotropicLayers(double omega, double scale, double[] out) {
        double[] z = new double[2];
        double[] radial = new double[2];
        double rootA = Math.sqrt(a);
        double rootB = Math.sqrt(b);
        double[] features = stack.featureWavenumbers(omega);
        double[] breaks = new double[features.length];
        // ∫ exp(−ρ²) ρ dρ (π/2) is π/4: the radial integral's co-axial scale
        double floor = ABSOLUTE_FLOOR * scale * Math.PI / 4;
        // the offsets' phases per unit ρ along x and y
        double px = x0 / rootA;
        double py = y0 / rootB;
        SpectralQuadrature rays = Geometries.innerWorkspace();
        new QuadrantTrapezoid().integrate((c, s, g) -> {
            double sxPerRho = c / rootA;
            double syPerRho = s / rootB;
            // along this ray |s| = ρ √(sx² + sy²) per unit ρ: a feature wavenumber k sits at ρ = k / that
            double stretch = Math.hypot(sxPerRho, syPerRho);
            for (int i = 0; i < features.length; i++) {
                breaks[i] = features[i] / stretch;
            }
            double reach = px * c + py * s;
            rays.integrate((rho, o) -> {
                stack.response(rho * sxPerRho, rho * syPerRho, omega, z);
                double w = rho * Math.exp(-rho * rho);
                if (reach > 0) {
                    w *= Math.cos(rho * px * c) * Math.cos(rho * py * s);
                }
                o[0] = z[0] * w;
                o[1] = z[1] * w;
            }, 0.0, Math.sqrt(GAUSSIAN_CUTOFF), breaks, reach > 0 ? 2 * Math.PI / reach : 0, tolerance, floor / 5,
                    radial);
            g[0] = radial[0];
            g[1] = radial[1];
        }, tolerance / 10, floor, out);
        double prefactor = Math.PI * Math.PI * rootA * rootB;
        out[0] /= prefactor;
        out[1] /= prefactor;
    }
}
