package lamella.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import lamella.api.BottomBoundary;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.Stack;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The case-file contract, version 1: what a valid case reads as, and that every bad input is an
 * {@link InputException} naming the file, the JSON path and the line of the offending key.
 */
class CaseFileReaderTest {

    /** The demo cases at the repository root; surefire runs in the module folder. */
    static final Path DEMO_CASES = Path.of("../../demo-data/cases");

    static final String GEOMETRY = "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 6e-6,"
            + " \"probe_radius_m\": 4e-6}";
    static final String MEASUREMENT = "\"measurement\": {\"type\": \"fdtr\", \"frequencies_hz\": [1e3, 1e6]}";

    @TempDir
    Path dir;

    private final CaseFileReader reader = new CaseFileReader();

    // ---------------------------------------------------------------- helpers

    private Path write(String json) throws IOException {
        Path f = dir.resolve("case.json");
        Files.writeString(f, json, StandardCharsets.UTF_8);
        return f;
    }

    private CaseDocument read(String json) throws Exception {
        return reader.read(write(json));
    }

    /** Reads a bad case and checks that the error is located in its file. */
    private InputException fail(String json) throws IOException {
        Path f = write(json);
        InputException e = assertThrows(InputException.class, () -> reader.read(f));
        assertEquals(f, e.file(), "the error names the file");
        assertTrue(e.getMessage().startsWith(f.toString()), e.getMessage());
        return e;
    }

    /** The 1-based line of the first occurrence of {@code marker} in {@code text}. */
    static int lineOf(String text, String marker) {
        int at = text.indexOf(marker);
        if (at < 0) {
            throw new IllegalArgumentException("no " + marker + " in the test's JSON");
        }
        return (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
    }

    /** A case with the given stack body (inside {@code "stack": {...}}) and a valid geometry and measurement. */
    static String withStack(String stackBody) {
        return "{\n"
                + "  \"stack\": {\n"
                + stackBody + "\n"
                + "  },\n"
                + "  " + GEOMETRY + ",\n"
                + "  " + MEASUREMENT + "\n"
                + "}\n";
    }

    /** A case whose stack has the given layers (one JSON object per line) and the default bottom. */
    static String withLayers(String... layers) {
        return withStack("    \"layers\": [\n      " + String.join(",\n      ", layers) + "\n    ]");
    }

    static final String TRANSDUCER = "{\"name\": \"transducer\", \"thickness_m\": 9e-8, \"k_through_w_mk\": 200,"
            + " \"heat_capacity_j_m3k\": 2.45e6, \"conductance_below_w_m2k\": 1.2e8}";
    static final String SUBSTRATE = "{\"name\": \"substrate\", \"k_through_w_mk\": 140,"
            + " \"heat_capacity_j_m3k\": 1.63e6}";

    private void assertAt(InputException e, String path, int line, String... inMessage) {
        assertEquals(path, e.path(), e.getMessage());
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains(":" + line + ": "), e.getMessage());
        if (path != null && !path.isEmpty()) {
            assertTrue(e.getMessage().contains(path + ": "), e.getMessage());
        }
        for (String s : inMessage) {
            assertTrue(e.getMessage().contains(s), "expected '" + s + "' in: " + e.getMessage());
        }
    }

    // ---------------------------------------------------------------- valid cases

    @Nested
    class Valid {

        @Test
        void defaultsAreApplied() throws Exception {
            CaseDocument doc = read(withLayers(
                    "{\"name\": \"top\", \"thickness_m\": 1e-7, \"k_through_w_mk\": 2, \"heat_capacity_j_m3k\": 3e6}",
                    "{\"name\": \"base\", \"k_through_w_mk\": 5, \"heat_capacity_j_m3k\": 4e6}"));
            Stack s = doc.stack();
            assertEquals(BottomBoundary.SEMI_INFINITE, s.bottom(), "semi-infinite is the default bottom");
            assertEquals(2, s.layers().size());
            Layer top = s.layers().get(0);
            assertEquals("top", top.name());
            assertEquals(1e-7, top.thickness());
            assertEquals(2.0, top.kThrough());
            assertEquals(2.0, top.kInPlaneX(), "in-plane defaults to through-plane");
            assertEquals(2.0, top.kInPlaneY(), "in-plane defaults to through-plane");
            assertEquals(3e6, top.heatCapacity());
            assertTrue(top.hasPerfectContactBelow(), "no conductance means perfect contact");
            Layer base = s.layers().get(1);
            assertEquals("base", base.name());
            assertTrue(base.isSemiInfinite());
            assertEquals(Double.POSITIVE_INFINITY, base.thickness());
            assertEquals(5.0, base.kInPlaneX());
            assertTrue(base.hasPerfectContactBelow());
            assertFalse(doc.root().has("description"), "description is optional");
        }

