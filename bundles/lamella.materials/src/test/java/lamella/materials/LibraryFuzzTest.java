package lamella.materials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.regex.Pattern;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryTier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A seeded random-mutation fuzz test of the material-library reader, in the manner of the importers' and case files'
 * (lamella.cli.data MutationFuzzTest): the shipped and demo library files are damaged in many small ways — bytes
 * flipped, dropped, repeated, cut, and tokens that JSON parsers trip on spliced in (NaN, comments, thousands of
 * digits, deep nesting, a byte-order mark, stray quotes) — and read again. Reading never throws; every error it
 * reports names its file and a line or JSON path, in our words: no Java class names, no parser feature names.
 * Deterministic seeds, so a failure reproduces.
 */
class LibraryFuzzTest {

    private static final int ROUNDS_PER_SAMPLE = 500;
    private static final String DIGITS = "1".repeat(1200);
    private static final String[] TOKENS = {"NaN", "-Infinity", "Infinity", "1e999", "-1e-999", "//", "/* x */",
        "#", DIGITS, "0." + DIGITS, "[".repeat(200), "{\"a\":".repeat(120), "\uFEFF", "\"", "\\", "\\u00",
        "\u0000", "\t", "\r\n", "null", "true", "'", ",", ":", "{", "}", "[", "]", "00", "-", "1.5e", "\"id\": \"x\",",
        "\"version\": 1,", "\"k_w_mk\"", "\u00b5", "\uFFFD", "\u00e9"};
    private static final Pattern JAVA_NAME = Pattern.compile(
            "\\b(?:java|javax|com|org|lamella)\\.[a-z]|[A-Z][a-z]+(?:Exception|Error)\\b");
    private static final Pattern PARSER_WORDS = Pattern.compile("ALLOW_|Feature|StreamReadConstraints|JsonToken"
            + "|JsonParser|Jackson|\\[Source|REDACTED|VALUE_[A-Z]|START_[A-Z]|FIELD_NAME|\\(code \\d+\\)|getMax"
            + "|ctrl-char|CTRL-CHAR|was expecting|Unexpected character");

    @TempDir
    Path dir;

    static List<byte[]> samples() throws IOException {
        List<byte[]> out = new ArrayList<>();
        for (Path p : List.of(Folders.SHIPPED.resolve("semiconductors.json"), Folders.SHIPPED.resolve("metals.json"),
                Folders.DEMO_FACILITY.resolve("films.json"), Folders.DEMO_FACILITY.resolve("library.json"))) {
            byte[] all = Files.readAllBytes(p);
            out.add(Arrays.copyOf(all, Math.min(all.length, 4000)));
        }
        return out;
    }

    static byte[] mutate(byte[] in, Random r) {
        byte[] b = in;
        int edits = 1 + r.nextInt(3);
        for (int e = 0; e < edits; e++) {
            int at = b.length == 0 ? 0 : r.nextInt(b.length);
            switch (r.nextInt(6)) {
                case 0 -> {
                    if (b.length > 0) {
                        b = b.clone();
                        b[at] = (byte) r.nextInt(256);
                    }
                }
                case 1 -> b = splice(b, at, Math.min(b.length, at + 1 + r.nextInt(40)), new byte[0]);
                case 2 -> b = splice(b, at, at, Arrays.copyOfRange(b, at, Math.min(b.length, at + 1 + r.nextInt(80))));
                case 3 -> b = Arrays.copyOf(b, at);
                default -> b = splice(b, at, at, TOKENS[r.nextInt(TOKENS.length)].getBytes(StandardCharsets.UTF_8));
            }
        }
        return b;
    }

    private static byte[] splice(byte[] b, int from, int to, byte[] insert) {
        byte[] out = new byte[b.length - (to - from) + insert.length];
        System.arraycopy(b, 0, out, 0, from);
        System.arraycopy(insert, 0, out, from, insert.length);
        System.arraycopy(b, to, out, from + insert.length, b.length - to);
        return out;
    }

    @Test
    void everyFindingOfADamagedLibraryNamesFileAndPlaceInOurWords() throws IOException {
        List<byte[]> samples = samples();
        int errors = 0;
        int clean = 0;
        for (int s = 0; s < samples.size(); s++) {
            boolean head = s == samples.size() - 1;
            Random r = new Random(41L * s + 5);
            for (int round = 0; round < ROUNDS_PER_SAMPLE; round++) {
                Path lib = Files.createDirectories(dir.resolve("s" + s + "r" + round));
                if (!head) {
                    Folders.library(lib, "fuzz", "Fuzzed library");
                }
                Path file = lib.resolve(head ? "library.json" : "entries.json");
                byte[] mutated = mutate(samples.get(s), r);
                Files.write(file, mutated);
                ReadLibrary read;
                try {
                    read = LibraryFolder.read(lib, LibraryTier.FACILITY);
                } catch (RuntimeException | Error e) {
                    fail("sample " + s + ", round " + round + ": " + e + " on input:\n"
                            + new String(mutated, StandardCharsets.UTF_8), e);
                    return;
                }
                List<LibraryFinding> found = read.findings().stream().filter(LibraryFinding::isError).toList();
                if (found.isEmpty()) {
                    clean++;
                }
                for (LibraryFinding f : found) {
                    errors++;
                    String where = "sample " + s + ", round " + round + ": " + f;
                    assertEquals(file.toString(), f.file(), where);
                    assertTrue(f.line() > 0 || !f.path().isEmpty(), "a line or a JSON path: " + where);
                    assertFalse(JAVA_NAME.matcher(f.message()).find(), "a Java class name: " + where);
                    assertFalse(PARSER_WORDS.matcher(f.message()).find(), "the parser's words: " + where);
                    assertTrue(f.message().length() < 3000, "a message, not a dump: " + where);
                }
                deleteTree(lib);
            }
        }
        assertTrue(errors > 0 && clean > 0, errors + " errors, " + clean + " clean reads: the mutations must"
                + " exercise both paths");
    }

    private static void deleteTree(Path p) throws IOException {
        try (var s = Files.walk(p)) {
            for (Path q : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(q);
            }
        }
    }
}
