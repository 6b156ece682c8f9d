package lamella.technique.sstr;

import java.util.List;
import java.util.Optional;
import lamella.api.FrequencyResponse;
import lamella.api.InputException;
import lamella.api.ParameterSpec;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.Technique;
import lamella.api.TechniqueModel;
import org.osgi.service.component.annotations.Component;

/**
 * SSTR: the steady probe-averaged temperature rise over absorbed pump power. The probe signal grows in proportion
 * to the pump power and its slope, once the thermoreflectance coefficient is calibrated on a reference sample, is
 * the rise per watt (Braun et al., Rev. Sci. Instrum. 90, 024905, 2019). Evaluated at zero frequency, as the low
 * modulation frequencies used (≈100 Hz–1 kHz) intend. The x axis is the absorbed pump power, so a power sweep can be
 * fitted as measured: {@code temperature_rise_k} at each power (times a named gain where the coefficient is
 * calibrated by the fit), or {@code k_per_w}, the same rise per watt at every power.
 */
@Component(service = Technique.class)
public final class SteadyState implements Technique {

    static final String POWERS = "pump_powers_w";
    static final String X = "pump_power_w";
    static final String PER_WATT = "k_per_w";
    static final String RISE = "temperature_rise_k";

    /** Without a list of powers, a simulation gives one row at 1 W absorbed: the rise per watt itself. */
    private static final double[] ONE_WATT = {1.0};

    @Override
    public String type() {
        return "sstr";
    }

    @Override
    public String summary() {
        return "steady-state thermoreflectance: steady temperature rise over absorbed pump power";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(ParameterSpec.optionalList(POWERS, ParameterSpec.Constraint.POSITIVE,
                "the absorbed pump powers in W (default: one row at 1 W)"));
    }

    @Override
    public ResponseUnit requiredUnit() {
        return ResponseUnit.KELVIN_PER_WATT;
    }

    @Override
    public Optional<String> xColumn() {
        return Optional.of(X);
    }

    @Override
    public Optional<String> xParameter() {
        return Optional.of(POWERS);
    }

    @Override
    public List<String> signalColumns() {
        return List.of(PER_WATT, RISE);
    }

    @Override
    public TechniqueModel bind(Parameters p) throws InputException {
        double[] powers = p.has(POWERS) ? p.list(POWERS) : ONE_WATT;
        return new TechniqueModel() {
            @Override
            public double[] xValues() {
                return powers.clone();
            }

            @Override
            public double[][] evaluate(double[] x, FrequencyResponse h) {
                double[] z = new double[2];
                h.at(0.0, z);
                double[] perWatt = new double[x.length];
                double[] rise = new double[x.length];
                for (int i = 0; i < x.length; i++) {
                    perWatt[i] = z[0];
                    rise[i] = z[0] * x[i];
                }
                return new double[][] {perWatt, rise};
            }
        };
    }
}
