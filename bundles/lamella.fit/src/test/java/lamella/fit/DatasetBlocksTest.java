package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import lamella.api.fit.SensitivityTable;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A fit whose every dataset has its own measurement (or geometry) block needs none at the top of the case. */
class DatasetBlocksTest {

    @TempDir
    Path dir;

    @BeforeEach
    void data() throws Exception {
        double[] f = Synthetic.logSpaced(1e4, 2e7, 20);
        String truth = "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + "," + FitTest.BEAMS + "," + FitTest.FDTR + "}";
        Synthetic.data(dir.resolve("fdtr.csv"), "frequency_hz", f, "phase_deg",
                Synthetic.model(dir, truth, f, "phase_deg"), 0.1, 3, true);
    }

    private static final String FREE = "\"free\": [{\"layer\": \"film\", \"property\": \"k_through_w_mk\","
            + " \"initial\": 3}]";

    @Test
    void everyDatasetsOwnMeasurementIsEnough() throws Exception {
        CaseDocument doc = Synthetic.read(dir, "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + "," + FitTest.BEAMS
                + ", \"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\", \"measurement\": {\"type\": \"fdtr\"}}], "
                + FREE + "}}");
        assertTrue(doc.states("geometry"));
        assertFalse(doc.states("measurement"));
        FitOutcome o = Synthetic.fitter().fit(doc, FitSettings.defaults(), Progress.NONE);
        assertEquals(1.4, o.parameters().get(0).value(), 3 * o.parameters().get(0).sigma(),
                "a self-consistency check: data made with Λ = 1.4 (common practice, no source)");
        SensitivityTable own = Synthetic.fitter().sensitivity(doc, 0, null);
        assertTrue(own.parameters().size() > 3);
        InputException none = assertThrows(InputException.class, () -> Synthetic.fitter().sensitivity(doc, -1, null));
        assertEquals("measurement", none.path());
        assertTrue(none.getMessage().contains("only in each dataset"), none.getMessage());
    }

    @Test
    void theSameHoldsForGeometryAndBothAtOnce() throws Exception {
        CaseDocument doc = Synthetic.read(dir, "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + ", \"fit\":"
                + " {\"datasets\": [{\"data\": \"fdtr.csv\", \"measurement\": {\"type\": \"fdtr\"}, "
                + FitTest.BEAMS + "}], " + FREE + ", \"uncertain\": [{\"geometry\": \"pump_radius_m\", \"dataset\": 0,"
                + " \"sigma_relative\": 0.03}]}}");
        FitOutcome o = Synthetic.fitter().fit(doc, FitSettings.defaults(), Progress.NONE);
        assertEquals("datasets[0].geometry.pump_radius_m", o.budget().get(1).label());
    }

    @Test
    void aDatasetWithoutOneStillNeedsTheCases() throws Exception {
        InputException e = assertThrows(InputException.class, () -> Synthetic.read(dir, "{"
                + Synthetic.STACK.formatted(1.2e8, 1.4) + "," + FitTest.BEAMS + ", \"fit\": {\"datasets\": ["
                + "{\"data\": \"fdtr.csv\", \"measurement\": {\"type\": \"fdtr\"}}, {\"data\": \"fdtr.csv\"}], "
                + FREE + "}}"));
        assertEquals("measurement", e.path());
        assertTrue(e.getMessage().contains("missing") && e.getMessage().contains("every dataset"), e.getMessage());
    }
}
