package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.CaseDocument;
import lamella.api.Sample;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.Test;

/** The committed SSTR calibration demo is what {@link SstrDemoScenario} makes, and fits back to its values. */
class SstrDemoTest {

    static final Path DEMO = Path.of("../../demo-data/sstr-calibration/case.json");

    @Test
    void theCommittedDataAreWhatTheScenarioMakes() throws Exception {
        CaseDocument doc = Synthetic.readExisting(DEMO);
        long seed = 611;
        for (Sample s : doc.samples()) {
            assertEquals(SstrDemoScenario.data(doc, s, seed++),
                    Files.readString(DEMO.resolveSibling(SstrDemoScenario.file(s))), s.name());
        }
    }

    @Test
    void theCalibratedFitRecoversItsTruthWithinTwoSigma() throws Exception {
        FitOutcome o = Synthetic.fitter().fit(Synthetic.readExisting(DEMO), FitSettings.defaults(), Progress.NONE);
        assertTrue(o.converged(), o.warnings().toString());
        double[] truth = {SstrDemoScenario.PROBE_GAIN, SstrDemoScenario.CERAMIC_K};
        for (int a = 0; a < 2; a++) {
            assertEquals(truth[a], o.parameters().get(a).value(), 2 * o.parameters().get(a).sigma(),
                    o.parameters().get(a).toString());
            assertTrue(o.parameters().get(a).identifiable(), o.parameters().get(a).toString());
        }
        assertEquals(5, o.budget().size(), "noise and four uncertain inputs");
        assertEquals("glass.k_through_w_mk (isotropic Λ)", o.budget().get(1).label(), "the reference's own Λ is in the budget");
    }
}