        @Test
        void explicitValuesAreKept() throws Exception {
            String json = withStack("""
                        "layers": [
                          {"name": "a", "thickness_m": 2e-8, "k_through_w_mk": 3, "k_in_plane_w_mk": 30,
                           "heat_capacity_j_m3k": 1e6, "conductance_below_w_m2k": 5e7},
                          {"name": "b", "thickness_m": 1e-3, "k_through_w_mk": 1.5, "heat_capacity_j_m3k": 2e6}
                        ],
                        "bottom": "adiabatic\"""");
            Stack s = read(json).stack();
            assertEquals(BottomBoundary.ADIABATIC, s.bottom());
            Layer a = s.layers().get(0);
            assertEquals(3.0, a.kThrough());
            assertEquals(30.0, a.kInPlaneX());
            assertEquals(30.0, a.kInPlaneY());
            assertEquals(5e7, a.conductanceBelow());
            assertFalse(a.hasPerfectContactBelow());
            Layer b = s.layers().get(1);
            assertEquals(1e-3, b.thickness(), "a thick last layer above an adiabatic bottom");
            assertFalse(b.isSemiInfinite());
        }

        @ParameterizedTest
        @ValueSource(strings = {"adiabatic", "isothermal", "semi-infinite"})
        void everyBottomIsRead(String bottom) throws Exception {
            String last = bottom.equals("semi-infinite")
                    ? "{\"name\": \"b\", \"k_through_w_mk\": 1, \"heat_capacity_j_m3k\": 1e6}"
                    : "{\"name\": \"b\", \"thickness_m\": 1e-4, \"k_through_w_mk\": 1, \"heat_capacity_j_m3k\": 1e6}";
            Stack s = read(withStack("    \"layers\": [" + last + "], \"bottom\": \"" + bottom + "\"")).stack();
            assertEquals(BottomBoundary.fromCaseName(bottom).orElseThrow(), s.bottom());
            assertEquals(1, s.layers().size());
            assertEquals(bottom.equals("semi-infinite"), s.layers().get(0).isSemiInfinite());
        }

        @Test
        void blocksAreKeptRawWithTheirPaths() throws Exception {
            Path f = write("{\"description\": \"a test\", \"stack\": {\"layers\": [" + SUBSTRATE + "]}, "
                    + GEOMETRY + ", " + MEASUREMENT + "}");
            CaseDocument doc = reader.read(f);
            assertEquals(f, doc.file());
            assertEquals("geometry", doc.geometry().path());
            assertEquals("gaussian", doc.geometry().get("type"));
            assertEquals(6e-6, doc.geometry().get("pump_radius_m"));
            assertEquals("measurement", doc.measurement().path());
            assertEquals(List.of(1e3, 1e6), doc.measurement().get("frequencies_hz"));
            assertEquals("a test", doc.root().get("description"));
        }

        @Test
        void everyDemoCaseReads() throws Exception {
            List<Path> cases;
            try (Stream<Path> s = Files.list(DEMO_CASES)) {
                cases = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
            }
            assertFalse(cases.isEmpty(), "demo cases at " + DEMO_CASES.toAbsolutePath());
            for (Path c : cases) {
                CaseDocument doc = reader.read(c);
                assertFalse(doc.stack().layers().isEmpty(), c.toString());
                assertTrue(doc.geometry().get("type") instanceof String, c.toString());
                assertTrue(doc.measurement().get("type") instanceof String, c.toString());
            }
        }

