package lamella.engine;

import lamella.api.OpticalDepths;

/**
 * The response of the layer under the heated plane when the pump heats it as Q(z) ∝ exp(−z/δ) and the probe reads
 * P(z) ∝ exp(−z/δₛ) over its depth z (0 ≤ z ≤ d), each normalised over the layer; a depth of 0 is the plane itself.
 *
 * <p>Derived for this engine: in the layer, Λz(θ'' − q²θ) = −Q, and the faces see the rest of the stack through
 * reflection factors ρ = (γZ − 1)/(γZ + 1) of the impedance Z beyond each face (γ = Λz q; ρ = 1 for an adiabatic
 * face, 0 for the same material continuing, −1 for an isothermal one). Its Green's function, written with decaying
 * exponentials only so that thick layers at high frequency cannot overflow, is
 * G(z, z') = [e^{−q|z−z'|} + ρ_a e^{−q(z+z')} + ρ_b e^{−q(2d−z−z')} + ρ_a ρ_b e^{−q(2d−|z−z'|)}] / (2γ(1 − ρ_a ρ_b e^{−2qd})),
 * and the reading is ∫∫ P(z) G(z, z') Q(z') dz dz' — four double integrals of exponentials done in closed form here.
 * The divided difference X(s) = (e^{−sd} − e^{−qd})/(q − s), which they share, is finite at q = s and is evaluated
 * from the smaller of the two exponentials with a series near there. With both depths 0 the result is the plane's
 * (1 + ρ_a)(1 + ρ_b e^{−2qd})/(2γ(1 − ρ_a ρ_b e^{−2qd})), the impedance recursion's own value. Immutable; the
 * complex work space is per thread, so an evaluation allocates nothing.
 */
final class DepthWeighting {

    /** Below this |x| the series of (1 − e^{−x})/x is used: 20 terms reach 1e-22 there. */
    private static final double SERIES_BELOW = 0.5;
    private static final int SERIES_TERMS = 20;

    private static final ThreadLocal<Work> WORK = ThreadLocal.withInitial(Work::new);

    private final double d;
    private final boolean halfSpace;
    /** Heated at the plane (δ = 0), read at the plane (δₛ = 0). */
    private final boolean heatAtPlane;
    private final boolean readAtPlane;
    /** 1/δ and 1/δₛ in 1/m. */
    private final double beta;
    private final double sigma;
    /** e^{−βd}, e^{−σd}. */
    private final double eBeta;
    private final double eSigma;
    /** The normalisations β/(1 − e^{−βd}) and σ/(1 − e^{−σd}), 1/m. */
    private final double cQ;
    private final double cP;
    /** (1 − e^{−(σ+β)d})/(σ+β), m. */
    private final double gSum;

    DepthWeighting(OpticalDepths optics, double thickness) {
        this.d = thickness;
        this.halfSpace = Double.isInfinite(thickness);
        this.heatAtPlane = optics.absorption() == 0;
        this.readAtPlane = optics.sensing() == 0;
        this.beta = heatAtPlane ? 0 : 1 / optics.absorption();
        this.sigma = readAtPlane ? 0 : 1 / optics.sensing();
        this.eBeta = halfSpace ? 0 : Math.exp(-beta * d);
        this.eSigma = halfSpace ? 0 : Math.exp(-sigma * d);
        // −expm1 keeps the normalisation exact for a layer much thinner than the depth
        this.cQ = halfSpace ? beta : beta / -Math.expm1(-beta * d);
        this.cP = halfSpace ? sigma : sigma / -Math.expm1(-sigma * d);
        double sum = sigma + beta;
        this.gSum = halfSpace ? 1 / sum : -Math.expm1(-sum * d) / sum;
    }

    /** The characteristic wavenumbers 1/δ and 1/δₛ (those that are not at the plane), for quadrature breaks. */
    double[] wavenumbers() {
        return heatAtPlane && readAtPlane ? new double[0] : heatAtPlane ? new double[] {sigma}
                : readAtPlane ? new double[] {beta} : new double[] {beta, sigma};
    }

