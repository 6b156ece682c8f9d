package lamella.api.command;

import java.io.PrintStream;
import java.nio.file.Path;

/**
 * Where a command writes and relative to what it resolves paths.
 *
 * @param out              results and reports
 * @param err              errors and progress
 * @param workingDirectory the directory relative paths on the command line refer to
 */
public record CommandIO(PrintStream out, PrintStream err, Path workingDirectory) {

    public Path resolve(String path) {
        return workingDirectory.resolve(path).normalize();
    }
}
