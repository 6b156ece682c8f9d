package lamella.api.guard;

import java.util.List;
import java.util.Optional;
import lamella.api.FrequencyResponse;
import lamella.api.InputException;
import lamella.api.ParameterSpec;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.Technique;
import lamella.api.TechniqueModel;

/**
 * A live technique as commands use it; like {@link GuardedGeometry}, a plug-in's exception, null or non-finite
 * signal becomes a {@link PluginFault} naming its type and bundle. A geometry's fault raised while the technique
 * evaluates passes through as the geometry's. Overrides every method of the interface, default methods included.
 */
public final class GuardedTechnique implements Technique {

    private final Technique plugin;
    private final String type;
    private final Blame blame;

    public GuardedTechnique(Technique plugin, PluginOrigin origin) {
        this.plugin = plugin;
        this.type = new Blame("a technique", origin).call("type()", plugin::type);
        this.blame = new Blame("technique '" + type + "'", origin);
    }

    public boolean guards(Technique t) {
        return plugin == t;
    }

    @Override
    public String type() {
        return type;
    }

    @Override
    public String summary() {
        return blame.call("summary()", plugin::summary);
    }

    @Override
    public List<ParameterSpec> parameters() {
        return blame.call("parameters()", plugin::parameters);
    }

    @Override
    public ResponseUnit requiredUnit() {
        return blame.call("requiredUnit()", plugin::requiredUnit);
    }

    @Override
    public Optional<String> xColumn() {
        return blame.call("xColumn()", plugin::xColumn);
    }

    @Override
    public Optional<String> xParameter() {
        return blame.call("xParameter()", plugin::xParameter);
    }

    @Override
    public List<String> signalColumns() {
        return blame.call("signalColumns()", plugin::signalColumns);
    }

    @Override
    public TechniqueModel bind(Parameters parameters) throws InputException {
        TechniqueModel model;
        try {
            model = plugin.bind(parameters);
        } catch (RuntimeException | LinkageError e) {
            throw blame.fault(e);
        }
        if (model == null) {
            throw blame.failed("bind() returned null", null);
        }
        List<String> columns = signalColumns();
        return new TechniqueModel() {
            @Override
            public double[] xValues() {
                return blame.call("xValues()", model::xValues);
            }

            @Override
            public double[][] evaluate(double[] x, FrequencyResponse response) {
                double[][] signals = blame.call("evaluate()", () -> model.evaluate(x, response));
                checkSignals(signals, x, columns);
                return signals;
            }

            @Override
            public double[] heatingFrequencies(double[] x) {
                return blame.call("heatingFrequencies()", () -> model.heatingFrequencies(x.clone())).clone();
            }
        };
    }

    /** One array per signal column, each as long as x, every value finite: what the CSV writer relies on. */
    private void checkSignals(double[][] signals, double[] x, List<String> columns) {
        if (signals.length != columns.size()) {
            throw blame.failed(signals.length + " signal arrays for the " + columns.size() + " columns " + columns,
                    null);
        }
        for (int c = 0; c < signals.length; c++) {
            if (signals[c] == null || signals[c].length != x.length) {
                throw blame.failed("column " + columns.get(c) + " does not have one value per x value (" + x.length
                        + ")", null);
            }
            for (int i = 0; i < x.length; i++) {
                if (!Double.isFinite(signals[c][i])) {
                    throw blame.failed("a non-finite " + columns.get(c) + " (" + signals[c][i] + ") at x = " + x[i],
                            null);
                }
            }
        }
    }
}
