package lamella.report;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import lamella.api.Block;
import lamella.api.BottomBoundary;
import lamella.api.CaseDocument;
import lamella.api.Layer;
import lamella.api.ParameterRef;
import lamella.api.Stack;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.MonteCarloSummary;
import lamella.api.fit.SensitivityTable;

/**
 * An invented fit outcome for rendering tests: made-up curves and numbers with no physics behind them, shaped like
 * a real outcome (an FDTR phase dataset, a TDTR ratio dataset, three parameters, a budget, Monte Carlo and one
 * warning). Nothing here is a check value of Lamella's physics.
 */
final class SyntheticFit {

    static final String WARNING = "transducer.conductance_below_w_m2k and film.k_through_w_mk are strongly"
            + " correlated (r = 0.93): read them together";
    static final String DESCRIPTION = "Invented film <test> on an invented substrate";

    static final ParameterRef FILM_K = ParameterRef.layer("film", "k_through_w_mk");
    static final ParameterRef TRANSDUCER_G = ParameterRef.layer("transducer", "conductance_below_w_m2k");
    static final ParameterRef PUMP_RADIUS = ParameterRef.geometry("pump_radius_m");
    static final ParameterRef TRANSDUCER_D = ParameterRef.layer("transducer", "thickness_m");
    static final ParameterRef TRANSDUCER_C = ParameterRef.layer("transducer", "heat_capacity_j_m3k");

    static final int PHASE_POINTS = 14;
    static final int RATIO_POINTS = 20;

    private SyntheticFit() {
    }

    static CaseDocument caseDocument() {
        Stack stack = new Stack(List.of(
                new Layer("transducer", 9.0e-8, 200, 200, 200, 2.45e6, 1.2e8),
                new Layer("film", 3.5e-7, 1.4, 1.4, 1.4, 1.65e6, 3.0e8),
                Layer.isotropicInPlane("substrate", Double.POSITIVE_INFINITY, 140, 140, 1.63e6)),
                BottomBoundary.SEMI_INFINITE);
        Block geometry = block("geometry", "type", "gaussian", "pump_radius_m", 6.0e-6, "probe_radius_m", 4.0e-6);
        Block measurement = block("measurement", "type", "fdtr", "frequencies_hz",
                List.of(1e4, 2e4, 5e4, 1e5, 2e5, 5e5, 1e6));
        Block dataset0 = block("fit.datasets[0]", "data", "invented-phase.csv");
        Block dataset1 = block("fit.datasets[1]", "data", "invented-ratio.csv", "measurement",
                block("fit.datasets[1].measurement", "type", "tdtr", "modulation_hz", 9.0e6));
        Block fit = block("fit", "free", List.of(FILM_K.toString(), TRANSDUCER_G.toString(), PUMP_RADIUS.toString()),
                "datasets", List.of(dataset0, dataset1));
        Block root = block("", "description", DESCRIPTION, "fit", fit);
        return new CaseDocument(Path.of("cases", "invented-film.json"), stack, geometry, measurement, root, Map.of());
    }

