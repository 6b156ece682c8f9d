package lamella.launcher;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Hashtable;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.UnaryOperator;

import org.apache.felix.framework.Felix;
import org.apache.felix.framework.util.FelixConstants;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleException;
import org.osgi.framework.Constants;
import org.osgi.framework.launch.Framework;

/**
 * A running Lamella runtime: an embedded Felix on a runtime folder ({@code lib/}, {@code bundle/}, {@code plugins/},
 * {@code conf/}) with the shipped bundles of its {@link RuntimeScope} started and FileInstall watching the plugins
 * folder. Tests start it the same way the launcher does.
 */
public final class FelixRuntime implements AutoCloseable {

    private static final long STOP_TIMEOUT_MS = 10_000;
    private static final String FILEINSTALL = "org.apache.felix.fileinstall";
    /** The role of the service the runtime registers once every shipped bundle has started. */
    public static final String STARTED_ROLE = "runtime.started";
    /** The filter that finds that service. */
    public static final String STARTED_FILTER = "(lamella.role=runtime.started)";

    private final Felix framework;
    private final StorageArea storage;
    private final Path pluginsDir;
    private final List<Path> pluginsAtLaunch;
    private final List<Path> shipped;
    /** Shipped jars left out of a help run's install; installed after all if the rest does not resolve alone. */
    private final List<Path> later;
    /**
     * The workbench's desktop jars, whose bundles and what they resolve against or need are installed first; the
     * other shipped jars are installed once the window is up. Empty for any other run.
     */
    private final List<Path> window;
    private final ShippedManifests manifests;
    /** Shipped jars to install once the window is up; set when the window's layer is installed. */
    private List<Path> afterWindow = List.of();
    private final List<Path> installedOnly;
    private final Set<String> heldBack;
    private final Set<String> early;
    /** Runs between the start of the early bundles (and what they need) and the others'. */
    private Runnable beforeTheRest = () -> { };
    private final UnaryOperator<List<Bundle>> needed;
    private final Function<Path, String> locations;
    private final Optional<ShippedClasses> connected;
    private volatile List<Bundle> toStart = List.of();
    private volatile List<String> startProblems = List.of();
    private volatile Bundle toolkit;
    private final StandardErrorLog log;
    private volatile boolean closed;

