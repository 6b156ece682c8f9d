package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Hashtable;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import java.util.jar.JarFile;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.Constants;
import org.osgi.framework.InvalidSyntaxException;
import org.osgi.framework.ServiceReference;
import org.osgi.framework.wiring.BundleWiring;

import lamella.launcher.FelixRuntime;
import lamella.launcher.RuntimeScope;

/**
 * A headless command starts every shipped bundle but the desktop feature's (in bundle/desktop/), which it installs
 * only when there are plug-ins, and Configuration Admin, which it starts only then; the workbench starts them all.
 */
class RuntimeScopeIT {

    @TempDir
    Path home;

    @Test
    void aCommandWithoutPluginsLeavesOutTheDesktopAndHoldsBackConfigurationAdmin() throws Exception {
        RuntimeCopy.into(home);
        List<String> desktop = symbolicNames(home.resolve("bundle/desktop"));
        assertTrue(desktop.contains("lamella.ui.workbench") && desktop.contains("org.eclipse.swt"), desktop.toString());
        try (FelixRuntime runtime = FelixRuntime.start(home, Map.of(), RuntimeScope.COMMANDS)) {
            assertEquals(List.of(), runtime.startProblems());
            List<String> wrong = new ArrayList<>();
            for (Bundle bundle : runtime.framework().getBundleContext().getBundles()) {
                String name = bundle.getSymbolicName();
                if (bundle.getBundleId() == 0) {
                    continue;
                }
                if (name.equals(CONFIG_ADMIN)) {
                    // Installed, and resolved when FileInstall's optional import wires to it, but not started.
                    if (bundle.getState() == Bundle.ACTIVE || bundle.getState() == Bundle.STARTING) {
                        wrong.add(name + " in state " + bundle.getState() + ", expected not started");
                    }
                    continue;
                }
                int expected = isFragment(bundle) ? Bundle.RESOLVED : Bundle.ACTIVE;
                if (desktop.contains(name) || bundle.getState() != expected) {
                    wrong.add(name + " in state " + bundle.getState() + ", expected "
                            + (desktop.contains(name) ? "not installed" : expected));
                }
            }
            assertEquals(List.of(), wrong);
            assertTrue(started(runtime), "the runtime's started service is registered when start returns");
        }
    }

    /** A plug-in may import the desktop's packages or need Configuration Admin: with one, both are there. */
    @Test
    void aCommandWithAPluginInstallsTheDesktopBundlesAndStartsConfigurationAdmin() throws Exception {
        RuntimeCopy.into(home);
        TestBundles.write(home.resolve("plugins/lab.nothing.jar"), "lab.nothing", Map.of());
        List<String> desktop = symbolicNames(home.resolve("bundle/desktop"));
        try (FelixRuntime runtime = FelixRuntime.start(home, Map.of(), RuntimeScope.COMMANDS)) {
            assertEquals(List.of(), runtime.startProblems());
            List<String> wrong = new ArrayList<>();
            List<String> seen = new ArrayList<>();
            for (Bundle bundle : runtime.framework().getBundleContext().getBundles()) {
                String name = bundle.getSymbolicName();
                seen.add(name);
                if (desktop.contains(name) && bundle.getState() != Bundle.INSTALLED) {
                    wrong.add(name + " in state " + bundle.getState() + ", expected installed only");
                }
                if (name.equals(CONFIG_ADMIN) && bundle.getState() != Bundle.ACTIVE) {
                    wrong.add(name + " in state " + bundle.getState() + ", expected active");
                }
            }
            assertEquals(List.of(), wrong);
            assertTrue(seen.containsAll(desktop), seen.toString());
        }
    }

    /** The workbench's window opens while the bundles start: start returns with SWT resolved and the rest to come. */
    @Test
    void theWorkbenchsBackgroundStartHasTheToolkitFirstAndSaysWhenAllAreLive() throws Exception {
        RuntimeCopy.into(home);
        AtomicBoolean ranBeforeTheSign = new AtomicBoolean();
        AtomicReference<List<String>> problems = new AtomicReference<>();
        try (FelixRuntime runtime = FelixRuntime.startInBackground(home, Map.of(), RuntimeScope.WORKBENCH, r -> {
            problems.set(r.startProblems());
            ranBeforeTheSign.set(!started(r));
        })) {
            Bundle toolkit = runtime.toolkit().orElseThrow();
            assertEquals("org.eclipse.swt", toolkit.getSymbolicName());
            assertTrue(toolkit.getState() >= Bundle.RESOLVED, "state " + toolkit.getState());
            assertTrue(Eventually.within(Duration.ofSeconds(30), () -> started(runtime)), "no started service");
            assertEquals(List.of(), problems.get());
            assertTrue(ranBeforeTheSign.get(), "whenStarted runs before the started service is registered");
            List<String> notActive = new ArrayList<>();
            for (Bundle bundle : runtime.framework().getBundleContext().getBundles()) {
                if (!isFragment(bundle) && bundle.getState() != Bundle.ACTIVE) {
                    notActive.add(bundle.getSymbolicName() + " in state " + bundle.getState());
                }
            }
            assertEquals(List.of(), notActive);
        }
    }

