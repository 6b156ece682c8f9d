package lamella.api;

/**
 * One technique measuring one geometry on one stack: the model signal, the unit every fit, sensitivity and
 * design is made of.
 */
public record Simulation(Technique technique, TechniqueModel measurement, GeometryModel geometry) {

    /** The signals at the x values of the measurement settings. */
    public SignalTable run() {
        return run(measurement.xValues());
    }

    /** The signals at given x values (for example those of a data file). */
    public SignalTable run(double[] x) {
        double[][] v = measurement.evaluate(x, geometry);
        return new SignalTable(technique.xColumn(), x, technique.signalColumns(), v);
    }
}
