package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;
import lamella.api.CaseDocument;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * SSTR as it is measured: the probe signal over a sweep of absorbed pump powers on a reference of known conductivity
 * and on the unknown sample, the thermoreflectance coefficient (a named gain) shared by both (Braun et al., Rev. Sci.
 * Instrum. 90, 024905, 2019). The stacks are typical values, known truth for the fit, not material data; the data are
 * made by the model with seeded noise of 1 % of the signal (common practice, no source).
 */
class SteadyStateFitTest {

    static final double GAIN = SharedGainTest.GAIN;
    static final double K_REFERENCE = SharedGainTest.K_REFERENCE;
    static final double K_UNKNOWN = SharedGainTest.K_UNKNOWN;
    static final String BEAMS = "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 1e-5, \"probe_radius_m\": 5e-6}";
    static final double[] POWERS = {1e-3, 2.5e-3, 5e-3, 7.5e-3, 1e-2};

    @TempDir
    Path dir;

    /** The same cap on a substrate of conductivity k as the FDTR calibration of {@link SharedGainTest}. */
    static String stack(double k) {
        return SharedGainTest.stack(k);
    }

    /**
     * The steady rise of an isotropic half-space under a Gaussian pump of 1/e² radius w₀, read by a Gaussian probe of
     * w₁: ΔT/P = 1/(√(2π) Λ √(w₀² + w₁²)), from the half-space kernel 1/(Λk) integrated against the beams'
     * exp(−k²(w₀² + w₁²)/8) (Lax, J. Appl. Phys. 48, 3919, 1977, for one beam; derived here for two). The rise is that
     * times the power at every power of the sweep.
     */
    @Test
    void aHalfSpaceRisesAsTheClosedFormAtEveryPower() throws Exception {
        String json = "{\"stack\": {\"layers\": [{\"name\": \"glass\", \"k_through_w_mk\": 1.38,"
                + " \"heat_capacity_j_m3k\": 1.65e6}]}," + BEAMS + ", \"measurement\": {\"type\": \"sstr\"}}";
        double[] rise = Synthetic.model(dir, json, POWERS, "temperature_rise_k");
        double[] perWatt = Synthetic.model(dir, json, POWERS, "k_per_w");
        double expected = 1 / (Math.sqrt(2 * Math.PI) * 1.38 * Math.sqrt(1e-10 + 25e-12));
        for (int i = 0; i < POWERS.length; i++) {
            assertEquals(expected, perWatt[i], 1e-7 * expected);
            assertEquals(expected * POWERS[i], rise[i], 1e-7 * expected * POWERS[i]);
        }
    }

    private void sweep(String name, double k, long seed) throws Exception {
        double[] clean = Synthetic.model(dir, "{\"stack\": " + stack(k) + "," + BEAMS
                + ", \"measurement\": {\"type\": \"sstr\"}}", POWERS, "temperature_rise_k");
        SplittableRandom rng = new SplittableRandom(seed);
        StringBuilder sb = new StringBuilder("pump_power_w,temperature_rise_k,sigma_temperature_rise_k\n");
        for (int i = 0; i < POWERS.length; i++) {
            double s = 0.01 * GAIN * clean[i];
            sb.append(String.format(Locale.ROOT, "%.12e,%.12e,%.6e%n", POWERS[i],
                    GAIN * clean[i] + s * rng.nextGaussian(), s));
        }
        Files.writeString(dir.resolve(name + ".csv"), sb.toString());
    }

    private static final String FREE = "\"free\": [{\"gain\": \"probe\", \"min\": 0.01, \"max\": 100},"
            + " {\"sample\": \"unknown\", \"layer\": \"substrate\", \"property\": \"k_through_w_mk\", \"initial\": 3,"
            + " \"min\": 0.1, \"max\": 1000}]";

    /**
     * One sample alone cannot tell the coefficient from Λ (the rise is about inversely proportional to Λ); with the
     * reference's sweep both come out within 3σ. Measured: σ(Λ) 0.8 % with the reference (correlation 0.70); alone
     * neither input is identifiable (correlation 1.000).
     */
    @Test
    void aReferenceSweepCalibratesTheCoefficientTheUnknownShares() throws Exception {
        sweep("reference", K_REFERENCE, 5);
        sweep("unknown", K_UNKNOWN, 6);
        CaseDocument doc = Synthetic.read(dir, "{\"samples\": [{\"name\": \"reference\", \"stack\": "
                + stack(K_REFERENCE) + "}, {\"name\": \"unknown\", \"stack\": " + stack(3.0) + "}]," + BEAMS
                + ", \"measurement\": {\"type\": \"sstr\"}, \"fit\": {\"gains\": {\"probe\": 1.0}, \"datasets\": ["
                + "{\"data\": \"reference.csv\", \"sample\": \"reference\", \"gain\": \"probe\"},"
                + "{\"data\": \"unknown.csv\", \"sample\": \"unknown\", \"gain\": \"probe\"}], " + FREE + "}}");
        FitOutcome o = Synthetic.fitter().fit(doc, FitSettings.defaults(), Progress.NONE);
        FittedParameter gain = o.parameters().get(0);
        FittedParameter k = o.parameters().get(1);
        assertEquals("temperature_rise_k", o.datasets().get(0).signal(), "SSTR is fitted by its rise by default");
        assertEquals(GAIN, gain.value(), 3 * gain.sigma(), gain.toString());
        assertEquals(K_UNKNOWN, k.value(), 3 * k.sigma(), k.toString());
        assertTrue(k.sigma() < 0.03 * K_UNKNOWN, k.toString());

        CaseDocument alone = Synthetic.read(dir, "{\"samples\": [{\"name\": \"unknown\", \"stack\": " + stack(3.0)
                + "}]," + BEAMS + ", \"measurement\": {\"type\": \"sstr\"}, \"fit\": {\"gains\": {\"probe\": 1.0},"
                + " \"datasets\": [{\"data\": \"unknown.csv\", \"gain\": \"probe\"}], " + FREE + "}}");
        FitOutcome a = Synthetic.fitter().fit(alone, FitSettings.defaults(), Progress.NONE);
        assertTrue(a.parameters().stream().noneMatch(FittedParameter::identifiable),
                "alone, coefficient and Λ are one combination: " + a.parameters() + " " + a.warnings());
    }
}
