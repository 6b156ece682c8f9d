package lamella.launcher;

/**
 * Which of the shipped bundles a run starts. The desktop feature's bundles (SWT, the workbench, its panels) lie in
 * {@code bundle/desktop/}; a headless command installs them without starting them, so that it never pays for their
 * start-up while a plug-in that imports their packages still resolves.
 */
public enum RuntimeScope {
    /** A headless command: every shipped bundle but the desktop's is started. */
    COMMANDS,
    /** The workbench: every shipped bundle is started. */
    WORKBENCH
}
