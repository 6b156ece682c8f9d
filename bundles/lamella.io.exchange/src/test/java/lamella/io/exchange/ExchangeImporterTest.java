package lamella.io.exchange;

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
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The exchange format, version 1, as the README specifies it: what it reads, and every way a file can be wrong. */
class ExchangeImporterTest {

    static final String TDTR = """
            lamella-exchange 1
            # invented example
            technique: tdtr
            modulation_hz: 9e6
            repetition_hz: 7.6e7
            pump_radius_m: 1e-5
            sample: FH-0417
            date: 2024-05-12T14:03:00Z
            lab.stage: long
            x: delay_s
            signal_unit: uV
            channels: in_phase out_of_phase sigma_in_phase sigma_out_of_phase
            scan 1
            -1e-11 1.0 -2.0 0.1 0.1
            1e-10 3.0 -2.0 0.1 0.1
            scan 2
            -1e-11 1.2 -2.2 0.1 0.1
            1e-10 3.2 -2.2 0.1 0.1
            end
            """;

    @TempDir
    Path dir;
    private final ExchangeImporter importer = new ExchangeImporter();

    private Path file(String text) throws IOException {
        Path f = dir.resolve("scan.lx");
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }

    @Test
    void readsMetadataScansAndStandardDeviationsInVolts() throws Exception {
        Dataset d = importer.read(file(TDTR));
        assertEquals("delay_s", d.xColumn());
        assertEquals(2, d.scans().size());
        assertEquals(List.of("in_phase", "out_of_phase"), d.signalColumns());
        assertArrayEquals(new double[] {1.2e-6, 3.2e-6}, d.scans().get(1).signals().get("in_phase"), 1e-18);
        assertArrayEquals(new double[] {1e-7, 1e-7}, d.scans().get(0).sigmas().get("out_of_phase"), 1e-19);
        assertEquals("FH-0417", d.metadata().get("sample"));
        assertEquals("9e6", d.metadata().get("modulation_hz"));
        assertEquals("long", d.metadata().get("lab.stage"));
        assertArrayEquals(new int[] {17, 18}, d.scans().get(1).lines());
    }

    @Test
    void amplitudeAndPhaseChannelsForFrequencyData() throws Exception {
        Dataset d = importer.read(file("lamella-exchange 1\ntechnique: fdtr\nx: frequency_hz\n"
                + "channels: amplitude phase_deg\nscan 1\n1e3 1e-6 -10\n1e4 0.5e-6 -20\nend\n"));
        assertEquals(List.of("amplitude", "phase_deg"), d.signalColumns());
        assertArrayEquals(new double[] {-10, -20}, d.scans().get(0).signals().get("phase_deg"), 0);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            cut short           | scan 2\\n-1e-11 1.2 -2.2 0.1 0.1\\n                  | scan.lx:17: the file ends without its closing 'end' line
            cut in a row        | scan 2\\n-1e-11 1.2 -2.2 0.1                         | scan.lx:17: has 4 numbers; expected 5
            scans out of order  | scan 3\\n-1e-11 1.2 -2.2 0.1 0.1\\nend\\n            | scan.lx:16: 'scan 3': scans are numbered 1, 2, … in order; expected 'scan 2'
            text after end      | scan 2\\n-1e-11 1.2 -2.2 0.1 0.1\\nend\\nmore\\n     | scan.lx:19: 'more' after the closing 'end' line
            """)
    void damagedTailsAreFound(String what, String tail, String expected) throws IOException {
        String head = TDTR.substring(0, TDTR.indexOf("scan 2"));
        String message = error(head + tail.replace("\\n", "\n"));
        assertTrue(message.substring(message.indexOf("scan.lx")).startsWith(expected), what + ": " + message);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            another format   | lamella-exchange 1 | other 1                 | scan.lx:1: expected the version line 'lamella-exchange 1' first
            newer version    | lamella-exchange 1 | lamella-exchange 2      | scan.lx:1: version '2'; this Lamella reads version 1
            misspelt key     | sample: FH-0417    | sampel: FH-0417         | scan.lx:7: unknown key 'sampel' (did you mean 'sample'?)
            bad date         | 2024-05-12T14:03:00Z | 12/05/2024            | scan.lx:8: date '12/05/2024'; expected ISO 8601
            zero modulation  | modulation_hz: 9e6 | modulation_hz: 0        | scan.lx:4: modulation_hz is 0; expected a positive number
            bad technique    | technique: tdtr    | technique: sstr         | scan.lx:3: technique 'sstr'; expected tdtr or fdtr
            missing setting  | repetition_hz: 7.6e7 | # no repetition rate  | scan.lx:13: the metadata block of a tdtr file needs 'repetition_hz'
            wrong x          | x: delay_s         | x: frequency_hz         | scan.lx:10: x is 'frequency_hz'; a tdtr file has x: delay_s
            bad unit         | signal_unit: uV    | signal_unit: furlong    | scan.lx:11: signal_unit: unknown unit 'furlong' for a lock-in signal
            half a pair      | channels: in_phase out_of_phase sigma_in_phase sigma_out_of_phase | channels: in_phase sigma_in_phase | scan.lx:12: channels [in_phase]; expected one pair
            orphan sigma     | channels: in_phase out_of_phase sigma_in_phase sigma_out_of_phase | channels: in_phase out_of_phase sigma_phase_deg sigma_in_phase | scan.lx:12: sigma_phase_deg without its channel
            repeated key     | lab.stage: long    | sample: again           | scan.lx:9: sample is stated twice (also on line 7)
            """)
    void badHeadersAreNamedAtTheirLine(String what, String original, String replacement, String expected)
            throws IOException {
        String message = error(TDTR.replace(original, replacement));
        assertTrue(message.substring(message.indexOf("scan.lx")).startsWith(expected), what + ": " + message);
    }

    @Test
    void onlyAFileThatDeclaresTheFormatIsClaimed() throws IOException {
        Path f = file(TDTR);
        assertEquals(1.0, importer.confidence(f, Files.readAllBytes(f)));
        assertEquals(0.0, importer.confidence(f, "f (Hz),phase (deg)\n".getBytes(StandardCharsets.UTF_8)));
        assertEquals(0.0, importer.confidence(f, new byte[0]));
    }

    private String error(String text) throws IOException {
        Path f = file(text);
        return assertThrows(InputException.class, () -> importer.read(f)).getMessage();
    }
}