        @Test
        void theFdtrDemoStack() throws Exception {
            Stack s = reader.read(DEMO_CASES.resolve("oxide-film-fdtr.json")).stack();
            assertEquals(List.of("transducer", "film", "substrate"),
                    s.layers().stream().map(Layer::name).toList());
            assertEquals(9.0e-8, s.layers().get(0).thickness());
            assertEquals(1.2e8, s.layers().get(0).conductanceBelow());
            assertEquals(200.0, s.layers().get(0).kInPlaneX());
            assertEquals(3.0e8, s.layers().get(1).conductanceBelow());
            assertTrue(s.layers().get(2).isSemiInfinite());
            assertEquals(BottomBoundary.SEMI_INFINITE, s.bottom());
        }

        @Test
        void linesPointAtKeys() throws Exception {
            String json = withLayers(TRANSDUCER, SUBSTRATE);
            CaseDocument doc = read(json);
            assertEquals(lineOf(json, "\"stack\""), doc.lines().get("stack"));
            assertEquals(lineOf(json, "\"layers\""), doc.lines().get("stack.layers"));
            assertEquals(lineOf(json, "\"name\": \"substrate\""), doc.lines().get("stack.layers[1]"));
            assertEquals(lineOf(json, "\"name\": \"substrate\""), doc.lines().get("stack.layers[1].k_through_w_mk"));
            assertEquals(lineOf(json, "\"geometry\""), doc.lines().get("geometry.pump_radius_m"));
            assertEquals(lineOf(json, "\"measurement\""), doc.lines().get("measurement.frequencies_hz[1]"));
        }

        /** Key and value on different lines: errors point at the key, which is what the path names. */
        @Test
        void valuesOnTheLineAfterTheirKeyAreLocatedAtTheKey() throws Exception {
            String json = """
                    {
                      "stack":
                        {"layers":
                          [{"name": "s", "k_through_w_mk":
                              1, "heat_capacity_j_m3k": 1e6}]},
                      "geometry":
                        {"type": "gaussian"},
                      "measurement": {"type": "fdtr"}
                    }
                    """;
            CaseDocument doc = read(json);
            assertEquals(lineOf(json, "\"stack\""), doc.lines().get("stack"));
            assertEquals(lineOf(json, "\"layers\""), doc.lines().get("stack.layers"));
            assertEquals(lineOf(json, "[{"), doc.lines().get("stack.layers[0]"), "a list element: its own line");
            assertEquals(lineOf(json, "\"k_through"), doc.lines().get("stack.layers[0].k_through_w_mk"));
            assertEquals(lineOf(json, "\"geometry\""),
                    doc.locate(InputException.at("geometry.pump_radius_m", "missing")).line(),
                    "a missing key: the line of its object's key");
        }

        @Test
        void locateUsesTheLineOfThePathOrItsNearestParent() throws Exception {
            String json = """
                    {
                      "stack": {"layers": [
                        {"name": "s", "k_through_w_mk": 1, "heat_capacity_j_m3k": 1e6}
                      ]},
                      "geometry": {
                        "type": "gaussian",
                        "pump_radus_m": 6e-6
                      },
                      "measurement": {"type": "fdtr", "frequencies_hz": [
                        1e3,
                        -1e4
                      ]}
                    }
                    """;
            CaseDocument doc = read(json);
            InputException typo = doc.locate(InputException.at("geometry.pump_radus_m", "unknown key"));
            assertEquals(doc.file(), typo.file());
            assertEquals(lineOf(json, "\"pump_radus_m\""), typo.line());
            assertEquals("geometry.pump_radus_m", typo.path());
            assertEquals("unknown key", typo.problem());

            InputException missing = doc.locate(InputException.at("geometry.probe_radius_m", "missing"));
            assertEquals(lineOf(json, "\"geometry\""), missing.line(), "a missing key: the line of its object");

            InputException element = doc.locate(InputException.at("measurement.frequencies_hz[1]", "negative"));
            assertEquals(lineOf(json, "-1e4"), element.line());

            InputException deep = doc.locate(InputException.at("stack.layers[0].thickness_m.x", "deeper"));
            assertEquals(lineOf(json, "{\"name\": \"s\""), deep.line());

            InputException located = new InputException(Path.of("other.json"), "x", 7, "already located");
            assertSame(located, doc.locate(located), "an error that names its file is kept");

            InputException nowhere = doc.locate(InputException.at("fit", "no such block"));
            assertEquals(doc.file(), nowhere.file());
            assertEquals(-1, nowhere.line());
        }
    }

