package lamella.io.profiles;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;
import lamella.api.data.ImporterProfiles.Finding;
import org.junit.jupiter.api.Test;

/** What a profile author is told: every mistake of a file at once, each at its line and JSON path, in our words. */
class ProfileReaderTest {

    private static final Path FILE = Path.of("facility", "lockin.json");

    static List<Finding> findings(String text) {
        return ProfileReader.read(FILE, text.getBytes(StandardCharsets.UTF_8), "test", "facility").findings();
    }

    static void inOurWords(Finding f) {
        String m = f.toString();
        for (String forbidden : List.of("java.", "Exception", "jackson", "Jackson", "JsonParse", "[Source",
                "StreamRead", "ALLOW_")) {
            assertFalse(m.contains(forbidden), m);
        }
        assertTrue(m.startsWith(FILE.toString()), m);
    }

    @Test
    void everyMistakeIsFoundAtItsLineAndPath() {
        String text = """
                {
                  "profile": "Lock In!",
                  "summary": "a lab's lock-in",
                  "recognise": {"extensions": ["dat"]},
                  "delimiter": "pipe",
                  "column_names_line": 4,
                  "header": {"values": {"Mod": {"key": "modulation_hz", "unit": "furlong"}}},
                  "columns": {
                    "f": {"meaning": "frequency", "unit": "kHz"},
                    "ph": {"meaning": "phase angle", "unit": "deg"},
                    "x": {"meaning": "in_phase", "sign": 2}
                  },
                  "colour": "blue"
                }
                """;
        List<Finding> all = findings(text);
        all.forEach(ProfileReaderTest::inOurWords);
        assertAt(all, "profile", 2, "not a profile name");
        assertAt(all, "delimiter", 5, "'pipe' is not a delimiter");
        assertAt(all, "header.values.Mod.unit", 7, "'furlong' is not a unit of Hz");
        assertAt(all, "columns.ph.meaning", 10, "'phase angle' is not a column meaning");
        assertAt(all, "columns.x.sign", 11, "expected 1 or -1");
        assertAt(all, "colour", 13, "unknown key");
        assertEquals(6, all.size(), all.toString());
    }

    private static void assertAt(List<Finding> all, String path, int line, String words) {
        assertTrue(all.stream().anyMatch(f -> f.path().equals(path) && f.line() == line
                && f.problem().contains(words)), path + " at line " + line + " saying '" + words + "' in " + all);
    }

    @Test
    void aProfileWithoutXOrSignalsOrWayToFindTheNamesIsRefused() {
        List<Finding> all = findings("""
                {"profile": "p", "summary": "s", "recognise": {"contains": ["P"]}, "delimiter": "tab",
                 "columns": {"a": {"meaning": "ignore"}}}
                """);
        all.forEach(ProfileReaderTest::inOurWords);
        assertTrue(all.stream().anyMatch(f -> f.problem().contains("no column has meaning frequency, delay or pump_power")),
                all.toString());
        assertTrue(all.stream().anyMatch(f -> f.problem().contains("no signal column")), all.toString());
        assertTrue(all.stream().anyMatch(f -> f.problem().contains("give exactly one of column_names_line")),
                all.toString());
    }

    @Test
    void textThatIsNotJsonIsToldInOurWords() {
        for (String broken : List.of("", "{", "{\"profile\": NaN}", "{\"a\": 1, \"a\": 2}", "[1, 2]",
                "{\"profile\": \"p\" // comment\n}", "{\"x\": 1" + "0".repeat(5000) + "}")) {
            List<Finding> all = findings(broken);
            assertFalse(all.isEmpty(), broken);
            all.forEach(ProfileReaderTest::inOurWords);
        }
    }

    @Test
    void theDemoProfilesAreSound() throws Exception {
        for (String name : List.of("halden-hx2.json", "quillon-records.json")) {
            Path f = ProfileTableTest.DEMO.resolve("profiles/fenwick-hall/" + name);
            ProfileReader.Result r = ProfileReader.read(f, Files.readAllBytes(f), "test", "facility");
            assertEquals(List.of(), r.findings(), name);
        }
    }

    /**
     * Seeded mutations of the demo profiles — bytes deleted, inserted, swapped, the file cut short — never end in
     * anything but a profile or findings in our words (common practice, no source).
     */
    @Test
    void mutatedProfilesGiveFindingsNeverAFailure() throws Exception {
        SplittableRandom random = new SplittableRandom(1202);
        byte[][] seeds = {
            Files.readAllBytes(ProfileTableTest.DEMO.resolve("profiles/fenwick-hall/halden-hx2.json")),
            Files.readAllBytes(ProfileTableTest.DEMO.resolve("profiles/fenwick-hall/quillon-records.json"))};
        byte[] alphabet = "{}[]\":,.-0123456789eE \n\\tfnu\u00b5".getBytes(StandardCharsets.UTF_8);
        int refused = 0;
        for (int i = 0; i < 3000; i++) {
            byte[] b = seeds[i % 2].clone();
            int edits = 1 + random.nextInt(4);
            for (int e = 0; e < edits && b.length > 1; e++) {
                int at = random.nextInt(b.length);
                switch (random.nextInt(4)) {
                    case 0 -> b = concat(slice(b, 0, at), slice(b, at + 1, b.length));
                    case 1 -> b = concat(concat(slice(b, 0, at), new byte[] {alphabet[random.nextInt(alphabet.length)]}),
                            slice(b, at, b.length));
                    case 2 -> {
                        int other = random.nextInt(b.length);
                        byte t = b[at];
                        b[at] = b[other];
                        b[other] = t;
                    }
                    default -> b = slice(b, 0, at);
                }
            }
            ProfileReader.Result r = ProfileReader.read(FILE, b, "test", "facility");
            if (r.profile() == null) {
                refused++;
                assertFalse(r.findings().isEmpty());
                r.findings().forEach(ProfileReaderTest::inOurWords);
            } else {
                assertTrue(r.findings().isEmpty());
            }
        }
        assertTrue(refused > 1000, refused + " of 3000 refused");
    }

    private static byte[] slice(byte[] b, int from, int to) {
        return java.util.Arrays.copyOfRange(b, from, to);
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] c = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }

    @Test
    void aProfileWithFindingsIsNotUsed() {
        ProfileReader.Result r = ProfileReader.read(FILE, "{\"profile\": \"p\"}".getBytes(StandardCharsets.UTF_8),
                "test", "facility");
        assertNull(r.profile());
    }
}
