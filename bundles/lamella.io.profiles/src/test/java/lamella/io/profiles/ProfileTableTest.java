package lamella.io.profiles;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lamella.api.InputException;
import lamella.api.data.Dataset;
import lamella.api.data.Scan;
import lamella.api.data.SignalNames;
import lamella.api.data.StatedSettings;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The two demo instruments' files read by their profiles, checked value by value against the demo files they were
 * made from (demo-data/raw/make/ProfileDemoFiles.java), which the delimited and exchange readers read: the same
 * numbers through other layouts, encodings, units and sign conventions (common practice, no source).
 */
class ProfileTableTest {

    static final Path DEMO = Path.of("..", "..", "demo-data");

    static Profile profile(String name) throws Exception {
        Path f = DEMO.resolve("profiles/fenwick-hall/" + name);
        ProfileReader.Result r = ProfileReader.read(f, Files.readAllBytes(f), "test", "facility");
        assertTrue(r.findings().isEmpty(), r.findings().toString());
        return r.profile();
    }

    /** The three sweeps of oxide-film-fdtr.csv: f (kHz), X (µV), Y (µV). */
    static List<double[][]> fdtrSweeps() throws Exception {
        List<double[][]> sweeps = new ArrayList<>();
        List<double[]> rows = null;
        for (String line : Files.readAllLines(DEMO.resolve("raw/oxide-film-fdtr.csv"))) {
            String t = line.strip();
            if (t.startsWith("f (kHz)")) {
                rows = new ArrayList<>();
                sweeps.add(null);
                continue;
            }
            if (rows == null || t.isEmpty()) {
                continue;
            }
            String[] c = t.split(",\\s*");
            rows.add(new double[] {Double.parseDouble(c[0]), Double.parseDouble(c[1]), Double.parseDouble(c[2])});
            sweeps.set(sweeps.size() - 1, rows.toArray(new double[0][]));
        }
        return sweeps;
    }

    @Test
    void theHx2ExportGivesAmplitudeAndPhaseOfTheDemoSweeps() throws Exception {
        Dataset d = ProfileTable.read(profile("halden-hx2.json"), DEMO.resolve("raw/halden-hx2-sweep.txt"));
        List<double[][]> sweeps = fdtrSweeps();
        assertEquals(SignalNames.FREQUENCY_HZ, d.xColumn());
        assertEquals(List.of(SignalNames.AMPLITUDE, SignalNames.PHASE_DEG), d.signalColumns());
        assertEquals(sweeps.size(), d.scans().size());
        for (int s = 0; s < sweeps.size(); s++) {
            Scan scan = d.scans().get(s);
            double[][] rows = sweeps.get(s);
            assertEquals(rows.length, scan.x().length);
            for (int i = 0; i < rows.length; i++) {
                assertEquals(rows[i][0] * 1e3, scan.x()[i], 1e-9 * rows[i][0] * 1e3);
                // written to 6 decimals in µV and 4 in degrees
                assertEquals(Math.hypot(rows[i][1], rows[i][2]) * 1e-6, scan.signals().get(SignalNames.AMPLITUDE)[i],
                        1e-12);
                assertEquals(Math.toDegrees(Math.atan2(rows[i][2], rows[i][1])),
                        scan.signals().get(SignalNames.PHASE_DEG)[i], 1e-4);
            }
        }
        StatedSettings stated = StatedSettings.of(d);
        assertEquals("fdtr", stated.technique().orElseThrow());
        assertEquals(6e-6, stated.number("pump_radius_m").orElseThrow().value(), 1e-18);
        assertEquals(4e-6, stated.number("probe_radius_m").orElseThrow().value(), 1e-18);
        assertEquals("FH-0417 oxide film (invented)", d.metadata().get("sample"));
        assertTrue(d.metadata().get(lamella.api.data.TextLines.ENCODING_KEY).startsWith("Latin-1"), d.metadata().toString());
        assertTrue(d.metadata().get("import_profile").startsWith("halden-hx2 1"), d.metadata().toString());
    }

    /**
     * An SSTR power sweep: the absorbed pump power in mW becomes x in W, the rise in mK becomes K, and its standard
     * deviation comes along. Common practice, no source: the values are invented.
     */
    @Test
    void anSstrPowerSweepReadsPumpPowerAndTemperatureRise(@TempDir Path dir) throws Exception {
        ProfileReader.Result r = sstrProfile(dir, """
                "technique": "sstr",
                "columns": {"P_abs": {"meaning": "pump_power", "unit": "mW"},
                            "dT": {"meaning": "temperature_rise", "unit": "mK"},
                            "sd dT": {"meaning": "sigma_temperature_rise", "unit": "mK"}}""");
        assertTrue(r.findings().isEmpty(), r.findings().toString());
        Path data = dir.resolve("sweep.csv");
        Files.writeString(data, "P_abs,dT,sd dT\n2.0,410.0,3.0\n4.0,822.5,3.5\n6.0,1231.0,4.0\n");
        Dataset d = ProfileTable.read(r.profile(), data);
        assertEquals(SignalNames.PUMP_POWER_W, d.xColumn());
        assertEquals(List.of(SignalNames.TEMPERATURE_RISE_K), d.signalColumns());
        Scan scan = d.scans().get(0);
        assertEquals(0.004, scan.x()[1], 1e-15);
        assertEquals(0.8225, scan.signals().get(SignalNames.TEMPERATURE_RISE_K)[1], 1e-12);
        assertEquals(0.0035, scan.sigmas().get(SignalNames.TEMPERATURE_RISE_K)[1], 1e-12);
        assertEquals("sstr", StatedSettings.of(d).technique().orElseThrow());
    }

