package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.lang.reflect.Field;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import lamella.api.CaseDocument;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.casefile.CaseFileReader;
import lamella.engine.Engine;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.geometry.line.LineHeater;
import lamella.geometry.point.PointSource;
import lamella.geometry.ring.RingSource;
import lamella.geometry.elliptic.EllipticBeams;
import lamella.technique.fdtr.FrequencyDomain;
import lamella.technique.sstr.SteadyState;
import lamella.technique.tdtr.TimeDomain;
import lamella.technique.threeomega.ThreeOmega;
import lamella.technique.threeomega.ThreeOmegaVoltage;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@code lamella simulate} with the real case format, engine, geometries and techniques: every demo case runs, the
 * CSV has the technique's columns, {@code --out} is all or nothing, and every bad case or command line is exit
 * status 2 with a message naming the file, line and JSON path.
 */
class SimulateCommandTest {

    /** The demo cases at the repository root; surefire runs in the module folder. */
    static final Path DEMO_CASES = Path.of("../../demo-data/cases");

    static final Map<String, String> HEADERS = Map.of(
            "fdtr", "frequency_hz,re_k_per_w,im_k_per_w,amplitude_k_per_w,phase_deg",
            "tdtr", "delay_s,in_phase,out_of_phase,ratio,phase_deg",
            "sstr", "pump_power_w,k_per_w,temperature_rise_k",
            "3omega", "frequency_hz,re_k_m_per_w,im_k_m_per_w,amplitude_k_m_per_w,phase_deg",
            "3omega-voltage", "frequency_hz,v3_in_phase_v,v3_out_of_phase_v,v3_amplitude_v,phase_deg");

    static final String STACK = """
              "stack": {
                "layers": [
                  {"name": "transducer", "thickness_m": 9e-8, "k_through_w_mk": 200, "heat_capacity_j_m3k": 2.45e6,
                   "conductance_below_w_m2k": 1.2e8},
                  {"name": "substrate", "k_through_w_mk": 140, "heat_capacity_j_m3k": 1.63e6}
                ]
              },
            """;

    static final String GAUSSIAN = "{\"type\": \"gaussian\", \"pump_radius_m\": 6e-6, \"probe_radius_m\": 4e-6}";
    static final String FDTR = "{\"type\": \"fdtr\", \"frequencies_hz\": [1e3, 1e5, 1e7]}";

    @TempDir
    Path dir;

    private SimulateCommand command;
    private final LineHeater line = new LineHeater();

    /** The outcome of one run. */
    record Run(int status, String out, String err) {
    }

    @BeforeEach
    void wire() throws ReflectiveOperationException {
        command = new SimulateCommand();
        inject(command, "caseFormat", new CaseFileReader());
        inject(command, "kernels", new Engine());
        command.addGeometry(Registrations.shipped("lamella.geometry.gaussian"), new GaussianBeams());
        command.addGeometry(Registrations.shipped("lamella.geometry.point"), new PointSource());
        command.addGeometry(Registrations.shipped("lamella.geometry.ring"), new RingSource());
        command.addGeometry(Registrations.shipped("lamella.geometry.elliptic"), new EllipticBeams());
        command.addGeometry(Registrations.shipped("lamella.geometry.line"), line);
        command.addTechnique(Registrations.shipped("lamella.technique.fdtr"), new FrequencyDomain());
        command.addTechnique(Registrations.shipped("lamella.technique.tdtr"), new TimeDomain());
        command.addTechnique(Registrations.shipped("lamella.technique.sstr"), new SteadyState());
        command.addTechnique(Registrations.shipped("lamella.technique.threeomega"), new ThreeOmega());
        command.addTechnique(Registrations.shipped("lamella.technique.threeomega"), new ThreeOmegaVoltage());
    }

    /** What Declarative Services does for the static references. */
    private static void inject(Object target, String field, Object value) throws ReflectiveOperationException {
        Field f = target.getClass().getDeclaredField(field);
        f.setAccessible(true);
        f.set(target, value);
    }

