package lamella.fit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lamella.api.Block;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ParameterRef;
import lamella.api.Technique;

/** How a design value enters a model, and which signal a planned measurement fits. */
final class Designs {

    private Designs() {
    }

    /**
     * The model with a design variable at a value. A number replaces the key's value; for a list key (frequencies,
     * delays) the value moves the list's first or last point and the other points keep their places between the
     * ends — in ln for frequencies (keys ending {@code _hz}), linearly otherwise.
     */
    static CaseModel apply(CaseModel model, ParameterRef ref, String end, double value) throws InputException {
        ParameterRef local = ref.dataset() < 0 ? ref : new ParameterRef(ref.scope(), null, ref.key(), -1);
        if (end == null) {
            return model.with(local, value);
        }
        boolean geometry = ref.scope() == ParameterRef.Scope.GEOMETRY;
        Block block = geometry ? model.geometry() : model.measurement();
        Object raw = block.get(ref.key());
        if (!(raw instanceof List<?> list) || list.size() < 2) {
            throw InputException.at(block.pathOf(ref.key()), "a plan moving an end of " + ref.key() + " needs the"
                    + " case's list of at least two points, got " + (raw == null ? "none" : Block.describe(raw)));
        }
        double[] old = new double[list.size()];
        for (int i = 0; i < old.length; i++) {
            old[i] = (Double) list.get(i);
        }
        double first = old[0];
        double last = old[old.length - 1];
        double a = end.equals("first") ? value : first;
        double b = end.equals("last") ? value : last;
        if (Math.signum(b - a) != Math.signum(last - first) || a == b) {
            throw InputException.at(block.pathOf(ref.key()), "moving the " + end + " point of " + ref.key() + " to "
                    + value + " would reverse or collapse the list (it runs from " + first + " to " + last + ")");
        }
        boolean log = ref.key().endsWith("_hz");
        if (log && !(a > 0 && b > 0 && first > 0 && last > 0)) {
            throw InputException.at(block.pathOf(ref.key()), "frequencies must be positive");
        }
        List<Object> moved = new ArrayList<>();
        for (int i = 0; i < old.length; i++) {
            double v;
            if (i == 0) {
                v = a;
            } else if (i == old.length - 1) {
                v = b;
            } else if (log) {
                double t = Math.log(old[i] / first) / Math.log(last / first);
                v = a * Math.exp(t * Math.log(b / a));
            } else {
                double t = (old[i] - first) / (last - first);
                v = a + t * (b - a);
            }
            moved.add(v);
        }
        Map<String, Object> values = new LinkedHashMap<>(block.values());
        values.put(ref.key(), moved);
        Block changed = new Block(block.path(), values);
        return geometry ? new CaseModel(model.stack(), changed, model.measurement())
                : new CaseModel(model.stack(), model.geometry(), changed);
    }

    /** The signal a dataset fits: its own {@code signal}, else the technique's usual one. */
    static String signal(DatasetSpec d, Technique t) throws InputException {
        String signal = d.signal() != null ? d.signal() : Signals.usual(t.type()).orElseThrow(() ->
                InputException.at(d.path() + ".signal", "name the signal to fit; technique '" + t.type()
                        + "' gives " + String.join(", ", t.signalColumns())));
        if (!t.signalColumns().contains(signal)) {
            throw InputException.at(d.path() + ".signal", "technique '" + t.type() + "' has no signal '" + signal
                    + "'; it gives " + String.join(", ", t.signalColumns()));
        }
        return signal;
    }
}
