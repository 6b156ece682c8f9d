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

    PreparedDataset(DatasetSpec spec, CaseModel model, String technique, String xColumn, String signal, double[] x,
                    double[] y, double[] dataSigma) {
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

    /** Whether a parameter of the fit reaches this dataset's inputs. */
    boolean uses(ParameterRef ref) {
        if (ref.scope() == ParameterRef.Scope.LAYER) {
            return true;
        }
        boolean own = (ref.scope() == ParameterRef.Scope.GEOMETRY ? spec.geometry() : spec.measurement()) != null;
        return ref.dataset() < 0 ? !own : ref.dataset() == spec.index();
    }

    /** The model inputs with the given parameters set. */
    CaseModel with(List<ParameterRef> refs, double[] values) throws InputException {
        CaseModel m = model;
        for (int i = 0; i < refs.size(); i++) {
            ParameterRef r = refs.get(i);
            if (uses(r)) {
                m = m.with(r.dataset() < 0 ? r : new ParameterRef(r.scope(), null, r.key(), -1), values[i]);
            }
        }
        return m;
    }

    /** The geometry's cautions for this dataset's x values with the given parameters set. */
    List<String> cautions(ModelCatalog catalog, List<ParameterRef> refs, double[] values) throws InputException {
        return with(refs, values).simulation(catalog).cautions(x);
    }

    /** The modelled signal at this dataset's x values. */
    double[] evaluate(ModelCatalog catalog, List<ParameterRef> refs, double[] values) throws InputException {
        Simulation s = with(refs, values).simulation(catalog);
        SignalTable t = s.run(x);
        return t.column(signal);
    }
}
