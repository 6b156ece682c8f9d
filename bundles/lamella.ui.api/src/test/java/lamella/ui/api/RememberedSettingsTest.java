package lamella.ui.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.List;
import lamella.api.CaseDocument;
import lamella.api.ParameterRef;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A technique's or geometry's values survive switching away and back, in the session and in the saved project. */
class RememberedSettingsTest {

    private static final List<String> TDTR = List.of("modulation_hz", "repetition_hz", "delays_s");
    private static final List<String> FDTR = List.of("frequencies_hz");
    private static final List<String> GAUSSIAN = List.of("pump_radius_m", "probe_radius_m", "offset_m");
    private static final List<String> RING = List.of("ring_radius_m", "ring_width_m", "probe_radius_m");

    @TempDir
    Path dir;

    @Test
    void tdtrToFdtrAndBackKeepsModulationAndRepetition() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.switchType("measurement", -1, "fdtr", FDTR);
        assertEquals(Project.Role.FIXED, p.role(lamella.api.ParameterRef.measurement("modulation_hz")));
        JsonNode fdtr = p.tree().path("measurement");
        assertEquals("fdtr", fdtr.path("type").asText());
        assertFalse(fdtr.has("modulation_hz"), "the FDTR block holds only what FDTR reads: " + fdtr);
        p.edit("list frequencies", d -> d.with("measurement").putArray("frequencies_hz").add(1e4).add(1e6));

        p.switchType("measurement", -1, "tdtr", TDTR);
        JsonNode tdtr = p.tree().path("measurement");
        assertEquals(9.8e6, tdtr.path("modulation_hz").asDouble());
        assertEquals(7.6e7, tdtr.path("repetition_hz").asDouble());
        assertTrue(p.problem().isEmpty(), p.problem().map(Throwable::getMessage).orElse(""));

        p.switchType("measurement", -1, "fdtr", FDTR);
        assertEquals("[10000.0,1000000.0]", p.tree().path("measurement").path("frequencies_hz").toString(),
                "FDTR's own list came back too");
    }

    @Test
    void geometrySwitchesKeepEachTypesValuesAndShareWhatBothRead() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.switchType("geometry", -1, "ring", RING);
        JsonNode ring = p.tree().path("geometry");
        assertEquals(6e-6, ring.path("probe_radius_m").asDouble(), "the probe radius is the same quantity in both");
        assertFalse(ring.has("pump_radius_m"));
        p.edit("ring radius", d -> d.with("geometry").put("ring_radius_m", 2e-5).put("probe_radius_m", 5e-6));
        p.switchType("geometry", -1, "gaussian", GAUSSIAN);
        JsonNode g = p.tree().path("geometry");
        assertEquals(1e-5, g.path("pump_radius_m").asDouble(), "gaussian's own pump radius came back");
        assertEquals(5e-6, g.path("probe_radius_m").asDouble(), "the probe radius last set wins");
        p.switchType("geometry", -1, "ring", RING);
        assertEquals(2e-5, p.tree().path("geometry").path("ring_radius_m").asDouble());
    }

    @Test
    void theFitRolesOfKeysTheNewTypeLacksGoAsideAndComeBack() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        ParameterRef pump = ParameterRef.geometry("pump_radius_m");
        ParameterRef probe = ParameterRef.geometry("probe_radius_m");
        ParameterRef fdtrPump = pump.inDataset(2);
        assertEquals(Project.Role.UNCERTAIN, p.role(pump));
        p.switchType("geometry", -1, "ring", RING);
        assertEquals(Project.Role.FIXED, p.role(pump), "the ring has no pump radius to be uncertain");
        assertEquals(Project.Role.UNCERTAIN, p.role(probe), "the probe radius is read by both and keeps its role");
        assertEquals(Project.Role.UNCERTAIN, p.role(fdtrPump), "dataset 2's own gaussian geometry is not switched");
        assertTrue(p.problem().isEmpty(), p.problem().map(Throwable::getMessage).orElse(""));
        ParameterRef ring = ParameterRef.geometry("ring_radius_m");
        p.edit("ring radius", d -> d.with("geometry").put("ring_radius_m", 2e-5));
        p.setFree(ring, Double.NaN, Double.NaN);

        p.switchType("geometry", -1, "gaussian", GAUSSIAN);
        assertEquals(Project.Role.UNCERTAIN, p.role(pump));
        assertEquals(0.04, p.relativeSigma(pump), 1e-15, "its σ came back with it");
        assertEquals(Project.Role.FIXED, p.role(ring));
        p.switchType("geometry", -1, "ring", RING);
        assertEquals(Project.Role.FREE, p.role(ring), "the ring's own free radius came back");
        assertEquals(Project.Role.FIXED, p.role(pump));
        p.undo();
        p.undo();
        assertEquals(Project.Role.FREE, p.role(ring), "undo takes a switch back with its roles");
        assertEquals(Project.Role.FIXED, p.role(pump));
    }

    @Test
    void aDatasetsOwnBlockTakesOnlyItsOwnRolesAside() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        ParameterRef pump = ParameterRef.geometry("pump_radius_m");
        p.switchType("geometry", 2, "ring", RING);
        assertEquals(Project.Role.FIXED, p.role(pump.inDataset(2)));
        assertEquals(Project.Role.UNCERTAIN, p.role(pump), "the case's own pump radius stays uncertain");
        p.switchType("geometry", 2, "gaussian", GAUSSIAN);
        assertEquals(Project.Role.UNCERTAIN, p.role(pump.inDataset(2)));
        assertFalse(p.tree().path(Project.WORKBENCH_KEY).has("remembered_roles"), "nothing left aside: "
                + p.tree().path(Project.WORKBENCH_KEY));
    }

    @Test
    void aDatasetsOwnBlockSwitchesToo() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.switchType("measurement", 1, "fdtr", FDTR);
        assertEquals("fdtr", p.datasets().get(1).path("measurement").path("type").asText());
        p.switchType("measurement", 1, "tdtr", TDTR);
        assertEquals(1.1e6, p.datasets().get(1).path("measurement").path("modulation_hz").asDouble());
    }

    @Test
    void whatIsRememberedIsSavedWithTheProjectAndTheCaseStillReads() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.switchType("measurement", -1, "fdtr", FDTR);
        p.edit("list frequencies", d -> d.with("measurement").putArray("frequencies_hz").add(1e4).add(1e6));
        Path saved = dir.resolve("case.json");
        p.save(saved);
        CaseDocument doc = ProjectTest.READER.read(saved);
        assertEquals("fdtr", doc.measurement().get("type"));
        Project again = Project.open(saved, ProjectTest.READER);
        again.switchType("measurement", -1, "tdtr", TDTR);
        assertEquals(9.8e6, again.tree().path("measurement").path("modulation_hz").asDouble());
    }

    @Test
    void aSwitchIsOneUndoableStep() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        String before = p.json();
        p.switchType("measurement", -1, "fdtr", FDTR);
        assertEquals("switch the technique to fdtr", p.undoName().orElseThrow());
        p.undo();
        assertEquals(before, p.json());
    }
}