    /**
     * The probe-weighted temperature per unit heat, with q and γ = Λz q of the layer and the reflection factors of
     * its two faces (ρ_a toward the plane's other side, ρ_b toward the layers below; ρ_b is unused for a
     * semi-infinite layer).
     */
    void response(double qr, double qi, double gr, double gi, double rar, double rai, double rbr, double rbi,
                  double[] out) {
        Work w = WORK.get();
        Cx q = w.q.set(qr, qi);
        Cx eq = w.eq;
        if (halfSpace) {
            eq.set(0, 0);
        } else {
            double m = qr * d > 745 ? 0 : Math.exp(-qr * d);
            eq.set(m * Math.cos(qi * d), -m * Math.sin(qi * d));
        }
        Cx e2 = w.e2.set(eq).mul(eq);
        Cx xBeta = w.xBeta;
        Cx xSigma = w.xSigma;
        if (!halfSpace) {
            divided(beta, q, eq, xBeta, w);
            divided(sigma, q, eq, xSigma, w);
        } else {
            xBeta.set(0, 0);
            xSigma.set(0, 0);
        }
        // A = ∫ W e^{−qz}, B = ∫ W e^{−q(d−z)}
        Cx aP = plane(readAtPlane, w.aP, sigma, cP, eSigma, q, eq, w);
        Cx aQ = plane(heatAtPlane, w.aQ, beta, cQ, eBeta, q, eq, w);
        Cx bP = readAtPlane ? w.bP.set(eq) : w.bP.set(xSigma).mul(cP);
        Cx bQ = heatAtPlane ? w.bQ.set(eq) : w.bQ.set(xBeta).mul(cQ);
        Cx i1 = w.i1;
        Cx i4 = w.i4;
        if (readAtPlane && heatAtPlane) {
            i1.set(1, 0);
            i4.set(e2);
        } else if (readAtPlane || heatAtPlane) {
            i1.set(readAtPlane ? aQ : aP);
            i4.set(eq).mul(readAtPlane ? bQ : bP);
        } else {
            // ∫∫ P Q e^{−q|z−z'|}: [G(σ+β) − e^{−σd} X(β)]/(σ+q) + [G(σ+β) − e^{−βd} X(σ)]/(β+q)
            Cx t = w.t1.set(xBeta).mul(-eSigma).add(gSum).div(w.t2.set(q).add(sigma));
            Cx u = w.t3.set(xSigma).mul(-eBeta).add(gSum).div(w.t2.set(q).add(beta));
            i1.set(t).add(u).mul(cP * cQ);
            // ∫∫ P Q e^{−q(2d−|z−z'|)}: the same two regions
            farPart(sigma, beta, eBeta, xSigma, q, eq, e2, w.t4, w);
            Cx far = w.t5.set(w.t4);
            farPart(beta, sigma, eSigma, xBeta, q, eq, e2, w.t4, w);
            i4.set(far).add(w.t4).mul(cP * cQ);
        }
        Cx ra = w.ra.set(rar, rai);
        Cx rb = w.rb.set(rbr, rbi);
        // numerator I1 + ρa A_P A_Q + ρb B_P B_Q + ρa ρb I4
        Cx num = w.num.set(i1);
        num.add(w.t1.set(aP).mul(aQ).mul(ra));
        if (!halfSpace) {
            num.add(w.t1.set(bP).mul(bQ).mul(rb));
            num.add(w.t1.set(i4).mul(ra).mul(rb));
        }
        // 2γ (1 − ρa ρb e^{−2qd})
        Cx den = w.den.set(ra).mul(rb).mul(e2).mul(-1).add(1).mul(w.t1.set(gr, gi)).mul(2);
        num.div(den);
        out[0] = num.re;
        out[1] = num.im;
    }

    /** A = ∫ W e^{−qz} dz: 1 at the plane, c (1 − e^{−sd} e^{−qd})/(s + q) over a depth. */
    private static Cx plane(boolean atPlane, Cx into, double s, double c, double es, Cx q, Cx eq, Work w) {
        if (atPlane) {
            return into.set(1, 0);
        }
        return into.set(eq).mul(-es).add(1).div(w.t1.set(q).add(s)).mul(c);
    }

