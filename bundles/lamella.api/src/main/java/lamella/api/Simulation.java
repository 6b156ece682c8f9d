package lamella.api;

import java.util.List;
import java.util.Optional;

/**
 * One technique measuring one geometry on one stack: the model signal, the unit every fit, sensitivity and
 * design is made of. {@code heating} is the consistent self-heating state the geometry was bound with, when the
 * case asks for it.
 */
public record Simulation(Technique technique, TechniqueModel measurement, GeometryModel geometry,
                         Optional<SelfHeating.Outcome> heating) {

    /** A simulation without self-heating. */
    public Simulation(Technique technique, TechniqueModel measurement, GeometryModel geometry) {
        this(technique, measurement, geometry, Optional.empty());
    }

    /** The signals at the x values of the measurement settings. */
    public SignalTable run() {
        return run(measurement.xValues());
    }

    /**
     * The steady temperature rise per watt of absorbed power, K/W: the geometry's response at 0 Hz, as SSTR measures
     * it. The one estimate of pump heating that the workbench's set-up and experiment plans show; NaN where the
     * geometry's response is not per watt (a line heater's is per unit length).
     *
     * @throws ModelEvaluationException when the stack has no steady state at 0 Hz
     */
    public double steadyRisePerWatt() {
        if (technique.requiredUnit() != ResponseUnit.KELVIN_PER_WATT) {
            return Double.NaN;
        }
        double[] h = new double[2];
        geometry.at(0, h);
        if (!Double.isFinite(h[0])) {
            throw new ModelEvaluationException("the steady response at 0 Hz is not finite for this stack");
        }
        return h[0];
    }

    /**
     * The geometry's cautions for the heating frequencies these x values are read at (for example a 3ω frequency
     * range outside the usual penetration-depth band), each one sentence.
     */
    public List<String> cautions(double[] x) {
        return geometry.cautions(measurement.heatingFrequencies(x));
    }

    /** The signals at given x values (for example those of a data file). */
    public SignalTable run(double[] x) {
        double[][] v = measurement.evaluate(x, geometry);
        return new SignalTable(technique.xColumn(), x, technique.signalColumns(), v);
    }
}
