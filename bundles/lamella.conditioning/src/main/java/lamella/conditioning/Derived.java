package lamella.conditioning;

import java.util.Map;
import lamella.api.data.SignalNames;

/**
 * The output columns derived from in-phase X and out-of-phase Y: ratio −X/Y (TDTR), amplitude √(X²+Y²) and phase
 * atan2(Y, X) in degrees, with standard deviations propagated to first order with the covariance of X and Y where
 * they are correlated (JCGM 100:2008, eq. 13).
 */
final class Derived {

    private Derived() {
    }

    /**
     * @param ratio          whether to add the TDTR ratio
     * @param phaseOnly      whether the data had a phase alone (then only the phase is written)
     * @param referenceSigma standard deviation of a subtracted reference phase, degrees, or null
     */
    static void columns(Channels c, boolean ratio, boolean phaseOnly, double[] referenceSigma,
                        Map<String, double[]> values, Map<String, double[]> sigmas) {
        int n = c.rows();
        double[] x = c.values.get(SignalNames.IN_PHASE);
        double[] y = c.values.get(SignalNames.OUT_OF_PHASE);
        double[] sx = c.sigmas.get(SignalNames.IN_PHASE);
        double[] sy = c.sigmas.get(SignalNames.OUT_OF_PHASE);
        boolean sigma = sx != null && sy != null;
        double[] cov = c.covariance;
        double[] r = new double[n];
        double[] amplitude = new double[n];
        double[] phase = new double[n];
        double[] sr = new double[n];
        double[] sa = new double[n];
        double[] sp = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = -x[i] / y[i];
            amplitude[i] = Math.hypot(x[i], y[i]);
            phase[i] = Math.toDegrees(Math.atan2(y[i], x[i]));
            if (sigma) {
                double vx = sx[i] * sx[i];
                double vy = sy[i] * sy[i];
                double cxy = cov == null ? 0.0 : cov[i];
                double x2 = x[i] * x[i];
                double y2 = y[i] * y[i];
                double a2 = amplitude[i] * amplitude[i];
                sr[i] = Math.sqrt(Math.max(0, vx / y2 + x2 * vy / (y2 * y2) - 2 * x[i] * cxy / (y2 * y[i])));
                sa[i] = Math.sqrt(Math.max(0, x2 * vx + y2 * vy + 2 * x[i] * y[i] * cxy)) / amplitude[i];
                sp[i] = Math.toDegrees(Math.sqrt(Math.max(0, y2 * vx + x2 * vy - 2 * x[i] * y[i] * cxy)) / a2);
            }
            if (referenceSigma != null) {
                sp[i] = Math.hypot(sp[i], referenceSigma[i]);
            }
        }
        boolean phaseSigma = sigma || referenceSigma != null;
        if (!phaseOnly) {
            values.put(SignalNames.IN_PHASE, x);
            values.put(SignalNames.OUT_OF_PHASE, y);
            if (sigma) {
                sigmas.put(SignalNames.IN_PHASE, sx);
                sigmas.put(SignalNames.OUT_OF_PHASE, sy);
            }
            if (ratio) {
                values.put(SignalNames.RATIO, r);
                if (sigma) {
                    sigmas.put(SignalNames.RATIO, sr);
                }
            }
            values.put(SignalNames.AMPLITUDE, amplitude);
            if (sigma) {
                sigmas.put(SignalNames.AMPLITUDE, sa);
            }
        }
        values.put(SignalNames.PHASE_DEG, phase);
        if (phaseSigma) {
            sigmas.put(SignalNames.PHASE_DEG, sp);
        }
    }
}