    /**
     * One region of ∫∫ e^{−sz} e^{−bz'} e^{−q(2d−|z−z'|)}: e^{−qd} X(s) g + e^{−2qd} D, with g = (1 − e^{−bd} e^{−qd})/(q + b)
     * and D = [−1 + e^{−bd}((q + b) X(s) + e^{−qd})] / ((q + b)(s + b)), the divided difference of g written out.
     */
    private static void farPart(double s, double b, double eb, Cx xs, Cx q, Cx eq, Cx e2, Cx into, Work w) {
        Cx qb = w.t6.set(q).add(b);
        Cx g = w.t7.set(eq).mul(-eb).add(1).div(qb);
        Cx first = w.t8.set(eq).mul(xs).mul(g);
        Cx dd = w.t9.set(qb).mul(xs).add(eq).mul(eb).add(-1).div(qb).mul(1 / (s + b));
        into.set(dd).mul(e2).add(first);
    }

    /** X = (e^{−sd} − e^{−qd})/(q − s), from the smaller exponential: d e^{−sd} φ(Δ) or d e^{−qd} φ(−Δ), Δ = (q − s)d. */
    private void divided(double s, Cx q, Cx eq, Cx into, Work w) {
        double dr = (q.re - s) * d;
        double di = q.im * d;
        if (dr >= 0) {
            phi(dr, di, into);
            into.mul(d * Math.exp(-s * d));
        } else {
            phi(-dr, -di, into);
            into.mul(eq).mul(d);
        }
    }

    /** φ(x) = (1 − e^{−x})/x for Re x ≥ 0; its Taylor series near 0. */
    private static void phi(double xr, double xi, Cx into) {
        if (Math.hypot(xr, xi) < SERIES_BELOW) {
            // Σ (−x)^n/(n+1)!, by Horner from the last term
            double sr = 0;
            double si = 0;
            for (int n = SERIES_TERMS; n >= 0; n--) {
                // s ← (1 + (−x) s)/(n + 1)
                double tr = 1 - (xr * sr - xi * si);
                double ti = -(xr * si + xi * sr);
                sr = tr / (n + 1);
                si = ti / (n + 1);
            }
            into.set(sr, si);
            return;
        }
        double m = Math.exp(-xr);
        double nr = 1 - m * Math.cos(xi);
        double ni = m * Math.sin(xi);
        double den = xr * xr + xi * xi;
        into.set((nr * xr + ni * xi) / den, (ni * xr - nr * xi) / den);
    }

    /** A complex number that arithmetic changes in place, so that a response allocates nothing. */
    static final class Cx {
        double re;
        double im;

        Cx set(double r, double i) {
            re = r;
            im = i;
            return this;
        }

        Cx set(Cx o) {
            return set(o.re, o.im);
        }

        Cx add(Cx o) {
            return set(re + o.re, im + o.im);
        }

        Cx add(double r) {
            return set(re + r, im);
        }

        Cx mul(double r) {
            return set(re * r, im * r);
        }

        Cx mul(Cx o) {
            return set(re * o.re - im * o.im, re * o.im + im * o.re);
        }

        Cx div(Cx o) {
            double m = o.re * o.re + o.im * o.im;
            return set((re * o.re + im * o.im) / m, (im * o.re - re * o.im) / m);
        }
    }

    private static final class Work {
        final Cx q = new Cx();
        final Cx eq = new Cx();
        final Cx e2 = new Cx();
        final Cx xBeta = new Cx();
        final Cx xSigma = new Cx();
        final Cx aP = new Cx();
        final Cx aQ = new Cx();
        final Cx bP = new Cx();
        final Cx bQ = new Cx();
        final Cx i1 = new Cx();
        final Cx i4 = new Cx();
        final Cx ra = new Cx();
        final Cx rb = new Cx();
        final Cx num = new Cx();
        final Cx den = new Cx();
        final Cx t1 = new Cx();
        final Cx t2 = new Cx();
        final Cx t3 = new Cx();
        final Cx t4 = new Cx();
        final Cx t5 = new Cx();
        final Cx t6 = new Cx();
        final Cx t7 = new Cx();
        final Cx t8 = new Cx();
        final Cx t9 = new Cx();
    }
}
