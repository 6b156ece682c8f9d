package lamella.fit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.ModelEvaluationException;
import lamella.api.ParameterRef;
import lamella.api.fit.Progress;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlanSetting;
import lamella.api.plan.PlannedSensitivity;
import lamella.api.plan.PlannedResult;

/** Reads a case's plan and fit blocks, evaluates the baseline and every plan over a pool of threads, ranks them. */
final class Planner {

    private Planner() {
    }

    static PlanOutcome run(CaseDocument doc, ModelCatalog catalog, int threads, Progress progress)
            throws InputException {
        FitSpec fit = FitBlockReader.readForPlan(doc);
        PlanSpec spec = PlanBlockReader.read(doc, fit, catalog);
        PlanEvaluator evaluator = new PlanEvaluator(doc, fit, spec, catalog);
        PlannedResult asWritten = evaluator.evaluate(null);
        PlannedResult baseline = new PlannedResult(0, evaluator.baselineValues(), asWritten.status(),
                asWritten.reason(), asWritten.objective(), asWritten.predicted(), asWritten.budget(),
                asWritten.risePerWatt(), asWritten.rise(), asWritten.measurements());
        List<PlanEvaluator.Choice> choices = evaluator.choices();
        List<PlannedResult> results = evaluateAll(evaluator, choices, threads, progress);
        List<PlannedResult> ranked = new ArrayList<>();
        List<PlannedResult> beyond = new ArrayList<>();
        List<PlannedResult> failed = new ArrayList<>();
        for (PlannedResult r : results) {
            switch (r.status()) {
                case RANKED -> ranked.add(r);
                case BEYOND_LIMIT -> beyond.add(r);
                default -> failed.add(r);
            }
        }
        Comparator<PlannedResult> byObjective = Comparator.comparingDouble(PlannedResult::objective);
        ranked.sort(byObjective);
        beyond.sort(byObjective);
        List<PlannedResult> plans = new ArrayList<>();
        for (int i = 0; i < ranked.size(); i++) {
            plans.add(ranked.get(i).ranked(i + 1));
        }
        plans.addAll(beyond);
        plans.addAll(failed);
        List<String> targets = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        for (int t = 0; t < spec.targets().size(); t++) {
            ParameterRef ref = spec.targets().get(t);
            String label = baseline.predicted().isEmpty() ? ref.toString() : baseline.predicted().get(t).label();
            targets.add(label);
            final int index = t;
            boolean anywhere = results.stream().anyMatch(r -> !r.predicted().isEmpty()
                    && r.predicted().get(index).identifiable());
            if (!anywhere) {
                warnings.add(label + " stays unidentifiable in every plan: no plan's data separate it from the other"
                        + " free inputs within ±" + Math.round(100 * FitRunner.IDENTIFIABLE_LIMIT)
                        + " % (1σ of the noise); fix it at a known value or add other measurements");
            }
        }
        if (ranked.isEmpty()) {
            warnings.add("no plan keeps within the limits; the plans beyond them are listed with the reason");
        }
        if (!failed.isEmpty()) {
            warnings.add(failed.size() + " of " + results.size() + " plans cannot be evaluated; they are listed with"
                    + " the reason");
        }
        List<String> varied = spec.variables().stream().map(PlanSpec.Variable::label).toList();
        List<String> noise = new ArrayList<>();
        spec.noise().forEach((signal, n) -> noise.add(signal + ": " + (n.relative()
                ? String.format(Locale.ROOT, "%.3g %% of its value", 100 * n.value())
                : String.format(Locale.ROOT, "%.3g", n.value())) + " per point (" + n.source() + ")"));
        return new PlanOutcome(spec.combine().words, targets, varied, noise, limits(spec.limits()), baseline, plans,
                warnings);
    }

    static List<PlanSetting> settings(CaseDocument doc, ModelCatalog catalog, PlannedResult plan)
            throws InputException {
        PlanEvaluator evaluator = evaluator(doc, catalog);
        return evaluator.settings(evaluator.choiceOf(plan));
    }

    static List<PlannedSensitivity> sensitivity(CaseDocument doc, ModelCatalog catalog, PlannedResult plan)
            throws InputException {
        PlanEvaluator evaluator = evaluator(doc, catalog);
        return evaluator.sensitivity(evaluator.choiceOf(plan));
    }

    private static PlanEvaluator evaluator(CaseDocument doc, ModelCatalog catalog) throws InputException {
        FitSpec fit = FitBlockReader.readForPlan(doc);
        return new PlanEvaluator(doc, fit, PlanBlockReader.read(doc, fit, catalog), catalog);
    }

    private static List<PlannedResult> evaluateAll(PlanEvaluator evaluator, List<PlanEvaluator.Choice> choices,
                                                   int threads, Progress progress) throws InputException {
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, threads), r -> {
            Thread t = new Thread(r, "lamella-plan");
            t.setDaemon(true);
            return t;
        });
        AtomicInteger done = new AtomicInteger();
        int total = choices.size();
        try {
            List<Future<PlannedResult>> futures = new ArrayList<>();
            for (PlanEvaluator.Choice c : choices) {
                futures.add(pool.submit(() -> {
                    if (progress.cancelled()) {
                        throw new CancellationException("the plan was cancelled");
                    }
                    PlannedResult r = evaluator.evaluate(c);
                    progress.update("planning", done.incrementAndGet(), total);
                    return r;
                }));
            }
            List<PlannedResult> out = new ArrayList<>();
            for (Future<PlannedResult> f : futures) {
                try {
                    out.add(f.get());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new CancellationException("interrupted");
                } catch (ExecutionException e) {
                    Throwable cause = e.getCause();
                    if (cause instanceof InputException ie) {
                        throw ie;
                    }
                    if (cause instanceof RuntimeException re) {
                        throw re;
                    }
                    throw new ModelEvaluationException("a plan failed: " + cause, cause);
                }
            }
            return out;
        } finally {
            pool.shutdownNow();
        }
    }

    private static List<String> limits(PlanSpec.Limits l) {
        List<String> out = new ArrayList<>();
        if (!Double.isNaN(l.absorbedPowerW())) {
            out.add(String.format(Locale.ROOT, "steady rise at most %.3g K at %.3g W absorbed", l.maxRiseK(),
                    l.absorbedPowerW()));
        }
        if (l.minSpotM() > 0 || Double.isFinite(l.maxSpotM())) {
            out.add("beam radii " + (l.minSpotM() > 0 ? "from " + PlanEvaluator.number(l.minSpotM()) + " m " : "")
                    + (Double.isFinite(l.maxSpotM()) ? "up to " + PlanEvaluator.number(l.maxSpotM()) + " m" : ""));
        }
        if (l.bandLowHz() > 0 || Double.isFinite(l.bandHighHz())) {
            out.add("frequencies from " + PlanEvaluator.number(l.bandLowHz()) + " Hz to "
                    + (Double.isFinite(l.bandHighHz()) ? PlanEvaluator.number(l.bandHighHz()) + " Hz" : "any"));
        }
        return out;
    }
}
