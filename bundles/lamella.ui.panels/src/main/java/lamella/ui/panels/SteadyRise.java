package lamella.ui.panels;

import java.util.Optional;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.ModelEvaluationException;
import lamella.api.SelfHeating;
import lamella.api.Simulation;

/**
 * The steady temperature rise that an absorbed power causes: {@link Simulation#steadyRisePerWatt()} (the geometry's
 * response at 0 Hz, as SSTR measures it; experiment plans use the same) times the power. Above 10 K it deserves a caution, above 50 K a warning — thresholds of common practice,
 * no source: by then temperature-dependent properties have moved noticeably from their room-temperature values.
 */
final class SteadyRise {

    static final double CAUTION_K = 10;
    static final double WARNING_K = 50;

    private SteadyRise() {
    }

    /**
     * The rise per watt and, when the case asks for self-heating, the consistent state at the case's absorbed power.
     *
     * @param perWatt the steady rise in K per W of absorbed power (with the case's self-heated values, if any)
     * @param heating the self-heating state, when the case has a {@code self_heating} block
     */
    record Estimate(double perWatt, Optional<SelfHeating.Outcome> heating) {
    }

    /** The rise in K per W of absorbed power. */
    static Outcome<Estimate> perWatt(CaseModel model, ModelCatalog catalog) {
        try {
            Simulation sim = model.simulation(catalog);
            double perWatt = sim.steadyRisePerWatt();
            if (Double.isNaN(perWatt)) {
                return Outcome.failed("a line heater's response is per unit length; its steady rise is not estimated"
                        + " here");
            }
            return Outcome.of(new Estimate(perWatt, sim.heating()));
        } catch (InputException e) {
            return Outcome.failed(e.getMessage());
        } catch (ModelEvaluationException e) {
            return Outcome.failed("the steady response cannot be evaluated: " + e.getMessage());
        }
    }
}
