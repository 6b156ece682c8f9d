package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintStream;
import java.lang.reflect.Constructor;
import java.lang.reflect.Method;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;
import java.util.stream.Stream;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceReference;

import lamella.launcher.FelixRuntime;

/**
 * A lab's importer for a made-up instrument, compiled at test time against the shipped API bundle and packed as a
 * bundle with a hand-written component description, is dropped into the plugins folder of a running runtime:
 * {@code formats} lists it and {@code import} reads the instrument's file with it — no rebuild, no restart. The API
 * classes are not on this test's class path, so the commands are called through their own bundle's classes.
 */
class ImporterDropInIT {

    private static final String COMMAND = "lamella.api.command.Command";
    private static final String COMMAND_IO = "lamella.api.command.CommandIO";
    private static final String IMPORTER = "lamella.api.data.DataImporter";
    private static final String ID = "tarrow-tl3";
    private static final String CLASS = "lab.example.tarrow.TarrowLogImporter";
    /** FileInstall polls every 500 ms (conf/lamella.properties); this leaves room for a slow machine. */
    private static final Duration LIVE_WITHIN = Duration.ofSeconds(10);

    private record Run(int status, String out, String err) {
    }

    @TempDir
    Path home;
    @TempDir
    Path scratch;
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
        runtime = FelixRuntime.start(RuntimeCopy.into(home), Map.of());
        context = runtime.framework().getBundleContext();
        assertTrue(Eventually.within(LIVE_WITHIN, () -> command("import") != null && command("formats") != null),
                "no import or formats command");
        importReference = command("import");
        formatsReference = command("formats");
        // Held for the whole test, so the components stay active and their references follow the plugins folder.
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

    @Test
    void aLabsImporterDroppedIntoPluginsIsListedAndUsed() throws Exception {
        Path log = home.resolve("sweep.tl3");
        Files.writeString(log, "TARROW-TL3 LOG\nkHz deg\n1.0 -12.5\n2.0 -14.0\n5.0 -17.25\n", StandardCharsets.UTF_8);

        Run before = call(formatsCommand);
        assertEquals(0, before.status(), before.err());
        assertFalse(before.out().contains(ID), before.out());
        Run refused = call(importCommand, log.toString());
        assertEquals(2, refused.status(), refused.err());
        assertEquals("", refused.out());

        Path jar = scratch.resolve("tarrow.jar");
        buildBundle(jar);
        Path partial = runtime.pluginsDir().resolve("tarrow.jar.part");
        Files.copy(jar, partial);
        Files.move(partial, runtime.pluginsDir().resolve("tarrow.jar"), StandardCopyOption.ATOMIC_MOVE);
        assertTrue(Eventually.within(LIVE_WITHIN, this::bothCommandsUseTheLabImporter),
                "the dropped importer did not reach the import and formats commands");
        // Both commands live in one bundle, so its use of the service proves only that one of them has it: the
        // other's reference may follow a moment later on a busy machine.
        assertTrue(Eventually.within(LIVE_WITHIN, () -> formatsLists(ID) && importReads(log)),
                "formats does not list the importer, or import does not read with it");

        Run listed = call(formatsCommand);
        assertEquals(0, listed.status(), listed.err());
        assertTrue(listed.out().contains("\n" + ID + " "), listed.out());
        assertTrue(listed.out().contains("Tarrow TL-3 phase logger (an invented instrument)."), listed.out());

        Path out = home.resolve("sweep.csv");
        Run imported = call(importCommand, log.toString(), "--out", out.toString());
        assertEquals(0, imported.status(), imported.err());
        assertTrue(imported.err().contains("read " + log + " as '" + ID + "'"), imported.err());
        assertEquals(List.of("frequency_hz,phase_deg,outlier,excluded",
                "1.000000000000e+03,-1.250000000000e+01,0,0",
                "2.000000000000e+03,-1.400000000000e+01,0,0",
                "5.000000000000e+03,-1.725000000000e+01,0,0"), Files.readAllLines(out));
    }

