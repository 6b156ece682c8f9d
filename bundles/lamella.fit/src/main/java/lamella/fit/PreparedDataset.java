package lamella.fit;

import java.util.List;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.ParameterRef;
import lamella.api.SignalTable;
import lamella.api.Simulation;

/**
 * A dataset ready to fit: its model inputs (the shared stack with its own or the case's geometry and measurement),
 * its x values and measured signal, and the σ column when the data have one.
 */
final class PreparedDataset {

    final DatasetSpec spec;
    final CaseModel model;
    final String technique;
    final String xColumn;
    final String signal;
    final double[] x;
    final double[] y;
    final double[] dataSigma;
    /** The value of its gain where the fit holds it fixed (1 without a gain). */
    final double gain;

    PreparedDataset(DatasetSpec spec, CaseModel model, String technique, String xColumn, String signal, double[] x,
                    double[] y, double[] dataSigma) {
        this(spec, model, technique, xColumn, signal, x, y, dataSigma, 1.0);
    }

    PreparedDataset(DatasetSpec spec, CaseModel model, String technique, String xColumn, String signal, double[] x,
                    double[] y, double[] dataSigma, double gain) {
        this.gain = gain;
        this.spec = spec;
        this.model = model;
        this.technique = technique;
        this.xColumn = xColumn;
        this.signal = signal;
        this.x = x;
        this.y = y;
        this.dataSigma = dataSigma;
    }

    int size() {
        return x.length;
    }

    /**
     * Whether a parameter of the fit reaches this dataset's inputs: a layer path without a sample reaches every
     * dataset whose sample has the layer, one with a sample only that sample's; a geometry path reaches the
     * datasets that use the block it names (the dataset's own, its sample's own, or the case's); a gain the
     * datasets that name it.
     */
    boolean uses(ParameterRef ref) {
        String sample = spec.sample() != null ? spec.sample().name() : "";
        switch (ref.scope()) {
            case LAYER:
                return (ref.sample() == null || ref.sample().equals(sample))
                        && model.stack().layer(ref.layer()).isPresent();
            case GAIN:
                return ref.key().equals(spec.gain());
            default:
                break;
        }
        boolean geometry = ref.scope() == ParameterRef.Scope.GEOMETRY;
        boolean own = (geometry ? spec.geometry() : spec.measurement()) != null;
        if (ref.dataset() >= 0) {
            return ref.dataset() == spec.index();
        }
        boolean sampleOwn = geometry && spec.sample() != null && spec.sample().geometry() != null;
        if (ref.sample() != null) {
            return !own && sampleOwn && ref.sample().equals(sample);
        }
        return !own && !sampleOwn;
    }

    /** The model inputs with the given parameters set (a gain is no input of the model: see {@link #evaluate}). */
    CaseModel with(List<ParameterRef> refs, double[] values) throws InputException {
        CaseModel m = model;
        for (int i = 0; i < refs.size(); i++) {
            ParameterRef r = refs.get(i);
            if (r.scope() != ParameterRef.Scope.GAIN && uses(r)) {
                m = m.with(r.local(), values[i]);
            }
        }
        return m;
    }

    /** The geometry's cautions for this dataset's x values with the given parameters set. */
    List<String> cautions(ModelCatalog catalog, List<ParameterRef> refs, double[] values) throws InputException {
        return with(refs, values).simulation(catalog).cautions(x);
    }

    /** The modelled signal at this dataset's x values, times its gain. */
    double[] evaluate(ModelCatalog catalog, List<ParameterRef> refs, double[] values) throws InputException {
        Simulation s = with(refs, values).simulation(catalog);
        SignalTable t = s.run(x);
        double[] column = t.column(signal);
        double g = gain;
        for (int i = 0; i < refs.size(); i++) {
            if (refs.get(i).scope() == ParameterRef.Scope.GAIN && uses(refs.get(i))) {
                g = values[i];
            }
        }
        if (g == 1.0) {
            return column;
        }
        double[] out = new double[column.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = g * column[i];
        }
        return out;
    }
}
