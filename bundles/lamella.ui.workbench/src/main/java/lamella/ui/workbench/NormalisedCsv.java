package lamella.ui.workbench;


import java.util.ArrayList;
import java.util.List;
import lamella.api.AtomicText;
import lamella.api.data.SignalNames;
import lamella.conditioning.ConditionedTable;

/**
 * A conditioned dataset in Lamella's normalised CSV, the form the import command writes and fits read: x, the
 * signals, {@code sigma_<signal>} where known, then the marks {@code outlier} and {@code excluded} (1 or 0).
 */
final class NormalisedCsv {

    private NormalisedCsv() {
    }

    static String of(ConditionedTable t) {
        List<String> header = new ArrayList<>();
        header.add(t.xColumn());
        header.addAll(t.signals().keySet());
        List<double[]> columns = new ArrayList<>(t.signals().values());
        t.signals().keySet().forEach(s -> {
            if (t.sigmas().containsKey(s)) {
                header.add(SignalNames.sigma(s));
                columns.add(t.sigmas().get(s));
            }
        });
        header.add("outlier");
        header.add("excluded");
        StringBuilder sb = new StringBuilder(String.join(",", header)).append('\n');
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
