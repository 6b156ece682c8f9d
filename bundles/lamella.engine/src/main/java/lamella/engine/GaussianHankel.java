package lamella.engine;

import lamella.api.StackKernel;

/**
 * The Hankel integral every axisymmetric beam geometry reduces to:
 * (1/2π) ∫₀^∞ Z(k, ω) exp(−k² W²/8) J₀(k r₀) k dk, with W² the sum of the squared 1/e² radii of what heats and
 * what senses and r₀ the distance between their centres (Cahill, Rev. Sci. Instrum. 75, 5119, 2004; offset: Feser &
 * Cahill, Rev. Sci. Instrum. 83, 104901, 2012). A thin ring of radius R heats like a point source offset by R
 * averaged around the ring, whose transform is J₀(kR): the same integral with r₀ = R.
 */
public final class GaussianHankel {

    /** Beyond k_max the Gaussian weight is below exp(−25) ≈ 1.4e-11, far under the 1e-6 the integral must meet. */
    private static final double GAUSSIAN_CUTOFF = 25.0;

    private GaussianHankel() {
    }

    /**
     * @param w2     W², the sum of squared 1/e² radii, m² (positive)
     * @param offset r₀ ≥ 0 in m
     * @param tol    relative tolerance of the quadrature's error estimate
     * @param out    receives (re, im) in K/W
     */
    public static void integrate(StackKernel stack, double omega, double w2, double offset, double tol,
                                 double[] out) {
        double eighthW2 = w2 / 8.0;
        double kMax = Math.sqrt(GAUSSIAN_CUTOFF / eighthW2);
        double[] z = new double[2];
        Geometries.workspace().integrate((k, o) -> {
            stack.radialResponse(k, omega, z);
            double w = k * Math.exp(-eighthW2 * k * k) * (offset > 0 ? Bessel.j0(k * offset) : 1.0);
            o[0] = z[0] * w;
            o[1] = z[1] * w;
        }, 0.0, kMax, stack.featureWavenumbers(omega), offset > 0 ? 2 * Math.PI / offset : 0, tol, 0.0, out);
        out[0] /= 2 * Math.PI;
        out[1] /= 2 * Math.PI;
    }
}
