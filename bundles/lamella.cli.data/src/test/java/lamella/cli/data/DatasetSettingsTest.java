package lamella.cli.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lamella.api.HeatingGeometry;
import lamella.api.Technique;
import lamella.api.data.Dataset;
import lamella.api.data.DatasetSettings;
import lamella.api.data.DatasetSettings.Choices;
import lamella.api.data.DatasetSettings.Origin;
import lamella.api.data.DatasetSettings.Setting;
import lamella.api.data.StatedSettings;
import lamella.cli.data.Runs.Run;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.geometry.line.LineHeater;
import lamella.io.delimited.DelimitedImporter;
import lamella.io.exchange.ExchangeImporter;
import lamella.technique.fdtr.FrequencyDomain;
import lamella.technique.tdtr.TimeDomain;
import lamella.technique.threeomega.ThreeOmega;
import lamella.technique.threeomega.ThreeOmegaVoltage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The one mapping from what a file states to a fit dataset's own blocks, with the live techniques and geometries,
 * and {@code lamella import} reporting it. The numbers are the files' own, carried as stated (common practice, no
 * source: a dataset is fitted at the settings it was measured at).
 */
class DatasetSettingsTest {

    private static final List<Technique> TECHNIQUES = List.of(new TimeDomain(), new FrequencyDomain(),
            new ThreeOmega(), new ThreeOmegaVoltage());
    private static final List<HeatingGeometry> GEOMETRIES = List.of(new GaussianBeams(), new LineHeater());
    private static final Map<String, Object> CASE_TDTR = block("type", "tdtr", "modulation_hz", 9.8e6,
            "repetition_hz", 7.6e7, "delays_s", List.of(1e-10, 1e-9));
    private static final Map<String, Object> CASE_GAUSSIAN = block("type", "gaussian", "pump_radius_m", 1e-5,
            "probe_radius_m", 6e-6);

    @TempDir
    Path dir;

    @Test
    void anExchangeFileAtAnotherModulationGetsAMeasurementBlockOfItsOwnAndKeepsTheCasesBeams() throws Exception {
        DatasetSettings s = map(exchange("modulation_hz: 9e6", "repetition_hz: 7.6e7", "pump_radius_m: 1e-5",
                "probe_radius_m: 6e-6", "temperature_k: 295", "sample: FH-0417"), CASE_TDTR, CASE_GAUSSIAN,
                Choices.none());
        assertEquals(List.of(), s.problems());
        assertEquals(block("type", "tdtr", "modulation_hz", 9e6, "repetition_hz", 7.6e7), s.measurement().get());
        assertTrue(s.geometry().isEmpty(), "the file's beams are the case's, so the case's geometry serves");
        assertEquals(Origin.FILE, setting(s, "measurement", "modulation_hz").origin());
        assertEquals(Origin.FILE, setting(s, "geometry", "pump_radius_m").origin());
        Setting t = setting(s, "", "temperature_k");
        assertEquals(Origin.NOT_USED, t.origin());
        assertEquals("temperature_k = 295 K (not used; not a model input)", t.describe());
        assertEquals("measurement.modulation_hz = 9e6 Hz (from the file)",
                setting(s, "measurement", "modulation_hz").describe());
    }

    @Test
    void beamsThatDifferFromTheCasesMakeAGeometryBlockOfItsOwnAndSaySoAboutTheCasesInputs() throws Exception {
        DatasetSettings s = map(exchange("modulation_hz: 9.8e6", "repetition_hz: 7.6e7", "pump_radius_m: 3.2e-6"),
                CASE_TDTR, CASE_GAUSSIAN, Choices.none());
        assertTrue(s.measurement().isEmpty(), "the measurement is the case's");
        assertEquals(block("type", "gaussian", "pump_radius_m", 3.2e-6, "probe_radius_m", 6e-6), s.geometry().get());
        assertEquals(Origin.CASE, setting(s, "geometry", "probe_radius_m").origin());
        assertTrue(s.notes().stream().anyMatch(n -> n.contains("no longer reach it")), s.notes().toString());
    }

