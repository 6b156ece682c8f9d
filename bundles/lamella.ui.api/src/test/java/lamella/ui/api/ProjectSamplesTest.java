package lamella.ui.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
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
}
