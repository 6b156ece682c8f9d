package lamella.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.ModelEvaluationException;
import lamella.api.fit.Progress;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlanService;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PredictedSigma;
import lamella.charts.plan.PlanCharts;
import lamella.charts.plan.PlanGrid;

/**
 * The report's {@code plan} section, for a case with a plan block: the best plans and the case as written by the σ
 * their fit would give, the objective over the first two varied keys a map can show ({@code plan-objective.png} and
 * {@code .svg}) and the best plan's sensitivity curves ({@code plan-sensitivity.png} and {@code .svg}). A plan block
 * that cannot be evaluated leaves the rest of the report as it is and says why in the section.
 *
 * @param outcome the plans, or null when they could not be evaluated
 * @param problem why not, in words; empty otherwise
 * @param figures the map and the curves that could be drawn
 */
record PlanSection(PlanOutcome outcome, String problem, List<Figure> figures) {

    /** Best plans listed in the section's table. */
    static final int LISTED = 5;

    static PlanSection of(CaseDocument doc, PlanService planner, ReportFiles files, Map<String, String> contents) {
        PlanOutcome o;
        try {
            o = planner.plan(doc, Math.max(1, Runtime.getRuntime().availableProcessors()), Progress.NONE);
        } catch (InputException | ModelEvaluationException e) {
            return new PlanSection(null, "The plan block cannot be evaluated: " + e.getMessage(), List.of());
        }
        List<Figure> figures = new ArrayList<>();
        List<Integer> keys = PlanGrid.mappable(o);
        if (keys.size() >= 2) {
            figures.add(Figure.draw(files, "plan-objective", PlanCharts.objectiveMap(PlanGrid.of(o, keys.get(0),
                    keys.get(1))), "The objective of every plan over " + o.varied().get(keys.get(0)) + " and "
                    + o.varied().get(keys.get(1)) + " (colour, with contour lines); the circle marks the best plan"
                    + " of the map, the diamond the case as written; crosses mark plans beyond a limit (grey) or"
                    + " that the model cannot evaluate (red)."));
            contents.put("plan-objective.png", "the plans' objective over two varied keys (PNG)");
            contents.put("plan-objective.svg", "the plans' objective over two varied keys (SVG)");
        }
        PlannedResult shown = o.best() != null ? o.best() : o.baseline();
        try {
            String title = o.best() != null ? "Sensitivities of the best plan" : "Sensitivities of the case as written";
            figures.add(Figure.draw(files, "plan-sensitivity", PlanCharts.sensitivity(title,
                    planner.sensitivity(doc, shown)), "How the planned signal moves with each input at the "
                    + (o.best() != null ? "best plan's" : "case's") + " settings; dashed curves belong to a joint"
                    + " plan's other measurements."));
            contents.put("plan-sensitivity.png", "sensitivity curves of the best plan (PNG)");
            contents.put("plan-sensitivity.svg", "sensitivity curves of the best plan (SVG)");
        } catch (InputException | ModelEvaluationException e) {
            return new PlanSection(o, "The best plan's sensitivities cannot be computed: " + e.getMessage(),
                    figures);
        }
        return new PlanSection(o, "", figures);
    }

    /** The section: how plans were ranked, the table of the best plans and the case as written, the pictures. */
    void write(Html h, java.util.function.Consumer<Figure> figure) {
        h.element("h2", "Experiment plan");
        if (outcome == null) {
            h.element("p", "note", problem);
            return;
        }
        h.element("p", "note", "Plans of the case's plan block ranked by " + outcome.objective() + ": the"
                + " linearised 1σ that fitting the free inputs would give, with the expected noise and every"
                + " uncertain input propagated (Yang, Ziade & Schmidt, Rev. Sci. Instrum. 87, 014901, 2016).");
        for (String n : outcome.noise()) {
            h.element("p", "note", "Expected noise: " + n);
        }
        for (String l : outcome.limits()) {
            h.element("p", "note", "Limit: " + l);
        }
        List<String> head = new ArrayList<>(List.of("rank"));
        for (String v : outcome.varied()) {
            head.add(v + " (SI)");
        }
        head.add("objective (%)");
        outcome.targets().forEach(t -> head.add("σ/|p| of " + t + " (%)"));
        head.add("steady rise (K)");
        head.add("note");
        h.raw("<table class=\"keys\"><thead>");
        h.headRow(head);
        h.raw("</thead><tbody>\n");
        int listed = 0;
        for (PlannedResult p : outcome.plans()) {
            if (p.status() != PlannedResult.Status.RANKED || listed >= LISTED) {
                break;
            }
            h.row(row(p, Integer.toString(p.rank())));
            listed++;
        }
        h.row(row(outcome.baseline(), "as written"));
        h.raw("</tbody></table>\n");
        h.element("p", "note", outcome.count(PlannedResult.Status.RANKED) + " of " + outcome.plans().size()
                + " plans ranked, " + outcome.count(PlannedResult.Status.BEYOND_LIMIT) + " beyond a limit, "
                + outcome.count(PlannedResult.Status.NOT_EVALUABLE) + " that the model cannot evaluate; lamella"
                + " plan CASE --out PLAN.json lists every one.");
        if (!outcome.warnings().isEmpty()) {
            h.raw("<ul>\n");
            outcome.warnings().forEach(w -> h.element("li", w));
            h.raw("</ul>\n");
        }
        if (!problem.isEmpty()) {
            h.element("p", "note", problem);
        }
        figures.forEach(figure);
    }

    private List<String> row(PlannedResult p, String rank) {
        List<String> cells = new ArrayList<>();
        cells.add(rank);
        for (Object v : p.values()) {
            cells.add(v instanceof List<?> l ? String.join(" + ", l.stream().map(x -> Numbers.plain((Double) x))
                    .toList()) : Double.isNaN((Double) v) ? "(none)" : Numbers.plain((Double) v));
        }
        cells.add(percent(p.objective()));
        if (p.predicted().isEmpty()) {
            outcome.targets().forEach(t -> cells.add("—"));
        } else {
            for (PredictedSigma s : p.predicted()) {
                cells.add(percent(s.sigmaRelative()));
            }
        }
        cells.add(Double.isNaN(p.rise()) ? "—" : Numbers.plain(p.rise()));
        List<String> notes = new ArrayList<>();
        p.predicted().stream().filter(s -> !s.identifiable()).forEach(s -> notes.add(s.label() + " unidentifiable"));
        if (p.measurements() > 1) {
            notes.add(p.measurements() + " measurements fitted together");
        }
        cells.add(String.join("; ", notes));
        return cells;
    }

    private static String percent(double fraction) {
        return Double.isFinite(fraction) ? Numbers.plain(100 * fraction) : "∞";
    }
}
