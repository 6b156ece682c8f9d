package lamella.fit;

import java.util.List;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.Names;
import lamella.api.ParameterRef;
import lamella.api.Sample;
import lamella.api.Simulation;
import lamella.api.StackKernels;
import lamella.api.Technique;
import lamella.api.fit.CurveFit;
import lamella.api.fit.CurveFitService;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitService;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import lamella.api.fit.SensitivityTable;
import lamella.api.guard.LiveModels;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlanService;
import lamella.api.plan.PlanSetting;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PlannedSensitivity;
import lamella.api.guard.PluginOrigin;
import org.osgi.framework.Bundle;
import org.osgi.framework.ServiceReference;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;

/**
 * The fitting service: reads a case's fit block, fits, propagates uncertainty; computes sensitivities; ranks the
 * plans of a plan block by the σ their fit would give.
 */
@Component(service = {FitService.class, PlanService.class, CurveFitService.class})
public final class Fitter implements FitService, PlanService, CurveFitService {

    private final LiveModels models = new LiveModels();

    @Reference
    private StackKernels kernels;

    public Fitter() {
    }

    /** For programs and tests that assemble the services themselves; each is named by its class in errors. */
    public Fitter(StackKernels kernels, List<HeatingGeometry> geometries, List<Technique> techniques) {
        this.kernels = kernels;
        geometries.forEach(g -> models.add(g, new PluginOrigin(g.getClass().getName(), "(not a bundle)")));
        techniques.forEach(t -> models.add(t, new PluginOrigin(t.getClass().getName(), "(not a bundle)")));
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeGeometry")
    void addGeometry(ServiceReference<HeatingGeometry> reference, HeatingGeometry g) {
        models.add(g, origin(reference));
    }

    void removeGeometry(HeatingGeometry g) {
        models.remove(g);
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeTechnique")
    void addTechnique(ServiceReference<Technique> reference, Technique t) {
        models.add(t, origin(reference));
    }

    void removeTechnique(Technique t) {
        models.remove(t);
    }

    /** Plug-ins are held behind guards, so a faulty one fails a fit with its name instead of the process. */
    private static PluginOrigin origin(ServiceReference<?> reference) {
        Bundle b = reference.getBundle();
        return b == null ? new PluginOrigin("(unregistered)", "?")
                : PluginOrigin.of(b.getSymbolicName(), b.getVersion().toString(), b.getLocation());
    }

    private ModelCatalog catalog() {
        return models.catalog(kernels);
    }

    @Override
    public FitOutcome fit(CaseDocument doc, FitSettings settings, Progress progress) throws InputException {
        FitSpec spec;
        FitProblem problem;
        try {
            spec = FitBlockReader.read(doc);
            problem = FitProblem.of(doc, spec, catalog());
        } catch (InputException e) {
            throw doc.locate(e);
        }
        int samples = settings.monteCarloSamples() > 0 ? settings.monteCarloSamples() : spec.monteCarlo();
        long seed = settings.seed() != 0 ? settings.seed() : spec.seed();
        return new FitRunner(problem, FitThreads.POOL, settings.threads(), progress).run(samples, seed);
    }

    @Override
    public PlanOutcome plan(CaseDocument doc, int threads, Progress progress) throws InputException {
        try {
            return Planner.run(doc, catalog(), threads, progress);
        } catch (InputException e) {
            throw doc.locate(e);
        }
    }

    @Override
    public List<PlanSetting> settings(CaseDocument doc, PlannedResult plan) throws InputException {
        try {
            return Planner.settings(doc, catalog(), plan);
        } catch (InputException e) {
            throw doc.locate(e);
        }
    }

    @Override
    public List<PlannedSensitivity> sensitivity(CaseDocument doc, PlannedResult plan) throws InputException {
        try {
            return Planner.sensitivity(doc, catalog(), plan);
        } catch (InputException e) {
            throw doc.locate(e);
        }
    }

    @Override
    public CurveFit curves(CaseDocument doc, String signal) throws InputException {
        try {
            DatasetSpec curve = new DatasetSpec(0, "map", doc.file(), signal, null, null, RowSelection.ALL, null,
                    "map");
            return new CurveFitter(doc, FitBlockReader.readForCurves(doc, curve), curve, catalog());
        } catch (InputException e) {
            throw doc.locate(e);
        }
    }

    @Override
    public SensitivityTable sensitivity(CaseDocument doc, int dataset, String signal) throws InputException {
        try {
            ModelCatalog catalog = catalog();
            if (dataset < 0) {
                doc.requireOneSample("sensitivity without --dataset");
                CaseModel model = new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
                Simulation sim = model.simulation(catalog);
                double[] x = sim.measurement().xValues();
                String xColumn = sim.technique().xColumn().orElse("x");
                if (x.length == 0) {
                    throw InputException.at(doc.measurement().pathOf(sim.technique().xParameter().orElse("x")),
                            "missing; sensitivities are computed at the measurement's x values");
                }
                return Sensitivities.of(model, catalog, xColumn, x, chosen(sim.technique(), signal));
            }
            FitSpec spec = FitBlockReader.read(doc);
            if (dataset >= spec.datasets().size()) {
                throw InputException.at("fit.datasets", "there is no dataset " + dataset + "; the case has "
                        + spec.datasets().size());
            }
            FitProblem problem = FitProblem.of(doc, spec, catalog);
            PreparedDataset d = problem.datasets.get(dataset);
            String s = signal != null ? chosen(d.model.simulation(catalog).technique(), signal) : d.signal;
            SensitivityTable t = Sensitivities.of(d.model, catalog, d.xColumn, d.x, s);
            return new SensitivityTable(t.xColumn(), t.x(), t.signal(), t.phaseLike(),
                    t.parameters().stream().map(r -> named(r, d.spec, doc)).toList(), t.quantities(), t.values());
        } catch (InputException e) {
            throw doc.locate(e);
        }
    }

    /** A dataset's own geometry or measurement block is addressed through the dataset, as the fit block does. */
    private static ParameterRef named(ParameterRef r, DatasetSpec d, CaseDocument doc) {
        boolean own = (r.scope() == ParameterRef.Scope.GEOMETRY && d.geometry() != null)
                || (r.scope() == ParameterRef.Scope.MEASUREMENT && d.measurement() != null);
        if (own) {
            return r.inDataset(d.index());
        }
        Sample s = d.sampleIn(doc);
        boolean ofSample = r.scope() == ParameterRef.Scope.LAYER
                || (r.scope() == ParameterRef.Scope.GEOMETRY && s.geometry() != null);
        return doc.severalSamples() && ofSample ? r.inSample(s.name()) : r;
    }

    private static String chosen(Technique t, String signal) throws InputException {
        String s = signal != null ? signal : Signals.usual(t.type()).orElse(t.signalColumns().get(0));
        if (!t.signalColumns().contains(s)) {
            throw InputException.at("--signal", "technique '" + t.type() + "' has no signal '" + s + "'"
                    + Names.closest(s, t.signalColumns()).map(c -> " (did you mean '" + c + "'?)").orElse("")
                    + "; it gives " + String.join(", ", t.signalColumns()));
        }
        return s;
    }
}
