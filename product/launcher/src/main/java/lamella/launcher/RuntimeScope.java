package lamella.launcher;

import java.util.List;
import java.util.Set;

/**
 * Which of the shipped bundles a run starts. The desktop feature's bundles (SWT, the workbench, its panels) lie in
 * {@code bundle/desktop/}; a headless command installs them without starting them, so that it never pays for their
 * start-up while a plug-in that imports their packages still resolves.
 */
public enum RuntimeScope {
    /**
     * A run that only shows help ({@code help}, {@code -h}, {@code --help}, {@code help COMMAND}, {@code COMMAND
     * --help}): without plug-ins, only the bundles that provide commands and what they need ({@link CommandLayer});
     * with plug-ins, as {@link #COMMANDS}, since a plug-in's command may need anything.
     */
    HELP,
    /** A headless command: every shipped bundle but the desktop's is started. */
    COMMANDS,
    /** The workbench: every shipped bundle is started. */
    WORKBENCH;

    private static final Set<String> HELP_FLAGS = Set.of("-h", "--help");
    private static final String END_OF_OPTIONS = "--";

    /** The scope of a headless command line, read as the command dispatcher reads it. */
    public static RuntimeScope of(List<String> commandLine) {
        if (commandLine.isEmpty() || commandLine.get(0).equals("help") || HELP_FLAGS.contains(commandLine.get(0))) {
            return HELP;
        }
        for (String arg : commandLine.subList(1, commandLine.size())) {
            if (arg.equals(END_OF_OPTIONS)) {
                return COMMANDS;
            }
            if (HELP_FLAGS.contains(arg)) {
                return HELP;
            }
        }
        return COMMANDS;
    }
}
