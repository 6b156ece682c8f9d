package lamella.api;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Text files written so that nobody ever sees half of one: into a temporary file beside the target, then moved into
 * place (atomically where the file system can). And the one number format of Lamella's CSV files.
 */
public final class AtomicText {

    /**
     * Temporary files being written. A process ended by a signal (Ctrl-C, SIGTERM) runs its shutdown hooks but not
     * the {@code finally} of the writing thread, so the hook removes them: an interrupted write leaves nothing.
     */
    private static final Set<Path> UNFINISHED = ConcurrentHashMap.newKeySet();

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(AtomicText::removeUnfinished, "lamella-unfinished-writes"));
    }

    private AtomicText() {
    }

    private static void removeUnfinished() {
        for (Path tmp : UNFINISHED) {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException e) {
                // The process is ending; a hidden temporary file that cannot be removed is all that is left.
            }
        }
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
        if (Files.isDirectory(target)) {
            throw new FileSystemException(target.toString(), null, "Is a directory");
        }
        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = createPart(dir, target.getFileName().toString(), content);
        try {
            keepPermissions(target, tmp);
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
            UNFINISHED.remove(tmp);
        }
    }

    /**
     * Writes {@code content} to a new hidden part file beside the target and returns it (listed as unfinished). Its
     * name carries the process id, the clock and a counter rather than a random UUID, whose secure random generator
     * costs a short command some 10 ms to seed; the name need only be new, and one already taken (by another process
     * on a shared folder) is skipped, since the file is created only if it does not exist.
     */
    private static Path createPart(Path dir, String name, byte[] content) throws IOException {
        for (int attempt = 0; ; attempt++) {
            Path tmp = dir.resolve("." + name + "." + PID + "-" + Long.toString(System.nanoTime() & Long.MAX_VALUE, 36)
                    + "-" + PARTS.incrementAndGet() + ".part");
            UNFINISHED.add(tmp);
            try {
                Files.write(tmp, content, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
                return tmp;
            } catch (FileAlreadyExistsException taken) {
                UNFINISHED.remove(tmp);
                if (attempt >= MAX_PART_ATTEMPTS) {
                    throw taken;
                }
            } catch (IOException | RuntimeException e) {
                Files.deleteIfExists(tmp);
                UNFINISHED.remove(tmp);
                throw e;
            }
        }
    }

    private static final long PID = ProcessHandle.current().pid();
    private static final AtomicLong PARTS = new AtomicLong();
    private static final int MAX_PART_ATTEMPTS = 100;

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

    /**
     * A number as Lamella's CSV files write it: 13 significant digits, exponent form, a point as separator — the text
     * of {@code String.format(Locale.ROOT, "%.12e", v)} (NaN and ±Infinity spelt the same), about twenty times faster:
     * the value is scaled by exact powers of ten to 13 digits and rounded, and where the scaled value lies too near a
     * rounding tie for its own few roundings to decide, the exact decimal value is rounded instead: the text is
     * always the double's exact value rounded half up. (Java's {@code %.12e} rounds the shortest decimal text, which
     * can be one unit off in the last digit.)
     */
    public static String number(double v) {
        return appendNumber(new StringBuilder(20), v).toString();
    }

    /** {@link #number} appended to {@code sb}, without an intermediate string. */
    public static StringBuilder appendNumber(StringBuilder sb, double v) {
        if (!Double.isFinite(v)) {
            return sb.append(Double.isNaN(v) ? "NaN" : v > 0 ? "Infinity" : "-Infinity");
        }
        if (v < 0 || (v == 0 && 1 / v < 0)) {
            sb.append('-');
        }
        double a = Math.abs(v);
        if (a == 0) {
            return sb.append("0.000000000000e+00");
        }
        int e = (int) Math.floor(Math.log10(a));
        double s = scaled(a, 12 - e);
        if (s < 999_999_999_999.5) {
            e--;
            s = scaled(a, 12 - e);
        } else if (s >= 9_999_999_999_999.5) {
            e++;
            s = scaled(a, 12 - e);
        }
        long m;
        double fraction = s - Math.floor(s);
        if (Math.abs(fraction - 0.5) < TIE_WINDOW) {
            // too near a tie for the scaled value's few roundings to decide: round the exact decimal value
            BigDecimal exact = new BigDecimal(a).round(new MathContext(13, RoundingMode.HALF_UP));
            m = exact.unscaledValue().longValueExact();
            e = exact.precision() - exact.scale() - 1;
            for (int p = exact.precision(); p < 13; p++) {
                m *= 10;
            }
        } else {
            m = (long) Math.floor(s + 0.5);
        }
        if (m >= 10_000_000_000_000L) {
            // rounded up to the next power of ten: 9.9999999999996e… becomes 1.000000000000e…+1
            m /= 10;
            e++;
        }
        char[] text = new char[19];
        for (int i = 13; i >= 2; i--) {
            text[i] = (char) ('0' + m % 10);
            m /= 10;
        }
        text[0] = (char) ('0' + m);
        text[1] = '.';
        text[14] = 'e';
        text[15] = e < 0 ? '-' : '+';
        int ae = Math.abs(e);
        int n = 16;
        if (ae >= 100) {
            text[n++] = (char) ('0' + ae / 100);
        }
        text[n++] = (char) ('0' + ae / 10 % 10);
        text[n++] = (char) ('0' + ae % 10);
        return sb.append(text, 0, n);
    }

    /**
     * The scaled value carries at most four roundings of half an ulp, under 0.005 of a unit in the 13th digit; within
     * four times that of a tie the exact value decides (a few values in a hundred).
     */
    private static final double TIE_WINDOW = 0.02;
    private static final double[] POWERS = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < POWERS.length; i++) {
            POWERS[i] = p;
            p *= 10;
        }
    }

    /** a·10^p by exact powers of ten (10^0 … 10^22 are exact doubles), a few roundings at most. */
    private static double scaled(double a, int p) {
        double s = a;
        while (p > 22) {
            s *= POWERS[22];
            p -= 22;
        }
        while (p < -22) {
            s /= POWERS[22];
            p += 22;
        }
        return p >= 0 ? s * POWERS[p] : s / POWERS[-p];
    }
}
