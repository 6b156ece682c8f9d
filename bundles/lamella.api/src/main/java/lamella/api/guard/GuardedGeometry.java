package lamella.api.guard;

import java.util.List;
import java.util.concurrent.CancellationException;
import lamella.api.GeometryModel;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.ParameterSpec;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.StackKernel;

/**
 * A live geometry as commands use it: every call goes to the plug-in, and whatever it throws or returns that is
 * not a usable answer (an exception, null, NaN or ∞) becomes a {@link PluginFault} naming its type and bundle, so
 * a faulty plug-in fails one run with a message instead of the process. Overrides every method of the interface,
 * default methods included, so that none silently bypasses the plug-in.
 */
public final class GuardedGeometry implements HeatingGeometry {

    private final HeatingGeometry plugin;
    private final String type;
    private final Blame blame;

    /** Asks the plug-in for its type once: a case file selects it by that name, and errors quote it. */
    public GuardedGeometry(HeatingGeometry plugin, PluginOrigin origin) {
        this.plugin = plugin;
        this.type = new Blame("a geometry", origin).call("type()", plugin::type);
        this.blame = new Blame("geometry '" + type + "'", origin);
    }

    public boolean guards(HeatingGeometry g) {
        return plugin == g;
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
    public ResponseUnit unit() {
        return blame.call("unit()", plugin::unit);
    }

    @Override
    public GeometryModel bind(Parameters parameters, StackKernel stack) throws InputException {
        GeometryModel model;
        try {
            model = plugin.bind(parameters, stack);
        } catch (RuntimeException | LinkageError e) {
            throw blame.fault(e);
        }
        if (model == null) {
            throw blame.failed("bind() returned null", null);
        }
        return new GeometryModel() {
            @Override
            public void at(double frequencyHz, double[] out) {
                if (Thread.currentThread().isInterrupted()) {
                    // The caller's thread was asked to stop: every geometry stops between frequencies, whether or
                    // not its own code looks at the interrupt.
                    throw new CancellationException("the model evaluation was cancelled");
                }
                try {
                    model.at(frequencyHz, out);
                } catch (RuntimeException | LinkageError e) {
                    throw blame.fault(e);
                }
                if (!Double.isFinite(out[0]) || !Double.isFinite(out[1])) {
                    throw blame.failed("a non-finite response (" + out[0] + ", " + out[1] + ") at " + frequencyHz
                            + " Hz", null);
                }
            }

            @Override
            public List<String> cautions(double[] heatingFrequenciesHz) {
                return blame.call("cautions()", () -> List.copyOf(model.cautions(heatingFrequenciesHz.clone())));
            }
        };
    }
}
