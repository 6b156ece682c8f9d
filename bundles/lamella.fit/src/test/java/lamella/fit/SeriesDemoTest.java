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

/** The committed thickness-series demo is what {@link SeriesDemoScenario} makes, and fits back to its values. */
class SeriesDemoTest {

    static final Path DEMO = Path.of("../../demo-data/thickness-series/case.json");

    @Test
    void theCommittedDataAreWhatTheScenarioMakes() throws Exception {
        CaseDocument doc = Synthetic.readExisting(DEMO);
        long seed = 401;
        for (Sample s : doc.samples()) {
            assertEquals(SeriesDemoScenario.data(doc, s, seed++),
                    Files.readString(DEMO.resolveSibling(SeriesDemoScenario.file(s))), s.name());
        }
    }

    @Test
    void theSeriesFitRecoversItsTruthWithinTwoSigma() throws Exception {
        FitOutcome o = Synthetic.fitter().fit(Synthetic.readExisting(DEMO), FitSettings.defaults(), Progress.NONE);
        assertTrue(o.converged(), o.warnings().toString());
        double[] truth = {SeriesDemoScenario.FILM_K, SeriesDemoScenario.FILM_G};
        for (int a = 0; a < 2; a++) {
            assertEquals(truth[a], o.parameters().get(a).value(), 2 * o.parameters().get(a).sigma(),
                    o.parameters().get(a).toString());
        }
        assertEquals(7, o.budget().size(), "noise and six uncertain inputs");
        assertEquals("samples[SN-25].film.thickness_m", o.budget().get(3).label());
        o.datasets().forEach(d -> assertEquals(1.0, d.reducedChiSquare(), 0.6, "dataset " + d.index()));
    }
}
