package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Lock-in V3ω data of a gold heater on glass, fitted for the glass's conductivity. The data are made by the model
 * itself with a 400 nm heater of its own heat capacity and a boundary resistance (Borca-Tasciuc, Kumar & Chen, Rev.
 * Sci. Instrum. 72, 2139, 2001) and seeded noise of 0.1 µV; the glass's 1.36 W/(m K) and the heater's values are
 * inputs of a self-consistency check, not material data (common practice, no source). Drive frequencies up to
 * 100 kHz reach where the heater's heat capacity carries a good part of the heat, so leaving it out biases Λ.
 */
class ThreeOmegaFitTest {

    static final double K_GLASS = 1.36;
    static final double SIGMA_V = 1e-7;

    static final String STACK = """
            "stack": {"layers": [
              {"name": "glass", "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.63e6}]},""";
    static final String HEATER_WITH_MASS = """
            "geometry": {"type": "line", "half_width_m": 5e-6, "length_m": 2e-3, "heater_thickness_m": 4e-7,
              "heater_heat_capacity_j_m3k": 2.49e6, "heater_boundary_resistance_m2k_w": 2e-8},""";
    static final String HEATER_WITHOUT_MASS = """
            "geometry": {"type": "line", "half_width_m": 5e-6, "length_m": 2e-3,
              "heater_boundary_resistance_m2k_w": 2e-8},""";
    static final String DRIVE = """
            "measurement": {"type": "3omega-voltage", "heater_resistance_ohm": 12.5, "dr_dt_ohm_per_k": 0.031,
              "heater_length_m": 1.5e-3, "drive_current_a": 0.01}""";

    @TempDir
    Path dir;

    @BeforeEach
    void data() throws Exception {
        double[] f = Synthetic.logSpaced(20, 1e5, 25);
        double[] clean = Synthetic.model(dir, "{" + STACK.formatted(K_GLASS) + HEATER_WITH_MASS + DRIVE + "}", f,
                "v3_in_phase_v");
        Synthetic.data(dir.resolve("v3.csv"), "frequency_hz", f, "v3_in_phase_v", clean, SIGMA_V, 23, true);
    }

    private FitOutcome fit(String geometry) throws Exception {
        return Synthetic.fitter().fit(Synthetic.read(dir, "{" + STACK.formatted(1.0) + geometry + DRIVE
                + ", \"fit\": {\"datasets\": [{\"data\": \"v3.csv\"}], \"free\": [{\"layer\": \"glass\","
                + " \"property\": \"k_w_mk\"}]}}"), FitSettings.defaults(), Progress.NONE);
    }

    @Test
    void theHeatersMassModelledGivesTheConductivityBack() throws Exception {
        FitOutcome o = fit(HEATER_WITH_MASS);
        assertTrue(o.converged(), o.warnings().toString());
        FittedParameter k = o.parameters().get(0);
        assertEquals(K_GLASS, k.value(), 3 * k.sigma(), k.toString());
        assertTrue(k.sigma() < 0.01 * K_GLASS, "determined: " + k);
        assertEquals(1.0, o.reducedChiSquare(), 0.6, "χ² per degree of freedom with the data's own σ");
    }

    @Test
    void theHeatersMassLeftOutBiasesTheConductivity() throws Exception {
        FittedParameter k = fit(HEATER_WITHOUT_MASS).parameters().get(0);
        assertTrue(Math.abs(k.value() - K_GLASS) > 5 * k.sigma(), "bias of " + (k.value() - K_GLASS) + " W/(m K)"
                + " against σ " + k.sigma() + ": " + k);
    }

    /**
     * The fit tells which frequencies lie outside the usual band (Cahill, Rev. Sci. Instrum. 61, 802, 1990): at
     * 100 kHz the glass's λ = √(D/(2π·2f)) = 0.815 µm is below the 5 µm half-width.
     */
    @Test
    void theFitWarnsOfFrequenciesOutsideTheUsualBand() throws Exception {
        FitOutcome o = fit(HEATER_WITH_MASS);
        String band = o.warnings().stream().filter(w -> w.contains("slope-method band")).findFirst()
                .orElseThrow(() -> new AssertionError(o.warnings().toString()));
        assertTrue(band.startsWith("dataset 0 (v3.csv): at the highest drive frequency, 1.00e5 Hz, the thermal"
                + " penetration depth λ = √(D/(2π·2f)) across the heater in layer 'glass' is 8.15e-7 m"), band);
    }

}
