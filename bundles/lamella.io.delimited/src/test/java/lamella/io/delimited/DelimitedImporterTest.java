package lamella.io.delimited;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import lamella.api.InputException;
import lamella.api.data.Dataset;
import lamella.api.data.Scan;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Delimited tables: every separator and decimal mark, units in headers converted (unit factors are SI definitions,
 * common practice, no source), metadata, scans, and a line-numbered error for each way a table can be wrong.
 */
class DelimitedImporterTest {

    @TempDir
    Path dir;
    private final DelimitedImporter importer = new DelimitedImporter();

    private Path file(String text) throws IOException {
        Path f = dir.resolve("data.txt");
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }

    private Dataset read(String text) throws Exception {
        return importer.read(file(text));
    }

    private String error(String text) throws IOException {
        Path f = file(text);
        return assertThrows(InputException.class, () -> importer.read(f)).getMessage();
    }

    @Test
    void commaSeparatedWithUnitsIsConvertedToSiAndDegrees() throws Exception {
        Dataset d = read("f (kHz),phase (rad),R (mV)\n1.5,-0.5,2\n3,-0.25,1\n");
        Scan s = d.scans().get(0);
        assertEquals("frequency_hz", d.xColumn());
        assertArrayEquals(new double[] {1500, 3000}, s.x(), 1e-9);
        assertArrayEquals(new double[] {Math.toDegrees(-0.5), Math.toDegrees(-0.25)}, s.signals().get("phase_deg"),
                1e-12);
        assertArrayEquals(new double[] {2e-3, 1e-3}, s.signals().get("amplitude"), 1e-15);
        assertEquals(List.of("phase_deg", "amplitude"), d.signalColumns());
    }

    /** An SSTR power sweep: the absorbed pump power is the x axis, the steady rise (or rise per watt) the signal. */
    @Test
    void anSstrPowerSweepIsReadInWattsAndKelvin() throws Exception {
        Dataset d = read("pump power (mW),temperature rise (mK),sd temperature rise (mK)\n1,120,2\n5,600,6\n");
        Scan s = d.scans().get(0);
        assertEquals("pump_power_w", d.xColumn());
        assertArrayEquals(new double[] {1e-3, 5e-3}, s.x(), 1e-15);
        assertArrayEquals(new double[] {0.12, 0.6}, s.signals().get("temperature_rise_k"), 1e-12);
        assertArrayEquals(new double[] {2e-3, 6e-3}, s.sigmas().get("temperature_rise_k"), 1e-15);
        assertEquals(List.of("k_per_w"), read("pump_power_w,k_per_w\n0.001,120\n0.002,121\n").signalColumns());
        String noUnit = error("power,rise (K)\n1,2\n2,4\n");
        assertTrue(noUnit.contains("'power' is a power without a unit") && noUnit.contains("power (mW)"), noUnit);
    }

    @Test
    void semicolonsWithDecimalCommas() throws Exception {
        Dataset d = read("delay [ps];X (µV);Y (µV)\n-10;1,5;-2,25\n100,5;3;-2\n");
        Scan s = d.scans().get(0);
        assertArrayEquals(new double[] {-10e-12, 100.5e-12}, s.x(), 1e-24);
        assertArrayEquals(new double[] {1.5e-6, 3e-6}, s.signals().get("in_phase"), 1e-18);
    }

    @Test
    void tabsAndWhitespaceWithBracketedUnits() throws Exception {
        assertEquals(2, read("f (Hz)\tphase (deg)\n10\t-1\n20\t-2\n").scans().get(0).rows());
        Dataset d = read("delay [ns]   X (V)   Y (V)\n  0.1   1e-6   -2e-6\n  0.2   0.9e-6   -1.9e-6\n");
        assertArrayEquals(new double[] {1e-10, 2e-10}, d.scans().get(0).x(), 1e-22);
    }

    @Test
    void whitespaceWithDecimalCommas() throws Exception {
        Dataset d = read("f (kHz) phase (deg)\n1,5 -2,5\n2,5 -3\n");
        assertArrayEquals(new double[] {-2.5, -3}, d.scans().get(0).signals().get("phase_deg"), 1e-12);
    }

    @Test
    void metadataCommentsAndNotesAreKept() throws Exception {
        Dataset d = read("Invented demo export\nsample: FH-12\nmodulation frequency = 9 MHz\n# a comment\n"
                + "delay (ps),X (V),Y (V)\n% another\n1,1,-1\n2,1,-1\n");
        assertEquals("FH-12", d.metadata().get("sample"));
        assertEquals("9 MHz", d.metadata().get("modulation_frequency"));
        assertEquals("Invented demo export", d.metadata().get("note.1"));
    }

    @Test
    void blankLinesAndRepeatedHeadersSeparateScans() throws Exception {
        Dataset d = read("f (Hz),phase (deg)\n1,-1\n2,-2\n\n1,-1.1\n2,-2.1\nf (Hz),phase (deg)\n1,-1.2\n2,-2.2\n\n");
        assertEquals(3, d.scans().size());
        assertArrayEquals(new double[] {-1.2, -2.2}, d.scans().get(2).signals().get("phase_deg"), 1e-12);
    }

