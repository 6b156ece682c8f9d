package lamella.report;

import lamella.api.fit.BudgetLine;
import lamella.api.fit.FitOutcome;

/**
 * Readings of the uncertainty budget shared by its table, its chart and its CSV. Independent contributions add in
 * quadrature (Yang, Ziade & Schmidt, Rev. Sci. Instrum. 87, 014901, 2016), so a source's share of a parameter's
 * variance is its contribution squared over the total σ squared.
 */
final class Budget {

    static final String TOTAL = "total";

    private Budget() {
    }

    /** The source's share of the parameter's total variance, as a fraction; NaN when the total is not positive. */
    static double varianceShare(FitOutcome o, BudgetLine line, int parameter) {
        double total = o.parameters().get(parameter).sigma();
        double c = line.contributions()[parameter];
        return total > 0 && Double.isFinite(total) ? c * c / (total * total) : Double.NaN;
    }

    /** A σ relative to the parameter's value, as a fraction; NaN for a value of zero. */
    static double relativeToValue(FitOutcome o, double sigma, int parameter) {
        double v = o.parameters().get(parameter).value();
        return v != 0 ? sigma / Math.abs(v) : Double.NaN;
    }

    /** The unit of a line's input σ: its source's, or none for the noise line, whose σ is in signal units. */
    static String inputUnit(BudgetLine line) {
        return line.source() == null ? "" : line.source().unit();
    }
}
