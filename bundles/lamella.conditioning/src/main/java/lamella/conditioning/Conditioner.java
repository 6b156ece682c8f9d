package lamella.conditioning;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import lamella.api.InputException;
import lamella.api.data.Dataset;
import lamella.api.data.Decimals;
import lamella.api.data.Scan;
import lamella.api.data.SignalNames;

/**
 * Conditions a dataset for fitting, in the order a practitioner would: bring lock-in channels to in-phase and
 * out-of-phase form, average the scans, mark outliers, correct the phase (TDTR: detection phase from the zero-delay
 * step; FDTR: subtract a reference measurement's phase), derive ratio, amplitude and phase, and mark excluded ranges.
 */
public final class Conditioner {

    private Conditioner() {
    }

    public static ConditionedTable condition(Dataset data, ConditioningOptions options) throws InputException {
        Path file = data.source();
        LockInForm.Source source = LockInForm.of(data.signalColumns());
        Channels c = averaged(data, source);
        List<String> notes = new ArrayList<>();
        recomputed(data, source, notes);

        boolean[] outlier = new boolean[c.rows()];
        for (double[] column : c.values.values()) {
            OutlierRule.mark(column, options.outlierLimit(), outlier);
        }
        if (options.outlierLimit() == 0) {
            notes.add("outlier marking: off");
        } else if (c.rows() < OutlierRule.MIN_ROWS) {
            notes.add("outlier marking: not done, fewer than " + OutlierRule.MIN_ROWS + " rows");
        }

        OptionalDouble detection = OptionalDouble.empty();
        String how;
        double[] referenceSigma = null;
        double refMin = Double.NaN;
        double refMax = Double.NaN;
        boolean lockIn = source != LockInForm.Source.NONE;
        if (data.xColumn().equals(SignalNames.DELAY_S)) {
            if (options.reference().isPresent()) {
                throw new InputException(file, null, -1, "a reference phase is subtracted from frequency data; this"
                        + " file has delays");
            }
            PhaseCorrection p = options.phase();
            if (p.mode() != PhaseCorrection.Mode.AS_RECORDED && source != LockInForm.Source.IN_OUT
                    && source != LockInForm.Source.AMPLITUDE_PHASE) {
                throw new InputException(file, null, -1, "the detection phase is corrected on in-phase and"
                        + " out-of-phase (or amplitude and phase) channels, and this file has " + data.signalColumns()
                        + "; keep the signals as recorded");
            }
            switch (p.mode()) {
                case FROM_STEP -> {
                    double phi = ZeroDelayStep.phaseDeg(file, c, p.stepWindowS());
                    Rotation.apply(c, phi);
                    detection = OptionalDouble.of(phi);
                    how = "no step in out_of_phase across zero delay, windows of "
                            + Decimals.show(p.stepWindowS() * 1e12) + " ps";
                }
                case FIXED -> {
                    Rotation.apply(c, p.fixedDeg());
                    detection = OptionalDouble.of(p.fixedDeg());
                    how = "as given";
                }
                default -> how = "not corrected, kept as recorded";
            }
        } else {
            how = data.xColumn().equals(SignalNames.FREQUENCY_HZ) ? "not applicable to frequency data"
                    : "not applicable: no lock-in channels over delay (x is " + data.xColumn() + ")";
            if (options.reference().isPresent()) {
                if (!lockIn) {
                    throw new InputException(file, null, -1, "a reference phase needs lock-in channels (in-phase and"
                            + " out-of-phase, or a phase), and this file has " + data.signalColumns());
                }
                Dataset reference = options.reference().get();
                double[][] ref = ReferencePhase.at(file, c, reference);
                double[] negative = new double[c.rows()];
                refMin = Double.POSITIVE_INFINITY;
                refMax = Double.NEGATIVE_INFINITY;
                for (int i = 0; i < negative.length; i++) {
                    negative[i] = -ref[0][i];
                    refMin = Math.min(refMin, ref[0][i]);
                    refMax = Math.max(refMax, ref[0][i]);
                }
                Rotation.apply(c, negative);
                referenceSigma = ref[1];
            }
        }

        Map<String, double[]> values = new LinkedHashMap<>();
        Map<String, double[]> sigmas = new LinkedHashMap<>();
        if (lockIn) {
            Derived.columns(c, data.xColumn().equals(SignalNames.DELAY_S), source == LockInForm.Source.PHASE_ONLY,
                    referenceSigma, values, sigmas);
        } else {
            values.putAll(c.values);
            sigmas.putAll(c.sigmas);
        }

        finite(file, c, values, sigmas);
        boolean[] excluded = new boolean[c.rows()];
        for (XRange r : options.exclusions()) {
            int hits = 0;
            for (int i = 0; i < c.rows(); i++) {
                if (r.contains(c.x[i])) {
                    excluded[i] = true;
                    hits++;
                }
            }
            if (hits == 0) {
                throw InputException.at("--exclude", r + " holds no row; " + data.xColumn() + " runs from "
                        + Decimals.show(c.x[0]) + " to " + Decimals.show(c.x[c.rows() - 1]) + " (SI units)");
            }
        }
        ConditioningReport report = new ConditioningReport(data.scans().size(), detection, how,
                options.reference().map(Dataset::source), refMin, refMax, count(outlier), count(excluded), notes);
        return new ConditionedTable(file, data.xColumn(), c.x, values, sigmas, outlier, excluded, report);
    }

