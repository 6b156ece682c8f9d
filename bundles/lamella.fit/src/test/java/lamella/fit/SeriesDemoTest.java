package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import lamella.api.fit.FitOutcome;
import org.junit.jupiter.api.Test;

/** The committed thickness-series demo is what {@link SeriesDemoScenario} makes, and fits back to its values. */
class SeriesDemoTest {

    static final Path DEMO = Path.of("../../demo-data/thickness-series/case.json");

    @Test
    void theCommittedDataAreWhatTheScenarioMakes() throws Exception {
        DemoChecks.committedDataAreTheScenarios(DEMO, SeriesDemoScenario.FIRST_SEED, SeriesDemoScenario::data, SeriesDemoScenario::file);
    }

    @Test
    void theSeriesFitRecoversItsTruthWithinTwoSigma() throws Exception {
        FitOutcome o = DemoChecks.fitsWithinTwoSigma(DEMO, SeriesDemoScenario.FILM_K, SeriesDemoScenario.FILM_G);
        assertEquals(7, o.budget().size(), "noise and six uncertain inputs");
        assertEquals("samples[SN-25].film.thickness_m", o.budget().get(3).label());
        o.datasets().forEach(d -> assertEquals(1.0, d.reducedChiSquare(), 0.6, "dataset " + d.index()));
    }
}
