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
 * A bare absorbing crystal measured by FDTR without a transducer: the pump is absorbed over a depth comparable to
 * the thermal penetration depth at the highest frequencies, so the fit can free the absorption depth beside the
 * conductivity. The values are typical of a semiconductor; they serve as known truth, not as material data.
 */
class OpticalDepthFitTest {

    static final String CASE = """
            "stack": {"layers": [
              {"name": "crystal", "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.66e6,
               "absorption_depth_m": %s}]},
            "geometry": {"type": "gaussian", "pump_radius_m": 3e-6, "probe_radius_m": 3e-6},
            "measurement": {"type": "fdtr"}""";

    @TempDir
    Path dir;

    /** Common practice, no source: the fit recovers the values that made the data within 3σ. */
    @Test
    void recoversConductivityAndAbsorptionDepth() throws Exception {
        double[] f = Synthetic.logSpaced(1e4, 5e7, 40);
        double[] clean = Synthetic.model(dir, "{" + CASE.formatted(140, 1e-6) + "}", f, "phase_deg");
        Synthetic.data(dir.resolve("fdtr.csv"), "frequency_hz", f, "phase_deg", clean, 0.05, 5, true);
        CaseDocument doc = Synthetic.read(dir, "{" + CASE.formatted(80, 3e-7) + ","
                + "\"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}],"
                + "\"free\": [{\"layer\": \"crystal\", \"property\": \"k_through_w_mk\", \"min\": 1, \"max\": 1000},"
                + "           {\"layer\": \"crystal\", \"property\": \"absorption_depth_m\", \"min\": 1e-9,"
                + " \"max\": 1e-4}]}}");
        FitOutcome o = Synthetic.fitter().fit(doc, FitSettings.defaults(), Progress.NONE);
        assertTrue(o.converged());
        FittedParameter k = o.parameters().get(0);
        FittedParameter depth = o.parameters().get(1);
        assertEquals("crystal.absorption_depth_m", depth.ref().toString());
        assertEquals(140, k.value(), 3 * k.sigma(), "conductivity " + k);
        assertEquals(1e-6, depth.value(), 3 * depth.sigma(), "absorption depth " + depth);
        assertTrue(depth.sigma() < 0.3e-6 && depth.identifiable(), "the data see the depth: " + depth);
    }
}
