package lamella.api;

import org.osgi.annotation.versioning.ConsumerType;

/** A technique with its settings: evaluates the observables at x values. Thread-safe. */
@ConsumerType
public interface TechniqueModel {

    /** The x values the case file asks for: empty when it gives none, one value (0) for a steady technique. */
    double[] xValues();

    /**
     * The signals at the given x values.
     *
     * @return one array per signal column, each as long as {@code x}
     */
    double[][] evaluate(double[] x, FrequencyResponse response);

    /**
     * The heating frequencies at which {@link #evaluate} reads the response for these x values (3ω: twice each drive
     * frequency), for the geometry's {@link GeometryModel#cautions}; empty where the technique does not say (the
     * default), such as for a sum over many harmonics.
     */
    default double[] heatingFrequencies(double[] x) {
        return new double[0];
    }
}