    // ---------------------------------------------------------------- syntax

    @Nested
    class Syntax {

        @Test
        void unparseableJsonNamesTheLine() throws Exception {
            String json = "{\n  \"description\": \"x\"\n  \"stack\": {}\n}\n";
            InputException e = fail(json);
            assertEquals(3, e.line(), e.getMessage());
            assertEquals("description", e.path());
            assertTrue(e.getMessage().contains("expected ',' or '}' after the value of 'description'"),
                    e.getMessage());
            assertTrue(e.getMessage().contains(":3: description: "), e.getMessage());
        }

        @Test
        void unclosedObjectAndListAtTheEnd() throws Exception {
            InputException list = fail("{\n\"stack\": {\"layers\": [1, 2\n");
            assertEquals("stack.layers", list.path());
            assertTrue(list.getMessage().contains("cut short: the list stack.layers (opened at line 2) is not closed"),
                    list.getMessage());
            InputException object = fail("{\n\"stack\": {\n");
            assertEquals("stack", object.path());
            assertTrue(object.getMessage().contains("cut short: the object stack (opened at line 2)"),
                    object.getMessage());
            InputException value = fail("{\"a\": ");
            assertEquals("a", value.path());
            assertTrue(value.getMessage().contains("cut short: it ends where a value was expected"),
                    value.getMessage());
        }

        @Test
        void trailingCommaAndComments() throws Exception {
            assertEquals(2, fail("{\"description\": \"x\",\n}").line());
            assertEquals(1, fail("{ // a comment\n}").line());
        }

        @ParameterizedTest
        @ValueSource(strings = {"", " ", "\n\n  \n"})
        void emptyFile(String content) throws Exception {
            InputException e = fail(content);
            assertTrue(e.getMessage().contains("empty"), e.getMessage());
            assertEquals(1, e.line());
        }

        @ParameterizedTest
        @ValueSource(strings = {"[{\"stack\": {}}]", "\n\"stack\"", "\n\n42", "true"})
        void topLevelMustBeAnObject(String content) throws Exception {
            InputException e = fail(content);
            assertTrue(e.getMessage().contains("expected a JSON object at the top level"), e.getMessage());
            assertEquals(lineOf(content, content.strip()), e.line());
        }

        @Test
        void trailingObjectAfterTheCase() throws Exception {
            String json = withLayers(SUBSTRATE) + "\n{\"more\": 1}\n";
            InputException e = fail(json);
            assertTrue(e.getMessage().contains("unexpected content after the end"), e.getMessage());
            assertEquals(lineOf(json, "{\"more\""), e.line());
        }

        @ParameterizedTest
        @ValueSource(strings = {"x", "}", "]", "1", "\"more\"", ","})
        void trailingTokensAfterTheCase(String tail) throws Exception {
            String json = withLayers(SUBSTRATE) + "\n" + tail + "\n";
            InputException e = fail(json);
            int tailLine = (int) json.chars().filter(c -> c == '\n').count();
            assertEquals(tailLine, e.line(), e.getMessage());
        }

        @Test
        void duplicateTopLevelKey() throws Exception {
            String json = withLayers(SUBSTRATE).replace("\"stack\": {", "\"stack\": {\"layers\": []},\n  \"stack\": {");
            InputException e = fail(json);
            assertTrue(e.getMessage().contains("the key 'stack' appears twice in the same object (first at line 2)"),
                    e.getMessage());
            assertEquals(3, e.line(), e.getMessage());
            assertEquals("stack", e.path());
        }

        @Test
        void duplicateKeyInALayer() throws Exception {
            String json = withLayers(TRANSDUCER,
                    "{\"name\": \"s\", \"k_through_w_mk\": 1,\n       \"k_through_w_mk\": 2, \"heat_capacity_j_m3k\": 1e6}");
            InputException e = fail(json);
            assertTrue(e.getMessage().contains("'k_through_w_mk'"), e.getMessage());
            assertEquals(lineOf(json, "\"k_through_w_mk\": 2,"), e.line(), e.getMessage());
        }

