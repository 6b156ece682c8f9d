package lamella.cli.data;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
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
            sb.append(number(t.x()[r]));
            for (double[] c : columns) {
                sb.append(',').append(number(c[r]));
            }
            sb.append(',').append(t.outlier()[r] ? '1' : '0').append(',').append(t.excluded()[r] ? '1' : '0')
                    .append('\n');
        }
        return sb.toString();
    }

    static String number(double v) {
        return String.format(Locale.ROOT, "%.12e", v);
    }

    /** Writes next to the target and moves into place, so a reader never sees half a file. */
    static void writeAtomically(Path target, String content) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + target.getFileName(), ".part");
        try {
            try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                w.write(content);
            }
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