    @Test
    void aDelimitedHeaderOfCaseFileKeysIsReadAndWhatItDoesNotSayComesFromTheCase() throws Exception {
        DatasetSettings s = map(delimited("modulation_hz: 9e6", "operator: R. Quill"), CASE_TDTR, CASE_GAUSSIAN,
                Choices.none());
        assertEquals(List.of(), s.problems());
        assertEquals(Origin.CASE, setting(s, "measurement", "type").origin(), "delay data, and the case is TDTR");
        assertEquals(block("type", "tdtr", "modulation_hz", 9e6, "repetition_hz", 7.6e7), s.measurement().get());
        assertEquals(Origin.CASE, setting(s, "measurement", "repetition_hz").origin());
    }

    @Test
    void aFileThatDoesNotSayItsTechniqueIsNeverGuessedFromItsAxis() throws Exception {
        Path f = write("sweep.csv", "f (Hz), phase (deg)\n1e3, -5\n1e4, -10\n1e5, -20\n");
        Dataset d = new DelimitedImporter().read(f);
        DatasetSettings s = DatasetSettings.of(StatedSettings.of(d), d.xColumn(), context(CASE_TDTR, CASE_GAUSSIAN),
                Choices.none());
        assertTrue(s.technique().isEmpty());
        assertEquals(1, s.problems().size());
        assertTrue(s.problems().get(0).contains("choose one of: 3omega, 3omega-voltage, fdtr"), s.problems().toString());
        DatasetSettings chosen = DatasetSettings.of(StatedSettings.of(d), d.xColumn(),
                context(CASE_TDTR, CASE_GAUSSIAN), new Choices("fdtr", Map.of()));
        assertEquals(List.of(), chosen.problems());
        assertEquals(block("type", "fdtr"), chosen.measurement().get());
        assertEquals(Origin.ENTERED, setting(chosen, "measurement", "type").origin());
    }

    @Test
    void aRequiredValueNobodyGivesIsAProblemUntilTheUserEntersIt() throws Exception {
        Map<String, Object> caseFdtr = block("type", "fdtr", "frequencies_hz", List.of(1e4, 1e5));
        DatasetSettings s = map(delimited("technique: tdtr", "modulation_hz: 1.1e6"), caseFdtr, CASE_GAUSSIAN,
                Choices.none());
        assertEquals(Origin.MISSING, setting(s, "measurement", "repetition_hz").origin());
        assertTrue(s.problems().get(0).startsWith("measurement.repetition_hz ("), s.problems().toString());
        DatasetSettings entered = map(delimited("technique: tdtr", "modulation_hz: 1.1e6"), caseFdtr,
                CASE_GAUSSIAN, new Choices(null, Map.of("repetition_hz", 8e7)));
        assertEquals(List.of(), entered.problems());
        assertEquals(block("type", "tdtr", "modulation_hz", 1.1e6, "repetition_hz", 8e7), entered.measurement().get());
    }

    @Test
    void headerValuesThatCannotBeUsedAreSaidNeverDroppedOrClamped() throws Exception {
        DatasetSettings s = map(delimited("modulation_hz: fast", "pump_power_w: 0.012", "repetition_hz: -7.6e7"),
                CASE_TDTR, CASE_GAUSSIAN, Choices.none());
        assertTrue(s.notes().stream().anyMatch(n -> n.startsWith("header 'modulation_hz': 'fast' is not a number")),
                s.notes().toString());
        assertEquals(Origin.CASE, setting(s, "measurement", "modulation_hz").origin());
        assertEquals("pump_power_w = 0.012 W (not used; not a model input)", setting(s, "", "pump_power_w")
                .describe());
        assertTrue(s.problems().stream().anyMatch(p -> p.contains("repetition_hz = -7.6e7, which is not a positive")),
                s.problems().toString());
    }

