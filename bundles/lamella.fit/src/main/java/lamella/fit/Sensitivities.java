package lamella.fit;

import java.util.ArrayList;
import java.util.List;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.ParameterRef;
import lamella.api.fit.SensitivityTable;

/**
 * S = ∂ln|s|/∂ln p — or ∂φ/∂ln p in degrees for a phase — of one signal over x, for every numeric input, by central
 * differences of ±0.1 % in p (common practice, no source). A conductivity stated once is perturbed in every
 * direction at once, as the fit moves it.
 */
final class Sensitivities {

    private static final double STEP = 1e-3;

    private Sensitivities() {
    }

    static SensitivityTable of(CaseModel model, ModelCatalog catalog, String xColumn, double[] x, String signal)
            throws InputException {
        boolean phase = Signals.phaseLike(signal);
        List<ParameterRef> refs = model.numericInputs();
        double[][] values = new double[refs.size()][];
        double dLn = Math.log1p(STEP) - Math.log1p(-STEP);
        for (int j = 0; j < refs.size(); j++) {
            ParameterRef r = refs.get(j);
            double p = model.value(r, r.toString());
            double[] up = model.with(r, p * (1 + STEP)).simulation(catalog).run(x).column(signal);
            double[] down = model.with(r, p * (1 - STEP)).simulation(catalog).run(x).column(signal);
            double[] s = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                s[i] = phase ? (up[i] - down[i]) / dLn
                        : (Math.log(Math.abs(up[i])) - Math.log(Math.abs(down[i]))) / dLn;
            }
            values[j] = s;
        }
        List<String> quantities = new ArrayList<>();
        refs.forEach(r -> quantities.add(model.quantity(r)));
        return new SensitivityTable(xColumn, x.clone(), signal, phase, refs, quantities, values);
    }
}