    /** An invented SSTR log's profile: its recognition and delimiter, then the given keys. */
    private static ProfileReader.Result sstrProfile(Path dir, String keys) throws Exception {
        Path json = dir.resolve("sstr.json");
        Files.writeString(json, "{\"profile\": \"lab-sstr\", \"version\": \"1\", \"summary\": \"an invented SSTR log\","
                + " \"recognise\": {\"extensions\": [\"csv\"]}, \"delimiter\": \",\", \"column_names_start\": \"P_abs\",\n"
                + keys + "}\n");
        return ProfileReader.read(json, Files.readAllBytes(json), "test", "user");
    }

    /** The x of a sweep has no standard deviation, and a power needs its unit. */
    @Test
    void aSigmaOfThePumpPowerOrAPowerWithoutItsUnitIsAFindingAtItsPath(@TempDir Path dir) throws Exception {
        ProfileReader.Result r = sstrProfile(dir, """
                "columns": {"P_abs": {"meaning": "pump_power"},
                            "sd P": {"meaning": "sigma_pump_power", "unit": "mW"},
                            "dT": {"meaning": "temperature_rise", "unit": "mK"}}""");
        String all = r.findings().toString();
        assertTrue(all.contains("columns.P_abs.unit") && all.contains("such as mW"), all);
        assertTrue(all.contains("'sigma_pump_power' is not a column meaning"), all);
    }

    @Test
    void rawRecordsAtEachDelayBecomeScansToAverage() throws Exception {
        Dataset d = ProfileTable.read(profile("quillon-records.json"), DEMO.resolve("raw/quillon-tdtr-records.csv"));
        // the exchange file's two scans, which the records were written from
        List<List<double[]>> scans = new ArrayList<>();
        for (String line : Files.readAllLines(DEMO.resolve("raw/oxide-film-tdtr.lamx"))) {
            String t = line.strip();
            if (t.startsWith("scan ")) {
                scans.add(new ArrayList<>());
            } else if (!scans.isEmpty() && !t.isEmpty() && (Character.isDigit(t.charAt(0)) || t.charAt(0) == '-')) {
                String[] c = t.split("\\s+");
                scans.get(scans.size() - 1).add(new double[] {Double.parseDouble(c[0]), Double.parseDouble(c[1]),
                    Double.parseDouble(c[2])});
            }
        }
        assertEquals(SignalNames.DELAY_S, d.xColumn());
        assertEquals(2, d.scans().size());
        for (int s = 0; s < 2; s++) {
            Scan scan = d.scans().get(s);
            assertEquals(scans.get(s).size(), scan.x().length);
            for (int i = 0; i < scan.x().length; i++) {
                double[] r = scans.get(s).get(i);
                assertEquals(r[0], scan.x()[i], 1e-15);
                assertEquals(r[1] * 1e-6, scan.signals().get(SignalNames.IN_PHASE)[i], 1e-13);
                assertEquals(r[2] * 1e-6, scan.signals().get(SignalNames.OUT_OF_PHASE)[i], 1e-13);
            }
        }
        StatedSettings stated = StatedSettings.of(d);
        assertEquals("tdtr", stated.technique().orElseThrow());
        assertEquals(9e6, stated.number("modulation_hz").orElseThrow().value(), 1e-6);
        assertEquals(7.6e7, stated.number("repetition_hz").orElseThrow().value(), 1e-6);
        assertEquals(1e-5, stated.number("pump_radius_m").orElseThrow().value(), 1e-18);
        assertEquals("UTF-8 (byte-order mark)", d.metadata().get(lamella.api.data.TextLines.ENCODING_KEY));
    }

