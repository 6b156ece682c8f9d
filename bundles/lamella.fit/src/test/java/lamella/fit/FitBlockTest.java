package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.InputException;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Mistakes in a fit block are errors at their JSON path and line, never guessed around. */
class FitBlockTest {

    static final String BASE = "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + ","
            + "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 6e-6, \"probe_radius_m\": 4e-6},"
            + "\"measurement\": {\"type\": \"fdtr\"},\n\"fit\": %s}";
    static final String FREE_K = "{\"layer\": \"film\", \"property\": \"k_through_w_mk\"}";

    @TempDir
    Path dir;

    @BeforeEach
    void data() throws Exception {
        double[] f = Synthetic.logSpaced(1e4, 1e7, 12);
        Synthetic.data(dir.resolve("fdtr.csv"), "frequency_hz", f, "phase_deg",
                Synthetic.model(dir, BASE.formatted("{}").replace(",\n\"fit\": {}", ""), f, "phase_deg"), 0.1, 3,
                false);
    }

    private InputException fails(String fit) {
        return assertThrows(InputException.class, () -> Synthetic.fitter().fit(
                Synthetic.read(dir, BASE.formatted(fit)), FitSettings.defaults(), Progress.NONE));
    }

    @Test
    void unknownKeysAreNamedWithAHint() {
        InputException e = fails("{\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [" + FREE_K + "],"
                + " \"multistrat\": 2}");
        assertEquals("fit.multistrat", e.path());
        assertTrue(e.getMessage().contains("did you mean 'multistart'"), e.getMessage());
        assertTrue(e.line() > 0, "located on its line");
    }

    @Test
    void anInputIsEitherFreeOrUncertain() {
        InputException e = fails("{\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [" + FREE_K + "],"
                + " \"uncertain\": [{\"layer\": \"film\", \"property\": \"k_through_w_mk\", \"sigma_relative\": 0.1}]}");
        assertEquals("fit.uncertain[0]", e.path());
    }

    @Test
    void anUnknownLayerOrPropertyIsNamed() {
        assertTrue(fails("{\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\": \"flim\","
                + " \"property\": \"k_through_w_mk\"}]}").getMessage().contains("there is no layer 'flim'"));
        InputException e = fails("{\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\": \"film\","
                + " \"property\": \"k_trough_w_mk\"}]}");
        assertEquals("fit.free[0].property", e.path());
        assertTrue(e.getMessage().contains("did you mean 'k_through_w_mk'"), e.getMessage());
    }

    @Test
    void aMissingDataFileOrColumnNamesTheFile() throws Exception {
        InputException missing = fails("{\"datasets\": [{\"data\": \"nowhere.csv\"}], \"free\": [" + FREE_K + "]}");
        assertTrue(missing.getMessage().contains("nowhere.csv"), missing.getMessage());
        Files.writeString(dir.resolve("bad.csv"), "frequency_hz,amplitude\n1e4,3\n1e5,2\n");
        InputException column = fails("{\"datasets\": [{\"data\": \"bad.csv\"}], \"free\": [" + FREE_K + "]}");
        assertTrue(column.getMessage().contains("no column 'phase_deg'"), column.getMessage());
        Files.writeString(dir.resolve("nan.csv"), "frequency_hz,phase_deg\n1e4,-3\n1e5,NaN\n");
        InputException nan = fails("{\"datasets\": [{\"data\": \"nan.csv\"}], \"free\": [" + FREE_K + "]}");
        assertEquals(3, nan.line(), nan.getMessage());
    }

    @Test
    void boundsMustHoldTheInitialValue() {
        InputException e = fails("{\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\": \"film\","
                + " \"property\": \"k_through_w_mk\", \"initial\": 50, \"min\": 0.1, \"max\": 10}]}");
        assertEquals("fit.free[0].initial", e.path());
    }

    @Test
    void aRelativeUncertaintyBeyondTheValueItselfIsRefusedAtItsPath() {
        for (String sigma : new String[] {"1e308", "2", "1e-12"}) {
            InputException e = fails("{\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [" + FREE_K + "],"
                    + " \"uncertain\": [{\"layer\": \"film\", \"property\": \"heat_capacity_j_m3k\","
                    + " \"sigma_relative\": " + sigma + "}]}");
            assertEquals("fit.uncertain[0].sigma_relative", e.path(), e.getMessage());
            assertTrue(e.getMessage().contains("a relative uncertainty between 1e-9 and 1"), e.getMessage());
            assertTrue(e.line() > 0, "located on its line");
        }
    }

    @Test
    void anAbsoluteUncertaintyLargerThanAnyValueIsRefused() {
        InputException e = fails("{\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [" + FREE_K + "],"
                + " \"uncertain\": [{\"geometry\": \"pump_radius_m\", \"sigma\": 1e308}]}");
        assertEquals("fit.uncertain[0].sigma", e.path(), e.getMessage());
        assertTrue(e.getMessage().contains("exceeds every value Lamella accepts for a length between"), e.getMessage());
    }

    @Test
    void startsAndBoundsOutsideThePhysicalRangeAreRefused() {
        InputException start = fails("{\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\": \"film\","
                + " \"property\": \"k_through_w_mk\", \"initial\": 1e-308}]}");
        assertEquals("fit.free[0].initial", start.path());
        assertTrue(start.getMessage().contains("a thermal conductivity between"), start.getMessage());
        InputException max = fails("{\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\": \"film\","
                + " \"property\": \"k_through_w_mk\", \"min\": 0, \"max\": 1e308}]}");
        assertEquals("fit.free[0].max", max.path());
    }

    @Test
    void weightsFromDataNeedASigmaColumn() {
        InputException e = fails("{\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [" + FREE_K + "],"
                + " \"weights\": \"data\"}");
        assertTrue(e.getMessage().contains("sigma_phase_deg"), e.getMessage());
    }

    /** Multi-start draws starts across the bounds and keeps the best; from a poor start it still finds the truth. */
    @Test
    void multiStartFindsTheMinimumFromAPoorStart() throws Exception {
        FitOutcome o = Synthetic.fitter().fit(Synthetic.read(dir, BASE.formatted("{\"datasets\": [{\"data\":"
                + " \"fdtr.csv\"}], \"free\": [{\"layer\": \"film\", \"property\": \"k_through_w_mk\", \"initial\":"
                + " 90, \"min\": 0.01, \"max\": 100}], \"multistart\": 4}")), FitSettings.defaults(), Progress.NONE);
        assertEquals(1.4, o.parameters().get(0).value(), 3 * o.parameters().get(0).sigma());
    }
}
