package lamella.api.command;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;

/**
 * Where a command writes and relative to what it resolves paths.
 *
 * @param out              results and reports
 * @param err              errors and progress
 * @param workingDirectory the directory relative paths on the command line refer to
 * @param runtimeInputs    files the runtime reads for the command beyond its command line (configured material
 *                         libraries), which its outputs must never replace
 */
public record CommandIO(PrintStream out, PrintStream err, Path workingDirectory, List<Path> runtimeInputs) {

    public CommandIO {
        runtimeInputs = List.copyOf(runtimeInputs);
    }

    public CommandIO(PrintStream out, PrintStream err, Path workingDirectory) {
        this(out, err, workingDirectory, List.of());
    }

    public Path resolve(String path) {
        return workingDirectory.resolve(path).normalize();
    }

    /** The same streams and folder, with these runtime inputs. */
    public CommandIO withRuntimeInputs(List<Path> files) {
        return new CommandIO(out, err, workingDirectory, files);
    }
}
