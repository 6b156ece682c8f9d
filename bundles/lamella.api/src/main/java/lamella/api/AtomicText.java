package lamella.api;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Locale;
import java.util.UUID;

/**
 * Text files written so that nobody ever sees half of one: into a temporary file beside the target, then moved into
 * place (atomically where the file system can). And the one number format of Lamella's CSV files.
 */
public final class AtomicText {

    private AtomicText() {
    }

    /**
     * Writes UTF-8 text to target, creating its folder; on failure the target is as it was. A new file gets the
     * user's usual permissions (the process's umask), a replaced one keeps its own.
     */
    public static void write(Path target, String content) throws IOException {
        writeBytes(target, content.getBytes(StandardCharsets.UTF_8));
    }

    /** Writes bytes (an image, say) the same way. */
    public static void writeBytes(Path target, byte[] content) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = dir.resolve("." + target.getFileName() + "." + UUID.randomUUID() + ".part");
        try {
            Files.write(tmp, content, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
            keepPermissions(target, tmp);
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    private static void keepPermissions(Path target, Path tmp) throws IOException {
        if (!Files.isRegularFile(target)) {
            return;
        }
        try {
            Files.setPosixFilePermissions(tmp, Files.getPosixFilePermissions(target));
        } catch (UnsupportedOperationException notPosix) {
            // the file system has no POSIX permissions; the new file has the system's default ones
        }
    }

    /** A number as Lamella's CSV files write it: 13 significant digits, exponent form, a point as separator. */
    public static String number(double v) {
        return String.format(Locale.ROOT, "%.12e", v);
    }
}
