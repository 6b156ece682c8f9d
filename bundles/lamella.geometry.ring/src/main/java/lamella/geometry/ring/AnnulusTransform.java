package lamella.geometry.ring;

import lamella.engine.Bessel;

/**
 * The Hankel transform of a ring of radius R whose intensity across its width has the Gaussian radial profile
 * g(r) = exp(−2 (r − R)² / w²) (w the 1/e² half-width), for unit power:
 * G(k) = ∫₀^∞ g(r) J₀(k r) 2π r dr / ∫₀^∞ g(r) 2π r dr, so that G(0) = 1 and, as w → 0, G(k) → J₀(k R).
 *
 * <p>The radial integral is done by quadrature at every wavenumber, not by blurring a thin ring (which holds only for
 * w ≪ R). Where the profile lies well clear of the centre (R ≥ {@value #CLEAR} w) the substitution
 * r = R + x w/√2 turns g into exp(−x²) and Gauss–Hermite quadrature applies, with a rule whose size follows the
 * oscillation k w/√2 of J₀ across the profile; nearer the centre, composite Gauss–Legendre over
 * [0, R + {@value #SPAN} w] with panels short against the oscillation. The normalisation is the same rule applied
 * to J₀ ≡ 1, so G(0) = 1 to rounding whatever the rule. Rule sizes were chosen so that doubling them changes G by
 * less than 1e-12 over k w ≤ 14 (checked in AnnulusTransformTest).
 */
final class AnnulusTransform {

    /** Profiles whose centre is at least this many half-widths out are integrated by Gauss–Hermite. */
    static final double CLEAR = 6.0;
    /** exp(−2·SPAN²) ≈ 5e-32: the profile beyond SPAN half-widths from R is left out. */
    static final double SPAN = 6.0;

    /** Gauss–Hermite rules by size; the first whose reach covers the oscillation is used. */
    private static final int[] HERMITE_SIZES = {16, 24, 32, 48, 64, 96};
    private static final double[][][] HERMITE = new double[HERMITE_SIZES.length][][];
    /** The largest oscillation c each rule is used for: 0.75·√(2n). */
    private static final double[] HERMITE_REACH = new double[HERMITE_SIZES.length];
    private static final double[][] LEGENDRE10 = GaussRules.legendre(10);

    static {
        for (int i = 0; i < HERMITE_SIZES.length; i++) {
            HERMITE[i] = GaussRules.hermite(HERMITE_SIZES[i]);
            HERMITE_REACH[i] = 0.75 * Math.sqrt(2.0 * HERMITE_SIZES[i]);
        }
    }

    private final double radius;
    private final double width;
    private final boolean hermite;
    /** Per Hermite rule: the radii and the normalised weights g·r·w. */
    private final double[][] hermiteRadii = new double[HERMITE_SIZES.length][];
    private final double[][] hermiteWeights = new double[HERMITE_SIZES.length][];
    private final double legendreEnd;
    /** w/√2: the oscillation across the profile is c = k·w/√2 in the Gauss–Hermite variable. */
    private final double halfWidthScale;

    AnnulusTransform(double radius, double width) {
        if (!(width > 0) || !(radius > 0)) {
            throw new IllegalArgumentException("an annulus needs a positive radius and width");
        }
        this.radius = radius;
        this.width = width;
        this.hermite = radius >= CLEAR * width;
        this.legendreEnd = radius + SPAN * width;
        this.halfWidthScale = width / Math.sqrt(2);
        if (hermite) {
            double scale = halfWidthScale;
            for (int s = 0; s < HERMITE_SIZES.length; s++) {
                double[] x = HERMITE[s][0];
                double[] h = HERMITE[s][1];
                double[] r = new double[x.length];
                double[] wt = new double[x.length];
                double norm = 0;
                for (int i = 0; i < x.length; i++) {
                    r[i] = radius + x[i] * scale;
                    wt[i] = r[i] > 0 ? h[i] * r[i] : 0.0;
                    norm += wt[i];
                }
                for (int i = 0; i < x.length; i++) {
                    wt[i] /= norm;
                }
                hermiteRadii[s] = r;
                hermiteWeights[s] = wt;
            }
        }
    }

    /** True when the Gauss–Hermite form is used (the profile is clear of the centre). */
    boolean clearOfCentre() {
        return hermite;
    }

    /** G(k) for k ≥ 0 (angular wavenumber, rad/m). */
    double at(double k) {
        return hermite ? hermiteAt(k) : legendreAt(k);
    }

    private double hermiteAt(double k) {
        // J₀ across the profile oscillates like cos(c x), c = k w/√2; an n-point rule resolves c up to about
        // √(2n)·0.6 with the Gaussian's own decay exp(−c²/4) doing the rest
        double c = k * halfWidthScale;
        int s = 0;
        while (s < HERMITE_SIZES.length - 1 && c > HERMITE_REACH[s]) {
            s++;
        }
        double[] r = hermiteRadii[s];
        double[] wt = hermiteWeights[s];
        double sum = 0;
        for (int i = 0; i < r.length; i++) {
            if (wt[i] != 0) {
                sum += wt[i] * Bessel.j0(k * r[i]);
            }
        }
        return sum;
    }

    private double legendreAt(double k) {
        int panels = (int) Math.max(2 * Math.ceil(legendreEnd / width), Math.ceil(k * legendreEnd / 1.5));
        double[] x = LEGENDRE10[0];
        double[] h = LEGENDRE10[1];
        double step = legendreEnd / panels;
        double sum = 0;
        double norm = 0;
        for (int p = 0; p < panels; p++) {
            double mid = (p + 0.5) * step;
            for (int i = 0; i < x.length; i++) {
                double r = mid + 0.5 * step * x[i];
                double u = (r - radius) / width;
                double g = h[i] * Math.exp(-2 * u * u) * r;
                norm += g;
                sum += g * Bessel.j0(k * r);
            }
        }
        return sum / norm;
    }
}