    /**
     * The bundles the window does not need — geometries, techniques, importers, the command line — wait for the
     * window (its control service) instead of competing with it for the processors: they are not even installed
     * before, and are installed, resolved and started as soon as it is there.
     */
    @Test
    void theBundlesTheWindowDoesNotNeedStartOnceItIsOpen() throws Exception {
        RuntimeCopy.into(home);
        try (FelixRuntime runtime = FelixRuntime.startInBackground(home, Map.of(), RuntimeScope.WORKBENCH, r -> { })) {
            BundleContext context = runtime.framework().getBundleContext();
            assertTrue(Eventually.within(Duration.ofSeconds(30), () -> hasService(context, Runnable.class,
                    "(lamella.role=workbench)")), "the workbench's component came up");
            long windowOpened = System.nanoTime();
            for (String waiting : List.of("lamella.geometry.point", "lamella.technique.tdtr", "lamella.io.delimited")) {
                // Not even installed: the window's layer (the desktop bundles and what they wire to) goes first.
                assertTrue(Stream.of(context.getBundles()).noneMatch(b -> waiting.equals(b.getSymbolicName())),
                        waiting + " was installed before the window opened");
            }
            assertFalse(started(runtime));
            // What the workbench registers once its window is open.
            Hashtable<String, Object> props = new Hashtable<>();
            props.put("lamella.role", "workbench.control");
            context.registerService(java.util.function.Function.class, x -> x, props);
            assertTrue(Eventually.within(Duration.ofSeconds(30),
                    () -> Stream.of(context.getBundles()).anyMatch(b -> "lamella.geometry.point"
                            .equals(b.getSymbolicName()) && b.getState() == Bundle.ACTIVE)), "the rest did not start");
            double waitedMs = (System.nanoTime() - windowOpened) / 1e6;
            // Well before the patience of 5 s: the rest started because the window opened, not because time ran out.
            assertTrue(waitedMs < 4_000, "the rest started " + waitedMs + " ms after the window opened");
            assertTrue(Eventually.within(Duration.ofSeconds(30), () -> started(runtime)), "no started service");
            assertEquals(List.of(), runtime.startProblems());
        }
    }

    private static boolean hasService(BundleContext context, Class<?> type, String filter) {
        try {
            return !context.getServiceReferences(type, filter).isEmpty();
        } catch (InvalidSyntaxException e) {
            throw new AssertionError(e);
        }
    }

    @Test
    void theWorkbenchStartsTheDesktopBundlesToo() throws Exception {
        RuntimeCopy.into(home);
        try (FelixRuntime runtime = FelixRuntime.start(home, Map.of(), RuntimeScope.WORKBENCH)) {
            assertEquals(List.of(), runtime.startProblems());
            for (Bundle bundle : runtime.framework().getBundleContext().getBundles()) {
                if (bundle.getSymbolicName().equals("lamella.ui.workbench")) {
                    assertEquals(Bundle.ACTIVE, bundle.getState());
                    return;
                }
            }
            throw new AssertionError("no workbench bundle in the runtime");
        }
    }

    /**
     * Help without plug-ins installs and starts only the bundles of commands and what they need — no geometry,
     * which commands only list — and every command is still there, with the same names as in a full start (a
     * command whose needs were left out would never register).
     */
    @Test
    void helpStartsTheCommandsAndWhatTheyNeedAndEveryCommandIsThere() throws Exception {
        RuntimeCopy.into(home);
        Set<String> all;
        try (FelixRuntime full = FelixRuntime.start(home, Map.of(), RuntimeScope.COMMANDS)) {
            all = commandNames(full);
        }
        assertTrue(all.containsAll(Set.of("help", "simulate", "fit", "import", "materials", "map")), all.toString());
        try (FelixRuntime help = FelixRuntime.start(home, Map.of(), RuntimeScope.HELP)) {
            assertEquals(List.of(), help.startProblems());
            assertEquals(all, commandNames(help));
            Map<String, Integer> states = new HashMap<>();
            for (Bundle bundle : help.framework().getBundleContext().getBundles()) {
                states.put(bundle.getSymbolicName(), bundle.getState());
            }
            // Read from the manifests before the framework starts: these are not even installed (had the layer
            // missed a bundle it needs, the launcher would have installed them all after all).
            for (String left : List.of("lamella.geometry.point", "lamella.geometry.ring", "lamella.io.delimited",
                    "lamella.technique.fdtr", "org.apache.felix.fileinstall")) {
                assertEquals(null, states.get(left), left + " is not installed for help");
            }
            for (String started : List.of("lamella.cli", "lamella.cli.data", "lamella.engine", "org.apache.felix.scr")) {
                assertEquals(Bundle.ACTIVE, states.get(started), started + " is started for help");
            }
        }
    }