    private Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        CommandIO io = new CommandIO(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir);
        int status = command.run(List.of(args), io);
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private Path writeCase(String name, String json) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, json, StandardCharsets.UTF_8);
        return f;
    }

    /** A case on the two-layer stack with the given geometry and measurement objects, one key per line. */
    static String caseOf(String geometry, String measurement) {
        return "{\n" + STACK + "  \"geometry\": " + geometry + ",\n  \"measurement\": " + measurement + "\n}\n";
    }

    /** The 1-based line of the first occurrence of {@code marker} in {@code text}. */
    static int lineOf(String text, String marker) {
        int at = text.indexOf(marker);
        if (at < 0) {
            throw new IllegalArgumentException("no " + marker + " in the test's JSON");
        }
        return (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
    }

    /** Runs a bad case: status 2, nothing on standard output, and the message names file, line and path. */
    private Run bad(String json, String path, String marker, String... inMessage) throws IOException {
        Path f = writeCase("bad.json", json);
        Run r = run("bad.json");
        assertEquals(Command.BAD_INPUT, r.status(), r.err());
        assertEquals("", r.out(), "no CSV for a bad case");
        String where = f + ":" + lineOf(json, marker) + ": " + path + ": ";
        assertTrue(r.err().startsWith("lamella simulate: " + where), "expected " + where + " in: " + r.err());
        for (String s : inMessage) {
            assertTrue(r.err().contains(s), "expected '" + s + "' in: " + r.err());
        }
        return r;
    }

    static List<Path> demoCases() throws IOException {
        try (Stream<Path> s = Files.list(DEMO_CASES)) {
            List<Path> cases = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
            assertFalse(cases.isEmpty(), "no demo cases in " + DEMO_CASES);
            return cases;
        }
    }

    private static final Pattern NUMBER = Pattern.compile("-?(\\d)\\.(\\d+)e[+-]\\d+");

    /** Checks a CSV cell: a finite number written with at least 10 significant digits. */
    private static double cell(String s) {
        Matcher m = NUMBER.matcher(s);
        assertTrue(m.matches(), "not a number in scientific notation: " + s);
        assertTrue(1 + m.group(2).length() >= 10, "fewer than 10 significant digits: " + s);
        double v = Double.parseDouble(s);
        assertTrue(Double.isFinite(v), s);
        return v;
    }

    // ---------------------------------------------------------------- demo cases

    @ParameterizedTest
    @MethodSource("demoCases")
    void everyDemoCaseSimulates(Path demo) throws Exception {
        CaseDocument doc = new CaseFileReader().read(demo);
        String type = (String) doc.measurement().get("type");
        String header = HEADERS.get(type);
        assertTrue(header != null, "a demo case of an untested technique: " + type);
        Object xs = switch (type) {
            case "fdtr" -> doc.measurement().get("frequencies_hz");
            case "tdtr" -> doc.measurement().get("delays_s");
            case "3omega", "3omega-voltage" -> doc.measurement().get("drive_frequencies_hz");
            case "sstr" -> doc.measurement().has("pump_powers_w") ? doc.measurement().get("pump_powers_w") : List.of(1.0);
            default -> List.of();
        };

        Run r = run(demo.toAbsolutePath().toString());
        assertEquals(Command.OK, r.status(), r.err());
        assertEquals("", r.err());
        String[] lines = r.out().split("\n", -1);
        assertEquals("", lines[lines.length - 1], "the CSV ends with a newline");
        assertEquals(header, lines[0]);
        int columns = header.split(",").length;
        List<?> x = (List<?>) xs;
        int rows = x.size();
        assertEquals(rows + 2, lines.length, "one row per x value");
        for (int i = 0; i < rows; i++) {
            String[] cells = lines[i + 1].split(",");
            assertEquals(columns, cells.length, lines[i + 1]);
            double[] v = Arrays.stream(cells).mapToDouble(SimulateCommandTest::cell).toArray();
            double xi = ((Number) x.get(i)).doubleValue();
            assertEquals(xi, v[0], Math.abs(xi) * 1e-12, "the x column repeats the case's x values");
        }
    }

    /**
     * A 3ω range outside the usual penetration-depth band (Cahill, Rev. Sci. Instrum. 61, 802, 1990) is simulated
     * and told on standard error with the drive frequency and the depth: at f = 1 Hz the substrate's λ =
     * √(D/(2π·2f)) = 2.61 mm (D = 140/1.63e6 m²/s), more than a fifth of a 0.5 mm substrate.
     */
    @Test
    void aThreeOmegaRangeOutsideTheUsualBandIsSimulatedWithAWarning() throws Exception {
        Path f = writeCase("wide.json", caseOf("{\"type\": \"line\", \"half_width_m\": 5e-6}",
                "{\"type\": \"3omega-voltage\", \"drive_frequencies_hz\": [1, 1000], \"heater_resistance_ohm\": 20,"
                        + " \"dr_dt_ohm_per_k\": 0.05, \"heater_length_m\": 1e-3, \"drive_current_a\": 0.01}"));
        Run r = run("wide.json");
        assertEquals(Command.OK, r.status(), r.err());
        assertEquals("lamella simulate: warning: " + f + ": at the lowest drive frequency, 1.00 Hz, the thermal"
                + " penetration depth λ = √(D/(2π·2f)) in the semi-infinite bottom layer 'substrate' is 0.00261 m, more"
                + " than a fifth of a 0.000500 m substrate", r.err().substring(0, r.err().indexOf(": outside")));
        assertEquals(1, r.err().split("\n").length, r.err());
        assertTrue(r.out().startsWith(HEADERS.get("3omega-voltage") + "\n"), r.out());
        assertEquals(3, r.out().split("\n").length, r.out());
    }

    // ---------------------------------------------------------------- --out

    @Nested
    class Out {

        @Test
        void writesTheSameCsvAsStandardOutput() throws Exception {
            writeCase("ok.json", caseOf(GAUSSIAN, FDTR));
            Run toStdout = run("ok.json");
            assertEquals(Command.OK, toStdout.status(), toStdout.err());

            Run toFile = run("ok.json", "--out", "result.csv");
            assertEquals(Command.OK, toFile.status(), toFile.err());
            assertEquals("", toFile.out(), "with --out nothing goes to standard output");
            Path out = dir.resolve("result.csv");
            assertEquals(toStdout.out(), Files.readString(out));
            assertTrue(toFile.err().contains("wrote 3 rows to " + out), toFile.err());
        }

        @Test
        void leavesNoTemporaryFileBehind() throws Exception {
            writeCase("ok.json", caseOf(GAUSSIAN, FDTR));
            Files.createDirectory(dir.resolve("results"));
            assertEquals(Command.OK, run("--out", "results/r.csv", "ok.json").status());
            try (Stream<Path> s = Files.list(dir.resolve("results"))) {
                assertEquals(List.of(dir.resolve("results/r.csv")), s.toList());
            }
        }

        @Test
        void createsMissingFolders() throws Exception {
            writeCase("ok.json", caseOf(GAUSSIAN, FDTR));
            assertEquals(Command.OK, run("ok.json", "--out", "a/b/r.csv").status());
            assertTrue(Files.readString(dir.resolve("a/b/r.csv")).startsWith(HEADERS.get("fdtr") + "\n"));
        }

        @Test
        void replacesAnExistingFile() throws Exception {
            writeCase("ok.json", caseOf(GAUSSIAN, FDTR));
            Path out = dir.resolve("r.csv");
            Files.writeString(out, "old content that is longer than nothing\n".repeat(100));
            assertEquals(Command.OK, run("ok.json", "--out", "r.csv").status());
            String csv = Files.readString(out);
            assertTrue(csv.startsWith(HEADERS.get("fdtr") + "\n"), csv);
            assertFalse(csv.contains("old content"), csv);
            assertEquals(4, csv.split("\n").length);
        }

        @Test
        void badInputWritesNoFile() throws Exception {
            writeCase("bad.json", caseOf(GAUSSIAN.replace("pump_radius_m", "pump_radus_m"), FDTR));
            Run r = run("bad.json", "--out", "r.csv");
            assertEquals(Command.BAD_INPUT, r.status());
            assertFalse(Files.exists(dir.resolve("r.csv")));
            try (Stream<Path> s = Files.list(dir)) {
                assertEquals(List.of(dir.resolve("bad.json")), s.toList(), "no temporary file either");
            }
        }

        @Test
        void badInputKeepsAnExistingFile() throws Exception {
            writeCase("bad.json", caseOf(GAUSSIAN, "{\"type\": \"fdtr\"}"));
            Path out = dir.resolve("r.csv");
            Files.writeString(out, "earlier result\n");
            assertEquals(Command.BAD_INPUT, run("bad.json", "--out", "r.csv").status());
            assertEquals("earlier result\n", Files.readString(out));
        }

        @Test
        void aModelThatCannotBeEvaluatedWritesNoFile() throws Exception {
            writeCase("adiabatic.json", adiabaticSstr());
            Path out = dir.resolve("r.csv");
            Files.writeString(out, "earlier result\n");
            Run r = run("adiabatic.json", "--out", "r.csv");
            assertEquals(Command.BAD_INPUT, r.status(), r.err());
            assertEquals("earlier result\n", Files.readString(out));
        }

        @Test
        void aMissingCaseFileWritesNoFile() {
            Run r = run("nowhere.json", "--out", "r.csv");
            assertEquals(Command.BAD_INPUT, r.status());
            assertTrue(r.err().contains(dir.resolve("nowhere.json").toString()), r.err());
            assertFalse(Files.exists(dir.resolve("r.csv")));
        }

        @Test
        void anUnwritableTargetIsAFailure() throws Exception {
            writeCase("ok.json", caseOf(GAUSSIAN, FDTR));
            Path target = dir.resolve("taken");
            Files.createDirectory(target);
            Files.writeString(target.resolve("inside"), "x");
            Run r = run("ok.json", "--out", "taken");
            assertEquals(Command.FAILED, r.status(), r.err());
            assertTrue(r.err().contains("cannot write " + target), r.err());
            assertEquals("x", Files.readString(target.resolve("inside")));
        }
    }

    // ---------------------------------------------------------------- binding of the blocks

    @Nested
    class Binding {

        @Test
        void unknownGeometryType() throws Exception {
            String json = caseOf("{\"type\": \"gausian\", \"pump_radius_m\": 6e-6, \"probe_radius_m\": 4e-6}", FDTR);
            bad(json, "geometry.type", "\"gausian\"", "unknown geometry 'gausian'", "did you mean 'gaussian'",
                    "live geometry types: elliptic, gaussian, line, point, ring");
        }

        @Test
        void unknownGeometryTypeListsOnlyLiveTypes() throws Exception {
            command.removeGeometry(line);
            String json = caseOf("{\"type\": \"strip\"}", FDTR);
            Run r = bad(json, "geometry.type", "\"strip\"", "live geometry types: elliptic, gaussian, point, ring");
            assertFalse(r.err().contains("line"), r.err());
            assertFalse(r.err().contains("did you mean"), r.err());
        }

        @Test
        void unknownTechniqueType() throws Exception {
            String json = caseOf(GAUSSIAN, "{\"type\": \"fdrt\", \"frequencies_hz\": [1e3]}");
            bad(json, "measurement.type", "\"fdrt\"", "unknown technique 'fdrt'",
                    "live techniques: 3omega, 3omega-voltage, fdtr, sstr, tdtr");
        }

        @Test
        void typeMustBeText() throws Exception {
            bad(caseOf("{\"type\": 1, \"pump_radius_m\": 6e-6, \"probe_radius_m\": 4e-6}", FDTR), "geometry.type",
                    "\"type\": 1", "text");
        }

        @Test
        void missingGeometryType() throws Exception {
            String json = caseOf("{\"pump_radius_m\": 6e-6, \"probe_radius_m\": 4e-6}", FDTR);
            bad(json, "geometry.type", "\"geometry\"", "missing");
        }

        @Test
        void typoInAGeometryKey() throws Exception {
            String geometry = "{\n    \"type\": \"gaussian\",\n    \"pump_radus_m\": 6e-6,\n"
                    + "    \"probe_radius_m\": 4e-6\n  }";
            bad(caseOf(geometry, FDTR), "geometry.pump_radus_m", "\"pump_radus_m\"",
                    "did you mean 'pump_radius_m'", "pump_radius_m, probe_radius_m, offset_m");
        }

        @Test
        void typoInAGeometryKeyWithItsValueOnTheNextLine() throws Exception {
            String geometry = "{\"type\": \"gaussian\", \"probe_radius_m\": 4e-6,\n    \"pump_radus_m\":\n      6e-6}";
            bad(caseOf(geometry, FDTR), "geometry.pump_radus_m", "\"pump_radus_m\"", "did you mean 'pump_radius_m'");
        }

        @Test
        void typoInAMeasurementKey() throws Exception {
            String json = caseOf(GAUSSIAN, "{\"type\": \"fdtr\",\n    \"frequency_hz\": [1e3]}");
            bad(json, "measurement.frequency_hz", "\"frequency_hz\"", "did you mean 'frequencies_hz'");
        }

        @Test
        void sstrTakesPowersNotFrequencies() throws Exception {
            String json = caseOf(GAUSSIAN, "{\"type\": \"sstr\",\n    \"frequencies_hz\": [1e3]}");
            bad(json, "measurement.frequencies_hz", "\"frequencies_hz\"", "pump_powers_w");
        }

        @Test
        void sstrRefusesANegativePower() throws Exception {
            String json = caseOf(GAUSSIAN, "{\"type\": \"sstr\",\n    \"pump_powers_w\": [1e-3,\n      -2e-3]}");
            bad(json, "measurement.pump_powers_w[1]", "      -2e-3", "positive");
        }

        @ParameterizedTest
        @ValueSource(strings = {"pump_radius_m", "probe_radius_m"})
        void missingGaussianRadius(String key) throws Exception {
            String geometry = "{\"type\": \"gaussian\",\n    \"pump_radius_m\": 6e-6,\n    \"probe_radius_m\": 4e-6}"
                    .replaceAll(",\\n    \"" + key + "\": [^,}]+", "");
            assertFalse(geometry.contains(key), geometry);
            bad(caseOf(geometry, FDTR), "geometry." + key, "\"geometry\"", "missing", "geometry 'gaussian' needs");
        }

        @Test
        void missingPointDistance() throws Exception {
            bad(caseOf("{\"type\": \"point\"}", FDTR), "geometry.distance_m", "\"geometry\"", "missing");
        }

        @Test
        void missingLineHalfWidth() throws Exception {
            String json = caseOf("{\"type\": \"line\", \"length_m\": 2e-3}",
                    "{\"type\": \"3omega\", \"drive_frequencies_hz\": [10]}");
            bad(json, "geometry.half_width_m", "\"geometry\"", "missing");
        }

        @Test
        void missingFrequencies() throws Exception {
            bad(caseOf(GAUSSIAN, "{\"type\": \"fdtr\"}"), "measurement.frequencies_hz", "\"measurement\"",
                    "missing", "a simulation needs the list of frequency_hz values");
            bad(caseOf("{\"type\": \"line\", \"half_width_m\": 5e-6}", "{\"type\": \"3omega\"}"),
                    "measurement.drive_frequencies_hz", "\"measurement\"", "missing");
        }

        @ParameterizedTest
        @ValueSource(strings = {"modulation_hz", "repetition_hz", "delays_s"})
        void missingTdtrSetting(String key) throws Exception {
            String tdtr = "{\"type\": \"tdtr\",\n    \"modulation_hz\": 9e6,\n    \"repetition_hz\": 7.6e7,\n"
                    + "    \"delays_s\": [1e-10, 1e-9]}";
            String without = tdtr.replaceAll(",\\n    \"" + key + "\": (\\[[^\\]]*\\]|[^,}]+)", "");
            assertFalse(without.contains(key), without);
            bad(caseOf(GAUSSIAN, without), "measurement." + key, "\"measurement\"", "missing");
        }

        @Test
        void aNegativeRadius() throws Exception {
            String json = caseOf("{\"type\": \"gaussian\", \"pump_radius_m\": 6e-6,\n    \"probe_radius_m\": -4e-6}",
                    FDTR);
            bad(json, "geometry.probe_radius_m", "-4e-6", "positive", "got -4.0E-6");
        }

        /**
         * Values no sample or instrument has stop at their path before any model sees them, and the message blames
         * the input, not the bundle that would have failed on it.
         */
        @ParameterizedTest
        @ValueSource(strings = {"1e308", "1e-308", "4.9e-324"})
        void valuesOutsideThePhysicalRangeNeverReachTheModel(String extreme) throws Exception {
            String[][] cases = {
                {"\"k_through_w_mk\": 200", "stack.layers[0].k_through_w_mk", "a thermal conductivity"},
                {"\"thickness_m\": 9e-8", "stack.layers[0].thickness_m", "a length"},
                {"\"heat_capacity_j_m3k\": 1.63e6", "stack.layers[1].heat_capacity_j_m3k", "a volumetric heat"},
                {"\"conductance_below_w_m2k\": 1.2e8", "stack.layers[0].conductance_below_w_m2k", "a thermal boundary"},
                {"\"pump_radius_m\": 6e-6", "geometry.pump_radius_m", "a length"},
                {"1e5", "measurement.frequencies_hz[1]", "a frequency"}};
            for (String[] c : cases) {
                String piece = c[0];
                String replaced = piece.substring(0, piece.lastIndexOf(' ') + 1) + extreme;
                if (!piece.contains(":")) {
                    replaced = extreme;
                }
                String json = caseOf(GAUSSIAN, FDTR).replace(piece, replaced);
                Run r = bad(json, c[1], replaced, "is outside the range Lamella accepts for " + c[2]);
                assertFalse(r.err().contains("bundle"), r.err());
                assertFalse(r.err().contains("Exception"), r.err());
            }
        }

        @Test
        void aRingOfAstronomicalRadiusStopsAtItsPath() throws Exception {
            String json = caseOf("{\"type\": \"ring\", \"ring_radius_m\": 1e308, \"probe_radius_m\": 4e-6}", FDTR);
            bad(json, "geometry.ring_radius_m", "ring_radius_m", "outside the range", "a length");
        }

        @Test
        void aNegativeFrequencyInAList() throws Exception {
            String json = caseOf(GAUSSIAN, "{\"type\": \"fdtr\", \"frequencies_hz\": [\n    1e3,\n    0,\n    1e5]}");
            bad(json, "measurement.frequencies_hz[1]", "    0,", "positive");
        }

        @Test
        void aTextInsteadOfAList() throws Exception {
            String json = caseOf(GAUSSIAN, "{\"type\": \"fdtr\", \"frequencies_hz\": \"1e3\"}");
            bad(json, "measurement.frequencies_hz", "\"frequencies_hz\"", "list of numbers", "the text \"1e3\"");
        }

        @Test
        void anEmptyList() throws Exception {
            bad(caseOf(GAUSSIAN, "{\"type\": \"fdtr\", \"frequencies_hz\": []}"), "measurement.frequencies_hz",
                    "\"frequencies_hz\"", "empty");
        }

        @Test
        void aShortLineHeater() throws Exception {
            String json = caseOf("{\"type\": \"line\", \"half_width_m\": 5e-6,\n    \"length_m\": 5e-5}",
                    "{\"type\": \"3omega\", \"drive_frequencies_hz\": [10]}");
            bad(json, "geometry.length_m", "\"length_m\"", "10.0 widths");
        }

        @Test
        void threeOmegaWithAGaussianGeometry() throws Exception {
            String json = caseOf(GAUSSIAN, "{\"type\": \"3omega\", \"drive_frequencies_hz\": [10, 100]}");
            bad(json, "geometry.type", "\"geometry\"", "technique '3omega'", "K m/W", "'gaussian' gives K/W",
                    "geometries that fit: line");
        }

        @Test
        void fdtrWithALineHeater() throws Exception {
            String json = caseOf("{\"type\": \"line\", \"half_width_m\": 5e-6}", FDTR);
            bad(json, "geometry.type", "\"geometry\"", "technique 'fdtr'", "geometries that fit: gaussian, point");
        }

        @ParameterizedTest
        @ValueSource(strings = {"3.8e7", "3.9e7", "7.6e7", "1e9"})
        void tdtrModulationAtOrAboveHalfTheRepetitionRate(String modulation) throws Exception {
            String json = caseOf(GAUSSIAN, "{\"type\": \"tdtr\",\n    \"modulation_hz\": " + modulation
                    + ",\n    \"repetition_hz\": 7.6e7,\n    \"delays_s\": [1e-10]}");
            bad(json, "measurement.modulation_hz", "\"modulation_hz\"", "below half the repetition rate");
        }

        @ParameterizedTest
        @ValueSource(strings = {"2e-8", "-2e-8", "1.3157894737e-8"})
        void tdtrDelayBeyondOnePulsePeriod(String delay) throws Exception {
            String json = caseOf(GAUSSIAN, "{\"type\": \"tdtr\", \"modulation_hz\": 9e6, \"repetition_hz\": 7.6e7,"
                    + "\n    \"delays_s\": [\n      1e-10,\n      " + delay + "\n    ]}");
            bad(json, "measurement.delays_s[1]", "      " + delay, "within one pulse period");
        }

        @Test
        void sstrOnAnAdiabaticStack() throws Exception {
            Path f = writeCase("adiabatic.json", adiabaticSstr());
            Run r = run("adiabatic.json");
            assertEquals(Command.BAD_INPUT, r.status(), r.err());
            assertEquals("", r.out());
            assertTrue(r.err().contains(f.toString()), r.err());
            assertTrue(r.err().contains("no steady state"), r.err());
        }

        @Test
        void sstrOnAnIsothermalStackSimulates() throws Exception {
            writeCase("isothermal.json", adiabaticSstr().replace("adiabatic", "isothermal"));
            Run r = run("isothermal.json");
            assertEquals(Command.OK, r.status(), r.err());
            String[] lines = r.out().split("\n");
            assertEquals("pump_power_w,k_per_w,temperature_rise_k", lines[0]);
            assertEquals(2, lines.length, "without powers, one row at 1 W");
            String[] cells = lines[1].split(",");
            assertEquals(1.0, cell(cells[0]));
            assertEquals(cell(cells[1]), cell(cells[2]), "at 1 W the rise is the rise per watt");
        }

        /** SSTR over pump power: the steady rise grows in proportion to the absorbed power (linear heat conduction). */
        @Test
        void sstrRiseIsTheRisePerWattTimesThePower() throws Exception {
            writeCase("powers.json", adiabaticSstr().replace("adiabatic", "isothermal")
                    .replace("{\"type\": \"sstr\"}", "{\"type\": \"sstr\", \"pump_powers_w\": [2e-3, 5e-3, 1e-2]}"));
            Run r = run("powers.json");
            assertEquals(Command.OK, r.status(), r.err());
            String[] lines = r.out().split("\n");
            assertEquals(4, lines.length, r.out());
            double perWatt = cell(lines[1].split(",")[1]);
            double[] powers = {2e-3, 5e-3, 1e-2};
            for (int i = 0; i < 3; i++) {
                String[] cells = lines[i + 1].split(",");
                assertEquals(powers[i], cell(cells[0]), 1e-15);
                assertEquals(perWatt, cell(cells[1]), 0.0, "the rise per watt is the same at every power");
                assertEquals(perWatt * powers[i], cell(cells[2]), 1e-12 * perWatt * powers[i]);
            }
        }

        @Test
        void aStackErrorIsReportedByTheCommand() throws Exception {
            String json = caseOf(GAUSSIAN, FDTR).replace("\"k_through_w_mk\": 140", "\"k_thruogh_w_mk\": 140");
            bad(json, "stack.layers[1].k_thruogh_w_mk", "\"k_thruogh_w_mk\"", "unknown key");
        }

        @Test
        void invalidJsonIsReportedWithItsLine() throws Exception {
            String broken = caseOf(GAUSSIAN, FDTR).replace("\"geometry\": ", "\"geometry\" ");
            Path f = writeCase("broken.json", broken);
            Run r = run("broken.json");
            assertEquals(Command.BAD_INPUT, r.status());
            assertTrue(r.err().startsWith("lamella simulate: " + f + ":" + lineOf(broken, "\"geometry\"") + ": "),
                    r.err());
        }
    }

    static String adiabaticSstr() {
        return """
                {
                  "stack": {
                    "layers": [
                      {"name": "film", "thickness_m": 1e-6, "k_through_w_mk": 1.4, "heat_capacity_j_m3k": 1.65e6}
                    ],
                    "bottom": "adiabatic"
                  },
                  "geometry": {"type": "gaussian", "pump_radius_m": 1e-5, "probe_radius_m": 1e-5},
                  "measurement": {"type": "sstr"}
                }
                """;
    }

    // ---------------------------------------------------------------- command line

    @Nested
    class Usage {

        @Test
        void noArguments() {
            Run r = run();
            assertEquals(Command.BAD_INPUT, r.status());
            assertEquals("", r.out());
            assertTrue(r.err().contains("which case file?"), r.err());
            assertTrue(r.err().contains("usage: lamella simulate"), r.err());
        }

        @Test
        void twoCaseFiles() throws Exception {
            writeCase("a.json", caseOf(GAUSSIAN, FDTR));
            writeCase("b.json", caseOf(GAUSSIAN, FDTR));
            Run r = run("a.json", "b.json");
            assertEquals(Command.BAD_INPUT, r.status());
            assertEquals("", r.out());
            assertTrue(r.err().contains("one case file at a time; got also b.json"), r.err());
        }

        @ParameterizedTest
        @ValueSource(strings = {"--verbose", "-o", "--out=r.csv", "-"})
        void unknownOption(String option) throws Exception {
            writeCase("a.json", caseOf(GAUSSIAN, FDTR));
            Run r = run("a.json", option);
            assertEquals(Command.BAD_INPUT, r.status());
            assertEquals("", r.out());
            assertTrue(r.err().contains("unknown option " + option), r.err());
            assertTrue(r.err().contains("usage: lamella simulate"), r.err());
            try (Stream<Path> s = Files.list(dir)) {
                assertEquals(List.of(dir.resolve("a.json")), s.toList());
            }
        }

        @Test
        void outWithoutValue() throws Exception {
            writeCase("a.json", caseOf(GAUSSIAN, FDTR));
            Run r = run("a.json", "--out");
            assertEquals(Command.BAD_INPUT, r.status());
            assertEquals("", r.out());
            assertTrue(r.err().contains("--out needs a file name"), r.err());
        }

        @Test
        void optionsMayComeFirst() throws Exception {
            writeCase("a.json", caseOf(GAUSSIAN, FDTR));
            Run r = run("--out", "r.csv", "a.json");
            assertEquals(Command.OK, r.status(), r.err());
            assertTrue(Files.exists(dir.resolve("r.csv")));
        }
    }

    @Test
    void relativeCasePathsResolveAgainstTheWorkingDirectory() throws Exception {
        Files.createDirectory(dir.resolve("cases"));
        writeCase("cases/c.json", caseOf(GAUSSIAN, FDTR));
        Run r = run("cases/../cases/c.json");
        assertEquals(Command.OK, r.status(), r.err());
        List<String> lines = new ArrayList<>(List.of(r.out().split("\n")));
        assertEquals(HEADERS.get("fdtr"), lines.remove(0));
        double[] f = lines.stream().mapToDouble(l -> cell(l.split(",")[0])).toArray();
        assertArrayEquals(new double[] {1e3, 1e5, 1e7}, f, 1e-6);
    }
}
