package lamella.conditioning;

import lamella.api.data.SignalNames;

/**
 * Rotates in-phase/out-of-phase signals by a phase: X' + iY' = (X + iY)·e^{iφ}. Standard deviations follow to first
 * order with the two channels independent.
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
        for (int i = 0; i < c.rows(); i++) {
            double p = Math.toRadians(phiDeg[i]);
            double cos = Math.cos(p);
            double sin = Math.sin(p);
            double xi = x[i];
            x[i] = xi * cos - y[i] * sin;
            y[i] = xi * sin + y[i] * cos;
            if (sigma) {
                double a = sx[i];
                sx[i] = Math.hypot(cos * a, sin * sy[i]);
                sy[i] = Math.hypot(sin * a, cos * sy[i]);
            }
        }
    }

    static void apply(Channels c, double phiDeg) {
        double[] phi = new double[c.rows()];
        java.util.Arrays.fill(phi, phiDeg);
        apply(c, phi);
    }
}
