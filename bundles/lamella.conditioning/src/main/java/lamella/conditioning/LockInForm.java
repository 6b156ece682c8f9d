package lamella.conditioning;

import lamella.api.data.Scan;
import lamella.api.data.SignalNames;

/**
 * Brings a scan's lock-in channels to in-phase/out-of-phase form, where averaging and phase rotation are linear:
 * amplitude and phase become X = R cos θ, Y = R sin θ, with their variances and their covariance to first order
 * (X and Y made from the same R and θ are correlated; with R and θ independent, cov(X, Y) = cos θ sin θ (σ_R² −
 * R² σ_θ²), JCGM 100:2008, the Guide to the expression of uncertainty in measurement, eq. 13), so that a phase's σ
 * comes back unchanged; a phase recorded alone becomes a unit vector, so that its average is the circular mean and no
 * wrap at ±180° can corrupt it.
 */
final class LockInForm {

    /** Which columns a dataset's lock-in channels came from. */
    enum Source { IN_OUT, AMPLITUDE_PHASE, PHASE_ONLY, NONE }

    private LockInForm() {
    }

    static Source of(java.util.List<String> signals) {
        if (signals.contains(SignalNames.IN_PHASE) && signals.contains(SignalNames.OUT_OF_PHASE)) {
            return Source.IN_OUT;
        }
        if (signals.contains(SignalNames.AMPLITUDE) && signals.contains(SignalNames.PHASE_DEG)) {
            return Source.AMPLITUDE_PHASE;
        }
        if (signals.contains(SignalNames.PHASE_DEG)) {
            return Source.PHASE_ONLY;
        }
        return Source.NONE;
    }

    /** The scan's columns in working form: in_phase and out_of_phase for a lock-in source, else as recorded. */
    static Channels convert(Scan s, Source source) {
        Channels c = new Channels(s.x(), s.lines());
        switch (source) {
            case IN_OUT -> {
                c.put(SignalNames.IN_PHASE, s.signals().get(SignalNames.IN_PHASE), s.sigmas().get(SignalNames.IN_PHASE));
                c.put(SignalNames.OUT_OF_PHASE, s.signals().get(SignalNames.OUT_OF_PHASE),
                        s.sigmas().get(SignalNames.OUT_OF_PHASE));
            }
            case AMPLITUDE_PHASE, PHASE_ONLY -> polar(s, source == Source.PHASE_ONLY, c);
            case NONE -> s.signals().forEach((name, v) -> c.put(name, v, s.sigmas().get(name)));
        }
        return c;
    }

    private static void polar(Scan s, boolean unit, Channels c) {
        int n = s.rows();
        double[] theta = s.signals().get(SignalNames.PHASE_DEG);
        double[] sTheta = s.sigmas().get(SignalNames.PHASE_DEG);
        double[] r = unit ? null : s.signals().get(SignalNames.AMPLITUDE);
        double[] sR = unit ? null : s.sigmas().get(SignalNames.AMPLITUDE);
        boolean sigma = sTheta != null && (unit || sR != null);
        double[] x = new double[n];
        double[] y = new double[n];
        double[] sx = sigma ? new double[n] : null;
        double[] sy = sigma ? new double[n] : null;
        double[] cov = sigma ? new double[n] : null;
        for (int i = 0; i < n; i++) {
            double a = unit ? 1.0 : r[i];
            double t = Math.toRadians(theta[i]);
            double cos = Math.cos(t);
            double sin = Math.sin(t);
            x[i] = a * cos;
            y[i] = a * sin;
            if (sigma) {
                double da = unit ? 0.0 : sR[i];
                double dt = Math.toRadians(sTheta[i]);
                sx[i] = Math.hypot(cos * da, a * sin * dt);
                sy[i] = Math.hypot(sin * da, a * cos * dt);
                cov[i] = cos * sin * (da * da - a * a * dt * dt);
            }
        }
        c.put(SignalNames.IN_PHASE, x, sx);
        c.put(SignalNames.OUT_OF_PHASE, y, sy);
        c.covariance = cov;
    }
}
