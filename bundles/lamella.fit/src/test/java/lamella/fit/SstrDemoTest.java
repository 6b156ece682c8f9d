package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import lamella.api.fit.FitOutcome;
import org.junit.jupiter.api.Test;

/** The committed SSTR calibration demo is what {@link SstrDemoScenario} makes, and fits back to its values. */
class SstrDemoTest {

    static final Path DEMO = Path.of("../../demo-data/sstr-calibration/case.json");

    @Test
    void theCommittedDataAreWhatTheScenarioMakes() throws Exception {
        DemoChecks.committedDataAreTheScenarios(DEMO, SstrDemoScenario.FIRST_SEED, SstrDemoScenario::data, SstrDemoScenario::file);
    }

    @Test
    void theCalibratedFitRecoversItsTruthWithinTwoSigma() throws Exception {
        FitOutcome o = DemoChecks.fitsWithinTwoSigma(DEMO, SstrDemoScenario.PROBE_GAIN, SstrDemoScenario.CERAMIC_K);
        for (int a = 0; a < 2; a++) {
            assertTrue(o.parameters().get(a).identifiable(), o.parameters().get(a).toString());
        }
        assertEquals(5, o.budget().size(), "noise and four uncertain inputs");
        assertEquals("glass.k_through_w_mk (isotropic Λ)", o.budget().get(1).label(), "the reference's own Λ is in the budget");
    }
}
