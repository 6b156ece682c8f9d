package lamella.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * The command line and working directory that the launcher attaches, as service properties, to its
 * {@code IntConsumer} launch service. Only JDK types, so that the launcher and the bundles share no class.
 */
record LaunchRequest(List<String> args, Path workingDirectory) {

    static final String ROLE_FILTER = "(lamella.role=launch)";
    static final String ARGS = "lamella.args";
    static final String CWD = "lamella.cwd";

    static LaunchRequest from(Map<String, ?> properties) {
        if (!(properties.get(ARGS) instanceof String[] args)) {
            throw new IllegalArgumentException("the launch service has no " + ARGS + " (String[]) property");
        }
        Object cwd = properties.get(CWD);
        Path directory = Path.of(cwd instanceof String s ? s : System.getProperty("user.dir"));
        return new LaunchRequest(List.of(args), directory.toAbsolutePath());
    }
}
