package lamella.engine;

import lamella.api.StackKernel;

/**
 * The Hankel integral every Gaussian-beam geometry reduces to:
 * (1/2π) ∫₀^∞ Z(k, ω) exp(−k² W²/8) J₀(k r₀) k dk, with W² the sum of the squared 1/e² radii of what heats and
 * what senses and r₀ the distance between their centres (Cahill, Rev. Sci. Instrum. 75, 5119, 2004; offset: Feser &
 * Cahill, Rev. Sci. Instrum. 83, 104901, 2012). A thin ring of radius R heats like a point source offset by R
 * averaged around the ring, whose transform is J₀(kR): the same integral with r₀ = R. A {@link RadialIntegral} with
 * the weight exp(−k²W²/8) J₀(k r₀), tail bound {@link RadialIntegral#gaussianCutoff} and period 2π/r₀.
 */
public final class GaussianHankel {

    private GaussianHankel() {
    }

    /**
     * The weight exp(−k²W²/8) J₀(k r₀) as a {@link RadialIntegral} named after {@code geometry}; call
     * {@link RadialIntegral#at} for the guarded result.
     *
     * @param w2     W², the sum of squared 1/e² radii, m² (positive)
     * @param offset r₀ ≥ 0 in m
     * @param tol    relative tolerance of the quadrature's error estimate
     */
    public static RadialIntegral of(String geometry, double w2, double offset, double tol) {
        double eighthW2 = w2 / 8.0;
        RadialWeight w = offset > 0
                ? k -> Math.exp(-eighthW2 * k * k) * Bessel.j0(k * offset)
                : k -> Math.exp(-eighthW2 * k * k);
        RadialIntegral integral = RadialIntegral.of(geometry, w, RadialIntegral.gaussianCutoff(w2))
                .tolerance(tol, 0.0);
        return offset > 0 ? integral.oscillating(2 * Math.PI / offset) : integral;
    }

    /**
     * The integral without the guards of {@link RadialIntegral#at}: failures of the quadrature surface as its own
     * {@link lamella.api.ModelEvaluationException}, for callers that add what they are and where.
     *
     * @param w2     W², the sum of squared 1/e² radii, m² (positive)
     * @param offset r₀ ≥ 0 in m
     * @param tol    relative tolerance of the quadrature's error estimate
     * @param out    receives (re, im) in K/W
     */
    public static void integrate(StackKernel stack, double omega, double w2, double offset, double tol,
                                 double[] out) {
        of("gaussian", w2, offset, tol).integrate(stack, omega, out);
    }
}
