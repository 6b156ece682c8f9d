package lamella.cli.data;

import java.util.ArrayList;
import java.util.List;
import lamella.api.AtomicText;
import lamella.api.data.SignalNames;
import lamella.conditioning.ConditionedTable;

/**
 * The normalised dataset as CSV: the x column, the signal columns, a {@code sigma_<signal>} column for each signal
 * with a standard deviation, and the marks {@code outlier} and {@code excluded} (1 or 0). Numbers with 13 significant
 * digits, as {@code simulate} writes them.
 */
final class DataCsv {

    static final String OUTLIER = "outlier";
    static final String EXCLUDED = "excluded";

    private DataCsv() {
    }

    static String format(ConditionedTable t) {
        List<String> header = new ArrayList<>();
        header.add(t.xColumn());
        header.addAll(t.signals().keySet());
        List<double[]> columns = new ArrayList<>(t.signals().values());
        for (String s : t.signals().keySet()) {
            double[] sigma = t.sigmas().get(s);
            if (sigma != null) {
                header.add(SignalNames.sigma(s));
                columns.add(sigma);
            }
        }
        header.add(OUTLIER);
        header.add(EXCLUDED);
        StringBuilder sb = new StringBuilder(64 * (t.rows() + 1) * header.size() / 4);
        sb.append(String.join(",", header)).append('\n');
        for (int r = 0; r < t.rows(); r++) {
            AtomicText.appendNumber(sb, t.x()[r]);
            for (double[] c : columns) {
                AtomicText.appendNumber(sb.append(','), c[r]);
            }
            sb.append(',').append(t.outlier()[r] ? '1' : '0').append(',').append(t.excluded()[r] ? '1' : '0')
                    .append('\n');
        }
        return sb.toString();
    }


}
