package lamella.launcher;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.apache.felix.framework.Felix;
import org.apache.felix.framework.util.FelixConstants;
import org.osgi.framework.BundleException;
import org.osgi.framework.launch.Framework;

/**
 * A running Lamella runtime: an embedded Felix on a runtime folder ({@code lib/}, {@code bundle/}, {@code plugins/},
 * {@code conf/}) with the shipped bundles of its {@link RuntimeScope} started and FileInstall watching the plugins
 * folder. Tests start it the same way the launcher does.
 */
public final class FelixRuntime implements AutoCloseable {

    private static final long STOP_TIMEOUT_MS = 10_000;

    private final Felix framework;
    private final StorageArea storage;
    private final Path pluginsDir;
    private final List<Path> pluginsAtLaunch;
    private final List<String> startProblems;
    private final StandardErrorLog log;
    private boolean closed;

    private FelixRuntime(Felix framework, StorageArea storage, Path pluginsDir, List<Path> pluginsAtLaunch,
            List<String> startProblems, StandardErrorLog log) {
        this.framework = framework;
        this.log = log;
        this.storage = storage;
        this.pluginsDir = pluginsDir;
        this.pluginsAtLaunch = pluginsAtLaunch;
        this.startProblems = startProblems;
    }

    /**
     * Starts the runtime in {@code home} with every shipped bundle, as the workbench has it.
     *
     * @param overrides framework properties that win over {@code conf/lamella.properties} and {@code -D} options
     */
    public static FelixRuntime start(Path home, Map<String, String> overrides) throws IOException, BundleException {
        return start(home, overrides, RuntimeScope.WORKBENCH);
    }

    /**
     * Starts the runtime in {@code home} with the shipped bundles the scope needs.
     *
     * @param overrides framework properties that win over {@code conf/lamella.properties} and {@code -D} options
     */
    public static FelixRuntime start(Path home, Map<String, String> overrides, RuntimeScope scope)
            throws IOException, BundleException {
        StorageArea storage = StorageArea.create();
        Felix framework = null;
        try {
            Map<String, String> properties = RuntimeProperties.of(home, System.getProperties(), overrides,
                    storage.folder());
            Path pluginsDir = Path.of(properties.get(RuntimeProperties.PLUGINS_DIR));
            List<Path> pluginsAtLaunch = ShippedBundles.jarsIn(pluginsDir);
            List<Path> shipped = new ArrayList<>(ShippedBundles.jarsIn(home.resolve("bundle")));
            List<Path> desktop = ShippedBundles.jarsIn(home.resolve("bundle/" + ShippedBundles.DESKTOP_FOLDER));
            List<Path> installedOnly = List.of();
            if (scope == RuntimeScope.WORKBENCH) {
                shipped.addAll(desktop);
            } else {
                installedOnly = desktop;
            }

            Map<String, Object> config = new HashMap<>(properties);
            StandardErrorLog log = new StandardErrorLog();
            config.put(FelixConstants.LOG_LOGGER_PROP, log);
            PluginFolderLog.install();
            framework = new Felix(config);
            framework.start();
            // Started once the framework runs, so that a bundle that cannot start says why here.
            List<String> problems = ShippedBundles.installAndStart(framework.getBundleContext(), shipped,
                    installedOnly);
            return new FelixRuntime(framework, storage, pluginsDir, pluginsAtLaunch, List.copyOf(problems), log);
        } catch (IOException | BundleException | RuntimeException e) {
            if (framework != null) {
                stop(framework);
            }
            storage.delete();
            throw e;
        }
    }

    public Framework framework() {
        return framework;
    }

    public Path pluginsDir() {
        return pluginsDir;
    }

    /** The jars that were in the plugins folder before FileInstall first looked at it. */
    public List<Path> pluginsAtLaunch() {
        return pluginsAtLaunch;
    }

    /** One line per shipped bundle that could not be installed or started; empty for a sound runtime. */
    public List<String> startProblems() {
        return startProblems;
    }

    /**
     * Stops the framework and deletes its storage; safe to call again. The framework's and the plugins folder's
     * messages stop first: bundles stopping, or a jar dropped into plugins/ meanwhile, are nothing to report.
     */
    @Override
    public synchronized void close() {
        if (closed) {
            return;
        }
        closed = true;
        log.silence();
        PluginFolderLog.silence();
        try {
            stop(framework);
        } finally {
            storage.delete();
        }
    }

    /**
     * Ends the runtime of a process that a signal is ending: the framework is left as it is — stopping it would
     * deactivate the command under way and have it report that — nothing more is logged, and the storage goes.
     */
    public synchronized void discard() {
        if (closed) {
            return;
        }
        closed = true;
        log.silence();
        PluginFolderLog.silence();
        try {
            storage.delete();
        } catch (UncheckedIOException stillInUse) {
            // The cache is a temporary folder; a file the running framework still writes is left to the system.
        }
    }

    private static void stop(Felix framework) {
        try {
            framework.stop();
            framework.waitForStop(STOP_TIMEOUT_MS);
        } catch (BundleException e) {
            System.err.println("lamella: the framework did not stop cleanly: " + e.getMessage());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
