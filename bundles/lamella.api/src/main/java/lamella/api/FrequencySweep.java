package lamella.api;

import java.util.List;
import java.util.Optional;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * A technique that reads a geometry's complex response over a list of frequencies — FDTR over modulation
 * frequency, 3ω over drive frequency (the heater's temperature oscillates at twice it) — and reports it as real
 * part, imaginary part, amplitude and phase.
 */
@ConsumerType
public abstract class FrequencySweep implements Technique {

    private final String type;
    private final String summary;
    private final String listKey;
    private final String listDescription;
    private final ResponseUnit unit;
    private final double responseFactor;

    /**
     * @param listKey        the measurement key of the frequency list
     * @param responseFactor the response is read at this multiple of each listed frequency
     */
    protected FrequencySweep(String type, String summary, String listKey, String listDescription, ResponseUnit unit,
                             double responseFactor) {
        this.type = type;
        this.summary = summary;
        this.listKey = listKey;
        this.listDescription = listDescription;
        this.unit = unit;
        this.responseFactor = responseFactor;
    }

    @Override
    public String type() {
        return type;
    }

    @Override
    public String summary() {
        return summary;
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(ParameterSpec.optionalList(listKey, ParameterSpec.Constraint.POSITIVE, listDescription));
    }

    @Override
    public ResponseUnit requiredUnit() {
        return unit;
    }

    @Override
    public Optional<String> xColumn() {
        return Optional.of("frequency_hz");
    }

    @Override
    public Optional<String> xParameter() {
        return Optional.of(listKey);
    }

    @Override
    public List<String> signalColumns() {
        return ComplexColumns.names(unit);
    }

    @Override
    public TechniqueModel bind(Parameters p) throws InputException {
        double[] f = p.has(listKey) ? p.list(listKey) : new double[0];
        return new TechniqueModel() {
            @Override
            public double[] xValues() {
                return f.clone();
            }

            @Override
            public double[][] evaluate(double[] x, FrequencyResponse h) {
                return ComplexColumns.sample(x, responseFactor, h);
            }

            @Override
            public double[] heatingFrequencies(double[] x) {
                double[] h = new double[x.length];
                for (int i = 0; i < x.length; i++) {
                    h[i] = responseFactor * x[i];
                }
                return h;
            }
        };
    }
}
