package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.OutputStream;
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
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceReference;

import lamella.launcher.FelixRuntime;

/**
 * Importer profiles become live, change and go while the runtime runs, without code or restart: a profile saved into
 * the facility folder is listed by {@code formats} with its tier and read by {@code import}; a mistyped one beside it
 * is reported and leaves the others live; a data bundle carrying a profile, dropped into plugins/, adds it as its own
 * tier; a deleted profile is gone.
 */
class ProfileDropInIT {

    private static final String COMMAND = "lamella.api.command.Command";
    private static final String COMMAND_IO = "lamella.api.command.CommandIO";
    private static final Path DEMO = Path.of("../../demo-data").toAbsolutePath().normalize();
    /** Folders are looked at every 2 s and FileInstall every 500 ms; this leaves room for a slow machine. */
    private static final Duration LIVE_WITHIN = Duration.ofSeconds(20);

    private record Run(int status, String out, String err) {
    }

    @TempDir
    Path home;
    @TempDir
    Path scratch;
    @TempDir
    Path facility;
    private FelixRuntime runtime;
    private BundleContext context;
    private ServiceReference<?> importReference;
    private Object importCommand;
    private Object formatsCommand;
    private ServiceReference<?> formatsReference;
    private Method run;
    private Constructor<?> commandIo;

    @BeforeEach
    void start() throws Exception {
        runtime = FelixRuntime.start(RuntimeCopy.into(home), Map.of("lamella.profiles.facility", facility.toString()));
        context = runtime.framework().getBundleContext();
        assertTrue(Eventually.within(LIVE_WITHIN, () -> command("import") != null && command("formats") != null),
                "no import or formats command");
        importReference = command("import");
        formatsReference = command("formats");
        importCommand = context.getService(importReference);
        formatsCommand = context.getService(formatsReference);
        Bundle data = importReference.getBundle();
        Class<?> io = data.loadClass(COMMAND_IO);
        commandIo = io.getConstructor(PrintStream.class, PrintStream.class, Path.class);
        run = data.loadClass(COMMAND).getMethod("run", List.class, io);
    }

    @AfterEach
    void stop() {
        if (importReference != null) {
            context.ungetService(importReference);
            context.ungetService(formatsReference);
        }
        runtime.close();
    }

    private boolean listed(String id) {
        try {
            Run r = call(formatsCommand);
            return r.out().lines().anyMatch(l -> l.startsWith(id + " "));
        } catch (ReflectiveOperationException e) {
            throw new AssertionError("cannot call the formats command", e);
        }
    }

    @Test
    void profilesSavedDroppedAndDeletedAreLiveWithoutRestart() throws Exception {
        Path sweep = DEMO.resolve("raw/halden-hx2-sweep.txt");
        assertFalse(listed("halden-hx2"));
        assertEquals(2, call(importCommand, sweep.toString(), "--out", home.resolve("a.csv").toString()).status());

        // saved the way an editor saves: written beside, then renamed into place
        Path part = facility.resolve("halden-hx2.json.part");
        Files.copy(DEMO.resolve("profiles/fenwick-hall/halden-hx2.json"), part);
        Files.move(part, facility.resolve("halden-hx2.json"), StandardCopyOption.ATOMIC_MOVE);
        Files.writeString(facility.resolve("mistyped.json"), "{\"profile\": \"mistyped\",\n \"delimiter\": \"pipe\"}");
        assertTrue(Eventually.within(LIVE_WITHIN, () -> listed("halden-hx2")), "the saved profile is not live");
        Run formats = call(formatsCommand);
        assertTrue(formats.out().lines().anyMatch(l -> l.startsWith("halden-hx2 ") && l.contains(" facility ")),
                formats.out());
        assertTrue(formats.out().contains("profiles not live until fixed"), formats.out());
        assertTrue(formats.out().contains("mistyped.json:2: delimiter: 'pipe' is not a delimiter"), formats.out());
        assertTrue(formats.out().contains("delimited "), "the other importers stay live: " + formats.out());

        Path out = home.resolve("sweep.csv");
        Run imported = call(importCommand, sweep.toString(), "--out", out.toString());
        assertEquals(0, imported.status(), imported.err());
        assertTrue(imported.err().contains("as 'halden-hx2'"), imported.err());
        assertTrue(imported.err().contains("geometry.pump_radius_m = 6e-6 m (from the file)"), imported.err());
        assertEquals(15, Files.readAllLines(out).size());

        Path jar = scratch.resolve("quillon-profiles.jar");
        dataBundle(jar);
        Files.copy(jar, runtime.pluginsDir().resolve("quillon-profiles.jar.part"));
        Files.move(runtime.pluginsDir().resolve("quillon-profiles.jar.part"),
                runtime.pluginsDir().resolve("quillon-profiles.jar"), StandardCopyOption.ATOMIC_MOVE);
        assertTrue(Eventually.within(LIVE_WITHIN, () -> listed("quillon-records")), "the bundle's profile is not live");
        assertTrue(call(formatsCommand).out().lines().anyMatch(l -> l.startsWith("quillon-records ")
                && l.contains("bundle lab.example.profiles")));
        Run records = call(importCommand, DEMO.resolve("raw/quillon-tdtr-records.csv").toString(), "--out",
                home.resolve("records.csv").toString());
        assertEquals(0, records.status(), records.err());
        assertTrue(records.err().contains("scans averaged: 2"), records.err());

        Files.delete(facility.resolve("halden-hx2.json"));
        assertTrue(Eventually.within(LIVE_WITHIN, () -> !listed("halden-hx2")), "the deleted profile is still live");
    }

    /** A data-only bundle: a manifest header naming its profile folder, and one profile. */
    private void dataBundle(Path jar) throws Exception {
        Manifest manifest = new Manifest();
        Attributes main = manifest.getMainAttributes();
        main.put(Attributes.Name.MANIFEST_VERSION, "1.0");
        main.putValue("Bundle-ManifestVersion", "2");
        main.putValue("Bundle-SymbolicName", "lab.example.profiles");
        main.putValue("Bundle-Version", "1.0.0");
        main.putValue("Lamella-Import-Profiles", "profiles/");
        try (OutputStream file = Files.newOutputStream(jar); JarOutputStream out = new JarOutputStream(file, manifest)) {
            out.putNextEntry(new JarEntry("profiles/"));
            out.closeEntry();
            out.putNextEntry(new JarEntry("profiles/quillon-records.json"));
            out.write(Files.readAllBytes(DEMO.resolve("profiles/fenwick-hall/quillon-records.json")));
            out.closeEntry();
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

    private List<ServiceReference<?>> references(String type) {
        return LiveCommands.references(context, type);
    }
}