    private FelixRuntime(Felix framework, StorageArea storage, Path pluginsDir, List<Path> pluginsAtLaunch,
            List<Path> shipped, List<Path> later, List<Path> window, ShippedManifests manifests,
            List<Path> installedOnly, Set<String> heldBack, Set<String> early, UnaryOperator<List<Bundle>> needed,
            Optional<ShippedClasses> connected, StandardErrorLog log) {
        this.framework = framework;
        this.log = log;
        this.storage = storage;
        this.pluginsDir = pluginsDir;
        this.pluginsAtLaunch = pluginsAtLaunch;
        this.shipped = shipped;
        this.later = later;
        this.window = window;
        this.manifests = manifests;
        this.installedOnly = installedOnly;
        this.heldBack = heldBack;
        this.early = early;
        this.needed = needed;
        this.connected = connected;
        Set<Path> connectedJars = connected.map(c -> Set.copyOf(c.jars())).orElse(Set.of());
        this.locations = jar -> connectedJars.contains(jar) ? ShippedClasses.location(jar)
                : ShippedBundles.location(jar);
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
     * Starts the runtime in {@code home} with the shipped bundles the scope needs, and returns once they are started
     * and the runtime's {@value #STARTED_FILTER} service is registered.
     *
     * @param overrides framework properties that win over {@code conf/lamella.properties} and {@code -D} options
     */
    public static FelixRuntime start(Path home, Map<String, String> overrides, RuntimeScope scope)
            throws IOException, BundleException {
        FelixRuntime runtime = prepare(home, overrides, scope);
        runtime.installAll();
        runtime.startBundles();
        runtime.announceStarted();
        return runtime;
    }

    /**
     * Starts the runtime in {@code home} and returns once the display toolkit (SWT) is installed and resolved, so
     * that the caller can set up the display while the other bundles install, resolve and start on a thread of their
     * own — the workbench's first, so that its window opens while the rest start. Then {@code whenStarted} runs on
     * that thread and the runtime's {@value #STARTED_FILTER} service is registered: the sign that every shipped
     * bundle, and whatever {@code whenStarted} waited for, is live.
     *
     * @param overrides framework properties that win over {@code conf/lamella.properties} and {@code -D} options
     */
    public static FelixRuntime startInBackground(Path home, Map<String, String> overrides, RuntimeScope scope,
            Consumer<FelixRuntime> whenStarted) throws IOException, BundleException {
        FelixRuntime runtime = prepare(home, overrides, scope);
        runtime.toolkit = ShippedBundles.installToolkit(runtime.framework.getBundleContext(), runtime.shipped,
                runtime.locations);
        if (scope == RuntimeScope.WORKBENCH) {
            // The window opens first; the geometries, techniques, importers and the rest start once it is up.
            runtime.beforeTheRest = () -> WorkbenchStart.awaitWindow(runtime.framework.getBundleContext(),
                    WorkbenchStart.WINDOW_PATIENCE_MS);
        }
        Thread starter = new Thread(() -> {
            try {
                runtime.installAll();
                runtime.startBundles();
            } catch (RuntimeException e) {
                // Whatever started is live; the window must not wait for the rest.
                runtime.startProblems = List.of("the bundles could not all be started: " + e);
            }
            if (runtime.closed) {
                return; // the window was closed while the bundles started
            }
            try {
                whenStarted.accept(runtime);
                runtime.announceStarted();
            } catch (IllegalStateException closedMeanwhile) {
                // The framework began to stop meanwhile.
            }
        }, "lamella-bundle-start");
        starter.setDaemon(true);
        starter.start();
        return runtime;
    }

    private static FelixRuntime prepare(Path home, Map<String, String> overrides, RuntimeScope scope)
            throws IOException, BundleException {
        StorageArea storage = StorageArea.create();
        Felix framework = null;
        try {
            Map<String, String> properties = RuntimeProperties.of(home, System.getProperties(), overrides,
                    storage.folder());
            Path pluginsDir = Path.of(properties.get(RuntimeProperties.PLUGINS_DIR));
            List<Path> pluginsAtLaunch = ShippedBundles.jarsIn(pluginsDir);
            List<Path> bundleJars = ShippedBundles.jarsIn(home.resolve("bundle"));
            List<Path> desktop = ShippedBundles.jarsIn(home.resolve("bundle/" + ShippedBundles.DESKTOP_FOLDER));
            // A headless command installs what only a plug-in could need — the desktop feature, whose packages a
            // plug-in may import, and Configuration Admin, which no shipped bundle uses — only when there are
            // plug-ins, and never starts the desktop's.
            boolean plugins = !pluginsAtLaunch.isEmpty();
            boolean workbench = scope == RuntimeScope.WORKBENCH;
            ShippedManifests manifests = ShippedManifests.read(bundleJars);
            // The shipped bundles of bundle/ share one class loader (the desktop's keep their own).
            Optional<ShippedClasses> connected = ShippedClasses.of(bundleJars, manifests,
                    properties.get(ShippedClasses.PROPERTY), System.getProperty("java.class.path"));
            List<Path> shipped = new ArrayList<>(bundleJars);
            List<Path> later = List.of();
            List<Path> window = List.of();
            List<Path> installedOnly = List.of();
            Set<String> heldBack = Set.of();
            Set<String> early = new HashSet<>();
            // Help without plug-ins installs and starts only the bundles of commands and what they need; with
            // plug-ins, whatever a plug-in's command needs may be anything.
            UnaryOperator<List<Bundle>> needed = scope == RuntimeScope.HELP && !plugins
                    ? CommandLayer::commandsAndNeeds : UnaryOperator.identity();
            Map<String, Object> config = new HashMap<>(properties);
            if (workbench) {
                shipped.addAll(0, desktop);
                desktop.forEach(jar -> early.add(ShippedBundles.location(jar)));
                // The window's bundles and what they resolve against or need are installed first; the geometries,
                // techniques, importers and the rest once the window is up, so that they do not compete with it.
                window = desktop;
            } else if (plugins) {
                installedOnly = desktop;
            } else {
                heldBack = ShippedBundles.FOR_PLUGINS;
                if (scope == RuntimeScope.HELP) {
                    shipped = new ArrayList<>(manifests.helpLayer(bundleJars, CommandLayer.COMMAND));
                    List<Path> rest = new ArrayList<>(bundleJars);
                    rest.removeAll(shipped);
                    later = List.copyOf(rest);
                }
                // With no plug-in, the system bundle exports only the platform packages the shipped bundles use (a
                // jar dropped into plugins/ while the command runs finds only those).
                if (!config.containsKey(Constants.FRAMEWORK_SYSTEMPACKAGES)) {
                    String own = ShippedManifests.frameworkExports();
                    Set<String> platform = ShippedManifests.platformPackages();
                    String packages = own == null ? ""
                            : manifests.systemPackages(bundleJars, own, platform);
                    if (!packages.isEmpty()) {
                        config.put(Constants.FRAMEWORK_SYSTEMPACKAGES, packages);
                    }
                }
            }

            StandardErrorLog log = new StandardErrorLog();
            config.put(FelixConstants.LOG_LOGGER_PROP, log);
            PluginFolderLog.install();
            StartupTrace.step("launcher: settings read, bundles listed");
            framework = connected.isPresent() ? new Felix(config, connected.get()) : new Felix(config);
            StartupTrace.step("framework constructed");
            framework.start();
            StartupTrace.step("framework started (system bundle resolved)");
            return new FelixRuntime(framework, storage, pluginsDir, pluginsAtLaunch, shipped, later, window,
                    manifests, installedOnly, heldBack, Set.copyOf(early), needed, connected, log);
        } catch (IOException | BundleException | RuntimeException e) {
            if (framework != null) {
                stop(framework);
            }
            storage.delete();
            throw e;
        }
    }

    /**
     * Installed once the framework runs, so that a bundle that cannot be installed says why. The workbench's window
     * layer is worked out here, on the thread that installs, since the window's display is being set up meanwhile.
     */
    private void installAll() {
        List<String> problems = new ArrayList<>();
        List<Path> shipped = this.shipped;
        if (!window.isEmpty()) {
            Set<Path> seeds = Set.copyOf(window);
            List<Path> first = manifests.with(window).layer(shipped, seeds::contains);
            if (first.size() < shipped.size()) {
                List<Path> rest = new ArrayList<>(shipped);
                rest.removeAll(first);
                afterWindow = List.copyOf(rest);
                shipped = first;
            }
        }
        toStart = ShippedBundles.installAndResolve(framework.getBundleContext(), shipped, installedOnly, heldBack,
                needed, locations, problems);
        if (!later.isEmpty() && anyUnresolved()) {
            // The layer read from the manifests missed something it needs: install the rest as well.
            StartupTrace.step("the help layer did not resolve alone; installing every shipped bundle");
            List<Path> all = new ArrayList<>(shipped);
            all.addAll(later);
            problems.clear();
            toStart = ShippedBundles.installAndResolve(framework.getBundleContext(), all, installedOnly, heldBack,
                    needed, locations, problems);
        }
        if (!afterWindow.isEmpty() && anyUnresolved()) {
            // The window's layer missed something it resolves against: install everything now, as before.
            StartupTrace.step("the window's bundles did not resolve alone; installing every shipped bundle");
            List<Path> all = new ArrayList<>(shipped);
            all.addAll(afterWindow);
            afterWindow = List.of();
            problems.clear();
            toStart = ShippedBundles.installAndResolve(framework.getBundleContext(), all, installedOnly, heldBack,
                    needed, locations, problems);
        }
        startProblems = List.copyOf(problems);
    }

    private boolean anyUnresolved() {
        for (Bundle bundle : framework.getBundleContext().getBundles()) {
            if (bundle.getState() == Bundle.INSTALLED) {
                return true;
            }
        }
        return false;
    }

    private void startBundles() {
        List<String> problems = new ArrayList<>(startProblems);
        Runnable once = new Runnable() {
            private boolean ran;

            @Override
            public void run() {
                if (!ran) {
                    ran = true;
                    beforeTheRest.run();
                }
            }
        };
        ShippedBundles.start(toStart, early, problems, once);
        if (!afterWindow.isEmpty()) {
            once.run();
            List<Bundle> rest = ShippedBundles.installAndResolve(framework.getBundleContext(), afterWindow, List.of(),
                    heldBack, needed, locations, problems);
            ShippedBundles.start(rest, Set.of(), problems, () -> { });
        }
        startProblems = List.copyOf(problems);
    }

    /** Registers the sign that every shipped bundle has started (a JDK type: it answers true). */
    private void announceStarted() {
        Hashtable<String, Object> properties = new Hashtable<>();
        properties.put("lamella.role", STARTED_ROLE);
        framework.getBundleContext().registerService(BooleanSupplier.class, () -> true, properties);
        StartupTrace.step("runtime started");
    }

    /** The class loader the shipped bundles of {@code bundle/} share; empty when each has its own. */
    public Optional<ClassLoader> sharedLoader() {
        return connected.map(ShippedClasses::loader);
    }

    /**
     * The display toolkit's bundle (SWT), resolved, when {@link #startInBackground} installed it ahead of the rest;
     * empty otherwise.
     */
    public Optional<Bundle> toolkit() {
        return Optional.ofNullable(toolkit);
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

    /**
     * One line per shipped bundle that could not be installed or started; empty for a sound runtime. Complete once the
     * bundles have started (for {@link #startInBackground}, when its {@code whenStarted} runs).
     */
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

    /**
     * Ends the runtime of a process whose command has finished and which exits next: FileInstall stops, the storage
     * goes, the rest of the framework is left running. Stopping it all would deactivate every component and stop
     * every bundle in turn, some 40 ms of a short command, for nothing the user could see: the command's outputs are
     * complete and closed when it returns its status, and the process's end stops every thread. FileInstall is
     * stopped because its folder watch waits in native code, and the JVM gives such a thread 300 ms before it exits.
     */
    public synchronized void abandon() {
        if (closed) {
            return;
        }
        log.silence();
        PluginFolderLog.silence();
        for (Bundle bundle : framework.getBundleContext().getBundles()) {
            if (FILEINSTALL.equals(bundle.getSymbolicName())) {
                try {
                    bundle.stop();
                } catch (BundleException | IllegalStateException e) {
                    // Already stopping or gone: the process ends either way.
                }
            }
        }
        discard();
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
