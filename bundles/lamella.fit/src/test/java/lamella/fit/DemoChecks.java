package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Function;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.Sample;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;

/** What every committed demo's test asks: its data are its scenario's, and its fit finds the scenario's truth. */
final class DemoChecks {

    /** How a scenario writes one sample's data file. */
    interface Scenario {
        String data(CaseDocument doc, Sample s, long seed) throws InputException;
    }

    private DemoChecks() {
    }

    /** Writes each sample's data file into the demo's folder, beside its case.json (a scenario's main). */
    static void writeScenario(Path folder, long firstSeed, Scenario scenario, Function<Sample, String> file)
            throws IOException, InputException {
        CaseDocument doc = Synthetic.readExisting(folder.resolve("case.json"));
        long seed = firstSeed;
        for (Sample s : doc.samples()) {
            Files.writeString(folder.resolve(file.apply(s)), scenario.data(doc, s, seed++));
        }
    }

    /** Each sample's committed file is what the scenario writes, the samples taking seeds from {@code firstSeed}. */
    static void committedDataAreTheScenarios(Path demo, long firstSeed, Scenario scenario,
            Function<Sample, String> file) throws Exception {
        CaseDocument doc = Synthetic.readExisting(demo);
        long seed = firstSeed;
        for (Sample s : doc.samples()) {
            assertEquals(scenario.data(doc, s, seed++), Files.readString(demo.resolveSibling(file.apply(s))), s.name());
        }
    }

    /** Fits the demo with the default settings; it converges and each fitted value lies within 2σ of its truth. */
    static FitOutcome fitsWithinTwoSigma(Path demo, double... truth) throws Exception {
        FitOutcome o = Synthetic.fitter().fit(Synthetic.readExisting(demo), FitSettings.defaults(), Progress.NONE);
        assertTrue(o.converged(), o.warnings().toString());
        for (int a = 0; a < truth.length; a++) {
            assertEquals(truth[a], o.parameters().get(a).value(), 2 * o.parameters().get(a).sigma(),
                    o.parameters().get(a).toString());
        }
        return o;
    }
}