    @Test
    void aUtf16FileForAProfileThatReadsLatin1IsToldSoNotCalledBinary(@TempDir Path dir) throws Exception {
        for (Profile.Encoding e : new Profile.Encoding[] {Profile.Encoding.LATIN_1, Profile.Encoding.UTF_8}) {
            byte[] body = "a: 1\nx,y\n1,2\n".getBytes(StandardCharsets.UTF_16LE);
            byte[] all = new byte[body.length + 2];
            all[0] = (byte) 0xFF;
            all[1] = (byte) 0xFE;
            System.arraycopy(body, 0, all, 2, body.length);
            Path f = dir.resolve("sweep.txt");
            Files.write(f, all);
            lamella.api.InputException x = org.junit.jupiter.api.Assertions.assertThrows(
                    lamella.api.InputException.class, () -> ProfileText.read(f, e));
            assertTrue(x.getMessage().endsWith(":1: the profile reads " + (e == Profile.Encoding.LATIN_1 ? "Latin-1"
                    : "UTF-8") + ", but the file begins with a UTF-16 byte-order mark (FF FE): it is UTF-16 text;"
                    + " set the profile's encoding to auto or utf-16"), x.getMessage());
        }
    }

    @Test
    void everyEncodingGivesTheSameData(@TempDir Path dir) throws Exception {
        Profile p = profile("quillon-records.json");
        Path original = DEMO.resolve("raw/quillon-tdtr-records.csv");
        String text = Files.readString(original, StandardCharsets.UTF_8).replace("\ufeff", "");
        Dataset expected = ProfileTable.read(p, original);
        String[][] cases = {{"UTF-16LE", "FFFE", "UTF-16 little-endian"}, {"UTF-16BE", "FEFF", "UTF-16 big-endian"},
            {"UTF-8", "", "UTF-8"}, {"ISO-8859-1", "", "UTF-8"}};
        for (String[] c : cases) {
            Path f = dir.resolve("records-" + c[0] + ".csv");
            byte[] body = text.replace("Sample =", "Sample = µ-").getBytes(java.nio.charset.Charset.forName(c[0]));
            byte[] bom = c[1].isEmpty() ? new byte[0] : java.util.HexFormat.of().parseHex(c[1]);
            byte[] all = new byte[bom.length + body.length];
            System.arraycopy(bom, 0, all, 0, bom.length);
            System.arraycopy(body, 0, all, bom.length, body.length);
            Files.write(f, all);
            Dataset d = ProfileTable.read(p, f);
            String expectedEncoding = c[0].equals("ISO-8859-1") ? "Latin-1 (the file is not valid UTF-8)" : c[2];
            assertTrue(d.metadata().get(lamella.api.data.TextLines.ENCODING_KEY).startsWith(expectedEncoding), c[0] + ": "
                    + d.metadata().get(lamella.api.data.TextLines.ENCODING_KEY));
            assertTrue(d.metadata().get("sample").startsWith("µ- FH-0417"), c[0] + ": " + d.metadata().get("sample"));
            for (int s = 0; s < 2; s++) {
                assertEquals(List.of(expected.scans().get(s).signals().get(SignalNames.IN_PHASE)).get(0)[7],
                        d.scans().get(s).signals().get(SignalNames.IN_PHASE)[7], 0.0, c[0]);
            }
        }
    }

    @Test
    void aColumnTheProfileDoesNotNameIsAnErrorAtTheNamesLine(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("extra.csv");
        Files.writeString(f, "# Quillon acquisition script 3.1\n# Modulation (MHz) = 9.0\nt_delay_ps,Vx_uV,Vy_uV,"
                + "phase sd (rad)\n100,1,2,0.1\n200,1,2,0.1\n");
        InputException e = assertThrows(InputException.class, () -> ProfileTable.read(profile("quillon-records.json"),
                f));
        assertEquals(3, e.line());
        assertTrue(e.getMessage().contains("'phase sd (rad)' (column 4)"), e.getMessage());
        assertTrue(e.getMessage().contains(f.toString()), e.getMessage());
        assertFalse(e.getMessage().contains("java."), e.getMessage());
    }

    @Test
    void recordsOfUnequalCountAreRefusedWhereTheyDiffer(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("ragged.csv");
        Files.writeString(f, "# Quillon acquisition script 3.1\nt_delay_ps,Vx_uV,Vy_uV\n100,1,2\n100,1.1,2\n200,1,2\n"
                + "300,1,2\n300,1,2\n");
        InputException e = assertThrows(InputException.class, () -> ProfileTable.read(profile("quillon-records.json"),
                f));
        assertEquals(5, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("has 1 records"), e.getMessage());
    }

    @Test
    void aCellThatIsNotANumberNamesItsLineAndColumn(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("bad.txt");
        String text = Files.readString(DEMO.resolve("raw/halden-hx2-sweep.txt"), StandardCharsets.ISO_8859_1)
                .replace("2,0000\t", "2,0O00\t");
        Files.write(f, text.getBytes(StandardCharsets.ISO_8859_1));
        InputException e = assertThrows(InputException.class, () -> ProfileTable.read(profile("halden-hx2.json"),
                f));
        assertEquals(10, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("column 1 (Freq [kHz])"), e.getMessage());
    }
}