    @Test
    void aTechniqueThatDoesNotGoWithTheCasesGeometryOrIsNotLiveIsAProblem() throws Exception {
        DatasetSettings line = map(delimitedOverFrequency("technique: 3omega"), CASE_TDTR, CASE_GAUSSIAN,
                Choices.none());
        assertTrue(line.problems().stream().anyMatch(p -> p.contains("needs a geometry whose response is in K m/W")),
                line.problems().toString());
        DatasetSettings unknown = map(delimitedOverFrequency("technique: fdtr2"), CASE_TDTR, CASE_GAUSSIAN,
                Choices.none());
        assertTrue(unknown.problems().get(0).startsWith("technique 'fdtr2' is not live"), unknown.problems().get(0));
        DatasetSettings wrongAxis = map(delimited("technique: fdtr"), CASE_TDTR, CASE_GAUSSIAN, Choices.none());
        assertTrue(wrongAxis.problems().get(0).contains("is over frequency_hz but the data are over delay_s"),
                wrongAxis.problems().get(0));
    }

    @Test
    void importReportsTheSettingsItReadInThePreviewsWords() throws Exception {
        Path f = write("run.lamx", exchangeText("modulation_hz: 9e6", "repetition_hz: 7.6e7", "pump_radius_m: 1e-5",
                "sample: FH-0417"));
        Run run = Runs.run(Runs.importCommand(), dir, f.toString(), "--phase-as-recorded", "--out", "out.csv");
        assertEquals(0, run.status(), run.err());
        assertTrue(run.err().contains("settings the file states, as a fit dataset's blocks take them:\n"
                + "  measurement.type = tdtr (from the file)\n"
                + "  measurement.modulation_hz = 9e6 Hz (from the file)\n"
                + "  measurement.repetition_hz = 7.6e7 Hz (from the file)\n"
                + "  geometry.pump_radius_m = 1e-5 m (from the file)\n"), run.err());
        assertTrue(run.err().contains("  sample: FH-0417\n"), run.err());
        assertFalse(run.err().contains("problem:"), run.err());
    }

    // ------------------------------------------------------------------ helpers

    private DatasetSettings map(Dataset d, Map<String, Object> measurement, Map<String, Object> geometry,
                                Choices choices) {
        return DatasetSettings.of(StatedSettings.of(d), d.xColumn(), context(measurement, geometry), choices);
    }

    private static DatasetSettings.Context context(Map<String, Object> measurement, Map<String, Object> geometry) {
        return new DatasetSettings.Context(TECHNIQUES, GEOMETRIES, measurement, geometry);
    }

    private static Setting setting(DatasetSettings s, String block, String key) {
        return s.settings().stream().filter(x -> x.block().equals(block) && x.key().equals(key)).findFirst()
                .orElseThrow(() -> new AssertionError(block + "." + key + " not in " + s.lines()));
    }

    private Dataset exchange(String... header) throws Exception {
        return new ExchangeImporter().read(write("run.lamx", exchangeText(header)));
    }

    private static String exchangeText(String... header) {
        return "lamella-exchange 1\ntechnique: tdtr\n" + String.join("\n", header) + "\nx: delay_s\n"
                + "channels: in_phase out_of_phase\nscan 1\n-5.0e-11 -2.7 -6.8\n1.0e-10 10.2 -7.4\n"
                + "2.0e-10 9.9 -7.3\nend\n";
    }

    private Dataset delimited(String... header) throws Exception {
        return new DelimitedImporter().read(write("run.csv", String.join("\n", header)
                + "\ndelay (ps), X (uV), Y (uV)\n-50, -2.7, -6.8\n100, 10.2, -7.4\n200, 9.9, -7.3\n"));
    }

    private Dataset delimitedOverFrequency(String... header) throws Exception {
        return new DelimitedImporter().read(write("run.csv", String.join("\n", header)
                + "\nf (Hz), phase (deg)\n1e3, -5\n1e4, -10\n1e5, -20\n"));
    }

    private Path write(String name, String text) throws Exception {
        Path f = dir.resolve(name);
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }

    private static Map<String, Object> block(Object... pairs) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            m.put((String) pairs[i], pairs[i + 1]);
        }
        return m;
    }
}