    /** Compiles the lab's importer against the API bundle the runtime ships, and packs it as a DS bundle. */
    private void buildBundle(Path jar) throws IOException {
        Path source = scratch.resolve("src/lab/example/tarrow/TarrowLogImporter.java");
        Files.createDirectories(source.getParent());
        try (InputStream in = getClass().getResourceAsStream("/dropin/TarrowLogImporter.java.txt")) {
            Files.write(source, in.readAllBytes());
        }
        Path api;
        try (Stream<Path> bundles = Files.list(home.resolve("bundle"))) {
            api = bundles.filter(p -> p.getFileName().toString().startsWith("lamella.api-")).findFirst()
                    .orElseThrow(() -> new AssertionError("no lamella.api bundle in the runtime"));
        }
        Path classes = scratch.resolve("classes");
        Files.createDirectories(classes);
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        ByteArrayOutputStream diagnostics = new ByteArrayOutputStream();
        int status = javac.run(null, diagnostics, diagnostics, "--release", "17", "-classpath", api.toString(),
                "-d", classes.toString(), source.toString());
        assertEquals(0, status, diagnostics.toString(StandardCharsets.UTF_8));

        Manifest manifest = new Manifest();
        Attributes main = manifest.getMainAttributes();
        main.put(Attributes.Name.MANIFEST_VERSION, "1.0");
        main.putValue("Bundle-ManifestVersion", "2");
        main.putValue("Bundle-SymbolicName", "lab.example.tarrow");
        main.putValue("Bundle-Version", "1.0.0");
        main.putValue("Import-Package", "lamella.api;version=\"[0.1,1)\",lamella.api.data;version=\"[0.1,1)\"");
        main.putValue("Service-Component", "OSGI-INF/tarrow.xml");
        String component = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + "<scr:component xmlns:scr=\"http://www.osgi.org/xmlns/scr/v1.3.0\" name=\"" + CLASS + "\">\n"
                + "  <implementation class=\"" + CLASS + "\"/>\n"
                + "  <service><provide interface=\"" + IMPORTER + "\"/></service>\n"
                + "</scr:component>\n";
        try (OutputStream file = Files.newOutputStream(jar); JarOutputStream out = new JarOutputStream(file, manifest)) {
            out.putNextEntry(new JarEntry("OSGI-INF/tarrow.xml"));
            out.write(component.getBytes(StandardCharsets.UTF_8));
            out.closeEntry();
            String entry = CLASS.replace('.', '/') + ".class";
            out.putNextEntry(new JarEntry(entry));
            out.write(Files.readAllBytes(classes.resolve(entry)));
            out.closeEntry();
        }
    }

    private boolean formatsLists(String id) {
        try {
            Run listed = call(formatsCommand);
            return listed.status() == 0 && listed.out().contains("\n" + id + " ");
        } catch (ReflectiveOperationException e) {
            throw new AssertionError("cannot run formats", e);
        }
    }

    private boolean importReads(Path file) {
        try {
            return call(importCommand, file.toString()).status() == 0;
        } catch (ReflectiveOperationException e) {
            throw new AssertionError("cannot run import", e);
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

    /** Registered is not enough: both commands' dynamic references must have taken it up. */
    private boolean bothCommandsUseTheLabImporter() {
        Bundle data = importReference.getBundle();
        for (ServiceReference<?> r : references(IMPORTER)) {
            Bundle b = r.getBundle();
            if (b != null && "lab.example.tarrow".equals(b.getSymbolicName()) && r.getUsingBundles() != null
                    && Arrays.asList(r.getUsingBundles()).contains(data)) {
                return true;
            }
        }
        return false;
    }

    private ServiceReference<?> command(String name) {
        return LiveCommands.command(context, name);
    }

    private List<ServiceReference<?>> references(String type) {
        return LiveCommands.references(context, type);
    }
}
