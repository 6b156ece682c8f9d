package lamella.technique.threeomega;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;
import lamella.api.FrequencyResponse;
import lamella.api.InputException;
import lamella.api.Parameters;
import lamella.api.TechniqueModel;
import org.junit.jupiter.api.Test;

class ThreeOmegaVoltageTest {

    static final double R0 = 21.5;
    static final double DR_DT = 0.061;
    static final double LENGTH = 1.8e-3;
    static final double DRIVE_HZ = 37.0;
    /** A heater response that lags, K m/W; only asked at 2f. */
    static final double H_RE = 2.3e-2;
    static final double H_IM = -0.9e-2;

    static final FrequencyResponse AT_TWICE_THE_DRIVE = (f, out) -> {
        if (f != 2 * DRIVE_HZ) {
            throw new AssertionError("response asked at " + f + " Hz, not at 2f");
        }
        out[0] = H_RE;
        out[1] = H_IM;
    };

    static TechniqueModel bind(Map<String, Double> drive) throws InputException {
        Map<String, Double> n = new HashMap<>(Map.of(ThreeOmegaVoltage.RESISTANCE, R0, ThreeOmegaVoltage.DR_DT, DR_DT,
                ThreeOmegaVoltage.LENGTH, LENGTH));
        n.putAll(drive);
        return new ThreeOmegaVoltage().bind(Parameters.of("measurement", n,
                Map.of(ThreeOmegaVoltage.FREQUENCIES, new double[] {DRIVE_HZ})));
    }

    /**
     * Against the time domain (common practice, no source; the V3ω relation is Cahill, Rev. Sci. Instrum. 61, 802,
     * 1990): I(t) = √2 I cos ωt over three whole periods, the power I(t)² R0 per unit length locked in at 2ω gives
     * the 2ω temperature with H, R(t) = R0 + dR/dT·T(t), and V(t) = I(t) R(t) locked in at 3ω (rms) agrees with the
     * technique's V3ω to 1e-9.
     */
    @Test
    void matchesALockInOfTheTimeDomainVoltage() throws InputException {
        double current = 0.012;
        double[][] v = bind(Map.of(ThreeOmegaVoltage.CURRENT, current)).evaluate(new double[] {DRIVE_HZ},
                AT_TWICE_THE_DRIVE);
        double w = 2 * Math.PI * DRIVE_HZ;
        int n = 6000;
        double span = 3 / DRIVE_HZ;
        double p2Re = 0;
        double p2Im = 0;
        for (int k = 0; k < n; k++) {
            double t = k * span / n;
            double i = Math.sqrt(2) * current * Math.cos(w * t);
            double perLength = i * i * R0 / LENGTH;
            p2Re += 2.0 / n * perLength * Math.cos(2 * w * t);
            p2Im -= 2.0 / n * perLength * Math.sin(2 * w * t);
        }
        double tRe = p2Re * H_RE - p2Im * H_IM;
        double tIm = p2Re * H_IM + p2Im * H_RE;
        double v3Re = 0;
        double v3Im = 0;
        for (int k = 0; k < n; k++) {
            double t = k * span / n;
            double i = Math.sqrt(2) * current * Math.cos(w * t);
            double temperature = tRe * Math.cos(2 * w * t) - tIm * Math.sin(2 * w * t);
            double volts = i * (R0 + DR_DT * temperature);
            v3Re += Math.sqrt(2) / n * volts * Math.cos(3 * w * t);
            v3Im -= Math.sqrt(2) / n * volts * Math.sin(3 * w * t);
        }
        double scale = Math.hypot(v3Re, v3Im);
        assertEquals(v3Re, v[0][0], 1e-9 * scale);
        assertEquals(v3Im, v[1][0], 1e-9 * scale);
        assertEquals(scale, v[2][0], 1e-9 * scale);
        assertEquals(Math.toDegrees(Math.atan2(v3Im, v3Re)), v[3][0], 1e-9);
        // The closed form, for the record: ½ I³ R0 (dR/dT) |H| / L.
        assertEquals(0.5 * Math.pow(current, 3) * R0 * DR_DT * Math.hypot(H_RE, H_IM) / LENGTH, scale, 1e-9 * scale);
    }

    /** A lagging temperature (negative imaginary H) gives a negative out-of-phase voltage and a negative phase. */
    @Test
    void aLaggingTemperatureGivesANegativeOutOfPhaseVoltage() throws InputException {
        double[][] v = bind(Map.of(ThreeOmegaVoltage.CURRENT, 0.01)).evaluate(new double[] {DRIVE_HZ},
                AT_TWICE_THE_DRIVE);
        assertTrue(v[0][0] > 0, "in-phase " + v[0][0]);
        assertTrue(v[1][0] < 0, "out-of-phase " + v[1][0]);
        assertEquals(Math.toDegrees(Math.atan2(H_IM, H_RE)), v[3][0], 1e-12);
    }

    /** The geometry's band check is asked at the frequencies the response is read at: twice the drive's. */
    @Test
    void theHeatingFrequenciesAreTwiceTheDrive() throws InputException {
        double[] h = bind(Map.of(ThreeOmegaVoltage.CURRENT, 0.01)).heatingFrequencies(new double[] {10, 250});
        assertEquals(20, h[0], 0);
        assertEquals(500, h[1], 0);
    }

    /** A voltage drive V is the current drive I = V/R0 (the constant-current assumption). */
    @Test
    void aDriveVoltageIsTheCurrentItDrives() throws InputException {
        double volts = 0.27;
        double[][] byVoltage = bind(Map.of(ThreeOmegaVoltage.VOLTAGE, volts)).evaluate(new double[] {DRIVE_HZ},
                AT_TWICE_THE_DRIVE);
        double[][] byCurrent = bind(Map.of(ThreeOmegaVoltage.CURRENT, volts / R0)).evaluate(new double[] {DRIVE_HZ},
                AT_TWICE_THE_DRIVE);
        for (int c = 0; c < 4; c++) {
            assertEquals(byCurrent[c][0], byVoltage[c][0], 1e-14 * Math.abs(byCurrent[c][0]));
        }
    }

    @Test
    void exactlyOneDriveIsNeeded() {
        InputException both = assertThrows(InputException.class, () -> bind(Map.of(ThreeOmegaVoltage.CURRENT, 0.01,
                ThreeOmegaVoltage.VOLTAGE, 0.2)));
        assertEquals("measurement.drive_voltage_v", both.path());
        assertTrue(both.problem().contains("both drives are given"), both.problem());
        InputException neither = assertThrows(InputException.class, () -> bind(Map.of()));
        assertEquals("measurement.drive_current_a", neither.path());
        assertTrue(neither.problem().startsWith("missing; technique '3omega-voltage' needs exactly one of"
                + " drive_current_a"), neither.problem());
    }
}
