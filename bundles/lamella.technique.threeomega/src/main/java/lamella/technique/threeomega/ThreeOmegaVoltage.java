package lamella.technique.threeomega;

import java.util.List;
import java.util.Optional;
import lamella.api.EvaluationCancelledException;
import lamella.api.FrequencyResponse;
import lamella.api.InputException;
import lamella.api.ParameterSpec;
import lamella.api.ParameterSpec.Constraint;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.Technique;
import lamella.api.TechniqueModel;
import org.osgi.service.component.annotations.Component;

/**
 * 3ω as the lock-in reads it: the heater's third-harmonic voltage. With the current I(t) = √2 I cos ωt (I rms) the
 * power I(t)² R0 = P (1 + cos 2ωt), P = I² R0: its 2ω part has the amplitude P, so the heater's 2ω temperature is
 * ΔT = (P/L) H(2f) with H per W/m. The resistance R0 + (dR/dT) Re[ΔT e^{i2ωt}] times the current holds
 * √2 I (dR/dT) |ΔT|/2 cos(3ωt + arg ΔT): in rms, V3ω = ½ I³ R0 (dR/dT) H(2f)/L (Cahill, Rev. Sci. Instrum. 61, 802,
 * 1990). The phase is that of the current's cos 3ωt; a lagging temperature gives a negative out-of-phase part. The
 * drive is taken as a constant current; a drive voltage V stands for I = V/R0.
 */
@Component(service = Technique.class)
public final class ThreeOmegaVoltage implements Technique {

    static final String FREQUENCIES = ThreeOmega.FREQUENCIES;
    static final String RESISTANCE = "heater_resistance_ohm";
    static final String DR_DT = "dr_dt_ohm_per_k";
    static final String LENGTH = "heater_length_m";
    static final String CURRENT = "drive_current_a";
    static final String VOLTAGE = "drive_voltage_v";

    static final List<String> SIGNALS = List.of("v3_in_phase_v", "v3_out_of_phase_v", "v3_amplitude_v",
            "phase_deg");

    @Override
    public String type() {
        return "3omega-voltage";
    }

    @Override
    public String summary() {
        return "electrical line heater: third-harmonic voltage (rms) over drive frequency f, from the 2f"
                + " temperature, the heater's resistance and dR/dT";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(
                ParameterSpec.optionalList(FREQUENCIES, Constraint.POSITIVE, "the heater's drive frequencies f in Hz"),
                ParameterSpec.required(RESISTANCE, Constraint.POSITIVE,
                        "the heater's resistance R0 between the voltage taps at the operating temperature in Ω"),
                ParameterSpec.required(DR_DT, Constraint.POSITIVE,
                        "the heater's temperature coefficient dR/dT between the voltage taps in Ω/K"),
                ParameterSpec.required(LENGTH, Constraint.POSITIVE,
                        "the heater's length between the voltage taps in m"),
                ParameterSpec.optional(CURRENT, Constraint.POSITIVE, Double.NaN,
                        "the rms drive current in A (or " + VOLTAGE + ")"),
                ParameterSpec.optional(VOLTAGE, Constraint.POSITIVE, Double.NaN,
                        "the rms drive voltage across the heater at 1ω in V (or " + CURRENT + ")"));
    }

    @Override
    public ResponseUnit requiredUnit() {
        return ResponseUnit.KELVIN_METRE_PER_WATT;
    }

    @Override
    public Optional<String> xColumn() {
        return Optional.of("frequency_hz");
    }

    @Override
    public Optional<String> xParameter() {
        return Optional.of(FREQUENCIES);
    }

    @Override
    public List<String> signalColumns() {
        return SIGNALS;
    }

    @Override
    public TechniqueModel bind(Parameters p) throws InputException {
        if (p.has(CURRENT) == p.has(VOLTAGE)) {
            String at = p.has(CURRENT) ? p.pathOf(VOLTAGE) : p.pathOf(CURRENT);
            throw InputException.at(at, (p.has(CURRENT) ? "both drives are given" : "missing")
                    + "; technique '3omega-voltage' needs exactly one of " + CURRENT + " (rms current in A) or "
                    + VOLTAGE + " (rms voltage across the heater in V)");
        }
        double r0 = p.number(RESISTANCE);
        double current = p.has(CURRENT) ? p.number(CURRENT) : p.number(VOLTAGE) / r0;
        double factor = 0.5 * current * current * current * r0 * p.number(DR_DT) / p.number(LENGTH);
        double[] f = p.has(FREQUENCIES) ? p.list(FREQUENCIES) : new double[0];
        return new TechniqueModel() {
            @Override
            public double[] xValues() {
                return f.clone();
            }

            @Override
            public double[][] evaluate(double[] x, FrequencyResponse h) {
                double[][] v = new double[4][x.length];
                double[] z = new double[2];
                for (int i = 0; i < x.length; i++) {
                    EvaluationCancelledException.checkpoint();
                    h.at(2 * x[i], z);
                    v[0][i] = factor * z[0];
                    v[1][i] = factor * z[1];
                    v[2][i] = Math.hypot(v[0][i], v[1][i]);
                    v[3][i] = Math.toDegrees(Math.atan2(z[1], z[0]));
                }
                return v;
            }

            @Override
            public double[] heatingFrequencies(double[] x) {
                double[] h = new double[x.length];
                for (int i = 0; i < x.length; i++) {
                    h[i] = 2 * x[i];
                }
                return h;
            }
        };
    }
}
