package lamella.api.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import lamella.api.Block;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** The strict reader: what it reads, and every refusal in words at line and JSON path. */
class StrictJsonTest {

    /** Words of a parser library or of Java that must never reach a user. */
    static final List<String> FOREIGN = List.of("ALLOW_", "StreamRead", "Constraints", "[Source", "Jackson",
            "jackson", "fasterxml", "Exception", "java.", "JsonToken", "START_", "END_", "VALUE_", "FIELD_NAME",
            "Feature", "Duplicate field", "Unexpected character", "Unrecognized token", "REDACTED");

    static void assertOwnWords(String message) {
        for (String f : FOREIGN) {
            assertFalse(message.contains(f), "'" + f + "' in: " + message);
        }
    }

    static JsonProblem refused(String text) {
        JsonProblem p = assertThrows(JsonProblem.class, () -> StrictJson.read(text));
        assertOwnWords(p.getMessage());
        return p;
    }

    @Test
    void readsObjectsListsNumbersTextAndTruthWithTheirLines() throws Exception {
        String text = "\uFEFF{\n  \"a\": 1.5e-9,\n  \"b\": [\n    \"x\\ty\\u00e9\",\n    true, false, -0, 12],\n"
                + "  \"c\": {\"d\": {}}\r\n}\n";
        StrictJson.Document d = StrictJson.read(text);
        Block root = d.root();
        assertEquals(1.5e-9, root.get("a"));
        assertEquals(List.of("x\ty\u00e9", true, false, -0.0, 12.0), root.get("b"));
        Block c = (Block) root.get("c");
        assertEquals("c", c.path());
        assertEquals("c.d", ((Block) c.get("d")).path());
        assertEquals(Map.of("", 1, "a", 2, "b", 3, "b[0]", 4, "b[1]", 5, "b[2]", 5, "b[3]", 5, "b[4]", 5,
                "c", 6, "c.d", 6), d.lines());
        assertEquals(6, d.lineOf("c.d.e"));
        assertEquals(1, d.lineOf("nowhere"), "the top-level object's line");
    }

    @Test
    void decimalsReadAsJavaReadsTheirTextCommonPracticeNoSource() throws Exception {
        Block b = StrictJson.read("{\"x\": [4.9e-324, 1.7976931348623157e308, 0.1, 123456789012345678901234567890]}")
                .root();
        assertEquals(List.of(Double.MIN_VALUE, Double.MAX_VALUE, 0.1, 1.2345678901234568e29), b.get("x"));
    }

