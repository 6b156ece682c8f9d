package lamella.technique.tdtr;

/**
 * What a lock-in sum needs of its harmonics that depends only on the modulation, the repetition rate and the
 * convergence factor: each term's weight g(m), and for the interpolated terms their frequency's place on the
 * Chebyshev interval and 1/√f. A fit evaluates the same measurement dozens of times with other stack values, so
 * these ten thousand logarithms, square roots and exponentials are worked out once ({@link #of} keeps the last few
 * sets, a few hundred kilobytes each). Immutable.
 */
final class Harmonics {

    private static final int KEPT = 8;
    private static final Harmonics[] RECENT = new Harmonics[KEPT];
    private static int next;

    final double fMod;
    final double fRep;
    final double cutoff;
    final int terms;
    final int exact;
    /** g(j) for j = −terms…terms at index j + terms. */
    final double[] weight;
    /** ln of the interpolated frequencies' ends. */
    final double lnLo;
    final double lnHi;
    /** For the interpolated terms j = exact + 1 … terms (index j − exact − 1), f = f_mod + j f_rep: t, 2t, 1/√f. */
    final double[] tPlus;
    final double[] twoTPlus;
    final double[] rootPlus;
    /** The same for f = j f_rep − f_mod, the negative frequencies' magnitudes. */
    final double[] tMinus;
    final double[] twoTMinus;
    final double[] rootMinus;

    private Harmonics(double fMod, double fRep, double cutoff, int terms, int exact) {
        this.fMod = fMod;
        this.fRep = fRep;
        this.cutoff = cutoff;
        this.terms = terms;
        this.exact = exact;
        weight = new double[2 * terms + 1];
        for (int j = -terms; j <= terms; j++) {
            double x = j * fRep / cutoff;
            weight[j + terms] = Double.isInfinite(cutoff) ? 1.0 : Math.exp(-Math.PI * x * x);
        }
        int tail = Math.max(0, terms - exact);
        tPlus = new double[tail];
        twoTPlus = new double[tail];
        rootPlus = new double[tail];
        tMinus = new double[tail];
        twoTMinus = new double[tail];
        rootMinus = new double[tail];
        lnLo = Math.log((exact + 1) * fRep - fMod);
        lnHi = Math.log(terms * fRep + fMod);
        for (int j = exact + 1; j <= terms; j++) {
            int i = j - exact - 1;
            double fp = fMod + j * fRep;
            tPlus[i] = (2 * Math.log(fp) - lnLo - lnHi) / (lnHi - lnLo);
            twoTPlus[i] = 2 * tPlus[i];
            rootPlus[i] = 1 / Math.sqrt(fp);
            double fn = j * fRep - fMod;
            tMinus[i] = (2 * Math.log(fn) - lnLo - lnHi) / (lnHi - lnLo);
            twoTMinus[i] = 2 * tMinus[i];
            rootMinus[i] = 1 / Math.sqrt(fn);
        }
    }

    /** The harmonics of a sum, from the recent ones when it was asked for lately. */
    static Harmonics of(double fMod, double fRep, double cutoff, int terms, int exact) {
        synchronized (RECENT) {
            for (Harmonics h : RECENT) {
                if (h != null && h.fMod == fMod && h.fRep == fRep && h.cutoff == cutoff && h.terms == terms
                        && h.exact == exact) {
                    return h;
                }
            }
        }
        Harmonics h = new Harmonics(fMod, fRep, cutoff, terms, exact);
        synchronized (RECENT) {
            RECENT[next] = h;
            next = (next + 1) % KEPT;
        }
        return h;
    }
}
