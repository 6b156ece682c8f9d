package lamella.cli;

import java.util.ArrayList;
import java.util.List;
import lamella.api.AtomicText;
import lamella.api.SignalTable;

/** CSV of model signals: a header of column names, then one row per x value, 13 significant digits. */
final class SignalCsv {

    private SignalCsv() {
    }

    static String format(SignalTable t) {
        StringBuilder sb = new StringBuilder();
        List<String> header = new ArrayList<>();
        t.xColumn().ifPresent(header::add);
        header.addAll(t.columns());
        sb.append(String.join(",", header)).append('\n');
        for (int r = 0; r < t.rows(); r++) {
            List<String> cells = new ArrayList<>();
            if (t.xColumn().isPresent()) {
                cells.add(number(t.x()[r]));
            }
            for (double[] column : t.values()) {
                cells.add(number(column[r]));
            }
            sb.append(String.join(",", cells)).append('\n');
        }
        return sb.toString();
    }

    static String number(double v) {
        return AtomicText.number(v);
    }

}
