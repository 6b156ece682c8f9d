package lamella.launcher;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
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
     * Installs every jar before starting any, so that start order never decides what resolves. A jar installed by
     * reference is read where it lies rather than copied into the cache.
     *
     * @param started       jars to install, resolve and start
     * @param installedOnly jars to install only: they resolve when something needs them, and never start
     * @return one line per jar that could not be installed or started
     */
    static List<String> installAndStart(BundleContext context, List<Path> started, List<Path> installedOnly) {
        List<String> problems = new ArrayList<>();
        List<Bundle> installed = install(context, started, problems);
        install(context, installedOnly, problems);
        // One resolver pass for all of them is cheaper than one per start.
        context.getBundle(0).adapt(FrameworkWiring.class).resolveBundles(installed);
        for (Bundle bundle : installed) {
            if (isFragment(bundle)) {
                continue;
            }
            try {
                bundle.start();
            } catch (BundleException e) {
                problems.add("bundle " + bundle.getSymbolicName() + " could not start: " + e.getMessage());
            }
        }
        return problems;
    }

    private static List<Bundle> install(BundleContext context, List<Path> jars, List<String> problems) {
        List<Bundle> installed = new ArrayList<>();
        for (Path jar : jars) {
            try {
                installed.add(context.installBundle("reference:" + jar.toUri()));
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
