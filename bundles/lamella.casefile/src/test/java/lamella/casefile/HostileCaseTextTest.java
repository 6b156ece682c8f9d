package lamella.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import lamella.api.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Each class of broken case text is told at FILE:LINE: PATH in Lamella's words, never with a parser library's
 * feature or constraint names or a Java class name.
 */
class HostileCaseTextTest {

    static final List<String> FOREIGN = List.of("ALLOW_", "StreamRead", "Constraints", "[Source", "Jackson",
            "jackson", "fasterxml", "Exception", "java.", "JsonToken", "START_", "END_", "VALUE_", "FIELD_NAME",
            "Feature", "Duplicate field", "Unexpected character", "Unrecognized token", "REDACTED");

    /** A valid case (the same as CaseFileReaderTest's) in which each hostile edit replaces one marked piece. */
    static final String CASE = "{\n"
            + "  \"stack\": {\n"
            + "    \"layers\": [\n"
            + "      {\"name\": \"transducer\", \"thickness_m\": 9e-8, \"k_through_w_mk\": 200,\n"
            + "       \"heat_capacity_j_m3k\": 2.45e6, \"conductance_below_w_m2k\": 1.2e8},\n"
            + "      {\"name\": \"substrate\", \"k_through_w_mk\": 140, \"heat_capacity_j_m3k\": 1.63e6}\n"
            + "    ]\n"
            + "  },\n"
            + "  \"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 6e-6, \"probe_radius_m\": 4e-6},\n"
            + "  \"measurement\": {\"type\": \"fdtr\", \"frequencies_hz\": [1e3, 1e6]}\n"
            + "}\n";

    @TempDir
    Path dir;

    static Stream<Arguments> hostile() {
        String deep = "[".repeat(200) + "]".repeat(200);
        return Stream.of(
                Arguments.of("\"thickness_m\": 9e-8", "\"thickness_m\": NaN", 4, "stack.layers[0].thickness_m",
                        "NaN is not allowed"),
                Arguments.of("\"k_through_w_mk\": 140", "\"k_through_w_mk\": Infinity", 6,
                        "stack.layers[1].k_through_w_mk", "Infinity is not allowed"),
                Arguments.of("[1e3, 1e6]", "[1e3, -Infinity]", 10, "measurement.frequencies_hz[1]",
                        "-Infinity is not allowed"),
                Arguments.of("  \"geometry\"", "  // the beams\n  \"geometry\"", 9, "", "comments are not part of"
                        + " JSON"),
                Arguments.of("[1e3, 1e6]", "[1e3, 1e6 /* two */]", 10, "measurement.frequencies_hz", "comments"),
                Arguments.of("\"pump_radius_m\": 6e-6", "\"pump_radius_m\": " + deep, 9, "geometry.pump_radius_m"
                        + "[0]".repeat(62), "nested more than 64 deep"),
                Arguments.of("\"k_through_w_mk\": 200", "\"k_through_w_mk\": 2" + "0".repeat(4000), 4,
                        "stack.layers[0].k_through_w_mk", "a number of 4001 characters"),
                Arguments.of("\"thickness_m\": 9e-8", "\"thickness_m\": 9e-8" + "0".repeat(2000), 4,
                        "stack.layers[0].thickness_m", "a number of 2004 characters"),
                Arguments.of("\"conductance_below_w_m2k\": 1.2e8}", "\"conductance_below_w_m2k\": 1.2e8}, {\"k", 5,
                        "stack.layers[1]", "the text is not closed on its line"),
                Arguments.of("\"probe_radius_m\": 4e-6", "\"probe_radius_m\": 4e-6, \"probe_radius_m\": 5e-6", 9,
                        "geometry.probe_radius_m", "the key 'probe_radius_m' appears twice"),
                Arguments.of("\"thickness_m\": 9e-8", "\"thickness_m\": \"90 nm\"", 4, "stack.layers[0].thickness_m",
                        "the text \"90 nm\""),
                Arguments.of("\"heat_capacity_j_m3k\": 1.63e6}", "\"heat_capacity_j_m3k\": [1.63e6]}", 6,
                        "stack.layers[1].heat_capacity_j_m3k", "a list"),
                Arguments.of("\"name\": \"substrate\"", "\"name\": true", 6, "stack.layers[1].name", ""),
                Arguments.of("\"thickness_m\": 9e-8", "\"thickness_m\": 9e-8,", 4, "stack.layers[0]",
                        "expected a key in double quotes"));
    }

    @ParameterizedTest
    @MethodSource("hostile")
    void toldAtFileLineAndPathInOwnWords(String piece, String replacement, int line, String path, String words)
            throws IOException {
        assertTrue(CASE.contains(piece), piece);
        InputException e = fail(CASE.replace(piece, replacement));
        assertEquals(line, e.line(), e.getMessage());
        assertEquals(path, e.path() == null ? "" : e.path(), e.getMessage());
        assertTrue(e.getMessage().startsWith(e.file() + ":" + line + ": " + (path.isEmpty() ? "" : path + ": ")),
                e.getMessage());
        assertTrue(e.problem().contains(words), "expected '" + words + "' in: " + e.getMessage());
    }

    @Test
    void aFileCutShortAnywhereIsToldInOwnWords() throws IOException {
        for (int end = 1; end < CASE.strip().length(); end++) {
            InputException e = fail(CASE.substring(0, end));
            assertTrue(e.line() >= 1, e.getMessage());
        }
    }

    @Test
    void bytesThatAreNotUtf8() throws IOException {
        Path f = dir.resolve("case.json");
        Files.write(f, CASE.replace("transducer", "transduc\u00e9r").getBytes(StandardCharsets.ISO_8859_1));
        InputException e = assertThrows(InputException.class, () -> new CaseFileReader().read(f));
        assertEquals(4, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("not UTF-8 text"), e.getMessage());
        assertOwnWords(e.getMessage());
    }

    @Test
    void aByteOrderMarkIsSkipped() throws Exception {
        Path f = dir.resolve("case.json");
        Files.writeString(f, "\uFEFF" + CASE, StandardCharsets.UTF_8);
        assertEquals(2, new CaseFileReader().read(f).stack().layers().size());
    }

    private InputException fail(String text) throws IOException {
        Path f = dir.resolve("case.json");
        Files.writeString(f, text, StandardCharsets.UTF_8);
        InputException e = assertThrows(InputException.class, () -> new CaseFileReader().read(f));
        assertEquals(f, e.file());
        assertOwnWords(e.getMessage());
        return e;
    }

    private static void assertOwnWords(String message) {
        for (String f : FOREIGN) {
            assertFalse(message.contains(f), "'" + f + "' in: " + message);
        }
    }
}
