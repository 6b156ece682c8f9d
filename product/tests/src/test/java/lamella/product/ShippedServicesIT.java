package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.Constants;
import org.osgi.framework.InvalidSyntaxException;
import org.osgi.framework.ServiceReference;

import lamella.launcher.FelixRuntime;

/**
 * The assembled runtime, started as the launcher starts it, offers every shipped geometry, technique and command.
 * The API classes are not on this test's class path, so services are read through their own bundles' classes.
 */
class ShippedServicesIT {

    private static final Duration REGISTRATION = Duration.ofSeconds(5);

    @TempDir
    static Path home;
    private static FelixRuntime runtime;
    private static BundleContext context;

    @BeforeAll
    static void start() throws Exception {
        runtime = FelixRuntime.start(RuntimeCopy.into(home), Map.of());
        context = runtime.framework().getBundleContext();
    }

    @AfterAll
    static void stop() {
        if (runtime != null) {
            runtime.close();
        }
    }

    @Test
    void theApiIsNotOnTheTestClassPathSoServicesComeFromTheBundlesAlone() {
        assertThrows(ClassNotFoundException.class, () -> Class.forName("lamella.api.HeatingGeometry"));
    }

    @Test
    void everyShippedBundleStartedOrIsAResolvedFragment() {
        assertEquals(List.of(), runtime.startProblems());
        List<String> notLive = new ArrayList<>();
        for (Bundle bundle : context.getBundles()) {
            boolean fragment = bundle.getHeaders("").get(Constants.FRAGMENT_HOST) != null;
            int expected = fragment ? Bundle.RESOLVED : Bundle.ACTIVE;
            if (bundle.getState() != expected) {
                notLive.add(bundle.getSymbolicName() + " in state " + bundle.getState());
            }
        }
        assertEquals(List.of(), notLive);
    }

    @Test
    void theShippedGeometriesAreRegistered() throws Exception {
        assertNamesEventually("lamella.api.HeatingGeometry", "type", Set.of("gaussian", "point", "line",
                "line-film-difference"));
    }

    @Test
    void theShippedTechniquesAreRegistered() throws Exception {
        assertNamesEventually("lamella.api.Technique", "type", Set.of("fdtr", "tdtr", "sstr", "3omega",
                "3omega-voltage"));
    }

    @Test
    void theShippedCommandsAreRegistered() throws Exception {
        assertNamesEventually("lamella.api.command.Command", "name", Set.of("help", "plugins", "simulate", "fit", "batch", "map"));
    }

    /** The command list is read from these properties without activating the commands, so they must agree. */
    @Test
    void everyShippedCommandCarriesItsNameAndSummaryAsServiceProperties() throws Exception {
        assertNamesEventually("lamella.api.command.Command", "name", Set.of("help", "simulate", "materials", "map"));
        List<String> wrong = new ArrayList<>();
        for (ServiceReference<?> reference : references("lamella.api.command.Command")) {
            Object service = context.getService(reference);
            try {
                Class<?> api = reference.getBundle().loadClass("lamella.api.command.Command");
                for (String[] pair : new String[][] {{"lamella.command.name", "name"},
                        {"lamella.command.summary", "summary"}}) {
                    Object property = reference.getProperty(pair[0]);
                    Object answer = api.getMethod(pair[1]).invoke(service);
                    if (!answer.equals(property)) {
                        wrong.add(reference.getBundle().getSymbolicName() + ": " + pair[0] + " is " + property
                                + " but " + pair[1] + "() says " + answer);
                    }
                }
            } finally {
                context.ungetService(reference);
            }
        }
        assertEquals(List.of(), wrong);
    }

    @Test
    void theEngineOffersStackKernels() throws Exception {
        assertTrue(Eventually.within(REGISTRATION, () -> !references("lamella.api.StackKernels").isEmpty()),
                "no lamella.api.StackKernels service");
    }

    @Test
    void theCaseFileBundleOffersACaseFormat() throws Exception {
        assertTrue(Eventually.within(REGISTRATION, () -> !references("lamella.api.CaseFormat").isEmpty()),
                "no lamella.api.CaseFormat service");
    }

    private static void assertNamesEventually(String type, String nameMethod, Set<String> expected)
            throws InterruptedException {
        Eventually.within(REGISTRATION, () -> names(type, nameMethod).containsAll(expected));
        Set<String> live = names(type, nameMethod);
        assertTrue(live.containsAll(expected), type + " services: expected " + expected + " among " + live);
    }

    /** Calls the naming method through the interface as the registering bundle sees it. */
    private static Set<String> names(String type, String nameMethod) {
        Set<String> names = new TreeSet<>();
        for (ServiceReference<?> reference : references(type)) {
            Object service = context.getService(reference);
            try {
                Class<?> api = reference.getBundle().loadClass(type);
                names.add(String.valueOf(api.getMethod(nameMethod).invoke(service)));
            } catch (ReflectiveOperationException e) {
                throw new AssertionError("cannot read " + nameMethod + "() of a " + type + " service", e);
            } finally {
                context.ungetService(reference);
            }
        }
        return names;
    }

    private static List<ServiceReference<?>> references(String type) {
        try {
            ServiceReference<?>[] found = context.getAllServiceReferences(type, null);
            return found == null ? List.of() : List.of(found);
        } catch (InvalidSyntaxException e) {
            throw new AssertionError(e);
        }
    }
}
