package lamella.cli;

import java.util.Locale;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.MonteCarloSummary;

/** The readable account of a fit that {@code lamella fit} prints: values ± σ, datasets, budget, warnings. */
final class FitSummary {

    private FitSummary() {
    }

    static String format(FitOutcome o) {
        StringBuilder sb = new StringBuilder();
        TextTable values = new TextTable("parameter", "value", "± σ (total)", "σ (noise)", "unit", "note");
        for (FittedParameter p : o.parameters()) {
            String note = !p.identifiable() ? "NOT IDENTIFIABLE" : p.atBound() ? "AT BOUND" : "";
            values.add(p.label(), num(p.value()), num(p.sigma()) + relative(p), num(p.sigmaNoise()),
                    p.ref().unit(), note);
        }
        sb.append("Fitted values (1σ)\n").append(values.render("  "));
        TextTable data = new TextTable("dataset", "technique", "signal", "points", "reduced χ²", "σ from");
        for (DatasetFit d : o.datasets()) {
            data.add(d.index() + ": " + d.source(), d.technique(), d.signal(), Integer.toString(d.x().length),
                    String.format(Locale.ROOT, "%.3f", d.reducedChiSquare()), d.sigmaFromData() ? "data" : "residuals");
        }
        sb.append("\nDatasets\n").append(data.render("  "));
        for (DatasetFit d : o.datasets()) {
            d.heating().ifPresent(h -> sb.append("\nDataset ").append(d.index()).append(", at the best fit\n")
                    .append(SelfHeatingText.render(h)));
        }
        if (o.budget().size() > 1) {
            String[] header = new String[o.parameters().size() + 1];
            header[0] = "source of uncertainty (1σ)";
            for (int a = 0; a < o.parameters().size(); a++) {
                header[a + 1] = o.parameters().get(a).label();
            }
            TextTable budget = new TextTable(header);
            for (BudgetLine b : o.budget()) {
                String[] row = new String[header.length];
                row[0] = b.label() + (b.source() == null ? "" : " ± " + num(b.inputSigma()) + " " + b.source().unit());
                for (int a = 0; a < o.parameters().size(); a++) {
                    row[a + 1] = num(b.contributions()[a]);
                }
                budget.add(row);
            }
            sb.append("\nUncertainty budget: each source's share of each σ\n").append(budget.render("  "));
        }
        o.monteCarlo().ifPresent(mc -> sb.append(monteCarlo(o, mc)));
        if (!o.warnings().isEmpty()) {
            sb.append("\nWarnings\n");
            o.warnings().forEach(w -> sb.append("  - ").append(w).append('\n'));
        }
        return sb.toString();
    }

    private static String monteCarlo(FitOutcome o, MonteCarloSummary mc) {
        TextTable t = new TextTable("parameter", "median", "16 %", "84 %", "2.5 %", "97.5 %", "σ MC / σ linear");
        for (int a = 0; a < o.parameters().size(); a++) {
            double[] p = mc.percentiles()[a];
            t.add(o.parameters().get(a).label(), num(p[2]), num(p[1]), num(p[3]), num(p[0]), num(p[4]),
                    String.format(Locale.ROOT, "%.2f", mc.stdOverLinearised()[a]));
        }
        return "\nMonte Carlo: " + (mc.samples() - mc.failed()) + " of " + mc.samples() + " refits converged\n"
                + t.render("  ");
    }

    private static String relative(FittedParameter p) {
        if (!Double.isFinite(p.sigma()) || p.value() == 0) {
            return "";
        }
        return String.format(Locale.ROOT, " (%.1f %%)", 100 * p.sigma() / Math.abs(p.value()));
    }

    static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : "∞";
    }
}
