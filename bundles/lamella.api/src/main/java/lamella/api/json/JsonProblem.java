package lamella.api.json;

/**
 * Why a text is not the JSON Lamella reads, and where: the 1-based line and the JSON path of the object, list or
 * value being read (empty at the top level). The reader of a file adds the file's name.
 */
public final class JsonProblem extends Exception {

    private static final long serialVersionUID = 1L;

    private final int line;
    private final String path;
    private final String problem;

    JsonProblem(int line, String path, String problem) {
        super((line > 0 ? "line " + line + ": " : "") + (path.isEmpty() ? "" : path + ": ") + problem);
        this.line = line;
        this.path = path;
        this.problem = problem;
    }

    /** The 1-based line, or −1 when the problem has none (an empty file has line 1). */
    public int line() {
        return line;
    }

    /** The JSON path where reading stopped, such as {@code stack.layers[1]}; empty at the top level. */
    public String path() {
        return path;
    }

    /** The problem in words, without its location. */
    public String problem() {
        return problem;
    }
}
