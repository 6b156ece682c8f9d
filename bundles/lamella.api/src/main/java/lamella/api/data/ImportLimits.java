package lamella.api.data;

/**
 * The limits every importer enforces, so that no file — however large or strange — exhausts memory. They are far
 * above what an instrument writes (a TDTR or FDTR scan has hundreds to thousands of rows).
 */
public final class ImportLimits {

    /** Files larger than this are refused before reading: 64 MiB. */
    public static final long MAX_FILE_BYTES = 64L * 1024 * 1024;

    /** At most this many lines per file, which bounds the rows kept in memory. */
    public static final int MAX_LINES = 1_000_000;

    /** At most this many bytes in one line. */
    public static final int MAX_LINE_BYTES = 64 * 1024;

    /** How much of a file {@link DataImporter#confidence} sees. */
    public static final int HEAD_BYTES = 8 * 1024;

    private ImportLimits() {
    }

    /** A size for messages, in bytes and binary units. */
    public static String describeSize(long bytes) {
        if (bytes >= 1024L * 1024 * 1024) {
            return bytes + " bytes (" + String.format(java.util.Locale.ROOT, "%.1f GiB", bytes / 1073741824.0) + ")";
        }
        if (bytes >= 1024L * 1024) {
            return bytes + " bytes (" + String.format(java.util.Locale.ROOT, "%.1f MiB", bytes / 1048576.0) + ")";
        }
        return bytes + " bytes";
    }
}
