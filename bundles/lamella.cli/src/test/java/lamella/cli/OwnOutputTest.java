package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.lang.reflect.Field;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import lamella.api.CaseDocument;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.ReportWriter;
import lamella.api.fit.SensitivityTable;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every command with an output refuses one that is its own input — the case file, a data file the case names, a file
 * of a configured material library — however it is spelled (./, .., a symbolic link, a hard link): exit 2, the words
 * "would overwrite its own input FILE", nothing computed and nothing written. The report folder is refused when it
 * is an input itself or holds an input under a name the report writes.
 */
class OwnOutputTest {

    @TempDir
    Path dir;

    private Path caseFile;
    private Path data;
    private Path library;

    /** A report writer that writes nothing here: only its file names matter before anything is computed. */
    static final class NamesOnly implements ReportWriter {
        @Override
        public Path write(CaseDocument doc, FitOutcome outcome, List<SensitivityTable> s, Path folder) {
            throw new AssertionError("nothing may be written");
        }

        @Override
        public boolean writes(String fileName) {
            return fileName.equals("budget.csv") || fileName.equals("result.json");
        }
    }

    @BeforeEach
    void files() throws IOException {
        Files.createDirectories(dir.resolve("data"));
        Files.createDirectories(dir.resolve("sub"));
        data = Files.writeString(dir.resolve("data/scan.csv"), "frequency_hz,phase_deg\n1e5,-40\n");
        caseFile = Files.writeString(dir.resolve("case.json"), """
                {"stack": {"layers": [{"name": "s", "k_w_mk": 1.4, "heat_capacity_j_m3k": 1.6e6}]},
                 "geometry": {"type": "gaussian", "pump_radius_m": 5e-6, "probe_radius_m": 5e-6},
                 "measurement": {"type": "fdtr", "frequencies_hz": [1e5]},
                 "fit": {"datasets": [{"data": "data/scan.csv"}],
                         "free": [{"layer": "s", "property": "k_w_mk", "initial": 1}]}}
                """);
        Files.createDirectories(dir.resolve("lib"));
        library = Files.writeString(dir.resolve("lib/films.json"), "{\"materials\": []}\n");
    }

    /** Every way of naming {@code target} that the test makes: plain, ./, .., a symbolic link and a hard link. */
    private List<String> spellings(Path target, String name) throws IOException {
        Path rel = dir.relativize(target);
        Path link = Files.createSymbolicLink(dir.resolve("sub/link-" + name), target);
        Path hard = Files.createLink(dir.resolve("sub/hard-" + name), target);
        return List.of(rel.toString(), "./" + rel, "sub/../" + rel, dir.relativize(link).toString(),
                dir.relativize(hard).toString());
    }

    private record Run(int status, String out, String err) {
    }

    private Run run(Command c, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = c.run(List.of(args), new CommandIO(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir, List.of(library)));
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private Map<Path, String> snapshot() throws IOException {
        Map<Path, String> all = new TreeMap<>();
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                all.put(p, Files.readString(p));
            }
        }
        return all;
    }

    private void assertRefused(Command c, String command, Path input, String... args) throws IOException {
        Map<Path, String> before = snapshot();
        Run r = run(c, args);
        String what = String.join(" ", args);
        assertEquals(Command.BAD_INPUT, r.status(), what + ": " + r.err());
        assertTrue(r.err().startsWith("lamella " + command + ": --out "), what + ": " + r.err());
        assertTrue(r.err().contains(" would overwrite its own input " + input + "; nothing was written"),
                what + ": " + r.err());
        assertEquals("", r.out(), what);
        assertEquals(before, snapshot(), "nothing written or changed: " + what);
    }

    private static <T> T with(T command, String field, Object value) throws ReflectiveOperationException {
        Field f = command.getClass().getDeclaredField(field);
        f.setAccessible(true);
        f.set(command, value);
        return command;
    }

    /** Case file, data file and library file, each in every spelling, for a command whose --out is a file. */
    private void everyInputOfAFileCommand(Command c, String command) throws IOException {
        for (Path input : List.of(caseFile, data, library)) {
            for (String out : spellings(input, command + "-" + input.getFileName())) {
                assertRefused(c, command, input, "case.json", "--out", out);
            }
        }
    }

    @Test
    void simulate() throws Exception {
        everyInputOfAFileCommand(new SimulateCommand(), "simulate");
    }

    @Test
    void fit() throws Exception {
        everyInputOfAFileCommand(new FitCommand(), "fit");
    }

    @Test
    void sensitivity() throws Exception {
        everyInputOfAFileCommand(new SensitivityCommand(), "sensitivity");
    }

    @Test
    void plan() throws Exception {
        everyInputOfAFileCommand(new PlanCommand(), "plan");
    }

    @Test
    void report() throws Exception {
        ReportCommand c = with(new ReportCommand(), "writer", new NamesOnly());
        for (String out : spellings(caseFile, "report-case")) {
            assertRefused(c, "report", caseFile, "case.json", "--out", out);
        }
        Path named = Files.writeString(dir.resolve("data/budget.csv"), "frequency_hz,phase_deg\n1e5,-40\n");
        Files.writeString(caseFile, Files.readString(caseFile).replace("data/scan.csv", "data/budget.csv"));
        Path link = Files.createSymbolicLink(dir.resolve("sub/data-link"), dir.resolve("data"));
        for (String out : List.of("data", "./data", "sub/../data", "data/", dir.relativize(link).toString())) {
            assertRefused(c, "report", named, "case.json", "--out", out);
        }
        Path libraryNamedLikeAResult = Files.writeString(dir.resolve("lib/result.json"), "{\"materials\": []}\n");
        CommandIO io = new CommandIO(System.out, System.err, dir, List.of(library, libraryNamedLikeAResult));
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = c.run(List.of("case.json", "--out", "lib"), new CommandIO(io.out(),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir, io.runtimeInputs()));
        assertEquals(Command.BAD_INPUT, status);
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("would overwrite its own input "
                + libraryNamedLikeAResult), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void demo() throws Exception {
        Path home = Files.createDirectories(dir.resolve("runtime"));
        Path demoCase = home.resolve(DemoCommand.DEMO_CASE);
        Files.createDirectories(demoCase.getParent());
        Files.copy(caseFile, demoCase);
        Files.createDirectories(demoCase.getParent().resolve("data"));
        Path demoData = Files.copy(data, demoCase.getParent().resolve("data/scan.csv"));
        DemoCommand c = with(with(new DemoCommand(), "home", home.toString()), "writer", new NamesOnly());
        for (String out : spellings(demoCase, "demo-case")) {
            assertRefused(c, "demo", demoCase, "--out", out);
        }
        for (String out : spellings(demoData, "demo-data")) {
            assertRefused(c, "demo", demoData, "--out", out);
        }
    }

    @Test
    void aNewOutputBesideTheInputsIsNotRefused() throws Exception {
        List<String> refusals = new ArrayList<>();
        for (String out : List.of("out.csv", "sub/out.csv", "data/other.csv")) {
            String r = lamella.api.OwnInputs.refusal("simulate", dir.resolve(out), caseFile, List.of(library));
            if (r != null) {
                refusals.add(r);
            }
        }
        assertEquals(List.of(), refusals);
        assertEquals(null, lamella.api.OwnInputs.folderRefusal("report", dir.resolve("sub"),
                List.of(caseFile, data, library), new NamesOnly()::writes));
    }
}
