package lamella.ui.panels;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.ModelEvaluationException;
import lamella.api.SignalTable;
import lamella.api.Simulation;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.Scan;

/**
 * The data and the model of one curve, computed off the UI thread: the model on a smooth grid over the data's x
 * range (or at the case's own x values when there are no data).
 *
 * @param xColumn   x column name
 * @param technique the technique's type
 * @param signal    the signal shown
 * @param signals   every signal column the technique gives
 * @param dataX     measured x values, all scans (empty without data)
 * @param dataY     measured signal
 * @param modelX    model x values
 * @param modelY    model signal
 * @param dataName  the data file's name, empty without data
 */
record SignalCurve(String xColumn, String technique, String signal, List<String> signals, double[] dataX,
                   double[] dataY, double[] modelX, double[] modelY, String dataName) {

    /** Points of the model curve: enough for a smooth line over a few decades, few enough for a live update. */
    static final int MODEL_POINTS = 60;

    static Outcome<SignalCurve> compute(CaseDocument doc, int dataset, String wantedSignal, ModelCatalog catalog,
                                        List<DataImporter> importers, DataFiles files) {
        try {
            CaseModel model = CaseBlocks.model(doc, dataset);
            Simulation sim = model.simulation(catalog);
            Optional<String> xColumn = sim.technique().xColumn();
            if (xColumn.isEmpty()) {
                return Outcome.failed("technique '" + sim.technique().type() + "' gives one steady value, not a"
                        + " curve over x; its value is in the set-up panel");
            }
            List<String> signals = sim.technique().signalColumns();
            String signal = wantedSignal != null && signals.contains(wantedSignal) ? wantedSignal
                    : CaseBlocks.signal(doc, dataset).filter(signals::contains).orElse(usual(signals));
            double[] dataX = new double[0];
            double[] dataY = new double[0];
            String name = "";
            Optional<String> data = CaseBlocks.data(doc, dataset);
            if (data.isPresent()) {
                Path file = Path.of(data.get());
                Dataset d = files.read(file, importers);
                name = file.getFileName().toString();
                if (d.signalColumns().contains(signal)) {
                    List<double[]> xs = new ArrayList<>();
                    List<double[]> ys = new ArrayList<>();
                    for (Scan s : d.scans()) {
                        xs.add(s.x());
                        ys.add(s.signals().get(signal));
                    }
                    dataX = concat(xs);
                    dataY = concat(ys);
                }
            }
            boolean log = logarithmic(xColumn.get());
            double[] x = dataX.length > 1 ? grid(dataX, log) : sim.measurement().xValues();
            if (x.length == 1 && !log && x[0] > 0) {
                // one power: the steady rise is drawn as the line from no power to it
                x = grid(new double[] {0, x[0]}, false);
            }
            if (x.length == 0) {
                return Outcome.failed("the measurement block lists no x values (" + sim.technique().xParameter()
                        .orElse("x") + ") and there are no data to take them from; give them in the set-up panel");
            }
            SignalTable t = sim.run(x);
            double[] modelY = t.column(signal).clone();
            // the fit multiplies the signal of a dataset that names a gain by it; the curve is drawn the same way (a
            // phase or a ratio carries no gain)
            double gain = signal.endsWith("_deg") || signal.equals("ratio") ? 1.0 : CaseBlocks.gain(doc, dataset);
            for (int i = 0; i < modelY.length; i++) {
                modelY[i] *= gain;
            }
            return Outcome.of(new SignalCurve(xColumn.get(), sim.technique().type(), signal, signals, dataX, dataY,
                    x, modelY, name));
        } catch (InputException e) {
            return Outcome.failed(e.getMessage());
        } catch (ModelEvaluationException e) {
            return Outcome.failed(e.getMessage());
        }
    }

    /** Frequencies sweep decades and TDTR ratios are read over log delay (common practice, no source). */
    static boolean logarithmic(String xColumn) {
        return xColumn.endsWith("_hz") || xColumn.equals("delay_s");
    }

    /** The signal a user most often looks at: the TDTR ratio, the FDTR and 3ω phase, the SSTR rise, or the first one. */
    private static String usual(List<String> signals) {
        for (String s : List.of("ratio", "phase_deg", "temperature_rise_k")) {
            if (signals.contains(s)) {
                return s;
            }
        }
        return signals.get(0);
    }

    private static double[] grid(double[] data, boolean log) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : data) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        boolean logGrid = log && lo > 0;
        double a = logGrid ? Math.log(lo) : lo;
        double b = logGrid ? Math.log(hi) : hi;
        double[] x = new double[MODEL_POINTS];
        for (int i = 0; i < x.length; i++) {
            double t = a + (b - a) * i / (x.length - 1);
            x[i] = logGrid ? Math.exp(t) : t;
        }
        x[0] = lo;
        x[x.length - 1] = hi;
        return x;
    }

    private static double[] concat(List<double[]> parts) {
        int n = parts.stream().mapToInt(p -> p.length).sum();
        double[] out = new double[n];
        int at = 0;
        for (double[] p : parts) {
            System.arraycopy(p, 0, out, at, p.length);
            at += p.length;
        }
        return out;
    }
}
