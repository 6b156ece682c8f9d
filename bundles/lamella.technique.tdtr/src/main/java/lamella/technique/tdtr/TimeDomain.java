package lamella.technique.tdtr;

import java.util.List;
import java.util.Optional;
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
 * TDTR: a pump pulse train at repetition rate f_rep, modulated at f_mod, read by a delayed probe train through a
 * lock-in at f_mod. In-phase + i·out-of-phase = Σₘ H(f_mod + m f_rep) exp(i2π m f_rep t) in K/W, which includes the
 * accumulation of heat from earlier pulses (Cahill, Rev. Sci. Instrum. 75, 5119, 2004; Schmidt, Chen & Chen, Rev.
 * Sci. Instrum. 79, 114902, 2008). The sum is evaluated by {@link PulseTrainSum}. Ratio = −in/out.
 */
@Component(service = Technique.class)
public final class TimeDomain implements Technique {

    static final String MODULATION = "modulation_hz";
    static final String REPETITION = "repetition_hz";
    static final String DELAYS = "delays_s";

    @Override
    public String type() {
        return "tdtr";
    }

    @Override
    public String summary() {
        return "time-domain thermoreflectance: lock-in output of a modulated pulse train over pump-probe delay";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(
                ParameterSpec.required(MODULATION, Constraint.POSITIVE, "the pump modulation frequency in Hz"),
                ParameterSpec.required(REPETITION, Constraint.POSITIVE, "the laser's pulse repetition rate in Hz"),
                ParameterSpec.optionalList(DELAYS, Constraint.FINITE, "the pump-probe delays in s"));
    }

    @Override
    public ResponseUnit requiredUnit() {
        return ResponseUnit.KELVIN_PER_WATT;
    }

    @Override
    public Optional<String> xColumn() {
        return Optional.of("delay_s");
    }

    @Override
    public Optional<String> xParameter() {
        return Optional.of(DELAYS);
    }

    @Override
    public List<String> signalColumns() {
        return List.of("in_phase", "out_of_phase", "ratio", "phase_deg");
    }

    @Override
    public TechniqueModel bind(Parameters p) throws InputException {
        double fMod = p.number(MODULATION);
        double fRep = p.number(REPETITION);
        if (fMod >= fRep / 2) {
            throw InputException.at(p.pathOf(MODULATION), "the modulation frequency " + fMod + " Hz must be below"
                    + " half the repetition rate (" + fRep / 2 + " Hz)");
        }
        double[] delays = p.has(DELAYS) ? p.list(DELAYS) : new double[0];
        for (int i = 0; i < delays.length; i++) {
            if (Math.abs(delays[i]) >= 1 / fRep) {
                throw InputException.at(p.pathOf(DELAYS) + "[" + i + "]", "the delay " + delays[i] + " s is not"
                        + " within one pulse period (±" + 1 / fRep + " s)");
            }
        }
        PulseTrainSum sum = PulseTrainSum.converged(fMod, fRep);
        return new TechniqueModel() {
            @Override
            public double[] xValues() {
                return delays.clone();
            }

            @Override
            public double[][] evaluate(double[] x, FrequencyResponse h) {
                double[][] s = sum.evaluate(x, h);
                int n = x.length;
                double[][] v = new double[4][n];
                for (int i = 0; i < n; i++) {
                    v[0][i] = s[0][i];
                    v[1][i] = s[1][i];
                    v[2][i] = -s[0][i] / s[1][i];
                    v[3][i] = Math.toDegrees(Math.atan2(s[1][i], s[0][i]));
                }
                return v;
            }
        };
    }
}
