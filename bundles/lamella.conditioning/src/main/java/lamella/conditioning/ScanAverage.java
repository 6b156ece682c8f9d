package lamella.conditioning;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import lamella.api.InputException;
import lamella.api.data.Decimals;

/**
 * The mean of repeated scans taken at the same x values. The standard deviation of each mean is the larger of two
 * estimates, so that neither understates it: the scatter between scans, s/√n (sample standard deviation s), and
 * the scans' own standard deviations propagated, √(Σσᵢ²)/n. With one scan, its own standard deviations are kept.
 * Scans at different x values are an error: interpolating them would invent data.
 */
final class ScanAverage {

    /** Relative agreement of x between scans: far below any stage or synthesiser step, far above rounding. */
    static final double X_TOLERANCE = 1e-9;

    private ScanAverage() {
    }

    static Channels of(Path file, List<Channels> scans) throws InputException {
        Channels first = scans.get(0);
        int n = first.rows();
        for (int k = 1; k < scans.size(); k++) {
            sameX(file, first, scans.get(k), k + 1);
        }
        if (scans.size() == 1) {
            return first;
        }
        Channels mean = new Channels(first.x, first.lines);
        int m = scans.size();
        for (Map.Entry<String, double[]> column : first.values.entrySet()) {
            String name = column.getKey();
            boolean own = first.sigmas.containsKey(name);
            double[] avg = new double[n];
            double[] sd = new double[n];
            for (int i = 0; i < n; i++) {
                double sum = 0;
                for (Channels s : scans) {
                    sum += s.values.get(name)[i];
                }
                double mu = sum / m;
                double squares = 0;
                double propagated = 0;
                for (Channels s : scans) {
                    double d = s.values.get(name)[i] - mu;
                    squares += d * d;
                    if (own) {
                        double sigma = s.sigmas.get(name)[i];
                        propagated += sigma * sigma;
                    }
                }
                avg[i] = mu;
                double scatter = Math.sqrt(squares / (m - 1) / m);
                sd[i] = Math.max(scatter, own ? Math.sqrt(propagated) / m : 0.0);
            }
            mean.put(name, avg, sd);
        }
        correlation(scans, mean);
        return mean;
    }

    /**
     * The covariance of the mean in-phase and out-of-phase: their correlation coefficient times their standard
     * deviations, the coefficient from the scans' own covariances where they have standard deviations (the
     * measurement's model: a pair made from amplitude and phase is correlated, a pair recorded as X and Y is not), else
     * from the scatter between scans. So the phase and amplitude derived from the mean keep honest σ.
     */
    private static void correlation(List<Channels> scans, Channels mean) {
        double[] sx = mean.sigmas.get(lamella.api.data.SignalNames.IN_PHASE);
        double[] sy = mean.sigmas.get(lamella.api.data.SignalNames.OUT_OF_PHASE);
        if (sx == null || sy == null) {
            return;
        }
        Channels first = scans.get(0);
        boolean own = first.sigmas.containsKey(lamella.api.data.SignalNames.IN_PHASE)
                && first.sigmas.containsKey(lamella.api.data.SignalNames.OUT_OF_PHASE);
        double[] mx = mean.values.get(lamella.api.data.SignalNames.IN_PHASE);
        double[] my = mean.values.get(lamella.api.data.SignalNames.OUT_OF_PHASE);
        double[] cov = new double[mean.rows()];
        boolean any = false;
        for (int i = 0; i < cov.length; i++) {
            double rho;
            if (own) {
                double c = 0;
                double vx = 0;
                double vy = 0;
                for (Channels s : scans) {
                    double a = s.sigmas.get(lamella.api.data.SignalNames.IN_PHASE)[i];
                    double b = s.sigmas.get(lamella.api.data.SignalNames.OUT_OF_PHASE)[i];
                    c += s.covariance == null ? 0.0 : s.covariance[i];
                    vx += a * a;
                    vy += b * b;
                }
                rho = vx > 0 && vy > 0 ? c / Math.sqrt(vx * vy) : 0.0;
            } else {
                double c = 0;
                double vx = 0;
                double vy = 0;
                for (Channels s : scans) {
                    double a = s.values.get(lamella.api.data.SignalNames.IN_PHASE)[i] - mx[i];
                    double b = s.values.get(lamella.api.data.SignalNames.OUT_OF_PHASE)[i] - my[i];
                    c += a * b;
                    vx += a * a;
                    vy += b * b;
                }
                rho = vx > 0 && vy > 0 ? c / Math.sqrt(vx * vy) : 0.0;
            }
            rho = Math.max(-1.0, Math.min(1.0, rho));
            cov[i] = rho * sx[i] * sy[i];
            any |= cov[i] != 0;
        }
        mean.covariance = any ? cov : null;
    }

    private static void sameX(Path file, Channels a, Channels b, int scan) throws InputException {
        if (a.rows() != b.rows()) {
            throw new InputException(file, null, b.lines[0], "scan " + scan + " has " + b.rows() + " rows, scan 1 has "
                    + a.rows() + "; repeated scans are averaged only at the same x values");
        }
        double span = Math.max(Math.abs(a.x[0]), Math.abs(a.x[a.rows() - 1]));
        for (int i = 0; i < a.rows(); i++) {
            if (Math.abs(a.x[i] - b.x[i]) > X_TOLERANCE * span) {
                throw new InputException(file, null, b.lines[i], "x " + Decimals.show(b.x[i]) + " in scan " + scan
                        + " differs from " + Decimals.show(a.x[i]) + " (line " + a.lines[i] + ") in scan 1; repeated"
                        + " scans are averaged only at the same x values");
            }
        }
    }
}
