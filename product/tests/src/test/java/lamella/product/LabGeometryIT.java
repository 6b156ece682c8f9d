package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.lang.reflect.Constructor;
import java.lang.reflect.Method;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.InvalidSyntaxException;
import org.osgi.framework.ServiceReference;

import lamella.launcher.FelixRuntime;

/**
 * A lab's own geometry, built apart from the product ({@code examples/lamella.example.linepair}), dropped into the
 * plugins folder of a running runtime: {@code simulate} does not know it before, computes with it once it is live,
 * and forgets it when its jar is deleted — all without a restart. The API classes are not on this test's class
 * path, so the command is called through its own bundle's classes.
 */
class LabGeometryIT {

    private static final String TYPE = "line-pair";
    private static final String GEOMETRY = "lamella.api.HeatingGeometry";
    private static final String COMMAND = "lamella.api.command.Command";
    private static final String COMMAND_IO = "lamella.api.command.CommandIO";
    /** The example's own case file, so the case its README shows is the one proven here. */
    private static final Path CASE = Path.of("../../examples/lamella.example.linepair/line-pair-case.json")
            .toAbsolutePath().normalize();
    private static final String HEADER = "frequency_hz,re_k_m_per_w,im_k_m_per_w,amplitude_k_m_per_w,phase_deg";
    private static final int DRIVE_FREQUENCIES = 8;
    /** FileInstall polls every 500 ms (conf/lamella.properties); this leaves room for a slow machine. */
    private static final Duration LIVE_WITHIN = Duration.ofSeconds(10);

    private record Run(int status, String out, String err) {
    }

    @TempDir
    Path home;
    private FelixRuntime runtime;
    private BundleContext context;
    private ServiceReference<?> simulateReference;
    private Object simulate;
    private Method run;
    private Constructor<?> commandIo;

    @BeforeEach
    void start() throws Exception {
        runtime = FelixRuntime.start(RuntimeCopy.into(home), Map.of());
        context = runtime.framework().getBundleContext();
        assertTrue(Eventually.within(LIVE_WITHIN, () -> simulateCommand() != null), "no simulate command");
        simulateReference = simulateCommand();
        // Held for the whole test, so the component stays active and its references follow the plugins folder.
        simulate = context.getService(simulateReference);
        Bundle cli = simulateReference.getBundle();
        Class<?> io = cli.loadClass(COMMAND_IO);
        commandIo = io.getConstructor(PrintStream.class, PrintStream.class, Path.class);
        run = cli.loadClass(COMMAND).getMethod("run", List.class, io);
    }

    @AfterEach
    void stop() {
        if (simulateReference != null) {
            context.ungetService(simulateReference);
        }
        runtime.close();
    }

    @Test
    void aLabsGeometryDroppedIntoPluginsIsUsedBySimulateAndForgottenWhenDeleted() throws Exception {
        Run before = simulate();
        assertEquals(2, before.status(), before.err());
        assertTrue(before.err().contains(": geometry.type: unknown geometry '" + TYPE + "'"), before.err());
        assertEquals("", before.out());

        Path partial = runtime.pluginsDir().resolve("line-pair.jar.part");
        Path jar = runtime.pluginsDir().resolve("line-pair.jar");
        Files.copy(ExamplePlugins.jar("lamella.example.linepair"), partial);
        Files.move(partial, jar, StandardCopyOption.ATOMIC_MOVE);
        assertTrue(Eventually.within(LIVE_WITHIN, this::simulateUsesTheLabGeometry),
                "the line-pair geometry did not reach the simulate command");
        // The commands that use geometries share one bundle, so its use of the service proves only that one of them
        // has it: simulate's own reference may follow a moment later on a busy machine.
        assertTrue(Eventually.within(LIVE_WITHIN, () -> quietly().status() == 0),
                "simulate does not compute with the line-pair geometry");

        Run live = simulate();
        assertEquals(0, live.status(), live.err());
        List<String> lines = live.out().lines().toList();
        assertEquals(HEADER, lines.get(0));
        assertEquals(DRIVE_FREQUENCIES + 1, lines.size(), "a header and one row per drive frequency");
        assertTrue(lines.get(1).matches("1\\.000000000000e\\+01(,-?\\d\\.\\d{12}e[+-]\\d{2}){4}"), lines.get(1));

        Files.delete(jar);
        assertTrue(Eventually.within(LIVE_WITHIN, () -> labGeometries().isEmpty()),
                "the line-pair geometry is still registered after its jar was deleted");

        Run after = simulate();
        assertEquals(2, after.status(), after.err());
        assertTrue(after.err().contains(": geometry.type: unknown geometry '" + TYPE + "'"), after.err());
    }

    private Run quietly() {
        try {
            return simulate();
        } catch (ReflectiveOperationException e) {
            throw new AssertionError("cannot run simulate", e);
        }
    }

    private Run simulate() throws ReflectiveOperationException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        Object io = commandIo.newInstance(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), home);
        int status = (Integer) run.invoke(simulate, List.of(CASE.toString()), io);
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** Registered is not enough: the command's dynamic reference must have taken it up. */
    private boolean simulateUsesTheLabGeometry() {
        Bundle cli = simulateReference.getBundle();
        return labGeometries().stream().anyMatch(r -> r.getUsingBundles() != null
                && Arrays.asList(r.getUsingBundles()).contains(cli));
    }

    private List<ServiceReference<?>> labGeometries() {
        List<ServiceReference<?>> found = new ArrayList<>();
        for (ServiceReference<?> reference : references(GEOMETRY)) {
            if (TYPE.equals(call(reference, GEOMETRY, "type"))) {
                found.add(reference);
            }
        }
        return found;
    }

    private ServiceReference<?> simulateCommand() {
        for (ServiceReference<?> reference : references(COMMAND)) {
            if ("simulate".equals(call(reference, COMMAND, "name"))) {
                return reference;
            }
        }
        return null;
    }

    /** Calls a naming method through the interface as the registering bundle sees it; null once it is gone. */
    private Object call(ServiceReference<?> reference, String type, String method) {
        Bundle bundle = reference.getBundle();
        if (bundle == null) {
            return null;
        }
        Object service = context.getService(reference);
        if (service == null) {
            return null;
        }
        try {
            return bundle.loadClass(type).getMethod(method).invoke(service);
        } catch (ReflectiveOperationException e) {
            throw new AssertionError("cannot call " + method + "() of a " + type + " service", e);
        } finally {
            context.ungetService(reference);
        }
    }

    private List<ServiceReference<?>> references(String type) {
        try {
            ServiceReference<?>[] found = context.getAllServiceReferences(type, null);
            return found == null ? List.of() : List.of(found);
        } catch (InvalidSyntaxException e) {
            throw new AssertionError(e);
        }
    }
}
