package lamella.technique.threeomega;

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
 * 3ω: a heater driven at frequency f dissipates power oscillating at 2f; its width-averaged temperature oscillation
 * at 2f, per unit average power per unit length, is read from the third-harmonic voltage (Cahill, Rev. Sci.
 * Instrum. 61, 802, 1990). x is the drive frequency f; the response is evaluated at 2f.
 */
@Component(service = Technique.class)
public final class ThreeOmega implements Technique {

    static final String FREQUENCIES = "drive_frequencies_hz";

    @Override
    public String type() {
        return "3omega";
    }

    @Override
    public String summary() {
        return "electrical line heater: 2f temperature oscillation over drive frequency f";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(ParameterSpec.optionalList(FREQUENCIES, Constraint.POSITIVE,
                "the heater's drive frequencies f in Hz"));
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
        return ComplexColumns.names(ResponseUnit.KELVIN_METRE_PER_WATT);
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
                return ComplexColumns.sample(x, 2.0, h);
            }
        };
    }
}
