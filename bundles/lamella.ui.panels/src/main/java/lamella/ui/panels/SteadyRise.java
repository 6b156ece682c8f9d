package lamella.ui.panels;

import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.ModelEvaluationException;
import lamella.api.ResponseUnit;
import lamella.api.Simulation;

/**
 * The steady temperature rise that an absorbed power causes: the geometry's response at 0 Hz (as SSTR measures
 * it) times the power. Above 10 K it deserves a caution, above 50 K a warning — thresholds of common practice,
 * no source: by then temperature-dependent properties have moved noticeably from their room-temperature values.
 */
final class SteadyRise {

    static final double CAUTION_K = 10;
    static final double WARNING_K = 50;

    private SteadyRise() {
    }

    /** The rise in K per W of absorbed power. */
    static Outcome<Double> perWatt(CaseModel model, ModelCatalog catalog) {
        try {
            Simulation sim = model.simulation(catalog);
            if (catalog.geometry(String.valueOf(model.geometry().get("type"))).map(g -> g.unit())
                    .orElse(ResponseUnit.KELVIN_PER_WATT) != ResponseUnit.KELVIN_PER_WATT) {
                return Outcome.failed("a line heater's response is per unit length; its steady rise is not estimated"
                        + " here");
            }
            double[] h = new double[2];
            sim.geometry().at(0, h);
            if (!Double.isFinite(h[0])) {
                return Outcome.failed("the steady response at 0 Hz is not finite for this stack");
            }
            return Outcome.of(h[0]);
        } catch (InputException e) {
            return Outcome.failed(e.getMessage());
        } catch (ModelEvaluationException e) {
            return Outcome.failed("the steady response cannot be evaluated: " + e.getMessage());
        }
    }
}