        @Test
        void nullIsNotAValue() throws Exception {
            String json = withLayers(TRANSDUCER.replace("1.2e8", "null"), SUBSTRATE);
            InputException e = fail(json);
            assertAt(e, "stack.layers[0].conductance_below_w_m2k", lineOf(json, "null"), "null");
        }

        @Test
        void nullOnTheLineAfterItsKey() throws Exception {
            String json = withLayers(TRANSDUCER.replace("1.2e8", "\n        null"), SUBSTRATE);
            assertAt(fail(json), "stack.layers[0].conductance_below_w_m2k", lineOf(json, "conductance_below"),
                    "null");
        }

        @Test
        void overflowOnTheLineAfterItsKey() throws Exception {
            String json = withLayers(TRANSDUCER.replace("9e-8", "\n        1e999"), SUBSTRATE);
            assertAt(fail(json), "stack.layers[0].thickness_m", lineOf(json, "thickness_m"), "1e999");
        }

        @Test
        void nullInAList() throws Exception {
            String json = withLayers(SUBSTRATE).replace("[1e3, 1e6]", "[1e3, null]");
            assertAt(fail(json), "measurement.frequencies_hz[1]", lineOf(json, "null"), "null");
        }

        @ParameterizedTest
        @ValueSource(strings = {"1e999", "-1e999", "1e309"})
        void overflowingNumber(String number) throws Exception {
            String json = withLayers(TRANSDUCER.replace("9e-8", number), SUBSTRATE);
            InputException e = fail(json);
            assertAt(e, "stack.layers[0].thickness_m", lineOf(json, number), number, "outside the range");
        }

        @Test
        void overflowingInteger() throws Exception {
            String big = "1" + "0".repeat(400);
            String json = withLayers(SUBSTRATE.replace("140", big));
            assertAt(fail(json), "stack.layers[0].k_through_w_mk", lineOf(json, big), "a number of 401 characters");
        }

        @ParameterizedTest
        @ValueSource(strings = {"NaN", "Infinity", "-Infinity"})
        void nonFiniteLiterals(String literal) throws Exception {
            String json = withLayers(TRANSDUCER.replace("9e-8", literal), SUBSTRATE);
            assertEquals(lineOf(json, literal), fail(json).line());
        }

        @Test
        void missingFile() {
            Path f = dir.resolve("nowhere.json");
            InputException e = assertThrows(InputException.class, () -> reader.read(f));
            assertEquals(f, e.file());
            assertTrue(e.getMessage().contains("cannot read"), e.getMessage());
        }

        @Test
        void aFolderIsNotACaseFile() {
            InputException e = assertThrows(InputException.class, () -> reader.read(dir));
            assertEquals(dir, e.file());
        }
    }

    // ---------------------------------------------------------------- structure

    @Nested
    class Structure {

        @Test
        void unknownTopLevelKeyWithHint() throws Exception {
            String json = withLayers(SUBSTRATE).replace("\"geometry\"", "\"geometri\"");
            InputException e = fail(json);
            assertAt(e, "geometri", lineOf(json, "\"geometri\""), "did you mean 'geometry'",
                    "description, fit, geometry, map, measurement, plan, samples, self_heating, stack, temperature_k, workbench");
        }

        @Test
        void unknownTopLevelKeyWithoutHint() throws Exception {
            String json = withLayers(SUBSTRATE).replace("{\n  \"stack\"", "{\n  \"results\": {},\n  \"stack\"");
            InputException e = fail(json);
            assertAt(e, "results", 2, "unknown key");
            assertFalse(e.getMessage().contains("did you mean"), e.getMessage());
        }

        @Test
        void workbenchSettingsAreAnObjectThatNoModelReads() throws Exception {
            String json = withLayers(SUBSTRATE).replace("{\n  \"stack\"", "{\n  \"workbench\": {\"remembered\":"
                    + " {\"measurement\": {\"tdtr\": {\"modulation_hz\": \"any text\"}}}},\n  \"stack\"");
            CaseDocument doc = read(json);
            assertEquals(read(withLayers(SUBSTRATE)).stack(), doc.stack());
            String bad = withLayers(SUBSTRATE).replace("{\n  \"stack\"", "{\n  \"workbench\": [1],\n  \"stack\"");
            assertAt(fail(bad), "workbench", 2, "expected an object of workbench settings");
        }

