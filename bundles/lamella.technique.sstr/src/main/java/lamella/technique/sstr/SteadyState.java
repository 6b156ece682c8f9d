package lamella.technique.sstr;

import java.util.Arrays;
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
 * SSTR: the steady probe-averaged temperature rise per watt of absorbed pump power — the slope of probe signal
 * against pump power once the thermoreflectance coefficient is calibrated (Braun et al., Rev. Sci. Instrum. 90,
 * 024905, 2019). Evaluated at zero frequency, as the low modulation frequencies used (≈100 Hz–1 kHz) intend.
 */
@Component(service = Technique.class)
public final class SteadyState implements Technique {

    @Override
    public String type() {
        return "sstr";
    }

    @Override
    public String summary() {
        return "steady-state thermoreflectance: steady temperature rise per watt";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of();
    }

    @Override
    public ResponseUnit requiredUnit() {
        return ResponseUnit.KELVIN_PER_WATT;
    }

    @Override
    public Optional<String> xColumn() {
        return Optional.empty();
    }

    @Override
    public List<String> signalColumns() {
        return List.of("k_per_w");
    }

    @Override
    public TechniqueModel bind(Parameters p) throws InputException {
        return new TechniqueModel() {
            @Override
            public double[] xValues() {
                return new double[] {0.0};
            }

            @Override
            public double[][] evaluate(double[] x, FrequencyResponse h) {
                double[] z = new double[2];
                h.at(0.0, z);
                double[] v = new double[x.length];
                Arrays.fill(v, z[0]);
                return new double[][] {v};
            }
        };
    }
}
