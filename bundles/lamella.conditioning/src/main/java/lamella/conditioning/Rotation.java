package lamella.conditioning;

import lamella.api.data.SignalNames;

/**
 * Rotates in-phase/out-of-phase signals by a phase: X' + iY' = (X + iY)·e^{iφ}. The covariance matrix of (X, Y)
 * follows exactly, Σ' = R Σ Rᵀ (JCGM 100:2008, eq. 13), so that a rotated pair keeps the amplitude's and phase's σ and
 * gains the correlation a rotation gives two channels of unequal σ.
 */
final class Rotation {

    private Rotation() {
    }

    /** Rotates by φ (degrees) each row's vector, in place. */
    static void apply(Channels c, double[] phiDeg) {
        double[] x = c.values.get(SignalNames.IN_PHASE);
        double[] y = c.values.get(SignalNames.OUT_OF_PHASE);
        double[] sx = c.sigmas.get(SignalNames.IN_PHASE);
        double[] sy = c.sigmas.get(SignalNames.OUT_OF_PHASE);
        boolean sigma = sx != null && sy != null;
        double[] cov = c.covariance;
        if (sigma && cov == null) {
            cov = new double[c.rows()];
            c.covariance = cov;
        }
        for (int i = 0; i < c.rows(); i++) {
            double p = Math.toRadians(phiDeg[i]);
            double cos = Math.cos(p);
            double sin = Math.sin(p);
            double xi = x[i];
            x[i] = xi * cos - y[i] * sin;
            y[i] = xi * sin + y[i] * cos;
            if (sigma) {
                double vx = sx[i] * sx[i];
                double vy = sy[i] * sy[i];
                double cxy = cov[i];
                sx[i] = Math.sqrt(Math.max(0, cos * cos * vx - 2 * cos * sin * cxy + sin * sin * vy));
                sy[i] = Math.sqrt(Math.max(0, sin * sin * vx + 2 * sin * cos * cxy + cos * cos * vy));
                cov[i] = cos * sin * (vx - vy) + (cos * cos - sin * sin) * cxy;
            }
        }
    }

    static void apply(Channels c, double phiDeg) {
        double[] phi = new double[c.rows()];
        java.util.Arrays.fill(phi, phiDeg);
        apply(c, phi);
    }
}