    /**
     * Without plug-ins the system bundle exports only the platform packages the shipped bundles import (none imports
     * java.net.http); with one it exports every platform package, for whatever the plug-in imports.
     */
    @Test
    void theSystemBundleExportsThePlatformPackagesOfTheShippedBundlesUnlessThereArePlugins() throws Exception {
        RuntimeCopy.into(home);
        try (FelixRuntime runtime = FelixRuntime.start(home, Map.of(), RuntimeScope.COMMANDS)) {
            String exports = systemExports(runtime);
            assertTrue(exports.contains("javax.xml.parsers") && exports.contains("org.osgi.framework;"), exports);
            assertFalse(exports.contains("java.net.http"), exports);
        }
        TestBundles.write(home.resolve("plugins/lab.nothing.jar"), "lab.nothing", Map.of());
        try (FelixRuntime runtime = FelixRuntime.start(home, Map.of(), RuntimeScope.COMMANDS)) {
            assertTrue(systemExports(runtime).contains("java.net.http"));
        }
    }

    private static String systemExports(FelixRuntime runtime) {
        StringBuilder exports = new StringBuilder();
        for (var capability : runtime.framework().adapt(BundleWiring.class).getCapabilities("osgi.wiring.package")) {
            exports.append(capability.getAttributes().get("osgi.wiring.package")).append(";\n");
        }
        return exports.toString();
    }

    /** With a plug-in, help starts everything a command run does: the plug-in's command may need any of it. */
    @Test
    void helpWithAPluginStartsWhatACommandStarts() throws Exception {
        RuntimeCopy.into(home);
        TestBundles.write(home.resolve("plugins/lab.nothing.jar"), "lab.nothing", Map.of());
        try (FelixRuntime help = FelixRuntime.start(home, Map.of(), RuntimeScope.HELP)) {
            for (Bundle bundle : help.framework().getBundleContext().getBundles()) {
                if (bundle.getSymbolicName().startsWith("lamella.geometry.")) {
                    assertEquals(Bundle.ACTIVE, bundle.getState(), bundle.getSymbolicName());
                }
            }
        }
    }

    /**
     * The shipped bundles of bundle/ share one class loader (OSGi Connect); the desktop's have their own; with
     * lamella.shipped.classes=false every bundle has its own again. A class of the API is one class either way.
     */
    @Test
    void theShippedBundlesShareOneLoaderTheDesktopsKeepTheirOwnAndTheSettingTurnsItOff() throws Exception {
        RuntimeCopy.into(home);
        try (FelixRuntime runtime = FelixRuntime.start(home, Map.of(), RuntimeScope.WORKBENCH)) {
            ClassLoader shared = runtime.sharedLoader().orElseThrow();
            Map<String, ClassLoader> loaders = loaders(runtime);
            for (String name : List.of("lamella.api", "lamella.engine", "lamella.cli",
                    "com.fasterxml.jackson.core.jackson-databind",
                    "org.apache.felix.scr")) {
                assertEquals(shared, loaders.get(name), name);
            }
            ClassLoader workbench = loaders.get("lamella.ui.workbench");
            assertTrue(workbench != null && workbench != shared, String.valueOf(workbench));
            Bundle api = bundle(runtime, "lamella.api");
            Bundle desktop = bundle(runtime, "lamella.ui.workbench");
            assertEquals(api.loadClass("lamella.api.Technique"), desktop.loadClass("lamella.api.Technique"));
        }
        try (FelixRuntime runtime = FelixRuntime.start(home, Map.of("lamella.shipped.classes", "false"),
                RuntimeScope.COMMANDS)) {
            assertTrue(runtime.sharedLoader().isEmpty());
            Map<String, ClassLoader> loaders = loaders(runtime);
            assertTrue(loaders.get("lamella.api") != loaders.get("lamella.engine"), loaders.toString());
        }
    }