        @Test
        void unknownStackKey() throws Exception {
            String json = withStack("    \"layers\": [" + SUBSTRATE + "],\n    \"botom\": \"adiabatic\"");
            assertAt(fail(json), "stack.botom", lineOf(json, "\"botom\""), "did you mean 'bottom'", "unknown key");
        }

        @Test
        void unknownStackKeyLayer() throws Exception {
            String json = withStack("    \"layer\": [" + SUBSTRATE + "]");
            assertAt(fail(json), "stack.layer", lineOf(json, "\"layer\""), "did you mean 'layers'");
        }

        @Test
        void unknownLayerKeyWithHint() throws Exception {
            String json = withLayers(TRANSDUCER.replace("thickness_m", "thikness_m"), SUBSTRATE);
            InputException e = fail(json);
            assertAt(e, "stack.layers[0].thikness_m", lineOf(json, "\"thikness_m\""), "did you mean 'thickness_m'");
            assertTrue(e.getMessage().contains("k_in_plane_w_mk"), "lists the known keys: " + e.getMessage());
        }

        @Test
        void unknownKeyWithItsValueOnTheNextLine() throws Exception {
            String json = withLayers(TRANSDUCER.replace("\"thickness_m\": 9e-8", "\"thikness_m\":\n        9e-8"),
                    SUBSTRATE);
            assertAt(fail(json), "stack.layers[0].thikness_m", lineOf(json, "\"thikness_m\""),
                    "did you mean 'thickness_m'");
        }

        @Test
        void unknownBlockOpenedOnTheNextLine() throws Exception {
            String json = withLayers(SUBSTRATE).replace("{\n  \"stack\"", "{\n  \"geometrie\":\n  {\n  },\n  \"stack\"");
            assertAt(fail(json), "geometrie", 2, "did you mean 'geometry'");
        }

        @Test
        void unknownLayerKeyOnALaterLine() throws Exception {
            String json = withLayers(TRANSDUCER, SUBSTRATE.replace("\"heat_capacity_j_m3k\"",
                    "\n        \"heat_capacity_j_mk\""));
            assertAt(fail(json), "stack.layers[1].heat_capacity_j_mk", lineOf(json, "heat_capacity_j_mk"),
                    "did you mean 'heat_capacity_j_m3k'");
        }

        @ParameterizedTest
        @ValueSource(strings = {"stack", "geometry", "measurement"})
        void missingBlock(String block) throws Exception {
            String json = switch (block) {
                case "stack" -> "{\n  " + GEOMETRY + ",\n  " + MEASUREMENT + "\n}";
                case "geometry" -> "{\n  \"stack\": {\"layers\": [" + SUBSTRATE + "]},\n  " + MEASUREMENT + "\n}";
                default -> "{\n  \"stack\": {\"layers\": [" + SUBSTRATE + "]},\n  " + GEOMETRY + "\n}";
            };
            InputException e = fail(json);
            assertEquals(block, e.path());
            assertTrue(e.getMessage().contains(block + ": missing"), e.getMessage());
        }

        @ParameterizedTest
        @ValueSource(strings = {"\"x\"", "[]", "3", "true"})
        void blockOfWrongKind(String value) throws Exception {
            String json = withLayers(SUBSTRATE).replace(GEOMETRY, "\"geometry\": " + value);
            assertAt(fail(json), "geometry", lineOf(json, "\"geometry\""), "expected an object");
            String stack = "{\n  \"stack\": " + value + ",\n  " + GEOMETRY + ",\n  " + MEASUREMENT + "\n}";
            assertAt(fail(stack), "stack", 2, "expected an object");
        }

        @Test
        void descriptionMustBeText() throws Exception {
            String json = withLayers(SUBSTRATE).replace("{\n  \"stack\"", "{\n  \"description\": 12,\n  \"stack\"");
            assertAt(fail(json), "description", 2, "text");
        }

