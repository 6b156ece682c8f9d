package lamella.geometry.elliptic;

/**
 * ∫₀^{π/2} g(θ) dθ for a function g that is even and π-periodic on the whole circle — as every angular integrand of
 * the elliptic geometry is, since it depends on cos θ and sin θ only through even functions of each. For a smooth
 * periodic function the trapezoidal rule converges geometrically (Trefethen & Weideman, SIAM Review 56, 385, 2014),
 * and its nodes nest: each doubling of the intervals reuses every value so far. Doubling stops when two levels agree.
 * The first comparison is of 2 and 4 intervals: 1 and 2 intervals agree whenever the cos 4θ term of g vanishes,
 * though both miss its cos 8θ term.
 *
 * <p>Allocation-free; the node tables are shared and immutable.
 */
final class QuadrantTrapezoid {

    /** At most 2^12 intervals over the quadrant. */
    static final int MAX_LEVEL = 12;
    private static final int FINEST = 1 << MAX_LEVEL;
    private static final double[] COS = new double[FINEST + 1];
    private static final double[] SIN = new double[FINEST + 1];

    static {
        for (int j = 0; j <= FINEST; j++) {
            double theta = 0.5 * Math.PI * j / FINEST;
            COS[j] = Math.cos(theta);
            SIN[j] = Math.sin(theta);
        }
        COS[FINEST] = 0.0;
        SIN[FINEST] = 1.0;
    }

    /** g at the angle whose cosine and sine are given, written into out as (re, im). */
    @FunctionalInterface
    interface AngularIntegrand {
        void value(double cos, double sin, double[] out);
    }

    private final double[] g = new double[2];

    /**
     * @param relTol relative tolerance on |∫|
     * @param absTol absolute tolerance, for integrals that nearly vanish
     * @param out    receives (re, im)
     * @throws ArithmeticException when 2^{@value #MAX_LEVEL} intervals do not meet the tolerance
     */
    void integrate(AngularIntegrand fn, double relTol, double absTol, double[] out) {
        fn.value(COS[0], SIN[0], g);
        double sr = 0.5 * g[0];
        double si = 0.5 * g[1];
        fn.value(COS[FINEST], SIN[FINEST], g);
        sr += 0.5 * g[0];
        si += 0.5 * g[1];
        // sr, si: the trapezoidal sum without the factor h, over 2^level intervals
        double lastR = 0.5 * Math.PI * sr;
        double lastI = 0.5 * Math.PI * si;
        double change = Double.NaN;
        double changeBefore = Double.NaN;
        for (int level = 1; level <= MAX_LEVEL; level++) {
            int stride = FINEST >> level;
            for (int j = stride; j < FINEST; j += 2 * stride) {
                fn.value(COS[j], SIN[j], g);
                sr += g[0];
                si += g[1];
            }
            double h = 0.5 * Math.PI / (1 << level);
            double tr = sr * h;
            double ti = si * h;
            double next = Math.hypot(tr - lastR, ti - lastI);
            double tol = Math.max(relTol * Math.hypot(tr, ti), absTol);
            if (level >= 2 && (next <= tol || converging(next, change, changeBefore, tol))) {
                out[0] = tr;
                out[1] = ti;
                return;
            }
            changeBefore = change;
            change = next;
            lastR = tr;
            lastI = ti;
        }
        throw new ArithmeticException("the angular integral did not converge with " + FINEST + " intervals");
    }

    /**
     * Once the changes between levels shrink geometrically — each at most a tenth of the one before — the error left
     * after the latest change d is about d·(d/d_before)², far below d itself; when that is below a tenth of the
     * tolerance the last doubling is saved.
     */
    private static boolean converging(double change, double before, double twoBefore, double tol) {
        if (!(before > 0) || !(twoBefore > 0)) {
            return false;
        }
        double ratio = change / before;
        return ratio <= 0.1 && before <= 0.1 * twoBefore && change * ratio * ratio <= 0.1 * tol;
    }
}