    /** One loader for all of bundle/ holds only if no two of its jars have a class in the same package. */
    @Test
    void noTwoShippedJarsSplitAPackage() throws IOException {
        Map<String, String> owner = new HashMap<>();
        List<String> split = new ArrayList<>();
        for (Path jar : jars(RuntimeCopy.assembled().resolve("bundle"))) {
            try (JarFile file = new JarFile(jar.toFile())) {
                Set<String> packages = new TreeSet<>();
                file.stream().map(e -> e.getName())
                        .filter(n -> n.endsWith(".class") && !n.startsWith("META-INF/") && n.contains("/"))
                        .forEach(n -> packages.add(n.substring(0, n.lastIndexOf('/'))));
                for (String p : packages) {
                    String before = owner.putIfAbsent(p, jar.getFileName().toString());
                    if (before != null) {
                        split.add(p + " in " + before + " and " + jar.getFileName());
                    }
                }
            }
        }
        assertEquals(List.of(), split);
    }

    private static Map<String, ClassLoader> loaders(FelixRuntime runtime) {
        Map<String, ClassLoader> loaders = new HashMap<>();
        for (Bundle bundle : runtime.framework().getBundleContext().getBundles()) {
            BundleWiring wiring = bundle.adapt(BundleWiring.class);
            if (bundle.getBundleId() != 0 && wiring != null && !isFragment(bundle)) {
                loaders.put(bundle.getSymbolicName(), wiring.getClassLoader());
            }
        }
        return loaders;
    }

    private static Bundle bundle(FelixRuntime runtime, String name) {
        for (Bundle bundle : runtime.framework().getBundleContext().getBundles()) {
            if (name.equals(bundle.getSymbolicName())) {
                return bundle;
            }
        }
        throw new AssertionError("no bundle " + name);
    }

    private static Set<String> commandNames(FelixRuntime runtime) throws InvalidSyntaxException {
        Set<String> names = new TreeSet<>();
        BundleContext context = runtime.framework().getBundleContext();
        for (ServiceReference<?> ref : context.getServiceReferences("lamella.api.command.Command", null)) {
            names.add(String.valueOf(ref.getProperty("lamella.command.name")));
        }
        return names;
    }

    /** A panel bundle added to the desktop feature but not to the runtime's desktop list would land in bundle/. */
    @Test
    void noBundleThatCommandsStartNeedsTheDisplayToolkit() throws IOException {
        List<String> needSwt = new ArrayList<>();
        for (Path jar : jars(RuntimeCopy.assembled().resolve("bundle"))) {
            try (JarFile file = new JarFile(jar.toFile())) {
                String imports = file.getManifest().getMainAttributes().getValue(Constants.IMPORT_PACKAGE);
                String host = file.getManifest().getMainAttributes().getValue(Constants.FRAGMENT_HOST);
                if ((imports != null && imports.contains("org.eclipse.swt"))
                        || (host != null && host.startsWith("org.eclipse.swt"))) {
                    needSwt.add(jar.getFileName().toString());
                }
            }
        }
        assertEquals(List.of(), needSwt, "these belong in bundle/desktop/ (product/runtime/pom.xml,"
                + " lamella.desktop.artifacts)");
        assertFalse(jars(RuntimeCopy.assembled().resolve("bundle/desktop")).isEmpty());
    }

    private static final String CONFIG_ADMIN = "org.apache.felix.configadmin";

    private static boolean isFragment(Bundle bundle) {
        return bundle.getHeaders("").get(Constants.FRAGMENT_HOST) != null;
    }

    private static boolean started(FelixRuntime runtime) {
        try {
            return !runtime.framework().getBundleContext()
                    .getServiceReferences(BooleanSupplier.class, FelixRuntime.STARTED_FILTER).isEmpty();
        } catch (InvalidSyntaxException e) {
            throw new AssertionError(e);
        }
    }

    private static List<String> symbolicNames(Path folder) throws IOException {
        List<String> names = new ArrayList<>();
        for (Path jar : jars(folder)) {
            try (JarFile file = new JarFile(jar.toFile())) {
                String name = file.getManifest().getMainAttributes().getValue(Constants.BUNDLE_SYMBOLICNAME);
                names.add(name.split(";")[0].trim());
            }
        }
        return names;
    }

    private static List<Path> jars(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.filter(f -> f.getFileName().toString().endsWith(".jar")).sorted().toList();
        }
    }
}
