package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import lamella.api.CaseDocument;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A transducer heated and read through a transparent window, a liquid below it: the window is a layer above the
 * heated plane and its conductivity is fitted like any layer's. The values are typical of glass, a thin metal film
 * and water; they serve as known truth, not as material data.
 */
class TwoSidedFitTest {

    static final String STACK = """
            "stack": {
              "layers": [
                {"name": "transducer", "thickness_m": 8e-8, "k_through_w_mk": 120, "heat_capacity_j_m3k": 2.4e6,
                 "conductance_below_w_m2k": 1e8},
                {"name": "liquid", "k_through_w_mk": %s, "heat_capacity_j_m3k": 4.2e6}],
              "above": [
                {"name": "window", "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.9e6,
                 "conductance_below_w_m2k": 2e8}],
              "top": "semi-infinite"}""";
    static final String BEAMS = "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 5e-6,"
            + " \"probe_radius_m\": 4e-6}";
    static final String FDTR = "\"measurement\": {\"type\": \"fdtr\"}";

    @TempDir
    Path dir;

    /** Common practice, no source: the fit recovers the values that made the data within 3σ. */
    @Test
    void recoversTheWindowAndLiquidConductivities() throws Exception {
        double[] f = Synthetic.logSpaced(1e3, 2e7, 40);
        String truth = "{" + STACK.formatted(0.6, 1.3) + "," + BEAMS + "," + FDTR + "}";
        double[] clean = Synthetic.model(dir, truth, f, "phase_deg");
        Synthetic.data(dir.resolve("fdtr.csv"), "frequency_hz", f, "phase_deg", clean, 0.05, 3, true);
        CaseDocument doc = Synthetic.read(dir, "{" + STACK.formatted(1.0, 3.0) + "," + BEAMS + "," + FDTR + ","
                + "\"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}],"
                + "\"free\": [{\"layer\": \"window\", \"property\": \"k_through_w_mk\", \"min\": 0.05, \"max\": 50},"
                + "           {\"layer\": \"liquid\", \"property\": \"k_through_w_mk\", \"min\": 0.05, \"max\": 50}]}}");
        FitOutcome o = Synthetic.fitter().fit(doc, FitSettings.defaults(), Progress.NONE);
        assertTrue(o.converged());
        FittedParameter window = o.parameters().get(0);
        FittedParameter liquid = o.parameters().get(1);
        assertEquals("window.k_through_w_mk", window.ref().toString());
        assertEquals(1.3, window.value(), 3 * window.sigma(), "window " + window);
        assertEquals(0.6, liquid.value(), 3 * liquid.sigma(), "liquid " + liquid);
        assertTrue(window.sigma() < 0.2 * 1.3 && window.identifiable(), "the data see the window: " + window);
    }
}
