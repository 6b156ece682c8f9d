package lamella.api;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;

/**
 * Text files written so that nobody ever sees half of one: into a temporary file beside the target, then moved into
 * place (atomically where the file system can). And the one number format of Lamella's CSV files.
 */
public final class AtomicText {

    private AtomicText() {
    }

    /** Writes UTF-8 text to target, creating its folder; on failure the target is as it was. */
    public static void write(Path target, String content) throws IOException {
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

    /** A number as Lamella's CSV files write it: 13 significant digits, exponent form, a point as separator. */
    public static String number(double v) {
        return String.format(Locale.ROOT, "%.12e", v);
    }
}
