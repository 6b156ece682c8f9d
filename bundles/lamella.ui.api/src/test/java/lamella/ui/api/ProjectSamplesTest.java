package lamella.ui.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import lamella.api.CaseDocument;
import lamella.api.ParameterRef;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import org.junit.jupiter.api.Test;

/** A case of several samples in the workbench: it loads, one sample's stack is shown and edited at a time. */
class ProjectSamplesTest {

    static final Path SERIES = Path.of("../../demo-data/thickness-series/case.json");
    static final ParameterRef FILM_K = ParameterRef.layer("film", "k_through_w_mk");

    private static JsonNode film(Project p, int sample) {
        return p.tree().path("samples").get(sample).path("stack").path("layers").get(1);
    }

    @Test
    void theStackShownIsOneSamplesAndItsEditsStayThere() throws Exception {
        Project p = Project.open(SERIES, ProjectTest.READER);
        assertEquals(List.of("SN-25", "SN-75", "SN-200"), p.sampleNames());
        assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());
        assertEquals(2.5e-8, p.model().orElseThrow().stack().layer("film").orElseThrow().thickness());
        p.showSample(2);
        assertEquals(2.0e-7, p.stackTree().path("layers").get(1).path("thickness_m").asDouble());
        assertEquals(2.0e-7, p.model().orElseThrow().stack().layer("film").orElseThrow().thickness());
        p.set(ParameterRef.layer("film", "thickness_m"), 2.1e-7);
        assertEquals(2.1e-7, film(p, 2).path("thickness_m").asDouble());
        assertEquals(2.5e-8, film(p, 0).path("thickness_m").asDouble(), "the other samples keep theirs");
        assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());
        assertFalse(p.tree().has("stack"), "no stack of its own beside the samples");
        assertThrows(IllegalArgumentException.class, () -> p.showSample(3));
    }

    @Test
    void aSharedFittedValueGoesIntoEverySampleThatHasTheLayer() throws Exception {
        Project p = Project.open(SERIES, ProjectTest.READER);
        FittedParameter k = new FittedParameter(FILM_K, "isotropic Λ", 1.0, 2.6, 0.05, 0.05, false, true);
        FittedParameter thin = new FittedParameter(ParameterRef.layer("film", "heat_capacity_j_m3k")
                .inSample("SN-25"), "", 2.1e6, 2.3e6, 1e5, 1e5, false, true);
        DatasetFit d = new DatasetFit(0, "fdtr-sn-25.csv", "fdtr", "phase_deg", "frequency_hz",
                new double[] {1e4, 1e5, 1e6}, new double[] {-2, -5, -9}, new double[] {0.15, 0.15, 0.15},
                new double[] {-2, -5, -9}, true, 1.0);
        p.setLastFit(new FitOutcome(List.of(k, thin), new double[][] {{1, 0}, {0, 1}}, List.of(d),
                List.of(new BudgetLine(null, "", 0, new double[] {0.05, 1e5})), Optional.empty(), List.of(), 10, 1.0,
                true));
        p.useFittedValues();
        for (int s = 0; s < 3; s++) {
            assertEquals(2.6, film(p, s).path("k_through_w_mk").asDouble(), 0, "sample " + s);
        }
        assertEquals(2.3e6, film(p, 0).path("heat_capacity_j_m3k").asDouble(), 0);
        assertEquals(2.1e6, film(p, 1).path("heat_capacity_j_m3k").asDouble(), 0, "only the sample named");
        assertEquals(2.6, p.tree().path("fit").path("free").get(0).path("initial").asDouble(), 0);
    }
    @Test
    void removingALayerFromOneSampleKeepsTheRolesTheOthersStillUse() throws Exception {
        Project p = Project.open(SERIES, ProjectTest.READER);
        ParameterRef thin = ParameterRef.layer("film", "thickness_m").inSample("SN-25");
        ParameterRef mid = ParameterRef.layer("film", "thickness_m").inSample("SN-75");
        assertEquals(Project.Role.UNCERTAIN, p.role(thin));
        p.removeLayer(1);
        assertEquals(Optional.of("remove layer 'film' from sample 'SN-25'"), p.undoName());
        assertEquals(Project.Role.FREE, p.role(FILM_K), "SN-75 and SN-200 still have the film: its Λ stays free");
        assertEquals(Project.Role.FREE, p.role(ParameterRef.layer("film", "conductance_below_w_m2k")));
        assertEquals(Project.Role.UNCERTAIN, p.role(mid), "another sample's own entry stays");
        assertEquals(Project.Role.FIXED, p.role(thin), "the entry of the sample that lost the layer goes");
        assertEquals(2, p.tree().path("samples").get(0).path("stack").path("layers").size());
        p.undo();
        assertEquals(Project.Role.UNCERTAIN, p.role(thin));
    }

    @Test
    void removingALayerNoSampleHasAnyMoreDropsItsSharedRoles() throws Exception {
        Project p = Project.open(SERIES, ProjectTest.READER);
        for (int s = 0; s < 3; s++) {
            p.showSample(s);
            p.removeLayer(1);
            assertEquals(s < 2 ? Project.Role.FREE : Project.Role.FIXED, p.role(FILM_K), "after sample " + s);
        }
    }

    @Test
    void aSampleIsAddedAsACopyRenamedAndRemovedWhenNoDatasetNamesIt() throws Exception {
        Project p = Project.open(SERIES, ProjectTest.READER);
        p.showSample(1);
        assertEquals(Optional.of("the name 'SN-75' is already used by a sample; every sample needs its own"),
                p.sampleNameProblem("SN-75", -1));
        assertTrue(p.sampleNameProblem("SN[2]", -1).orElseThrow().contains("'['"));
        assertTrue(p.sampleNameProblem("  ", -1).isPresent());
        assertThrows(IllegalArgumentException.class, () -> p.addSample("SN-75"));
        p.addSample("SN-75b");
        assertEquals(List.of("SN-25", "SN-75", "SN-200", "SN-75b"), p.sampleNames());
        assertEquals(3, p.shownSample(), "the new sample is shown");
        assertEquals(7.5e-8, film(p, 3).path("thickness_m").asDouble(), "a copy of the sample shown");
        assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());

        p.renameSample(1, "SN-75a");
        assertEquals("SN-75a", p.tree().path("fit").path("datasets").get(1).path("sample").asText());
        assertEquals(Project.Role.UNCERTAIN, p.role(ParameterRef.layer("film", "thickness_m").inSample("SN-75a")));
        assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());

        IllegalStateException named = assertThrows(IllegalStateException.class, () -> p.removeSample(1));
        assertTrue(named.getMessage().contains("datasets [1]"), named.getMessage());
        assertEquals(List.of(1), p.datasetsOf("SN-75a"));
        p.removeSample(3);
        assertEquals(List.of("SN-25", "SN-75a", "SN-200"), p.sampleNames());
        assertTrue(p.shownSample() < 3);
        assertEquals(Optional.of("remove sample 'SN-75b'"), p.undoName());
        p.undo();
        p.undo();
        p.undo();
        assertEquals(List.of("SN-25", "SN-75", "SN-200"), p.sampleNames());
        assertEquals(2, p.shownSample(), "undoing the added sample shows one that exists");
    }

    @Test
    void aSecondSampleTurnsAOneStackCaseIntoSamplesThatSaveAndReadBack() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        assertEquals(List.of(), p.sampleNames());
        assertTrue(p.sampleNameProblem(Project.FIRST_SAMPLE, -1).isPresent(), "the name the stack will take");
        p.addSample("annealed");
        assertEquals(List.of(Project.FIRST_SAMPLE, "annealed"), p.sampleNames());
        assertFalse(p.tree().has("stack"));
        for (JsonNode ds : p.tree().path("fit").path("datasets")) {
            assertEquals(Project.FIRST_SAMPLE, ds.path("sample").asText(), "the data so far were of the stack");
        }
        assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());
        Path dir = Files.createTempDirectory("lamella-samples");
        Path saved = dir.resolve("two.json");
        p.save(saved);
        CaseDocument back = ProjectTest.READER.read(saved);
        assertEquals(List.of(Project.FIRST_SAMPLE, "annealed"), back.sampleNames());
        assertEquals(back.samples().get(0).stack().layers().size(), back.samples().get(1).stack().layers().size());
        p.undo();
        assertEquals(List.of(), p.sampleNames());
        assertTrue(p.tree().has("stack"));
    }
}
