package lamella.conditioning;

import java.nio.file.Path;
import lamella.api.InputException;
import lamella.api.data.Decimals;
import lamella.api.data.SignalNames;

/**
 * The TDTR detection phase from the step at zero delay: the pump's arrival changes the in-phase signal abruptly and
 * the out-of-phase signal, which integrates over many pulses, not at all, so the right phase leaves no step in the
 * out-of-phase signal (Cahill, Rev. Sci. Instrum. 75, 5119 (2004), section on phase; from memory). With ΔX and ΔY
 * the changes at zero delay between straight lines through the rows of the window before and of the window after,
 * φ = atan2(−ΔY, ΔX) makes ΔY' = 0 and ΔX' = |ΔV| > 0.
 */
final class ZeroDelayStep {

    private ZeroDelayStep() {
    }

    /**
     * The rotation in degrees. Every row in the windows counts, marked or not: the peak just after zero delay is real
     * signal that a running-median outlier rule may well mark.
     */
    static double phaseDeg(Path file, Channels c, double window) throws InputException {
        double[] x = c.values.get(SignalNames.IN_PHASE);
        double[] y = c.values.get(SignalNames.OUT_OF_PHASE);
        Side before = new Side();
        Side after = new Side();
        for (int i = 0; i < c.rows(); i++) {
            double t = c.x[i];
            if (t < 0 && t >= -window) {
                before.add(t, x[i], y[i]);
            } else if (t > 0 && t <= window) {
                after.add(t, x[i], y[i]);
            }
        }
        if (before.n == 0 || after.n == 0) {
            throw new InputException(file, null, -1, "cannot find the detection phase: it needs delays within "
                    + Decimals.show(window * 1e12) + " ps both before and after zero delay, and the data have "
                    + before.n + " before and " + after.n + " after (delays " + Decimals.show(c.x[0]) + " to "
                    + Decimals.show(c.x[c.rows() - 1]) + " s); widen the window, give the phase, or keep the"
                    + " signals as recorded");
        }
        double dx = after.atZero(after.sx, after.sxt) - before.atZero(before.sx, before.sxt);
        double dy = after.atZero(after.sy, after.syt) - before.atZero(before.sy, before.syt);
        if (dx == 0 && dy == 0) {
            throw new InputException(file, null, -1, "cannot find the detection phase: the signal does not change"
                    + " across zero delay");
        }
        return Math.toDegrees(Math.atan2(-dy, dx));
    }

    /**
     * The rows of one window, for a straight line through them evaluated at zero delay, so that the slow drift of the
     * out-of-phase signal over the window is not taken for a step. One row gives its own value.
     */
    private static final class Side {
        int n;
        double st;
        double stt;
        double sx;
        double sxt;
        double sy;
        double syt;

        void add(double t, double x, double y) {
            n++;
            st += t;
            stt += t * t;
            sx += x;
            sxt += x * t;
            sy += y;
            syt += y * t;
        }

        double atZero(double sv, double svt) {
            double d = n * stt - st * st;
            if (n < 2 || d == 0) {
                return sv / n;
            }
            return (sv * stt - st * svt) / d;
        }
    }
}