    @Test
    void aDescendingSweepIsStoredAscendingWithItsLines() throws Exception {
        Scan s = read("f (Hz),phase (deg)\n30,-3\n20,-2\n10,-1\n").scans().get(0);
        assertArrayEquals(new double[] {10, 20, 30}, s.x(), 0);
        assertArrayEquals(new int[] {4, 3, 2}, s.lines());
        assertArrayEquals(new double[] {-1, -2, -3}, s.signals().get("phase_deg"), 0);
    }

    @Test
    void standardDeviationColumnsFollowTheirSignalsUnit() throws Exception {
        Dataset d = read("f (kHz),phase (rad),sigma phase (rad)\n1,-0.1,0.01\n2,-0.2,0.02\n");
        assertTrue(d.hasSigma("phase_deg"));
        assertArrayEquals(new double[] {Math.toDegrees(0.01), Math.toDegrees(0.02)},
                d.scans().get(0).sigmas().get("phase_deg"), 1e-12);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            ambiguous millihertz         | f (mhz),phase (deg)\\n1,2\\n2,3\\n          | data.txt:1: column 1: 'f (mhz)': unit 'mhz' could be mHz
            wrong dimension              | delay (kHz),X,Y\\n1,2,3\\n2,3,4\\n           | data.txt:1: column 1: 'delay (kHz)': 'kHz' is a unit of a frequency, but this column is a time
            phase without unit           | f (Hz),phase\\n1,2\\n2,3\\n                  | data.txt:1: column 2: 'phase' is a phase without a unit
            unknown column               | f (Hz),wobble\\n1,2\\n2,3\\n                 | data.txt:1: column 2: 'wobble' names no column
            ragged row                   | f (Hz),phase (deg)\\n1,2\\n2,3,4\\n          | data.txt:3: has 3 cells, but the header (line 1) names 2
            truncated last line          | f (Hz),phase (deg),R (V)\\n1,2,3\\n2,3       | data.txt:3: has 2 cells, but the header (line 1) names 3 (comma-separated, decimal point); the file ends in this line
            non-numeric cell             | f (Hz),phase (deg)\\n1,2\\n2,abc\\n          | data.txt:3: column 2 (phase (deg)): 'abc' is not a number
            truncated number             | f (Hz),phase (deg)\\n1,2\\n2,3e\\n           | data.txt:3: column 2 (phase (deg)): '3e' is not a number
            not a number                 | f (Hz),phase (deg)\\n1,2\\n2,NaN\\n          | data.txt:3: column 2 (phase (deg)): 'NaN' is not a finite number
            infinity                     | f (Hz),phase (deg)\\n1,2\\n2,-Infinity\\n    | data.txt:3: column 2 (phase (deg)): '-Infinity' is not a finite number
            overflow                     | f (Hz),phase (deg)\\n1,2\\n2,1e999\\n        | data.txt:3: column 2 (phase (deg)): '1e999' is too large
            empty cell                   | f (Hz),phase (deg),R (V)\\n1,2,3\\n2,,3\\n   | data.txt:3: column 2 (phase (deg)): the cell is empty
            duplicate x                  | f (Hz),phase (deg)\\n1,2\\n1,3\\n            | data.txt:3: frequency_hz 1.00000 repeats the value of line 2
            unsorted x                   | f (Hz),phase (deg)\\n1,2\\n3,3\\n2,4\\n      | data.txt:4: frequency_hz 2.00000 after 3.00000 on line 3: the scan increases from line 2
            no header                    | 1,2\\n2,3\\n                                 | data.txt:1: data without a header line
            header but no data           | f (Hz),phase (deg)\\n                        | data.txt:1: no data rows
            two x columns                | f (Hz),delay (s),X\\n1,2,3\\n2,3,4\\n        | data.txt:1: two x columns (1 and 2)
            repeated column              | f (Hz),X,in-phase (V)\\n1,2,3\\n2,3,4\\n     | data.txt:1: columns 2 and 3 both hold in_phase
            negative sigma               | f (Hz),X,sd X\\n1,2,3\\n2,3,-4\\n            | data.txt:3: sigma_in_phase is -4.00000; a standard deviation cannot be negative
            decimal mark changes         | f (Hz);phase (deg)\\n1;2,5\\n2;3.5\\n        | data.txt:3: column 2 (phase (deg)): '3.5' is not a number (expected a decimal comma
            """)
    void badTablesNameTheFileAndLine(String what, String text, String expected) throws IOException {
        String message = error(text.replace("\\n", "\n"));
        String relative = message.substring(message.indexOf("data.txt"));
        assertTrue(relative.startsWith(expected), what + ": " + message);
    }

    @Test
    void confidenceIsModestForATableAndZeroForBinary() throws IOException {
        Path f = file("f (Hz),phase (deg)\n1,2\n");
        assertEquals(0.5, importer.confidence(f, Files.readAllBytes(f)));
        assertEquals(0.0, importer.confidence(f, new byte[] {'f', 0, 1}));
        assertEquals(0.1, importer.confidence(f, "just words\n".getBytes(StandardCharsets.UTF_8)));
    }
}
