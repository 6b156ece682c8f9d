package lamella.geometry.elliptic;

import lamella.api.StackKernel;

/**
 * A(k) = ∫₀^{π/2} exp(−k²(a cos²φ + b sin²φ)) Z(k cos φ, k sin φ, ω) dφ for co-centred elliptic beams over layers
 * whose in-plane conductivity depends on the direction: an angular rule matched to the beams' ellipticity, so that
 * the number of evaluations of the stack depends only on how much Z itself changes with the direction.
 *
 * <p>Derivation. With ψ = 2φ, a cos²φ + b sin²φ = (a+b)/2 + ((a−b)/2) cos ψ, and Z depends on the direction only
 * through sx² = k²(1 + cos ψ)/2 and sy² = k²(1 − cos ψ)/2, so it is a smooth even 2π-periodic function of ψ. Its
 * trigonometric interpolant through M + 1 equally spaced ψⱼ = πj/M is Z(ψ) ≈ Σ''ₘ cₘ cos mψ with
 * cₘ = (2/M) Σ''ⱼ Z(ψⱼ) cos(πmj/M) (Σ'' halves the first and last terms). The weight times each cos mψ has a closed
 * form: from Iₘ(z) = (1/π) ∫₀^π e^{z cos ψ} cos mψ dψ (Abramowitz & Stegun, 1964, 9.6.19) and Iₘ(−t) = (−1)ᵐ Iₘ(t),
 * Wₘ = ∫₀^{π/2} exp(−k²(a cos²φ + b sin²φ)) cos 2mφ dφ = (π/2) e^{−k² min(a,b)} σᵐ e^{−t} Iₘ(t),
 * t = k²|a−b|/2, σ = −1 when a > b and +1 otherwise. So A ≈ Σ''ₘ cₘ Wₘ. For layers isotropic in the plane every
 * cₘ but c₀ vanishes and A = Z (π/2) e^{−k²(a+b)/2} I₀(k²(a−b)/2), the closed form of the isotropic case.
 *
 * <p>M doubles from 2 (φ = 0, π/4, π/2), every value of Z reused, until two levels agree. The interpolant's
 * coefficients fall geometrically with m (Z is analytic in cos ψ), so the error left after the last doubling is far
 * below the change it made. One instance per thread: it keeps its node values and Bessel values between calls.
 */
final class MatchedAngularRule {

    /** At most M = 2^6 = 64 intervals in ψ. */
    static final int MAX_LEVEL = 6;
    private static final int FINEST = 1 << MAX_LEVEL;
    /** cos φⱼ and sin φⱼ, φⱼ = jπ/(2·FINEST). */
    private static final double[] COS = new double[FINEST + 1];
    private static final double[] SIN = new double[FINEST + 1];
    /**
     * Per level, with M = 2^level: (2/M) cos(πmj/M) at [m·(M+1) + j], halved for j = 0, M and again for m = 0, M
     * (the two Σ''), so that A/envelope = Σₘ Σⱼ [m·(M+1) + j] Zⱼ σᵐ e^{−t} Iₘ(t).
     */
    private static final double[][] INTERPOLATION = new double[MAX_LEVEL + 1][];

    static {
        for (int j = 0; j <= FINEST; j++) {
            double phi = 0.5 * Math.PI * j / FINEST;
            COS[j] = Math.cos(phi);
            SIN[j] = Math.sin(phi);
        }
        COS[FINEST] = 0.0;
        SIN[FINEST] = 1.0;
        for (int level = 1; level <= MAX_LEVEL; level++) {
            int m = 1 << level;
            double[] table = new double[(m + 1) * (m + 1)];
            for (int order = 0; order <= m; order++) {
                for (int node = 0; node <= m; node++) {
                    double c = 2.0 / m * Math.cos(Math.PI * ((order * node) % (2 * m)) / m);
                    if (node == 0 || node == m) {
                        c *= 0.5;
                    }
                    if (order == 0 || order == m) {
                        c *= 0.5;
                    }
                    table[order * (m + 1) + node] = c;
                }
            }
            INTERPOLATION[level] = table;
        }
    }

    private final double a;
    private final double b;
    private final double[] zr = new double[FINEST + 1];
    private final double[] zi = new double[FINEST + 1];
    private final double[] weights = new double[FINEST + 1];
    private final double[] z = new double[2];

    /** @param a Wx²/8, m²; {@code b} Wy²/8 */
    MatchedAngularRule(double a, double b) {
        this.a = a;
        this.b = b;
    }

    /** Wₘ/((π/2) e^{−k² min(a,b)}) for m ≤ max, into {@link #weights}: σᵐ e^{−t} Iₘ(t). */
    private void weightsUpTo(double t, int max) {
        ScaledBesselOrders.of(t, max, weights);
        if (a > b) {
            for (int m = 1; m <= max; m += 2) {
                weights[m] = -weights[m];
            }
        }
    }

    /**
     * @param relTol relative tolerance on |A|
     * @param absTol absolute tolerance on A
     * @param out    receives (re, im) of A(k)
     * @throws ArithmeticException when M = {@value #FINEST} does not meet the tolerance
     */
    void integrate(StackKernel stack, double k, double omega, double relTol, double absTol, double[] out) {
        double envelope = 0.5 * Math.PI * Math.exp(-k * k * Math.min(a, b));
        double t = 0.5 * k * k * Math.abs(a - b);
        int known = 0;
        double lastR = Double.NaN;
        double lastI = Double.NaN;
        for (int level = 1; level <= MAX_LEVEL; level++) {
            int m = 1 << level;
            int stride = FINEST / m;
            for (int j = level == 1 ? 0 : stride; j <= FINEST; j += level == 1 ? stride : 2 * stride) {
                stack.response(k * COS[j], k * SIN[j], omega, z);
                zr[j] = z[0];
                zi[j] = z[1];
            }
            if (m > known) {
                known = Math.max(m, 8);
                weightsUpTo(t, known);
            }
            // A/envelope = Σⱼ Ωⱼ Zⱼ with the node weights Ωⱼ = Σₘ table[m·(M+1) + j] σᵐ e^{−t} Iₘ(t)
            double[] table = INTERPOLATION[level];
            double ar = 0;
            double ai = 0;
            for (int node = 0; node <= m; node++) {
                double omegaJ = 0;
                for (int order = 0; order <= m; order++) {
                    omegaJ += table[order * (m + 1) + node] * weights[order];
                }
                ar += omegaJ * zr[node * stride];
                ai += omegaJ * zi[node * stride];
            }
            ar *= envelope;
            ai *= envelope;
            if (level >= 2) {
                double tol = Math.max(relTol * Math.hypot(ar, ai), absTol);
                if (Math.hypot(ar - lastR, ai - lastI) <= tol) {
                    out[0] = ar;
                    out[1] = ai;
                    return;
                }
            }
            lastR = ar;
            lastI = ai;
        }
        throw new ArithmeticException("the angular integral did not converge with " + FINEST + " intervals");
    }
}
