package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
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
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceReference;

import lamella.launcher.FelixRuntime;

/**
 * A lab's own importer, built apart from the product ({@code examples/lamella.example.sweeplog}), dropped into the
 * plugins folder of a running runtime: {@code formats} lists it and {@code import} reads the example's own file with
 * it once it is live, and both forget it when its jar is deleted — all without a restart. The API classes are not on
 * this test's class path, so the commands are called through their own bundle's classes.
 */
class LabImporterIT {

    private static final String ID = "sweep-log";
    private static final String COMMAND = "lamella.api.command.Command";
    private static final String COMMAND_IO = "lamella.api.command.CommandIO";
    /** The example's own file, so the import its README shows is the one proven here. */
    private static final Path LOG = Path.of("../../examples/lamella.example.sweeplog/sweep-example.swlog")
            .toAbsolutePath().normalize();
    /** FileInstall polls every 500 ms (conf/lamella.properties); this leaves room for a slow machine. */
    private static final Duration LIVE_WITHIN = Duration.ofSeconds(10);

    private record Run(int status, String out, String err) {
    }

    @TempDir
    Path home;
    private FelixRuntime runtime;
    private BundleContext context;
    private ServiceReference<?> importReference;
    private ServiceReference<?> formatsReference;
    private Object importCommand;
    private Object formatsCommand;
    private Method run;
    private Constructor<?> commandIo;

    @BeforeEach
    void start() throws Exception {
        runtime = FelixRuntime.start(RuntimeCopy.into(home), Map.of());
        context = runtime.framework().getBundleContext();
        assertTrue(Eventually.within(LIVE_WITHIN, () -> command("import") != null && command("formats") != null),
                "no import or formats command");
        importReference = command("import");
        formatsReference = command("formats");
        // Held for the whole test, so the components stay active and their references follow the plugins folder.
        importCommand = context.getService(importReference);
        formatsCommand = context.getService(formatsReference);
        Class<?> io = importReference.getBundle().loadClass(COMMAND_IO);
        commandIo = io.getConstructor(PrintStream.class, PrintStream.class, Path.class);
        run = importReference.getBundle().loadClass(COMMAND).getMethod("run", List.class, io);
    }

    @AfterEach
    void stop() {
        if (importReference != null) {
            context.ungetService(importReference);
            context.ungetService(formatsReference);
        }
        runtime.close();
    }

    @Test
    void aLabsImporterDroppedIntoPluginsIsListedUsedAndForgottenWhenDeleted() throws Exception {
        Path out = home.resolve("sweep.csv");
        Run before = call(formatsCommand);
        assertEquals(0, before.status(), before.err());
        assertFalse(before.out().contains("\n" + ID + " "), before.out());
        Run refused = call(importCommand, LOG.toString(), "--format", ID, "--out", out.toString());
        assertEquals(2, refused.status(), refused.err());
        assertFalse(Files.exists(out), "nothing is written when no importer reads the file");

        Path partial = runtime.pluginsDir().resolve("sweep-log.jar.part");
        Path jar = runtime.pluginsDir().resolve("sweep-log.jar");
        Files.copy(ExamplePlugins.jar("lamella.example.sweeplog"), partial);
        Files.move(partial, jar, StandardCopyOption.ATOMIC_MOVE);
        // Both commands must have taken the service up; each is asked, as one bundle holds them both.
        assertTrue(Eventually.within(LIVE_WITHIN, () -> formatsLists() && imports(LOG)),
                "the dropped importer did not reach the formats and import commands");

        Run listed = call(formatsCommand);
        assertTrue(listed.out().contains("Sweep log of an invented FDTR instrument"), listed.out());

        Run imported = call(importCommand, LOG.toString(), "--out", out.toString());
        assertEquals(0, imported.status(), imported.err());
        assertTrue(imported.err().contains("read " + LOG + " as '" + ID + "'"), imported.err());
        // the file's 3.2 µm, translated by the importer into the case-file key in SI units
        assertTrue(imported.err().contains("geometry.pump_radius_m = 3.2e-6 m (from the file)"), imported.err());
        assertEquals(List.of("frequency_hz,phase_deg,outlier,excluded",
                "1.000000000000e+03,-1.142000000000e+01,0,0",
                "1.000000000000e+04,-1.587000000000e+01,0,0",
                "1.000000000000e+05,-2.136000000000e+01,0,0",
                "1.000000000000e+06,-2.904000000000e+01,0,0",
                "1.000000000000e+07,-3.875000000000e+01,0,0"), Files.readAllLines(out));

        Files.delete(jar);
        assertTrue(Eventually.within(LIVE_WITHIN, () -> !formatsLists()),
                "formats still lists the importer after its jar was deleted");
        Run after = call(importCommand, LOG.toString(), "--format", ID);
        assertEquals(2, after.status(), after.err());
    }

    private boolean formatsLists() {
        Run listed = quietly(formatsCommand);
        return listed.status() == 0 && listed.out().contains("\n" + ID + " ");
    }

    private boolean imports(Path file) {
        return quietly(importCommand, file.toString(), "--format", ID).status() == 0;
    }

    private Run quietly(Object command, String... args) {
        try {
            return call(command, args);
        } catch (ReflectiveOperationException e) {
            throw new AssertionError("cannot run a command", e);
        }
    }

    private Run call(Object command, String... args) throws ReflectiveOperationException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        Object io = commandIo.newInstance(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), home);
        int status = (Integer) run.invoke(command, List.of(args), io);
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private ServiceReference<?> command(String name) {
        return LiveCommands.command(context, name);
    }
}
