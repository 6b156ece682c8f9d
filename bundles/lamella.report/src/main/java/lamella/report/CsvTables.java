package lamella.report;

import java.util.ArrayList;
import java.util.List;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.MonteCarloSummary;

/**
 * The numbers of a report as comma-separated tables: a header row, full precision, a point as decimal mark, and
 * units either in the header (by the case-file suffix convention, such as {@code frequency_hz}) or, where rows
 * differ in unit, in a unit column beside the value. Parameters are named by their paths; parameters.csv says in its
 * quantity column what a conductivity path moved ("isotropic Λ").
 */
final class CsvTables {

    private CsvTables() {
    }

    static String parameters(FitOutcome o) {
        Csv csv = new Csv("parameter", "quantity", "unit", "initial", "value", "sigma_total", "sigma_noise",
                "at_bound", "identifiable");
        for (FittedParameter p : o.parameters()) {
            csv.row(p.ref().toString(), p.quantity(), p.ref().unit(), number(p.initial()), number(p.value()), number(p.sigma()),
                    number(p.sigmaNoise()), Boolean.toString(p.atBound()), Boolean.toString(p.identifiable()));
        }
        return csv.text();
    }

    /** The correlation matrix with the parameters' names along both edges; coefficients are dimensionless. */
    static String correlation(FitOutcome o) {
        List<String> header = new ArrayList<>(List.of("parameter"));
        o.parameters().forEach(p -> header.add(p.ref().toString()));
        Csv csv = new Csv(header.toArray(String[]::new));
        for (int i = 0; i < o.parameters().size(); i++) {
            List<String> row = new ArrayList<>(List.of(o.parameters().get(i).ref().toString()));
            for (double r : o.correlation()[i]) {
                row.add(number(r));
            }
            csv.row(row.toArray(String[]::new));
        }
        return csv.text();
    }

    /** One row per source and parameter, then the total of each parameter, whose σ is the fit's total σ. */
    static String budget(FitOutcome o) {
        Csv csv = new Csv("source", "input_sigma", "input_unit", "parameter", "sigma_contribution", "parameter_unit",
                "variance_share");
        for (BudgetLine line : o.budget()) {
            for (int p = 0; p < o.parameters().size(); p++) {
                FittedParameter fp = o.parameters().get(p);
                csv.row(line.label(), number(line.inputSigma()), Budget.inputUnit(line), fp.ref().toString(),
                        number(line.contributions()[p]), fp.ref().unit(), number(Budget.varianceShare(o, line, p)));
            }
        }
        for (FittedParameter fp : o.parameters()) {
            csv.row(Budget.TOTAL, "", "", fp.ref().toString(), number(fp.sigma()), fp.ref().unit(), number(1));
        }
        return csv.text();
    }

    /** x, data, σ, model and residual in the signal's own unit (its column suffix), then (data − model)/σ. */
    static String datasetFit(DatasetFit d) {
        String s = d.signal();
        Csv csv = new Csv(d.xColumn(), "data_" + s, "sigma_" + s, "model_" + s, "residual_" + s,
                "normalised_residual");
        double[] normalised = DatasetCharts.normalisedResiduals(d);
        for (int i = 0; i < d.x().length; i++) {
            csv.row(number(d.x()[i]), number(d.data()[i]), number(d.sigma()[i]), number(d.model()[i]),
                    number(d.data()[i] - d.model()[i]), number(normalised[i]));
        }
        return csv.text();
    }

    static String monteCarlo(FitOutcome o, MonteCarloSummary mc) {
        List<String> header = new ArrayList<>(List.of("parameter", "unit", "mean", "std"));
        for (double level : MonteCarloSummary.LEVELS) {
            header.add("percentile_" + level(level));
        }
        header.add("std_over_linearised_sigma");
        Csv csv = new Csv(header.toArray(String[]::new));
        for (int p = 0; p < o.parameters().size(); p++) {
            List<String> row = new ArrayList<>(List.of(o.parameters().get(p).ref().toString(),
                    o.parameters().get(p).ref().unit(), number(mc.mean()[p]), number(mc.std()[p])));
            for (double v : mc.percentiles()[p]) {
                row.add(number(v));
            }
            row.add(number(mc.stdOverLinearised()[p]));
            csv.row(row.toArray(String[]::new));
        }
        return csv.text();
    }

    /** A percentile level for a column name: {@code 2.5} becomes {@code 2_5}, {@code 16} stays {@code 16}. */
    static String level(double level) {
        String s = level == Math.rint(level) ? Integer.toString((int) level) : Double.toString(level);
        return s.replace('.', '_');
    }

    /** 13 significant digits, as the simulate command writes; NaN and ±Infinity spelt as Java and Python read them. */
    static String number(double v) {
        return lamella.api.AtomicText.number(v);
    }

    /** Rows of cells; a cell holding a comma, quote or line break is quoted (RFC 4180). */
    private static final class Csv {

        private final StringBuilder text = new StringBuilder();
        private final int columns;

        Csv(String... header) {
            columns = header.length;
            row(header);
        }

        void row(String... cells) {
            if (cells.length != columns) {
                throw new IllegalArgumentException(cells.length + " cells in a row of " + columns + " columns");
            }
            for (int i = 0; i < cells.length; i++) {
                text.append(i == 0 ? "" : ",").append(quoted(cells[i]));
            }
            text.append('\n');
        }

        String text() {
            return text.toString();
        }

        private static String quoted(String cell) {
            if (cell.contains(",") || cell.contains("\"") || cell.contains("\n")) {
                return "\"" + cell.replace("\"", "\"\"") + "\"";
            }
            return cell;
        }
    }
}
