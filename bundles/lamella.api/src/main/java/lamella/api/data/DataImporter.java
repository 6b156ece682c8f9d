package lamella.api.data;

import java.nio.file.Path;
import lamella.api.InputException;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * Reads one family of instrument files into a {@link Dataset}, offered as a service. Any number of importers may be
 * live; the one most confident about a file reads it, unless the user names one by {@link #id()}.
 */
@ConsumerType
public interface DataImporter {

    /** The name a user gives to choose this importer, such as {@code delimited}. Unique among live importers. */
    String id();

    /** One line saying which files it reads. */
    String summary();

    /**
     * How sure this importer is that it can read the file, from 0 (it cannot) to 1 (the file declares this format).
     * Must be cheap and must not throw: it sees only the first bytes.
     *
     * @param file the file, for its name
     * @param head up to {@link ImportLimits#HEAD_BYTES} bytes from the start of the file
     */
    double confidence(Path file, byte[] head);

    /**
     * Reads the whole file. Every problem — unreadable, not text, too large, a cell that is not a number, a ragged
     * row, x values out of order — is an {@link InputException} naming the file and line; nothing is
     * guessed, clamped or skipped silently.
     */
    Dataset read(Path file) throws InputException;
}