        @Test
        void missingLayers() throws Exception {
            String json = withStack("    \"bottom\": \"semi-infinite\"");
            assertAt(fail(json), "stack.layers", lineOf(json, "\"stack\""), "missing");
        }

        @ParameterizedTest
        @ValueSource(strings = {"[]", "{}", "\"a\"", "1"})
        void layersMustBeANonEmptyList(String value) throws Exception {
            String json = withStack("    \"layers\": " + value);
            assertAt(fail(json), "stack.layers", lineOf(json, "\"layers\""), "non-empty list");
        }

        @Test
        void aLayerMustBeAnObject() throws Exception {
            String json = withLayers(TRANSDUCER, "\"substrate\"");
            assertAt(fail(json), "stack.layers[1]", lineOf(json, "\"substrate\""), "expected a layer object");
        }
    }

    // ---------------------------------------------------------------- layer values

    @Nested
    class LayerValues {

        @ParameterizedTest
        @ValueSource(strings = {"thickness_m", "k_through_w_mk", "heat_capacity_j_m3k"})
        void missingRequiredValue(String key) throws Exception {
            String first = TRANSDUCER.replaceAll("\"" + key + "\": [^,}]+,? ?", "");
            String json = withLayers(first, SUBSTRATE);
            assertFalse(first.contains(key));
            assertAt(fail(json), "stack.layers[0]." + key, lineOf(json, "\"transducer\""), "missing");
        }

        @Test
        void missingName() throws Exception {
            String json = withLayers(TRANSDUCER.replace("\"name\": \"transducer\", ", ""), SUBSTRATE);
            assertAt(fail(json), "stack.layers[0].name", lineOf(json, "\"thickness_m\""), "missing");
        }

        @ParameterizedTest
        @ValueSource(strings = {"\"\"", "\"  \""})
        void blankName(String name) throws Exception {
            String json = withLayers(TRANSDUCER.replace("\"transducer\"", name), SUBSTRATE);
            assertAt(fail(json), "stack.layers[0].name", 4, "blank");
        }

        @Test
        void nameMustBeText() throws Exception {
            String json = withLayers(TRANSDUCER.replace("\"transducer\"", "7"), SUBSTRATE);
            assertAt(fail(json), "stack.layers[0].name", 4, "text");
        }

        @ParameterizedTest
        @ValueSource(strings = {"thickness_m", "k_through_w_mk", "k_in_plane_w_mk", "heat_capacity_j_m3k",
                                "conductance_below_w_m2k"})
        void negativeAndZeroValues(String key) throws Exception {
            for (String bad : new String[] {"-1.5", "0", "-0.0"}) {
                String layer = "{\"name\": \"a\", \"thickness_m\": 1e-7, \"k_through_w_mk\": 2,"
                        + " \"k_in_plane_w_mk\": 2, \"heat_capacity_j_m3k\": 3e6, \"conductance_below_w_m2k\": 1e8}";
                layer = layer.replaceAll("(\"" + key + "\": )[^,}]+", "$1" + bad);
                String json = withLayers(layer, SUBSTRATE);
                assertAt(fail(json), "stack.layers[0]." + key, lineOf(json, "\"a\""), "positive");
            }
        }

        @Test
        void negativeValueOnALaterLayerLine() throws Exception {
            String json = withLayers(TRANSDUCER,
                    "{\"name\": \"substrate\",\n       \"k_through_w_mk\": -140, \"heat_capacity_j_m3k\": 1.63e6}");
            assertAt(fail(json), "stack.layers[1].k_through_w_mk", lineOf(json, "-140"), "got -140.0");
        }

        @ParameterizedTest
        @ValueSource(strings = {"\"9e-8\"", "true", "[9e-8]", "{\"value\": 9e-8}"})
        void numberOfWrongKind(String value) throws Exception {
            String json = withLayers(TRANSDUCER.replace("9e-8", value), SUBSTRATE);
            assertAt(fail(json), "stack.layers[0].thickness_m", 4, "as a number");
        }

