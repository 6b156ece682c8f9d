package lamella.fit;

import java.util.ArrayList;
import java.util.List;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.ParameterRef;
import lamella.api.Technique;
import lamella.api.fit.CurveFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.Progress;

/**
 * A case's fit rules applied to one curve at a time (see {@link CurveFit}): the case's stack, geometry and
 * measurement, bound once; per curve a one-dataset problem fitted in the calling thread, its Jacobian columns one
 * after another, so that the caller's threads each fit their own curves.
 */
final class CurveFitter implements CurveFit {

    private final FitSpec spec;
    private final ModelCatalog catalog;
    private final CaseModel model;
    private final String technique;
    private final String xColumn;
    private final String signal;
    private final DatasetSpec curve;
    private final List<ParameterRef> free = new ArrayList<>();
    private final List<String> quantities = new ArrayList<>();

    CurveFitter(CaseDocument doc, FitSpec spec, DatasetSpec curve, ModelCatalog catalog) throws InputException {
        this.spec = spec;
        this.catalog = catalog;
        this.curve = curve;
        List<ParameterRef> named = new ArrayList<>();
        spec.free().forEach(f -> named.add(f.ref()));
        spec.uncertain().forEach(u -> named.add(u.ref()));
        this.model = new CaseModel(doc.stack(), doc.geometry(), doc.measurement()).apartFor(named);
        Technique t = model.simulation(catalog).technique();
        this.technique = t.type();
        this.signal = FitProblem.signalOf(curve, t);
        this.xColumn = t.xColumn().orElseThrow(() -> InputException.at(curve.path(), "technique '" + t.type()
                + "' has no x axis; its data cannot be fitted as curves"));
        for (FreeInput f : spec.free()) {
            free.add(f.ref());
            quantities.add(model.quantity(f.ref()));
        }
    }

    @Override
    public List<ParameterRef> free() {
        return List.copyOf(free);
    }

    @Override
    public List<String> quantities() {
        return List.copyOf(quantities);
    }

    @Override
    public String xColumn() {
        return xColumn;
    }

    @Override
    public String signal() {
        return signal;
    }

    @Override
    public double[] initial() {
        return spec.free().stream().mapToDouble(FreeInput::initial).toArray();
    }

    @Override
    public void check(double[] x, boolean withSigma, String path) throws InputException {
        if (spec.weighting() == FitSpec.Weighting.DATA && !withSigma) {
            throw InputException.at(path, "the fit asks for weights from the data, but the map has no column"
                    + " 'sigma_" + signal + "'");
        }
        if (x.length <= free.size()) {
            throw InputException.at(path, "each curve has " + x.length + " points; fitting " + free.size()
                    + " free inputs needs more");
        }
        FitProblem p = problem(x, new double[x.length], null, null);
        p.checkEvaluates();
    }

    @Override
    public FitOutcome fit(double[] x, double[] y, double[] sigma, double[] start) {
        if (x.length != y.length || (sigma != null && sigma.length != y.length)) {
            throw new IllegalArgumentException("x, y and σ of a curve must have one value per point");
        }
        if (x.length <= free.size()) {
            throw new IllegalArgumentException(x.length + " points cannot determine " + free.size()
                    + " free inputs");
        }
        double[] weights = spec.weighting() == FitSpec.Weighting.RESIDUALS ? null : sigma;
        if (weights == null && spec.weighting() == FitSpec.Weighting.DATA) {
            throw new IllegalArgumentException("the fit asks for weights from the data, and this curve has no σ");
        }
        return new FitRunner(problem(x, y, weights, start), InlineExecutor.INSTANCE, 1, Progress.NONE).run(0,
                spec.seed());
    }

    private FitProblem problem(double[] x, double[] y, double[] sigma, double[] start) {
        FitSpec s = spec;
        if (start != null) {
            if (start.length != spec.free().size()) {
                throw new IllegalArgumentException("one start value per free input: " + spec.free().size());
            }
            List<FreeInput> moved = new ArrayList<>();
            for (int a = 0; a < start.length; a++) {
                FreeInput f = spec.free().get(a);
                double v = Math.min(Math.max(start[a], f.min()), f.max());
                if (!Double.isFinite(v) || (f.logScale() && !(v > 0))) {
                    v = f.initial();
                }
                moved.add(new FreeInput(f.ref(), v, f.min(), f.max(), f.logScale(), f.scale(), f.path()));
            }
            s = new FitSpec(spec.datasets(), moved, spec.uncertain(), spec.weighting(), spec.multiStart(), 0,
                    spec.seed());
        }
        PreparedDataset d = new PreparedDataset(curve, model, technique, xColumn, signal, x, y, sigma);
        return FitProblem.prepared(List.of(d), s, catalog);
    }
}
