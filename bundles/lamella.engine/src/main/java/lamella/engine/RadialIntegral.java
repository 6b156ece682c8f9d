package lamella.engine;

import lamella.api.ModelEvaluationException;
import lamella.api.StackKernel;

/**
 * The integral every axisymmetric geometry evaluates, H(ω) = (1/2π) ∫₀^{k_max} Z(k, ω) w(k) k dk, with Z the stack's
 * {@link StackKernel#radialResponse radial response}, w a caller's {@link RadialWeight} and k_max the caller's tail
 * bound: the wavenumber beyond which w(k) k Z(k) adds less than the tolerance (for a weight with a Gaussian
 * envelope exp(−k²W²/8), {@link #gaussianCutoff}). Adaptive Gauss–Kronrod on this thread's
 * {@link Geometries#workspace()}, with break points at the stack's {@link StackKernel#featureWavenumbers feature
 * wavenumbers} and the caller's own, and panels no wider than an oscillating weight's period to begin with.
 *
 * <p>It keeps the guards a geometry owes its callers: no steady state on a stack that cannot lose heat
 * ({@link Geometries#requireSteadyStateExists}), a finite result ({@link Geometries#requireFinite}), and every
 * failure — a weight that throws or is not finite, a quadrature that does not converge within its bound, a stack
 * that is not in-plane isotropic — as a {@link ModelEvaluationException} that names the geometry and the frequency.
 * Cancellation ({@link lamella.api.EvaluationCancelledException}) passes through unchanged.
 *
 * <p>Immutable and thread-safe: build one in {@code bind} and call {@link #at} from any thread.
 */
public final class RadialIntegral {

    /** Beyond the cutoff a Gaussian weight is below exp(−25) ≈ 1.4e-11, far under the 1e-6 the integral must meet. */
    private static final double GAUSSIAN_EXPONENT = 25.0;

    private final String geometry;
    private final RadialWeight weight;
    private final double kMax;
    private final double period;
    private final double[] breaks;
    private final double relativeTolerance;
    private final double absoluteTolerance;

    private RadialIntegral(String geometry, RadialWeight weight, double kMax, double period, double[] breaks,
                           double relativeTolerance, double absoluteTolerance) {
        if (!(kMax > 0) || !Double.isFinite(kMax)) {
            throw new IllegalArgumentException("geometry '" + geometry + "': the tail bound k_max must be a positive"
                    + " finite wavenumber in rad/m, not " + kMax);
        }
        if (!(period >= 0) || !Double.isFinite(period)) {
            throw new IllegalArgumentException("geometry '" + geometry + "': the weight's period must be 0 (none) or"
                    + " a positive wavenumber, not " + period);
        }
        if (!(relativeTolerance > 0) || !(absoluteTolerance >= 0)) {
            throw new IllegalArgumentException("geometry '" + geometry + "': tolerances must be positive (relative)"
                    + " and non-negative (absolute)");
        }
        this.geometry = geometry;
        this.weight = weight;
        this.kMax = kMax;
        this.period = period;
        this.breaks = breaks;
        this.relativeTolerance = relativeTolerance;
        this.absoluteTolerance = absoluteTolerance;
    }

    /**
     * The integral of a weight up to its tail bound, at the default relative tolerance
     * ({@link SpectralQuadrature#DEFAULT_RELATIVE_TOLERANCE}), with no absolute tolerance, no period and no break
     * points of the caller's.
     *
     * @param geometry the geometry's {@code type()}, for messages
     * @param kMax     the tail bound in rad/m (positive, finite)
     */
    public static RadialIntegral of(String geometry, RadialWeight weight, double kMax) {
        return new RadialIntegral(geometry, weight, kMax, 0.0, new double[0],
                SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE, 0.0);
    }

    /**
     * A copy whose first panels are no wider than {@code period} (rad/m): for a weight that oscillates, such as
     * J₀(k r₀) with period 2π/r₀, so that the first pass cannot miss sign changes.
     */
    public RadialIntegral oscillating(double period) {
        return new RadialIntegral(geometry, weight, kMax, period, breaks, relativeTolerance, absoluteTolerance);
    }

    /** A copy with further break points (rad/m) where the weight changes character, such as 1/a for a disc. */
    public RadialIntegral breaks(double... wavenumbers) {
        return new RadialIntegral(geometry, weight, kMax, period, wavenumbers.clone(), relativeTolerance,
                absoluteTolerance);
    }

    /** A copy with these tolerances: relative to |H| and absolute in the result's unit (for results that vanish). */
    public RadialIntegral tolerance(double relative, double absolute) {
        return new RadialIntegral(geometry, weight, kMax, period, breaks, relative, absolute);
    }

    /**
     * The tail bound of a weight with the Gaussian envelope exp(−k²W²/8): k_max = √(200/W²), where the envelope is
     * exp(−25) ≈ 1.4e-11.
     *
     * @param w2 W², the sum of the squared 1/e² radii of what heats and what senses, m² (positive)
     */
    public static double gaussianCutoff(double w2) {
        return Math.sqrt(GAUSSIAN_EXPONENT * 8.0 / w2);
    }

    /**
     * H at a heating frequency.
     *
     * @param out receives (re, im) in the stack response's unit times the weight's (K/W for a unit-power source)
     * @throws ModelEvaluationException naming the geometry and the frequency when H cannot be evaluated
     */
    public void at(StackKernel stack, double frequencyHz, double[] out) {
        double omega = 2 * Math.PI * frequencyHz;
        Geometries.requireSteadyStateExists(stack.stack(), omega, geometry);
        try {
            integrate(stack, omega, out);
        } catch (ModelEvaluationException e) {
            throw new ModelEvaluationException("geometry '" + geometry + "' at " + frequencyHz + " Hz: "
                    + e.getMessage(), e);
        }
        Geometries.requireFinite(out, geometry, frequencyHz);
    }

    /** H at angular frequency omega, without the guards of {@link #at} (the caller keeps them). */
    void integrate(StackKernel stack, double omega, double[] out) {
        double[] z = new double[2];
        double[] features = stack.featureWavenumbers(omega);
        double[] all = features;
        if (breaks.length > 0) {
            all = new double[features.length + breaks.length];
            System.arraycopy(features, 0, all, 0, features.length);
            System.arraycopy(breaks, 0, all, features.length, breaks.length);
        }
        Geometries.workspace().integrate((k, o) -> {
            stack.radialResponse(k, omega, z);
            double w = weightAt(k) * k;
            o[0] = z[0] * w;
            o[1] = z[1] * w;
        }, 0.0, kMax, all, period, relativeTolerance, absoluteTolerance * 2 * Math.PI, out);
        out[0] /= 2 * Math.PI;
        out[1] /= 2 * Math.PI;
    }

    private double weightAt(double k) {
        double w;
        try {
            w = weight.at(k);
        } catch (ModelEvaluationException | java.util.concurrent.CancellationException e) {
            throw e;
        } catch (RuntimeException e) {
            throw new ModelEvaluationException("its weight w(k) failed at k = " + k + " rad/m: " + e, e);
        }
        if (!Double.isFinite(w)) {
            throw new ModelEvaluationException("its weight w(k) is " + w + " at k = " + k + " rad/m");
        }
        return w;
    }
}
