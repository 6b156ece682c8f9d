package lamella.conditioning;

import java.nio.file.Path;
import lamella.api.InputException;
import lamella.api.data.Dataset;
import lamella.api.data.Decimals;
import lamella.api.data.SignalNames;

/**
 * The instrument's own phase at each frequency of an FDTR measurement, from a reference measurement (a sample of
 * known response, or the pump beam sent straight to the detector) at the same frequencies. Frequencies missing
 * from the reference are an error: interpolating a phase would invent it.
 */
final class ReferencePhase {

    private ReferencePhase() {
    }

    /** Reference phase in degrees and its standard deviation (0 where unknown), at each row of the data. */
    static double[][] at(Path file, Channels data, Dataset reference) throws InputException {
        if (!reference.xColumn().equals(SignalNames.FREQUENCY_HZ)) {
            throw new InputException(reference.source(), null, -1, "a phase reference must be over frequency;"
                    + " it has " + reference.xColumn());
        }
        Channels ref = Conditioner.referenceChannels(reference);
        double[] rx = ref.values.get(SignalNames.IN_PHASE);
        double[] ry = ref.values.get(SignalNames.OUT_OF_PHASE);
        double[] sx = ref.sigmas.get(SignalNames.IN_PHASE);
        double[] sy = ref.sigmas.get(SignalNames.OUT_OF_PHASE);
        double[] phase = new double[data.rows()];
        double[] sigma = new double[data.rows()];
        int j = 0;
        for (int i = 0; i < data.rows(); i++) {
            double f = data.x[i];
            while (j < ref.rows() && ref.x[j] < f * (1 - ScanAverage.X_TOLERANCE)) {
                j++;
            }
            if (j == ref.rows() || Math.abs(ref.x[j] - f) > ScanAverage.X_TOLERANCE * f) {
                throw new InputException(file, null, data.lines[i], "frequency " + Decimals.show(f) + " Hz is not in"
                        + " the reference " + reference.source() + "; the reference must be measured at every"
                        + " frequency of the data");
            }
            double a2 = rx[j] * rx[j] + ry[j] * ry[j];
            if (a2 == 0) {
                throw new InputException(reference.source(), null, ref.lines[j], "the reference signal is zero at "
                        + Decimals.show(f) + " Hz, so it has no phase");
            }
            phase[i] = Math.toDegrees(Math.atan2(ry[j], rx[j]));
            if (sx != null && sy != null) {
                sigma[i] = Math.toDegrees(Math.hypot(ry[j] * sx[j], rx[j] * sy[j]) / a2);
            }
        }
        return new double[][] {phase, sigma};
    }
}