        @Test
        void stringInsteadOfNumberIsQuoted() throws Exception {
            String json = withLayers(TRANSDUCER, SUBSTRATE.replace("140", "\"140 W/mK\""));
            assertAt(fail(json), "stack.layers[1].k_through_w_mk", 5, "the text \"140 W/mK\"");
        }

        @Test
        void duplicateLayerName() throws Exception {
            String json = withLayers(TRANSDUCER, TRANSDUCER, SUBSTRATE);
            assertAt(fail(json), "stack.layers[1].name", 5, "'transducer'", "stack.layers[0]");
        }

        @Test
        void semiInfiniteLayerNotLast() throws Exception {
            String middle = "{\"name\": \"film\", \"k_through_w_mk\": 1.4, \"heat_capacity_j_m3k\": 1.65e6}";
            String json = withLayers(TRANSDUCER, middle, SUBSTRATE);
            assertAt(fail(json), "stack.layers[1].thickness_m", lineOf(json, "\"film\""), "missing", "thickness");
        }

        @Test
        void thicknessOnTheLastLayerOfASemiInfiniteStack() throws Exception {
            String json = withLayers(TRANSDUCER,
                    "{\"name\": \"substrate\", \"k_through_w_mk\": 140,\n       \"thickness_m\": 5e-4,"
                            + " \"heat_capacity_j_m3k\": 1.63e6}");
            assertAt(fail(json), "stack.layers[1].thickness_m", lineOf(json, "5e-4"), "semi-infinite",
                    "adiabatic", "isothermal");
        }

        @Test
        void explicitSemiInfiniteBottomAlsoRejectsALastThickness() throws Exception {
            String json = withStack("    \"layers\": [" + TRANSDUCER.replace(", \"conductance_below_w_m2k\": 1.2e8", "")
                    + "],\n    \"bottom\": \"semi-infinite\"");
            assertAt(fail(json), "stack.layers[0].thickness_m", 3, "semi-infinite");
        }

        @ParameterizedTest
        @ValueSource(strings = {"adiabatic", "isothermal"})
        void finiteBottomNeedsALastThickness(String bottom) throws Exception {
            String json = withStack("    \"layers\": [\n      " + TRANSDUCER + ",\n      " + SUBSTRATE
                    + "\n    ],\n    \"bottom\": \"" + bottom + "\"");
            assertAt(fail(json), "stack.layers[1].thickness_m", lineOf(json, "\"substrate\""), "missing", bottom);
        }

        @Test
        void conductanceOnTheLastLayer() throws Exception {
            String json = withLayers(TRANSDUCER,
                    SUBSTRATE.replace("}", ",\n       \"conductance_below_w_m2k\": 1e8}"));
            assertAt(fail(json), "stack.layers[1].conductance_below_w_m2k", lineOf(json, "1e8}"), "last layer");
        }

        @Test
        void conductanceOnTheLastLayerOfAFiniteStack() throws Exception {
            String json = withStack("    \"layers\": [" + TRANSDUCER + "],\n    \"bottom\": \"isothermal\"");
            assertAt(fail(json), "stack.layers[0].conductance_below_w_m2k", 3, "last layer");
        }

        @ParameterizedTest
        @ValueSource(strings = {"insulated", "Adiabatic", "semi_infinite", ""})
        void unknownBottom(String bottom) throws Exception {
            String json = withStack("    \"layers\": [" + SUBSTRATE + "],\n    \"bottom\": \"" + bottom + "\"");
            assertAt(fail(json), "stack.bottom", lineOf(json, "\"bottom\""), "unknown bottom '" + bottom + "'",
                    "semi-infinite, adiabatic, isothermal");
        }

        @Test
        void bottomMustBeText() throws Exception {
            String json = withStack("    \"layers\": [" + SUBSTRATE + "],\n    \"bottom\": 0");
            assertAt(fail(json), "stack.bottom", 4, "text");
        }

        @Test
        void theFirstProblemInFileOrderIsReported() throws Exception {
            String json = withLayers(TRANSDUCER.replace("200", "-200"), SUBSTRATE.replace("140", "-140"));
            InputException e = fail(json);
            assertEquals("stack.layers[0].k_through_w_mk", e.path());
            assertNotNull(e.problem());
        }
    }
}