    static FitOutcome outcome() {
        List<FittedParameter> parameters = List.of(
                new FittedParameter(FILM_K, "through-plane Λz", 1.0, 1.4, 0.07, 0.031, false, true),
                new FittedParameter(TRANSDUCER_G, "", 1.0e8, 1.2e8, 1.5e7, 8.0e6, false, true),
                new FittedParameter(PUMP_RADIUS, "", 6.0e-6, 6.0e-6, 2.5e-7, 1.0e-7, true, true));
        double[][] correlation = {{1, 0.93, -0.2}, {0.93, 1, -0.1}, {-0.2, -0.1, 1}};
        List<BudgetLine> budget = List.of(
                new BudgetLine(null, "", 0, new double[]{0.031, 8.0e6, 1.0e-7}),
                new BudgetLine(TRANSDUCER_D, "", 2.0e-9, new double[]{0.055, 1.1e7, 2.0e-7}),
                new BudgetLine(TRANSDUCER_C, "", 7.0e4, new double[]{0.03, 6.0e6, 1.1e-7}));
        MonteCarloSummary mc = new MonteCarloSummary(200, 3, new double[]{1.41, 1.21e8, 6.01e-6},
                new double[]{0.075, 1.6e7, 2.6e-7},
                new double[][]{{1.26, 1.33, 1.41, 1.48, 1.56}, {0.9e8, 1.05e8, 1.21e8, 1.37e8, 1.52e8},
                        {5.5e-6, 5.75e-6, 6.01e-6, 6.27e-6, 6.5e-6}},
                new double[]{1.07, 1.07, 1.04});
        return new FitOutcome(parameters, correlation, List.of(phaseDataset(), ratioDataset()), budget,
                Optional.of(mc), List.of(WARNING), 412, 1.08, true);
    }

    static List<SensitivityTable> sensitivities() {
        List<ParameterRef> refs = List.of(FILM_K, TRANSDUCER_G, PUMP_RADIUS, TRANSDUCER_D);
        List<String> quantities = List.of("through-plane Λz", "", "", "");
        DatasetFit phase = phaseDataset();
        DatasetFit ratio = ratioDataset();
        return List.of(
                new SensitivityTable(phase.xColumn(), phase.x(), phase.signal(), true, refs, quantities,
                        curves(phase.x(), 1e4, new double[]{-4, 2.5, 1.2, -0.8})),
                new SensitivityTable(ratio.xColumn(), ratio.x(), ratio.signal(), false, refs, quantities,
                        curves(ratio.x(), 1e-10, new double[]{0.6, -0.3, 0.2, -0.45})));
    }

    /** Invented: a phase falling by 10° per decade, with a fixed wobble standing in for noise. */
    static DatasetFit phaseDataset() {
        double[] f = logSpaced(1e4, 2e7, PHASE_POINTS);
        double[] model = new double[f.length];
        double[] data = new double[f.length];
        double[] sigma = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            model[i] = -30 - 10 * Math.log10(f[i] / 1e4);
            data[i] = model[i] + 0.3 * Math.sin(3.1 * i);
            sigma[i] = 0.3;
        }
        return new DatasetFit(0, "invented-phase.csv", "fdtr", "phase_deg", "frequency_hz", f, data, sigma, model,
                true, 0.95);
    }

    /** Invented: a ratio falling as a power of the delay, with a fixed relative wobble. */
    static DatasetFit ratioDataset() {
        double[] t = logSpaced(1e-10, 4e-9, RATIO_POINTS);
        double[] model = new double[t.length];
        double[] data = new double[t.length];
        double[] sigma = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            model[i] = 3.0 * Math.pow(t[i] / 1e-10, -0.3);
            data[i] = model[i] * (1 + 0.01 * Math.sin(2.3 * i));
            sigma[i] = 0.02;
        }
        return new DatasetFit(1, "invented-ratio.csv", "tdtr", "ratio", "delay_s", t, data, sigma, model, false,
                1.21);
    }

    private static double[][] curves(double[] x, double x0, double[] scale) {
        double[][] v = new double[scale.length][x.length];
        for (int p = 0; p < scale.length; p++) {
            for (int i = 0; i < x.length; i++) {
                v[p][i] = scale[p] * Math.tanh(Math.log10(x[i] / x0) / 2 + 0.2 * p);
            }
        }
        return v;
    }

    private static double[] logSpaced(double from, double to, int n) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = from * Math.pow(to / from, i / (n - 1.0));
        }
        return x;
    }

    private static Block block(String path, Object... keysAndValues) {
        Map<String, Object> values = new LinkedHashMap<>();
        for (int i = 0; i < keysAndValues.length; i += 2) {
            values.put((String) keysAndValues[i], keysAndValues[i + 1]);
        }
        return new Block(path, values);
    }
}