    private static Channels averaged(Dataset data, LockInForm.Source source) throws InputException {
        List<Channels> scans = new ArrayList<>();
        for (Scan s : data.scans()) {
            scans.add(LockInForm.convert(s, source));
        }
        return ScanAverage.of(data.source(), scans);
    }

    /** Columns the file gave but that are derived again from the lock-in channels, which the user should know. */
    private static void recomputed(Dataset data, LockInForm.Source source, List<String> notes) {
        List<String> used = switch (source) {
            case IN_OUT -> List.of(SignalNames.IN_PHASE, SignalNames.OUT_OF_PHASE);
            case AMPLITUDE_PHASE -> List.of(SignalNames.AMPLITUDE, SignalNames.PHASE_DEG);
            case PHASE_ONLY -> List.of(SignalNames.PHASE_DEG);
            case NONE -> data.signalColumns();
        };
        List<String> again = new ArrayList<>(data.signalColumns());
        again.removeAll(used);
        if (!again.isEmpty()) {
            notes.add("recomputed from " + String.join(" and ", used) + " (the file's own columns are not used): "
                    + String.join(", ", again));
        }
    }

    /** A derived value that is not finite (a ratio where out_of_phase is zero) is an error, never written. */
    private static void finite(Path file, Channels c, Map<String, double[]> values, Map<String, double[]> sigmas)
            throws InputException {
        for (Map<String, double[]> m : List.of(values, sigmas)) {
            for (Map.Entry<String, double[]> e : m.entrySet()) {
                double[] v = e.getValue();
                for (int i = 0; i < v.length; i++) {
                    if (!Double.isFinite(v[i])) {
                        String name = m == values ? e.getKey() : SignalNames.sigma(e.getKey());
                        throw new InputException(file, null, c.lines[i], name + " is " + v[i] + " at "
                                + Decimals.show(c.x[i]) + " (a lock-in signal of zero); it cannot be used");
                    }
                }
            }
        }
    }

    private static int count(boolean[] b) {
        int n = 0;
        for (boolean v : b) {
            n += v ? 1 : 0;
        }
        return n;
    }

    /** The conditioned reference of an FDTR measurement, for {@link ReferencePhase}. */
    static Channels referenceChannels(Dataset reference) throws InputException {
        LockInForm.Source source = LockInForm.of(reference.signalColumns());
        if (source == LockInForm.Source.NONE) {
            throw new InputException(reference.source(), null, -1, "a reference needs a phase or lock-in channels;"
                    + " it has " + reference.signalColumns());
        }
        return averaged(reference, source);
    }

}
