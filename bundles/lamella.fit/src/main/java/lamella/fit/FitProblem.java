package lamella.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.ModelEvaluationException;
import lamella.api.ParameterRef;
import lamella.api.Sample;
import lamella.api.SelfHeating;
import lamella.api.Simulation;
import lamella.api.Technique;

/**
 * The datasets, free and uncertain inputs of one fit, and the model of all datasets at once: the concatenation of
 * every dataset's modelled signal divided by its σ, as a function of the free inputs (in their fitting variables u)
 * and the uncertain inputs (in their natural units).
 */
final class FitProblem {

    final List<PreparedDataset> datasets;
    final List<FreeInput> free;
    final List<UncertainInput> uncertain;
    final FitSpec spec;
    private final ModelCatalog catalog;
    private final List<ParameterRef> refs = new ArrayList<>();
    private final int points;

    private FitProblem(List<PreparedDataset> datasets, FitSpec spec, ModelCatalog catalog) {
        this.datasets = List.copyOf(datasets);
        this.free = spec.free();
        this.uncertain = spec.uncertain();
        this.spec = spec;
        this.catalog = catalog;
        free.forEach(f -> refs.add(f.ref()));
        uncertain.forEach(u -> refs.add(u.ref()));
        this.points = datasets.stream().mapToInt(PreparedDataset::size).sum();
    }

    static FitProblem of(CaseDocument doc, FitSpec spec, ModelCatalog catalog) throws InputException {
        List<ParameterRef> named = new ArrayList<>();
        spec.free().forEach(f -> named.add(f.ref()));
        spec.uncertain().forEach(u -> named.add(u.ref()));
        List<PreparedDataset> prepared = new ArrayList<>();
        for (DatasetSpec d : spec.datasets()) {
            prepared.add(prepare(doc, d, catalog, spec, named));
        }
        FitProblem p = new FitProblem(prepared, spec, catalog);
        for (FreeInput f : spec.free()) {
            if (prepared.stream().noneMatch(d -> d.uses(f.ref()))) {
                throw InputException.at(f.path(), f.ref() + " reaches no dataset");
            }
        }
        if (p.points <= spec.free().size()) {
            throw InputException.at("fit.free", spec.free().size() + " free inputs but only " + p.points
                    + " data points; a fit needs more points than unknowns");
        }
        p.checkEvaluates();
        return p;
    }

    private static PreparedDataset prepare(CaseDocument doc, DatasetSpec d, ModelCatalog catalog, FitSpec spec,
                                           List<ParameterRef> named)
            throws InputException {
        FitSpec.Weighting weighting = spec.weighting();
        Sample sample = d.sampleIn(doc);
        Block geometry = d.geometry() != null ? d.geometry() : sample.geometryOr(doc.geometry());
        Block measurement = d.measurement() != null ? d.measurement() : doc.measurement();
        List<ParameterRef> own = named.stream().filter(r -> r.scope() == ParameterRef.Scope.LAYER
                && (r.sample() == null || r.sample().equals(sample.name()))).map(ParameterRef::local).toList();
        CaseModel model = new CaseModel(sample.stack(), geometry, measurement).apartFor(own);
        Simulation sim = model.simulation(catalog);
        Technique t = sim.technique();
        String signal = signalOf(d, t);
        if (d.gain() != null && FitBlockReader.GAINLESS_SIGNALS.contains(signal)) {
            throw InputException.at(d.path() + ".gain", "a gain multiplies a signal, and " + signal + " carries"
                    + " none (a phase or ratio does not scale with the detector); leave \"gain\" out or fit an"
                    + " amplitude-like signal (" + String.join(", ", t.signalColumns().stream()
                    .filter(c -> !FitBlockReader.GAINLESS_SIGNALS.contains(c)).toList()) + ")");
        }
        DataTable table = DataTable.read(d.file());
        String xColumn = t.xColumn().orElseThrow(() -> InputException.at(d.path(), "technique '" + t.type()
                + "' has no x axis; its data cannot be fitted as a curve"));
        for (String need : List.of(xColumn, signal)) {
            if (!table.has(need)) {
                throw new InputException(d.file(), null, 1, "no column '" + need + "' for " + d.path()
                        + "; the file has " + String.join(", ", table.names()));
            }
        }
        table.checkX(xColumn);
        if (d.weighting() != null) {
            weighting = d.weighting();
        }
        boolean[] keep = d.rows().rows(table, xColumn);
        double[] x = RowSelection.select(table.column(xColumn), keep);
        if (x.length == 0) {
            throw InputException.at(d.path(), "no row of " + d.given() + " is left to fit: its " + table.rows()
                    + " rows are all outside x_range, inside an exclude range, or marked excluded or outlier");
        }
        double[] sigma = null;
        String sigmaColumn = "sigma_" + signal;
        if (weighting != FitSpec.Weighting.RESIDUALS && table.has(sigmaColumn)) {
            double[] all = table.column(sigmaColumn);
            for (int i = 0; i < all.length; i++) {
                if (keep[i] && !(all[i] > 0)) {
                    throw new InputException(d.file(), null, table.lineOf(i), "column '" + sigmaColumn
                            + "': a standard deviation must be positive, got " + all[i]);
                }
            }
            sigma = RowSelection.select(all, keep);
        } else if (weighting == FitSpec.Weighting.DATA) {
            throw new InputException(d.file(), null, 1, "the fit asks for weights from the data, but the file has"
                    + " no column '" + sigmaColumn + "'");
        }
        return new PreparedDataset(d, model, t.type(), xColumn, signal, x,
                RowSelection.select(table.column(signal), keep), sigma,
                d.gain() != null ? spec.gains().get(d.gain()) : 1.0);
    }

