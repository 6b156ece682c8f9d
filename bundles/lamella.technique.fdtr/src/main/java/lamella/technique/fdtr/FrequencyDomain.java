package lamella.technique.fdtr;

import java.util.List;
import java.util.Optional;
import lamella.api.ComplexColumns;
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
 * FDTR: the probe-averaged temperature per watt of absorbed modulated pump power at each modulation frequency,
 * as the lock-in reads it after the instrument's own phase is removed (Schmidt, Cheaito & Chiesa, Rev. Sci.
 * Instrum. 80, 094901, 2009). Phase in degrees, negative when the temperature lags.
 */
@Component(service = Technique.class)
public final class FrequencyDomain implements Technique {

    static final String FREQUENCIES = "frequencies_hz";

    @Override
    public String type() {
        return "fdtr";
    }

    @Override
    public String summary() {
        return "frequency-domain thermoreflectance: complex response over modulation frequency";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(ParameterSpec.optionalList(FREQUENCIES, Constraint.POSITIVE,
                "the modulation frequencies in Hz"));
    }

    @Override
    public ResponseUnit requiredUnit() {
        return ResponseUnit.KELVIN_PER_WATT;
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
        return ComplexColumns.names(ResponseUnit.KELVIN_PER_WATT);
    }

    @Override
    public TechniqueModel bind(Parameters p) throws InputException {
        double[] f = p.has(FREQUENCIES) ? p.list(FREQUENCIES) : new double[0];
        return new TechniqueModel() {
            @Override
            public double[] xValues() {
                return f.clone();
            }

            @Override
            public double[][] evaluate(double[] x, FrequencyResponse h) {
                return ComplexColumns.sample(x, 1.0, h);
            }
        };
    }
}
