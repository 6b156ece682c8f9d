package lamella.cli;

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
