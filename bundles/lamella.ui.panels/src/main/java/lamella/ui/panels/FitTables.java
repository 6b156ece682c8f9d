package lamella.ui.panels;

import java.util.ArrayList;
import java.util.List;
import lamella.api.ParameterRef;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;

/**
 * The Fit panel's tables as text: values rounded to their σ, in the units the trade reads, and the uncertainty
 * budget with each source's 1σ, its share of the variance in %, and the total they add up to in quadrature.
 *
 * @param headings column headings, each with its unit
 * @param rows     one array of cells per row
 */
record FitTables(String[] headings, List<String[]> rows) {

    /** parameter · value ± σ total · σ noise · unit · note. */
    static FitTables results(FitOutcome o) {
        List<String[]> rows = new ArrayList<>();
        for (FittedParameter p : o.parameters()) {
            DisplayUnit u = DisplayUnit.of(p.ref());
            String note = p.atBound() ? "ended on a bound: σ not meaningful"
                    : !p.identifiable() ? "not determined by the data" : "";
            rows.add(new String[] {Words.parameter(p.ref(), p.quantity()),
                SigmaRounding.valueAndSigma(u.shown(p.value()), u.shown(p.sigma())),
                SigmaRounding.sigma(u.shown(p.sigmaNoise())), u.unit(), note});
        }
        return new FitTables(new String[] {"parameter", "value ± σ total (1σ)", "σ noise", "unit", "note"}, rows);
    }

    /**
     * source · input σ · for each fitted value, numbered as in the correlation table, "σ (share %)"; the last row is the total, the quadrature sum of the
     * lines (Yang, Ziade & Schmidt, Rev. Sci. Instrum. 87, 014901, 2016: independent sources add in variance).
     */
    static FitTables budget(FitOutcome o) {
        List<FittedParameter> ps = o.parameters();
        String[] headings = new String[ps.size() + 2];
        headings[0] = "source";
        headings[1] = "input σ";
        double[] variance = new double[ps.size()];
        for (BudgetLine b : o.budget()) {
            for (int i = 0; i < ps.size(); i++) {
                variance[i] += b.contributions()[i] * b.contributions()[i];
            }
        }
        for (int i = 0; i < ps.size(); i++) {
            headings[i + 2] = "(" + (i + 1) + ") " + DisplayUnit.of(ps.get(i).ref()).unit();
        }
        List<String[]> rows = new ArrayList<>();
        for (BudgetLine b : o.budget()) {
            String[] r = new String[ps.size() + 2];
            r[0] = b.source() == null ? b.label() : Words.parameter(b.source(), b.quantity());
            r[1] = b.source() == null ? "—" : inputSigma(b.source(), b.inputSigma());
            for (int i = 0; i < ps.size(); i++) {
                double c = b.contributions()[i];
                r[i + 2] = SigmaRounding.sigma(DisplayUnit.of(ps.get(i).ref()).shown(c)) + "  ("
                        + percent(variance[i] > 0 ? c * c / variance[i] : Double.NaN) + ")";
            }
            rows.add(r);
        }
        String[] total = new String[ps.size() + 2];
        total[0] = "total (in quadrature)";
        total[1] = "";
        for (int i = 0; i < ps.size(); i++) {
            total[i + 2] = SigmaRounding.sigma(DisplayUnit.of(ps.get(i).ref()).shown(Math.sqrt(variance[i])))
                    + "  (100 %)";
        }
        rows.add(total);
        return new FitTables(headings, rows);
    }

    private static String inputSigma(ParameterRef ref, double sigma) {
        DisplayUnit u = DisplayUnit.of(ref);
        return SigmaRounding.sigma(u.shown(sigma)) + " " + u.unit();
    }

    private static String percent(double share) {
        if (Double.isNaN(share)) {
            return "— %";
        }
        double pct = 100 * share;
        return (pct >= 10 || pct == 0 ? String.format(java.util.Locale.ROOT, "%.0f", pct)
                : String.format(java.util.Locale.ROOT, "%.1f", pct)) + " %";
    }
}
