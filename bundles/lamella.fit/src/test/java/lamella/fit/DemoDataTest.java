package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import lamella.api.CaseDocument;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.Test;

/** The committed demo data fit back to the invented values they were made from (see DemoScenario). */
class DemoDataTest {

    static final Path DEMO = Path.of("../../demo-data/oxide-film-joint/case.json");

    @Test
    void jointFitOfTheDemoRecoversItsTruthWithinTwoSigma() throws Exception {
        CaseDocument doc = Synthetic.readExisting(DEMO);
        FitOutcome o = Synthetic.fitter().fit(doc, FitSettings.defaults(), Progress.NONE);
        assertTrue(o.converged(), o.warnings().toString());
        double[] truth = {DemoScenario.FILM_K, DemoScenario.TRANSDUCER_G, DemoScenario.SUBSTRATE_K};
        for (int a = 0; a < 3; a++) {
            assertEquals(truth[a], o.parameters().get(a).value(), 2 * o.parameters().get(a).sigma(),
                    o.parameters().get(a).toString());
        }
        assertEquals(3, o.datasets().size());
        assertEquals(10, o.budget().size(), "noise and nine uncertain inputs");
        o.datasets().forEach(d -> assertEquals(1.0, d.reducedChiSquare(), 0.6, "dataset " + d.index()));
    }
}
