package lamella.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lamella.api.fit.BudgetLine;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PredictedSigma;

/** What {@code lamella plan} prints: the best plans and the case as written, the best plan's budget, the rest. */
final class PlanSummary {

    /** Plans beyond a limit or not evaluable listed one by one before they are only counted. */
    private static final int LISTED = 5;

    private PlanSummary() {
    }

    static String format(PlanOutcome o, int show) {
        StringBuilder sb = new StringBuilder();
        sb.append("Plans ranked by ").append(o.objective()).append(" (1σ, noise and every uncertain input)\n");
        o.noise().forEach(n -> sb.append("  expected noise: ").append(n).append('\n'));
        o.limits().forEach(l -> sb.append("  limit: ").append(l).append('\n'));
        List<String> header = new ArrayList<>(List.of("rank"));
        header.addAll(o.varied());
        header.add("objective");
        o.targets().forEach(t -> header.add("σ/|p| " + t));
        header.add("steady rise");
        header.add("note");
        TextTable t = new TextTable(header.toArray(new String[0]));
        int shown = 0;
        for (PlannedResult p : o.plans()) {
            if (p.status() != PlannedResult.Status.RANKED || shown >= show) {
                break;
            }
            t.add(row(o, p, Integer.toString(p.rank())));
            shown++;
        }
        t.add(row(o, o.baseline(), "as written"));
        sb.append('\n').append(t.render("  "));
        long ranked = o.count(PlannedResult.Status.RANKED);
        sb.append(String.format(Locale.ROOT, "  %d of %d plans ranked%s%n", ranked, o.plans().size(),
                ranked > shown ? " (the best " + shown + " shown; --show N for more, --out for all)" : ""));
        PlannedResult best = o.best();
        if (best != null) {
            sb.append("\nBudget of the best plan: each source's 1σ in each target\n").append(budget(o, best));
        }
        for (PlannedResult.Status s : List.of(PlannedResult.Status.BEYOND_LIMIT,
                PlannedResult.Status.NOT_EVALUABLE)) {
            List<PlannedResult> these = o.plans().stream().filter(p -> p.status() == s).toList();
            if (these.isEmpty()) {
                continue;
            }
            sb.append('\n').append(these.size()).append(" plans ").append(s.words()).append('\n');
            for (int i = 0; i < Math.min(LISTED, these.size()); i++) {
                sb.append("  ").append(values(o, these.get(i))).append(": ").append(these.get(i).reason())
                        .append('\n');
            }
            if (these.size() > LISTED) {
                sb.append("  … and ").append(these.size() - LISTED).append(" more (--out lists every one)\n");
            }
        }
        if (!o.warnings().isEmpty()) {
            sb.append("\nWarnings\n");
            o.warnings().forEach(w -> sb.append("  - ").append(w).append('\n'));
        }
        return sb.toString();
    }

    private static String[] row(PlanOutcome o, PlannedResult p, String rank) {
        List<String> cells = new ArrayList<>();
        cells.add(rank);
        p.values().forEach(v -> cells.add(value(v)));
        cells.add(percent(p.objective()));
        if (p.predicted().isEmpty()) {
            o.targets().forEach(x -> cells.add("—"));
        } else {
            p.predicted().forEach(s -> cells.add(percent(s.sigmaRelative())));
        }
        cells.add(Double.isNaN(p.rise()) ? (Double.isNaN(p.risePerWatt()) ? "—"
                : FitSummary.num(p.risePerWatt()) + " K/W") : FitSummary.num(p.rise()) + " K");
        List<String> notes = new ArrayList<>();
        if (!p.predicted().isEmpty()) {
            p.predicted().stream().filter(s -> !s.identifiable()).forEach(s -> notes.add(s.ref() + " unidentifiable"));
        }
        if (p.status() != PlannedResult.Status.RANKED && !p.reason().isEmpty()) {
            notes.add(p.reason());
        }
        if (p.measurements() > 1) {
            notes.add(p.measurements() + " measurements");
        }
        cells.add(String.join("; ", notes));
        return cells.toArray(new String[0]);
    }

    private static String budget(PlanOutcome o, PlannedResult p) {
        String[] header = new String[o.targets().size() + 1];
        header[0] = "source of uncertainty (1σ)";
        for (int t = 0; t < o.targets().size(); t++) {
            header[t + 1] = o.targets().get(t);
        }
        TextTable t = new TextTable(header);
        for (BudgetLine b : p.budget()) {
            String[] row = new String[header.length];
            row[0] = b.label() + (b.source() == null ? "" : " ± " + FitSummary.num(b.inputSigma()) + " "
                    + b.source().unit());
            for (int k = 0; k < o.targets().size(); k++) {
                row[k + 1] = FitSummary.num(b.contributions()[k]);
            }
            t.add(row);
        }
        String[] total = new String[header.length];
        total[0] = "total";
        for (int k = 0; k < o.targets().size(); k++) {
            PredictedSigma s = p.predicted().get(k);
            total[k + 1] = FitSummary.num(s.sigma()) + " " + s.ref().unit();
        }
        t.add(total);
        return t.render("  ");
    }

    static String values(PlanOutcome o, PlannedResult p) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < p.values().size(); i++) {
            parts.add(o.varied().get(i) + " = " + value(p.values().get(i)));
        }
        return String.join(", ", parts);
    }

    static String value(Object v) {
        if (v instanceof List<?> l) {
            List<String> parts = new ArrayList<>();
            l.forEach(x -> parts.add(FitSummary.num((Double) x)));
            return "{" + String.join(" + ", parts) + "}";
        }
        return Double.isNaN((Double) v) ? "(none)" : FitSummary.num((Double) v);
    }

    private static String percent(double r) {
        return Double.isFinite(r) ? String.format(Locale.ROOT, "%.3g %%", 100 * r) : "∞";
    }
}
