package lamella.api;

import java.nio.file.Path;

/**
 * Bad input: a value, a key or a file that cannot be used as given. Carries where the problem is — a file, a JSON
 * path such as {@code stack.layers[1].k_through_w_mk}, a line — so that the message can name it. Commands turn it
 * into exit status 2.
 */
public class InputException extends Exception {

    private static final long serialVersionUID = 1L;

    private final transient Path file;
    private final String path;
    private final int line;
    private final String problem;

    public InputException(Path file, String path, int line, String problem) {
        super(compose(file, path, line, problem));
        this.file = file;
        this.path = path;
        this.line = line;
        this.problem = problem;
    }

    /** A problem at a JSON path (or another logical location), with no file yet. */
    public static InputException at(String path, String problem) {
        return new InputException(null, path, -1, problem);
    }

    /** The same problem, located in a file. */
    public InputException inFile(Path f) {
        return new InputException(f, path, line, problem);
    }

    /** The file, or null when not known. */
    public Path file() {
        return file;
    }

    /** The JSON path, or null. */
    public String path() {
        return path;
    }

    /** The 1-based line, or −1. */
    public int line() {
        return line;
    }

    /** The problem without its location. */
    public String problem() {
        return problem;
    }

    private static String compose(Path file, String path, int line, String problem) {
        StringBuilder sb = new StringBuilder();
        if (file != null) {
            sb.append(file);
            if (line > 0) {
                sb.append(':').append(line);
            }
            sb.append(": ");
        } else if (line > 0) {
            sb.append("line ").append(line).append(": ");
        }
        if (path != null && !path.isEmpty()) {
            sb.append(path).append(": ");
        }
        return sb.append(problem).toString();
    }
}