    /** The dataset's signal column, or the technique's usual one, checked against what the technique gives. */
    static String signalOf(DatasetSpec d, Technique t) throws InputException {
        String signal = d.signal() != null ? d.signal() : Signals.usual(t.type()).orElseThrow(() ->
                InputException.at(d.path() + ".signal", "name the signal to fit; technique '" + t.type()
                        + "' gives " + String.join(", ", t.signalColumns())));
        if (!t.signalColumns().contains(signal)) {
            throw InputException.at(d.path() + ".signal", "technique '" + t.type() + "' has no signal '" + signal
                    + "'; it gives " + String.join(", ", t.signalColumns()));
        }
        return signal;
    }

    /** A problem of datasets already prepared (one curve of a map), without the checks {@link #of} makes. */
    static FitProblem prepared(List<PreparedDataset> datasets, FitSpec spec, ModelCatalog catalog) {
        return new FitProblem(datasets, spec, catalog);
    }

    /** Fails early, with the case's words, when the model cannot be evaluated at the starting point. */
    void checkEvaluates() throws InputException {
        double[] v = startValues();
        for (PreparedDataset d : datasets) {
            try {
                d.evaluate(catalog, refs, v);
            } catch (ModelEvaluationException e) {
                throw InputException.at(d.spec.path(), "the model cannot be evaluated at the starting values: "
                        + e.getMessage());
            }
        }
    }

    /** What a path of this fit moves, in words for its labels, in the first dataset whose sample it reaches. */
    String quantity(ParameterRef ref) {
        return datasets.stream().filter(d -> d.uses(ref)).findFirst().orElse(datasets.get(0)).model
                .quantity(ref.local());
    }

    int points() {
        return points;
    }

    List<ParameterRef> refs() {
        return refs;
    }

    /** Free inputs at their initial values followed by uncertain inputs at theirs. */
    double[] startValues() {
        double[] v = new double[refs.size()];
        for (int i = 0; i < free.size(); i++) {
            v[i] = free.get(i).initial();
        }
        for (int k = 0; k < uncertain.size(); k++) {
            v[free.size() + k] = uncertain.get(k).value();
        }
        return v;
    }

    /** The natural values of all inputs for fitting variables u and uncertain values. */
    double[] values(double[] u, double[] uncertainValues) {
        double[] v = new double[refs.size()];
        for (int i = 0; i < free.size(); i++) {
            v[i] = free.get(i).toP(u[i]);
        }
        System.arraycopy(uncertainValues, 0, v, free.size(), uncertainValues.length);
        return v;
    }

    double[] nominalUncertain() {
        double[] v = new double[uncertain.size()];
        for (int k = 0; k < v.length; k++) {
            v[k] = uncertain.get(k).value();
        }
        return v;
    }

    /** The modelled signal of every dataset, concatenated (not weighted). */
    double[] model(double[] values) {
        double[] out = new double[points];
        int at = 0;
        for (PreparedDataset d : datasets) {
            double[] m;
            try {
                m = d.evaluate(catalog, refs, values);
            } catch (InputException e) {
                throw new ModelEvaluationException("the fit reached inputs the model rejects (" + freeValues(values)
                        + "): " + e.getMessage(), e);
            } catch (ModelEvaluationException e) {
                throw new ModelEvaluationException("the model cannot be evaluated where the fit went ("
                        + freeValues(values) + "): " + e.getMessage() + "; give the free inputs bounds (min and max"
                        + " in fit.free) or start values nearer the answer", e);
            }
            System.arraycopy(m, 0, out, at, m.length);
            at += m.length;
        }
        return out;
    }

    /** The free inputs at these values, as the case names them: "layers.film.thermal_conductivity = 1.2e-33". */
    String freeValues(double[] values) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < free.size(); i++) {
            b.append(i == 0 ? "" : ", ").append(free.get(i).ref()).append(" = ")
                    .append(String.format(Locale.ROOT, "%.4g", values[i]));
        }
        return b.toString();
    }

    /**
     * The self-heating state of one dataset at these input values (the rise depends on them, so it is settled anew
     * at every evaluation); empty when the case asks for none.
     */
    Optional<SelfHeating.Outcome> heating(PreparedDataset d, double[] values) {
        try {
            return d.with(refs, values).simulation(catalog).heating();
        } catch (InputException e) {
            throw new ModelEvaluationException("the fit reached inputs the model rejects: " + e.getMessage(), e);
        }
    }

    /**
     * Every dataset's geometry cautions at these values (a 3ω frequency range outside the usual band, judged with the
     * fitted conductivities), each prefixed by the dataset it concerns.
     */
    List<String> cautions(double[] values) {
        List<String> out = new ArrayList<>();
        for (PreparedDataset d : datasets) {
            try {
                for (String c : d.cautions(catalog, refs, values)) {
                    out.add(String.format(Locale.ROOT, "dataset %d (%s): %s", d.spec.index(), d.spec.given(), c));
                }
            } catch (InputException e) {
                throw new ModelEvaluationException("the fit reached inputs the model rejects: " + e.getMessage(), e);
            }
        }
        return out;
    }

    /** The measured signal of every dataset, concatenated. */
    double[] data() {
        double[] out = new double[points];
        int at = 0;
        for (PreparedDataset d : datasets) {
            System.arraycopy(d.y, 0, out, at, d.size());
            at += d.size();
        }
        return out;
    }
}