    static Stream<Arguments> hostile() {
        return Stream.of(
                Arguments.of("{\n\"a\": NaN}", 2, "a", "NaN is not allowed: a value must be a finite number"),
                Arguments.of("{\n\"a\": [1,\n -Infinity]}", 3, "a[1]", "-Infinity is not allowed"),
                Arguments.of("{\"a\": +Infinity}", 1, "a", "+Infinity is not allowed"),
                Arguments.of("{\"a\": {\"b\":\n Infinity}}", 1, "a.b", "Infinity is not allowed"),
                Arguments.of("{\"a\": -nan}", 1, "a", "-nan is not allowed"),
                Arguments.of("{\n  // a note\n  \"a\": 1}", 2, "", "comments are not part of JSON"),
                Arguments.of("{\"a\": 1 /* x */}", 1, "", "comments are not part of JSON"),
                Arguments.of("{\"a\":\n # x\n 1}", 2, "a", "comments are not part of JSON"),
                Arguments.of("{\"a\": [1] // x\n}", 1, "", "comments are not part of JSON"),
                Arguments.of("{\"a\": 1}\n// the end", 2, "", "comments are not part of JSON"),
                Arguments.of("{\"a\": [1,\n]}", 2, "a", "a comma before ']'"),
                Arguments.of("{\"a\": 1,\n}", 2, "", "a comma before '}'"),
                Arguments.of("{'a': 1}", 1, "", "double quotes"),
                Arguments.of("{\"a\": 'x'}", 1, "a", "double quotes"),
                Arguments.of("{a: 1}", 1, "", "the key a must be written in double quotes"),
                Arguments.of("{\"a\": +1}", 1, "a", "may not start with '+'"),
                Arguments.of("{\"a\": 01}", 1, "a", "'01' is not a number as JSON writes one"),
                Arguments.of("{\"a\": 0x10}", 1, "a", "'0x10' is not a number"),
                Arguments.of("{\"a\": 1.}", 1, "a", "'1.' is not a number"),
                Arguments.of("{\"a\": .5}", 1, "a", "'.5' is not a number as JSON writes one"),
                Arguments.of("{\"a\": 1e999}", 1, "a", "outside the range of double precision"),
                Arguments.of("{\"a\": -1e999}", 1, "a", "outside the range of double precision"),
                Arguments.of("{\"a\": 1e-400}", 1, "a", "too small for double precision"),
                Arguments.of("{\"a\": " + "9".repeat(5000) + "}", 1, "a", "a number of 5000 characters"),
                Arguments.of("{\"a\": 0." + "0".repeat(3000) + "1}", 1, "a", "a number of 3003 characters"),
                Arguments.of("{\"a\": null}", 1, "a", "null is not a value"),
                Arguments.of("{\"a\": nul}", 1, "a", "the word nul is not a value"),
                Arguments.of("{\"a\": True}", 1, "a", "the word True is not a value"),
                Arguments.of("{\"a\": 1,\n \"b\": 2,\n \"a\": 3}", 3, "a", "the key 'a' appears twice in the same object"
                        + " (first at line 1)"),
                Arguments.of("{\"l\": [{\"k\": 1, \"k\": 2}]}", 1, "l[0].k", "the key 'k' appears twice"),
                Arguments.of("{\n\"a\": {\n\"b\": [1, 2", 3, "a.b", "the file is cut short: the list a.b (opened at"
                        + " line 3) is not closed"),
                Arguments.of("{\n\"a\": {\n\"b\": 1", 3, "a", "the file is cut short: the object a (opened at line 2)"),
                Arguments.of("{\n\"a\": ", 2, "a", "the file is cut short: it ends where a value was expected"),
                Arguments.of("{\n\"a\": \"text", 2, "a", "the file is cut short: it ends inside text that starts at"
                        + " line 2"),
                Arguments.of("{\n\"a\"", 2, "", "the file is cut short: the top-level object (opened at line 1)"),
                Arguments.of("{\"a\": \"two\nlines\"}", 1, "a", "the text is not closed on its line"),
                Arguments.of("{\"a\": \"tab\there\"}", 1, "a", "a control character (U+0009)"),
                Arguments.of("{\"a\": \"\\x\"}", 1, "a", "unknown escape \\x"),
                Arguments.of("{\"a\": \"\\u12\"}", 1, "a", "four hexadecimal digits"),
                Arguments.of("{\"a\" 1}", 1, "a", "expected ':' after the key 'a'"),
                Arguments.of("{\"a\": 1 \"b\": 2}", 1, "a", "expected ',' or '}' after the value of 'a'"),
                Arguments.of("{\"a\": [1 2]}", 1, "a[0]", "expected ',' or ']' after this element"),
                Arguments.of("{\"a\": }", 1, "a", "expected a value, found '}'"),
                Arguments.of("[1]", 1, "", "expected a JSON object at the top level, found a list"),
                Arguments.of("\n\"x\"", 2, "", "expected a JSON object at the top level, found text"),
                Arguments.of("{} {}", 1, "", "unexpected content after the end of the JSON object"),
                Arguments.of("  \n ", 1, "", "the file is empty"),
                Arguments.of("{\"a\":" + "[".repeat(100) + "]".repeat(100) + "}", 1,
                        "a" + "[0]".repeat(StrictJson.MAX_DEPTH - 1),
                        "nested more than " + StrictJson.MAX_DEPTH + " deep"));
    }

    @ParameterizedTest
    @MethodSource("hostile")
    void refusedInWordsAtLineAndPath(String text, int line, String path, String words) {
        JsonProblem p = refused(text);
        assertEquals(line, p.line(), p.getMessage());
        assertEquals(path, p.path(), p.getMessage());
        assertTrue(p.problem().contains(words), "expected '" + words + "' in: " + p.getMessage());
        assertTrue(p.getMessage().startsWith("line " + line + ": " + (path.isEmpty() ? "" : path + ": ")),
                p.getMessage());
    }

    @Test
    void deepNestingIsRefusedWithoutExhaustingTheStack() {
        String deep = "{\"a\":" + "[".repeat(1_000_000);
        assertTrue(refused(deep).problem().contains("nested more than"));
        String atTheLimit = "{\"a\":" + "[".repeat(StrictJson.MAX_DEPTH - 1) + "]".repeat(StrictJson.MAX_DEPTH - 1)
                + "}";
        assertEquals(1, assertDoesNotThrowRead(atTheLimit).values().size());
    }

    private static Block assertDoesNotThrowRead(String text) {
        try {
            return StrictJson.read(text).root();
        } catch (JsonProblem e) {
            throw new AssertionError(e.getMessage(), e);
        }
    }

    @Test
    void bytesThatAreNotUtf8NameTheirLine() {
        byte[] bytes = "{\n\"a\": \"caf\u00e9\"}".getBytes(StandardCharsets.ISO_8859_1);
        JsonProblem p = assertThrows(JsonProblem.class, () -> StrictJson.read(bytes));
        assertEquals(2, p.line());
        assertTrue(p.problem().contains("not UTF-8 text (byte 0xE9"), p.getMessage());
        assertOwnWords(p.getMessage());
    }

    @Test
    void checkAllowsNullAndRefusesTheRest() throws Exception {
        StrictJson.check("{\"a\": null, \"b\": [null]}");
        JsonProblem p = assertThrows(JsonProblem.class, () -> StrictJson.check("{\"a\": NaN}"));
        assertEquals("a", p.path());
    }
}
