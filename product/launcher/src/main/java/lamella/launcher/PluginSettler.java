package lamella.launcher;

import java.io.IOException;
import java.net.URI;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.jar.JarFile;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.BundleException;
import org.osgi.framework.wiring.FrameworkWiring;

/**
 * Holds a headless command back until the plugins that were present at launch are live, so that a command never
 * runs without a plugin the user dropped in. FileInstall installs them; this class waits for that, then starts
 * them itself (FileInstall would too, a poll later) so that a plugin that cannot run is named with the reason.
 */
final class PluginSettler {

    private static final long POLL_MS = 10;

    private PluginSettler() {
    }

    /** @return one line per plugin that is not live, naming its jar */
    static List<String> settle(BundleContext context, List<Path> jars, Duration patience)
            throws InterruptedException {
        List<String> problems = new ArrayList<>();
        List<Path> bundles = new ArrayList<>();
        for (Path jar : jars) {
            unreadable(jar).ifPresentOrElse(why -> problems.add("plugin " + jar.getFileName() + " " + why),
                    () -> bundles.add(jar));
        }
        Map<Path, Bundle> installed = awaitInstalled(context, bundles, patience);
        for (Path jar : bundles) {
            Bundle bundle = installed.get(jar);
            if (bundle == null) {
                problems.add("plugin " + jar.getFileName() + " was not installed within " + patience.toSeconds()
                        + " s");
            } else {
                goLive(context, jar, bundle).ifPresent(problems::add);
            }
        }
        return problems;
    }

    /** FileInstall gives up on such a jar without a trace the launcher could wait for, so it is checked here. */
    static Optional<String> unreadable(Path jar) {
        try (JarFile file = new JarFile(jar.toFile())) {
            return file.getManifest() == null
                    ? Optional.of("is not a bundle: it has no META-INF/MANIFEST.MF")
                    : Optional.empty();
        } catch (IOException e) {
            return Optional.of("is not a readable jar: " + e.getMessage());
        }
    }

    private static Map<Path, Bundle> awaitInstalled(BundleContext context, List<Path> jars, Duration patience)
            throws InterruptedException {
        long deadline = System.nanoTime() + patience.toNanos();
        Map<Path, Bundle> installed = new LinkedHashMap<>();
        while (true) {
            for (Bundle bundle : context.getBundles()) {
                fileOf(bundle.getLocation()).filter(jars::contains).ifPresent(jar -> installed.put(jar, bundle));
            }
            if (installed.size() == jars.size() || System.nanoTime() > deadline) {
                return installed;
            }
            Thread.sleep(POLL_MS);
        }
    }

    private static Optional<String> goLive(BundleContext context, Path jar, Bundle bundle) {
        String name = "plugin " + jar.getFileName() + " (" + bundle.getSymbolicName() + ")";
        if (ShippedBundles.isFragment(bundle)) {
            FrameworkWiring wiring = context.getBundle(0).adapt(FrameworkWiring.class);
            return wiring.resolveBundles(List.of(bundle))
                    ? Optional.empty()
                    : Optional.of(name + " could not be resolved: its host or one of its imports is missing");
        }
        if (bundle.getState() == Bundle.ACTIVE || bundle.getState() == Bundle.STARTING) {
            return Optional.empty();
        }
        try {
            bundle.start(Bundle.START_ACTIVATION_POLICY);
            return Optional.empty();
        } catch (BundleException | IllegalStateException e) {
            return Optional.of(name + " could not start: " + e.getMessage());
        }
    }

    /** FileInstall names a bundle by its file's URI; other locations are not files of the plugins folder. */
    static Optional<Path> fileOf(String location) {
        if (!location.startsWith("file:")) {
            return Optional.empty();
        }
        try {
            return Optional.of(Path.of(URI.create(location)).toAbsolutePath().normalize());
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
    }
}
