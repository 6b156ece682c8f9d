package lamella.cli.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import lamella.cli.data.Runs.Run;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code lamella import} and {@code lamella formats} with the shipped importers: the demo files are read and
 * conditioned, the output is all or nothing, and every hostile file or bad command line is exit status 2 with the
 * file and line named, nothing on standard output and no output file.
 */
class ImportCommandTest {

    static final Path DEMO_RAW = Path.of("../../demo-data/raw").toAbsolutePath().normalize();
    static final String TDTR_HEADER = "delay_s,in_phase,out_of_phase,ratio,amplitude,phase_deg,sigma_in_phase,"
            + "sigma_out_of_phase,sigma_ratio,sigma_amplitude,sigma_phase_deg,outlier,excluded";

    @TempDir
    Path dir;

    private Run importing(String... args) {
        return Runs.run(Runs.importCommand(), dir, args);
    }

    @Test
    void theDemoTdtrFileIsAveragedPhaseCorrectedAndWritten() throws IOException {
        Path out = dir.resolve("tdtr.csv");
        Run run = importing(DEMO_RAW.resolve("oxide-film-tdtr.lamx").toString(), "--exclude", "-1:1e-10",
                "--out", out.toString());
        assertEquals(0, run.status(), run.err());
        assertEquals("", run.out());
        List<String> lines = Files.readAllLines(out);
        assertEquals(TDTR_HEADER, lines.get(0));
        assertEquals(52, lines.size(), "a header and one row per delay: the two scans are averaged");
        assertTrue(lines.get(1).matches("-5\\.000000000000e-11(,-?\\d\\.\\d{12}e[+-]\\d{2}){10},0,1"), lines.get(1));
        assertTrue(lines.get(51).endsWith(",0,0"), lines.get(51));
        assertTrue(run.err().contains("\n  scans averaged: 2\n  detection phase: rotated by "), run.err());
        assertTrue(run.err().contains("\n  rows excluded: 12\n"), run.err());
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(out), files.toList(), "only the output, no temporary file left");
        }
    }

    @Test
    void theDemoFdtrTableHasItsReferencePhaseSubtracted() {
        Run run = importing(DEMO_RAW.resolve("oxide-film-fdtr.csv").toString(), "--reference",
                DEMO_RAW.resolve("fdtr-reference-phase.csv").toString());
        assertEquals(0, run.status(), run.err());
        assertTrue(run.out().startsWith("frequency_hz,in_phase,out_of_phase,amplitude,phase_deg,sigma_in_phase,"
                + "sigma_out_of_phase,sigma_amplitude,sigma_phase_deg,outlier,excluded\n1.000000000000e+03,"),
                run.out());
        assertEquals(15, run.out().lines().count());
        assertTrue(run.err().contains("as 'delimited'\n  scans averaged: 3\n"), run.err());
        assertTrue(run.err().contains("  reference phase: subtracted, from "), run.err());
    }

    @Test
    void formatsListsTheLiveImporters() {
        Run run = Runs.run(Runs.formatsCommand(), dir);
        assertEquals(0, run.status());
        assertEquals(List.of("format            tier      reads", "delimited         built-in  Text tables separated"
                + " by comma, tab, semicolon or spaces, with units in the header.", "lamella-exchange  built-in  Lamella"
                + " exchange format, version 1: metadata, lock-in channels with standard deviations, scans."),
                run.out().lines().toList());
    }

    static Stream<Arguments> hostileFiles() {
        return Stream.of(
                Arguments.of("empty", new byte[0], "bad.dat: the file is empty"),
                Arguments.of("binary garbage", garbage(), "bad.dat:1: contains a NUL byte (offset "),
                Arguments.of("neither UTF-8 nor Latin-1", bytes("f (Hz),phase (deg)\n1,2\n2,\u0001", 0xB5),
                        "bad.dat:3: is not text: control byte 0x01 in a file that is not UTF-8 either (line 3"),
                Arguments.of("not UTF-8 and a NUL beyond the first bytes", bytes("f (Hz),phase (deg)\n1,2\n2,", 0xB5,
                        "\n" + "3,4\n".repeat(5000) + "5,\u0000\n"), "bad.dat:3: is not text: a byte sequence that no"
                                + " UTF-8 text contains, and a NUL byte on line 5004"),
                Arguments.of("a NUL beyond the first bytes, then not UTF-8", bytes("f (Hz),phase (deg)\n"
                        + "3,4\n".repeat(5000) + "5,\u0000\n", 0xB5, "\n"), "bad.dat:5002: contains a NUL byte: this"
                                + " is a binary file, not text"),
                Arguments.of("a byte Windows-1252 leaves undefined", bytes("f (Hz),phase (deg)\n1,2\n2,", 0x81, ""),
                        "bad.dat:3: is not text: byte 0x81 is neither UTF-8 nor a character of Latin-1 or"
                                + " Windows-1252 text"),
                Arguments.of("Latin-1 read, then a bad cell", bytes("f (Hz),phase (deg)\n1,2\n2,", 0xB5, "\n"),
                        "bad.dat:3: column 2 (phase (deg)): '\u00b5' is not a number"),
                Arguments.of("UTF-16 with an unpaired surrogate", utf16le("f (Hz),phase (deg)\n1,2\n2,\ud800\n"),
                        "bad.dat:3: is not UTF-16 little-endian text although it begins with that byte-order mark"),
                Arguments.of("UTF-16 ending in half a character",
                        dropLast(utf16le("f (Hz),phase (deg)\n1,2\n2,3")),
                        "bad.dat:3: is not UTF-16 little-endian text although it begins with that byte-order mark:"
                                + " it ends in half a character"),
                Arguments.of("truncated line", text("f (Hz),phase (deg),R (V)\n1,2,3\n2,3"), "bad.dat:3: has 2 cells"),
                Arguments.of("non-numeric cell", text("f (Hz),phase (deg)\n1,2\n2,n/a\n"),
                        "bad.dat:3: column 2 (phase (deg)): 'n/a' is not a number"),
                Arguments.of("ragged rows", text("f (Hz),X,Y\n1,2,3\n2,3\n"), "bad.dat:3: has 2 cells, but the header"),
                Arguments.of("duplicate x", text("f (Hz),phase (deg)\n1,2\n1,3\n"), "bad.dat:3: frequency_hz 1.00000"
                        + " repeats the value of line 2"),
                Arguments.of("unsorted x", text("delay (ps),X,Y\n1,2,3\n3,2,3\n2,2,3\n"), "bad.dat:4: delay_s"),
                Arguments.of("NaN", text("f (Hz),phase (deg)\n1,NaN\n"), "bad.dat:2: column 2 (phase (deg)): 'NaN'"
                        + " is not a finite number"),
                Arguments.of("infinity", text("f (Hz),phase (deg)\n1,inf\n"), "bad.dat:2: column 2 (phase (deg)):"
                        + " 'inf' is not a finite number"),
                Arguments.of("wrong units", text("f (ps),phase (deg)\n1,2\n"), "bad.dat:1: column 1: 'f (ps)': 'ps'"
                        + " is a unit of a time, but this column is a frequency"),
                Arguments.of("line without end", text("f (Hz),phase (deg)\n" + "1".repeat(70_000)),
                        "bad.dat:2: the line is longer than 65536 bytes"),
                Arguments.of("exchange cut short", text("lamella-exchange 1\ntechnique: fdtr\nx: frequency_hz\n"
                        + "channels: amplitude phase_deg\nscan 1\n1e3 1 -2\n"),
                        "bad.dat:6: the file ends without its closing 'end' line"));
    }

    private static byte[] garbage() {
        byte[] b = new byte[4096];
        new Random(11).nextBytes(b);
        b[100] = 0;
        return b;
    }

    private static byte[] text(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] bytes(String s, int extra) {
        return bytes(s, extra, "");
    }

    /** UTF-8 text with one raw byte between two parts. */
    private static byte[] bytes(String before, int extra, String after) {
        byte[] t = text(before);
        byte[] a = text(after);
        byte[] b = java.util.Arrays.copyOf(t, t.length + 1 + a.length);
        b[t.length] = (byte) extra;
        System.arraycopy(a, 0, b, t.length + 1, a.length);
        return b;
    }

    /** Text as UTF-16 little-endian with its byte-order mark; an unpaired surrogate is written as its code unit. */
    private static byte[] utf16le(String s) {
        byte[] b = new byte[2 + 2 * s.length()];
        b[0] = (byte) 0xFF;
        b[1] = (byte) 0xFE;
        for (int i = 0; i < s.length(); i++) {
            b[2 + 2 * i] = (byte) s.charAt(i);
            b[3 + 2 * i] = (byte) (s.charAt(i) >> 8);
        }
        return b;
    }

    private static byte[] utf16be(String s) {
        byte[] le = utf16le(s);
        byte[] b = new byte[le.length];
        for (int i = 0; i < le.length; i += 2) {
            b[i] = le[i + 1];
            b[i + 1] = le[i];
        }
        return b;
    }

    static Stream<Arguments> encodings() {
        String table = "modulation_hz: 9e6\nf (kHz),phase (\u00b0)\n100,-30.5\n200,-35.25\n";
        return Stream.of(
                Arguments.of("UTF-8", text(table), ""),
                Arguments.of("UTF-8 with a byte-order mark", concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF},
                        text(table)), "UTF-8 (byte-order mark)"),
                Arguments.of("UTF-16 little-endian", utf16le(table), "UTF-16 little-endian (byte-order mark)"),
                Arguments.of("UTF-16 big-endian", utf16be(table), "UTF-16 big-endian (byte-order mark)"),
                Arguments.of("Latin-1", table.getBytes(StandardCharsets.ISO_8859_1),
                        "Latin-1 (the file is not valid UTF-8: line 2)"),
                Arguments.of("Windows-1252 (a curly quote in a note)", ("# sample \u201cWafer 7\u201d\n" + table)
                        .getBytes(java.nio.charset.Charset.forName("windows-1252")),
                        "Windows-1252 (the file is not valid UTF-8: line 1)"));
    }

    private static byte[] dropLast(byte[] b) {
        return java.util.Arrays.copyOf(b, b.length - 1);
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] c = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }

    /** Common practice, no source: the encodings instrument software writes, read to the same numbers. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("encodings")
    void everyCommonEncodingReadsToTheSameTableAndIsSaid(String what, byte[] content, String said) throws IOException {
        Files.write(dir.resolve("sweep.txt"), content);
        Run run = importing("sweep.txt");
        assertEquals(0, run.status(), what + ": " + run.err());
        List<String> rows = run.out().lines().toList();
        assertEquals(3, rows.size(), run.out());
        assertTrue(rows.get(1).startsWith("1.000000000000e+05,"), rows.get(1));
        assertTrue(rows.get(1).contains(",-3.050000000000e+01,") || rows.get(1).contains("-3.050000000000e+01"),
                rows.get(1));
        assertTrue(rows.get(2).contains("-3.525000000000e+01"), rows.get(2));
        assertTrue(run.err().contains("as 'delimited'" + (said.isEmpty() ? "" : ", text in " + said) + "\n"),
                what + ": plain UTF-8 goes unsaid, any other encoding is said: " + run.err());
        assertTrue(run.err().contains("modulation"), what + ": the header's settings are read: " + run.err());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("hostileFiles")
    void hostileFilesAreBadInputWithFileAndLineAndNoOutput(String what, byte[] content, String expected)
            throws IOException {
        Path bad = dir.resolve("bad.dat");
        Files.write(bad, content);
        Path out = dir.resolve("out.csv");
        Run run = importing("bad.dat", "--out", "out.csv");
        assertEquals(2, run.status(), what + ": " + run.err());
        assertEquals("", run.out());
        assertTrue(run.err().startsWith("lamella import: " + bad + (expected.startsWith("bad.dat:") ? ":" : ": ")
                + expected.substring(expected.indexOf(expected.startsWith("bad.dat:") ? ':' : ' ') + 1)), what + ": "
                + run.err());
        assertFalse(Files.exists(out), what + ": an output file was written");
    }

    @Test
    void aOneGibibyteFileIsRefusedBeforeReadingWithItsSize() throws IOException {
        Path big = dir.resolve("big.csv");
        try (RandomAccessFile f = new RandomAccessFile(big.toFile(), "rw")) {
            f.setLength(1L << 30);
        }
        try {
            Run run = importing("big.csv", "--out", "out.csv");
            assertEquals(2, run.status());
            assertEquals("lamella import: " + big + ": the file is 1073741824 bytes (1.0 GiB); data files are read"
                    + " up to 67108864 bytes (64.0 MiB) — split it into smaller files\n", run.err());
            assertFalse(Files.exists(dir.resolve("out.csv")));
        } finally {
            Files.delete(big);
        }
    }

    @Test
    void aMissingFileIsBadInput() {
        Run run = importing("nowhere.csv");
        assertEquals(2, run.status());
        assertEquals("lamella import: " + dir.resolve("nowhere.csv") + ": no such file\n", run.err());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badCommandLines")
    void badCommandLinesAreBadInput(String what, List<String> args, String expected) throws IOException {
        Files.writeString(dir.resolve("f.csv"), "f (Hz),phase (deg)\n1,2\n2,3\n");
        Files.writeString(dir.resolve("t.csv"), "delay (ps),X,Y\n-10,1,-1\n10,3,-1\n");
        Run run = importing(args.toArray(String[]::new));
        assertEquals(2, run.status(), what);
        assertEquals("", run.out());
        assertTrue(run.err().startsWith(expected.replace("DIR", dir.toString())), what + ": " + run.err());
    }

    static Stream<Arguments> badCommandLines() {
        return Stream.of(
                Arguments.of("no file", List.of(), "lamella import: which data file?"),
                Arguments.of("unknown option", List.of("f.csv", "--outt", "x"), "lamella import: --outt: unknown"),
                Arguments.of("two files", List.of("f.csv", "t.csv"), "lamella import: t.csv: one data file at a time"),
                Arguments.of("bad range", List.of("f.csv", "--exclude", "5"), "lamella import: --exclude: '5';"
                        + " expected FROM:TO"),
                Arguments.of("empty range", List.of("f.csv", "--exclude", "5:5"), "lamella import: --exclude: '5:5':"
                        + " FROM must be less than TO"),
                Arguments.of("range in the wrong unit", List.of("f.csv", "--exclude", "1e3:1e4"),
                        "lamella import: --exclude: 1000.00:10000.0 holds no row; frequency_hz runs from 1.00000 to"
                                + " 2.00000"),
                Arguments.of("unknown format", List.of("f.csv", "--format", "delimted"), "lamella import: --format:"
                        + " no live importer 'delimted' (did you mean 'delimited'?); live: delimited,"
                        + " lamella-exchange"),
                Arguments.of("reference for delays", List.of("t.csv", "--reference", "f.csv"), "lamella import:"
                        + " DIR/t.csv: a reference phase is subtracted from frequency data; this file has delays"),
                Arguments.of("TDTR phase for frequencies", List.of("f.csv", "--detection-phase", "10"),
                        "lamella import: DIR/f.csv: --detection-phase, --phase-as-recorded and --step-window are for"
                                + " TDTR"),
                Arguments.of("two phase choices", List.of("t.csv", "--detection-phase", "10", "--phase-as-recorded"),
                        "lamella import: --detection-phase: choose one of"),
                Arguments.of("negative outlier limit", List.of("f.csv", "--outlier-limit", "-1"),
                        "lamella import: --outlier-limit: expected a positive number"),
                Arguments.of("no delays before zero", List.of("DIR/t.csv".replace("DIR/", ""), "--step-window",
                        "5e-12"), "lamella import: DIR/t.csv: cannot find the detection phase"));
    }
}
