package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.jar.JarFile;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.Bundle;
import org.osgi.framework.Constants;

import lamella.launcher.FelixRuntime;
import lamella.launcher.RuntimeScope;

/**
 * A headless command starts every shipped bundle but the desktop feature's, which lie in bundle/desktop/ installed
 * and unstarted; the workbench starts them all.
 */
class RuntimeScopeIT {

    @TempDir
    Path home;

    @Test
    void aCommandInstallsTheDesktopBundlesWithoutStartingOrResolvingThem() throws Exception {
        RuntimeCopy.into(home);
        List<String> desktop = symbolicNames(home.resolve("bundle/desktop"));
        assertTrue(desktop.contains("lamella.ui.workbench") && desktop.contains("org.eclipse.swt"), desktop.toString());
        try (FelixRuntime runtime = FelixRuntime.start(home, Map.of(), RuntimeScope.COMMANDS)) {
            assertEquals(List.of(), runtime.startProblems());
            List<String> wrong = new ArrayList<>();
            for (Bundle bundle : runtime.framework().getBundleContext().getBundles()) {
                if (bundle.getBundleId() == 0) {
                    continue;
                }
                boolean fragment = bundle.getHeaders("").get(Constants.FRAGMENT_HOST) != null;
                int expected = desktop.contains(bundle.getSymbolicName()) ? Bundle.INSTALLED
                        : fragment ? Bundle.RESOLVED : Bundle.ACTIVE;
                if (bundle.getState() != expected) {
                    wrong.add(bundle.getSymbolicName() + " in state " + bundle.getState() + ", expected " + expected);
                }
            }
            assertEquals(List.of(), wrong);
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
