package lamella.api.material;

/**
 * A problem found in a library: where it is and what is wrong. An error keeps the entry (or file) it concerns out of
 * the library; a warning leaves it in and asks the curator to look.
 *
 * @param severity error or warning
 * @param file     the file (or bundle entry) it is in
 * @param line     the 1-based line, or −1 when the problem concerns the whole file or folder
 * @param path     the JSON path inside the file, empty when none
 * @param message  what is wrong and what was expected
 */
public record LibraryFinding(Severity severity, String file, int line, String path, String message) {

    public enum Severity {
        ERROR, WARNING
    }

    public LibraryFinding {
        path = path == null ? "" : path;
    }

    public boolean isError() {
        return severity == Severity.ERROR;
    }

    /** "file:line: path: error: message", the form of every other Lamella message. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(file);
        if (line > 0) {
            sb.append(':').append(line);
        }
        sb.append(": ");
        if (!path.isEmpty()) {
            sb.append(path).append(": ");
        }
        return sb.append(severity == Severity.ERROR ? "error: " : "warning: ").append(message).toString();
    }
}
