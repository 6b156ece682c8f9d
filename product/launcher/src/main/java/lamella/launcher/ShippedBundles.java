package lamella.launcher;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Function;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.BundleException;
import org.osgi.framework.Constants;
import org.osgi.framework.wiring.FrameworkWiring;

/**
 * Installs the jars of the runtime's {@code bundle/} folder (and of {@code bundle/desktop/}) in place and starts every
 * one that is not a fragment and that the run's scope needs.
 */
final class ShippedBundles {

    /** The desktop feature's bundles, below {@code bundle/}. */
    static final String DESKTOP_FOLDER = "desktop";

    private ShippedBundles() {
    }

    static List<Path> jarsIn(Path folder) throws IOException {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        try (Stream<Path> files = Files.list(folder)) {
            return files.filter(f -> f.getFileName().toString().endsWith(".jar") && Files.isRegularFile(f))
                    .sorted()
                    .toList();
        }
    }

    /**
     * Shipped bundles that a headless command without plug-ins installs but does not start (they resolve only if
     * another bundle's import wires to them): nothing
     * shipped uses them, and starting Configuration Admin has Declarative Services look up a configuration for every
     * component (some 25 ms). A plug-in that needs them finds them started.
     */
    static final Set<String> FOR_PLUGINS = Set.of("org.apache.felix.configadmin");

    /** The display toolkit's symbolic name, and the start of its jars' names in {@code bundle/desktop/}. */
    static final String TOOLKIT = "org.eclipse.swt";

    /**
     * Installs every jar before starting any, so that start order never decides what resolves, and resolves them in
     * one pass. A jar installed by reference is read where it lies rather than copied into the cache.
     *
     * @param started       jars to install, resolve and (by {@link #start}) start
     * @param installedOnly jars to install only: they resolve when something needs them, and never start
     * @param heldBack      symbolic names of bundles among {@code started} to install and not start
     * @param locations     the location each jar is installed from ({@link #location}, or a connected jar's)
     * @param needed        of the installed and resolved bundles of {@code started}, those the run needs started
     *                      (all of them, or a {@link CommandLayer})
     * @param problems      where a jar that cannot be installed is named
     * @return the bundles to start
     */
    static List<Bundle> installAndResolve(BundleContext context, List<Path> started, List<Path> installedOnly,
            Set<String> heldBack, UnaryOperator<List<Bundle>> needed, Function<Path, String> locations,
            List<String> problems) {
        List<Bundle> installed = install(context, started, locations, problems);
        install(context, installedOnly, locations, problems);
        installed.removeIf(b -> heldBack.contains(b.getSymbolicName()));
        StartupTrace.step("bundles installed");
        // One resolver pass for all of them is cheaper than one per start.
        context.getBundle(0).adapt(FrameworkWiring.class).resolveBundles(installed);
        StartupTrace.step("bundles resolved");
        return needed.apply(installed);
    }

    /**
     * Starts the bundles that are not fragments. Declarative Services and the OSGi libraries it needs start first,
     * so that each bundle's components are set up as the bundle starts; then the bundles of {@code early} (the
     * workbench's, so that its window can open while the rest start) and what they need ({@link CommandLayer#needs}),
     * so that their components are satisfied before the rest start; FileInstall starts last, once the shipped
     * bundles that plug-ins build on are live.
     *
     * @param early         locations of bundles to start right after Declarative Services
     * @param problems      where a bundle that cannot start is named
     * @param beforeTheRest runs once the early bundles and what they need have started, before any other bundle
     *                      starts (only when there are early bundles)
     */
    static void start(List<Bundle> bundles, Set<String> early, List<String> problems, Runnable beforeTheRest) {
        List<Bundle> order = new ArrayList<>(bundles);
        Set<Bundle> earlyBundles = new HashSet<>();
        for (Bundle b : bundles) {
            if (early.contains(b.getLocation())) {
                earlyBundles.add(b);
            }
        }
        Set<Bundle> neededEarly = earlyBundles.isEmpty() ? Set.of()
                : new HashSet<>(CommandLayer.needs(bundles, earlyBundles));
        order.sort(Comparator.comparingInt(b -> startRank(b, early, neededEarly)));
        boolean paused = earlyBundles.isEmpty();
        for (Bundle bundle : order) {
            if (isFragment(bundle)) {
                continue;
            }
            if (!paused && startRank(bundle, early, neededEarly) > 2) {
                paused = true;
                beforeTheRest.run();
            }
            try {
                bundle.start();
                StartupTrace.step("started " + bundle.getSymbolicName());
            } catch (BundleException | IllegalStateException e) {
                problems.add("bundle " + bundle.getSymbolicName() + " could not start: " + e.getMessage());
            }
        }
    }

    /**
     * Declarative Services and its libraries, then the early bundles, then what they need, then the rest, then
     * FileInstall.
     */
    static int startRank(Bundle bundle, Set<String> early, Set<Bundle> neededEarly) {
        String name = bundle.getSymbolicName();
        if (name != null && (name.startsWith("org.osgi.") || name.equals("org.apache.felix.scr"))) {
            return 0;
        }
        if (early.contains(bundle.getLocation())) {
            return 1;
        }
        if (neededEarly.contains(bundle)) {
            return 2;
        }
        return "org.apache.felix.fileinstall".equals(name) ? 4 : 3;
    }

    /**
     * Installs and resolves the display toolkit's jars (SWT and its platform fragment, which import nothing) ahead of
     * the rest; the later full install finds them installed.
     *
     * @return SWT's bundle, resolved; null when there is none or it does not resolve
     */
    static Bundle installToolkit(BundleContext context, List<Path> jars, Function<Path, String> locations) {
        List<Path> toolkitJars = jars.stream()
                .filter(j -> j.getFileName().toString().startsWith(TOOLKIT))
                .toList();
        List<Bundle> installed = install(context, toolkitJars, locations, new ArrayList<>());
        context.getBundle(0).adapt(FrameworkWiring.class).resolveBundles(installed);
        StartupTrace.step("display toolkit installed and resolved");
        return installed.stream()
                .filter(b -> TOOLKIT.equals(b.getSymbolicName()) && b.getState() == Bundle.RESOLVED)
                .findFirst()
                .orElse(null);
    }

    /** The location of a jar installed by reference: read where it lies rather than copied into the cache. */
    static String location(Path jar) {
        return "reference:" + jar.toUri();
    }

    private static List<Bundle> install(BundleContext context, List<Path> jars, Function<Path, String> locations,
            List<String> problems) {
        List<Bundle> installed = new ArrayList<>();
        for (Path jar : jars) {
            try {
                installed.add(context.installBundle(locations.apply(jar)));
            } catch (BundleException e) {
                problems.add("bundle " + jar.getFileName() + " could not be installed: " + e.getMessage());
            }
        }
        return installed;
    }

    static boolean isFragment(Bundle bundle) {
        return bundle.getHeaders("").get(Constants.FRAGMENT_HOST) != null;
    }
}
