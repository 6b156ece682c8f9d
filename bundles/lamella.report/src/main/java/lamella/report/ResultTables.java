package lamella.report;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.MonteCarloSummary;

/** The results on the page: fitted values, fit quality per dataset, correlations, budget and Monte Carlo. */
final class ResultTables {

    private ResultTables() {
    }

    static void parameters(Html h, FitOutcome o) {
        h.raw("<table class=\"results\"><thead>");
        h.headRow(List.of("parameter", "value ± σ (total)", "σ (noise only)", "σ (total) / |value| (%)",
                "starting value", "flags"));
        h.raw("</thead><tbody>\n");
        for (int i = 0; i < o.parameters().size(); i++) {
            FittedParameter p = o.parameters().get(i);
            String unit = p.ref().unit();
            h.raw("<tr><th scope=\"row\">").text(p.label()).raw("</th>");
            h.raw("<td class=\"value\">").text(withUnit(Numbers.withSigma(p.value(), p.sigma()), unit)).raw("</td>");
            h.raw("<td>").text(withUnit(Numbers.plain(p.sigmaNoise()), unit)).raw("</td>");
            h.raw("<td>").text(Numbers.percent(Budget.relativeToValue(o, p.sigma(), i)))
                    .raw("</td>");
            h.raw("<td>").text(withUnit(Numbers.plain(p.initial()), unit)).raw("</td><td>");
            if (p.atBound()) {
                h.element("span", "flag", "at a bound: not a minimum, σ not meaningful");
            }
            if (!p.identifiable()) {
                h.element("span", "flag", "not identifiable from these data");
            }
            h.raw("</td></tr>\n");
        }
        h.raw("</tbody></table>\n");
    }

    static void datasets(Html h, FitOutcome o) {
        h.raw("<table class=\"results\"><thead>");
        h.headRow(List.of("dataset", "data file", "technique", "fitted signal", "points", "σ per point from",
                "reduced χ² (" + ColumnWords.DIMENSIONLESS + ")"));
        h.raw("</thead><tbody>\n");
        for (DatasetFit d : o.datasets()) {
            h.row(List.of(Integer.toString(d.index()), d.source(), d.technique(), ColumnWords.signal(d.signal()),
                    Integer.toString(d.x().length), d.sigmaFromData() ? "the data file" : "the fit's residuals",
                    Numbers.plain(d.reducedChiSquare())));
        }
        h.raw("</tbody></table>\n");
    }

    /** Cells tinted by |r|, blue for positive and red for negative, so that strong pairs stand out at a glance. */
    static void correlation(Html h, FitOutcome o) {
        List<String> header = new ArrayList<>(List.of("r (" + ColumnWords.DIMENSIONLESS + ")"));
        o.parameters().forEach(p -> header.add(p.label()));
        h.raw("<table class=\"matrix\"><thead>");
        h.headRow(header);
        h.raw("</thead><tbody>\n");
        for (int i = 0; i < o.parameters().size(); i++) {
            h.raw("<tr><th scope=\"row\">").text(o.parameters().get(i).label()).raw("</th>");
            for (int j = 0; j < o.parameters().size(); j++) {
                double r = o.correlation()[i][j];
                String tint = i == j || !Double.isFinite(r) ? ""
                        : String.format(Locale.ROOT, " style=\"background: rgba(%s, %.2f)\"",
                        r >= 0 ? "31, 95, 168" : "192, 57, 43", 0.55 * Math.min(1, Math.abs(r)));
                h.raw("<td" + tint + ">").text(Numbers.coefficient(r)).raw("</td>");
            }
            h.raw("</tr>\n");
        }
        h.raw("</tbody></table>\n");
    }

    static void budget(Html h, FitOutcome o) {
        List<String> header = new ArrayList<>(List.of("source", "input 1σ"));
        o.parameters().forEach(p -> header.add("contribution to σ of " + p.label()));
        h.raw("<table class=\"results budget\"><thead>");
        h.headRow(header);
        h.raw("</thead><tbody>\n");
        for (BudgetLine line : o.budget()) {
            List<String> cells = new ArrayList<>(List.of(line.label(), line.source() == null ? "—"
                    : withUnit(Numbers.plain(line.inputSigma()), Budget.inputUnit(line))));
            for (int p = 0; p < o.parameters().size(); p++) {
                FittedParameter fp = o.parameters().get(p);
                cells.add(withUnit(Numbers.plain(line.contributions()[p]), fp.ref().unit()) + " ("
                        + Numbers.percent(Budget.varianceShare(o, line, p)) + " % of variance)");
            }
            h.row(cells);
        }
        h.raw("<tr class=\"total\"><th scope=\"row\">").text(Budget.TOTAL).raw("</th><td></td>");
        for (FittedParameter fp : o.parameters()) {
            h.raw("<td>").text(withUnit(Numbers.plain(fp.sigma()), fp.ref().unit())).raw("</td>");
        }
        h.raw("</tr>\n</tbody></table>\n");
    }

    static void monteCarlo(Html h, FitOutcome o, MonteCarloSummary mc) {
        h.raw("<p>").text(mc.samples() + " refits with resampled noise and uncertain inputs; " + mc.failed()
                + " did not converge and are left out of these statistics.").raw("</p>\n");
        List<String> header = new ArrayList<>(List.of("parameter", "unit", "mean", "σ"));
        for (double level : MonteCarloSummary.LEVELS) {
            header.add(BigDecimal.valueOf(level).stripTrailingZeros().toPlainString() + " % percentile");
        }
        header.add("σ (Monte Carlo) / σ (linearised) (" + ColumnWords.DIMENSIONLESS + ")");
        h.raw("<table class=\"results\"><thead>");
        h.headRow(header);
        h.raw("</thead><tbody>\n");
        for (int p = 0; p < o.parameters().size(); p++) {
            String unit = o.parameters().get(p).ref().unit();
            List<String> cells = new ArrayList<>(List.of(o.parameters().get(p).label(),
                    unit.isEmpty() ? "—" : unit, Numbers.plain(mc.mean()[p]), Numbers.plain(mc.std()[p])));
            for (double v : mc.percentiles()[p]) {
                cells.add(Numbers.plain(v));
            }
            cells.add(Numbers.plain(mc.stdOverLinearised()[p]));
            h.row(cells);
        }
        h.raw("</tbody></table>\n");
    }

    /** Joined with no-break spaces, so a narrow column never splits a unit such as W/(m K) across lines. */
    static String withUnit(String number, String unit) {
        return unit.isEmpty() ? number : number + "\u00a0" + unit.replace(' ', '\u00a0');
    }
}
