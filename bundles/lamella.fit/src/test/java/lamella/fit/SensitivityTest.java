package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import lamella.api.CaseDocument;
import lamella.api.ParameterRef;
import lamella.api.fit.SensitivityTable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SensitivityTest {

    @TempDir
    Path dir;

    /**
     * Lax, J. Appl. Phys. 48, 3919 (1977): steady Gaussian heating of a half-space read by a Gaussian probe gives
     * ΔT = P/(√(2π) Λ √(w₀² + w₁²)), so S_Λ = −1 and S_w₀ = −w₀²/(w₀² + w₁²).
     */
    @Test
    void steadyHalfSpaceSensitivitiesFollowLax() throws Exception {
        CaseDocument doc = Synthetic.read(dir, """
                {"stack": {"layers": [{"name": "glass", "k_through_w_mk": 1.4, "heat_capacity_j_m3k": 1.6e6}]},
                 "geometry": {"type": "gaussian", "pump_radius_m": 6e-6, "probe_radius_m": 3e-6},
                 "measurement": {"type": "sstr"}}""");
        SensitivityTable t = Synthetic.fitter().sensitivity(doc, -1, null);
        assertEquals(-0.5, value(t, ParameterRef.layer("glass", "k_through_w_mk")), 1e-6,
                "only √(Λz Λr) matters, so each conductivity carries half");
        assertEquals(-0.5, value(t, ParameterRef.layer("glass", "k_in_plane_w_mk")), 1e-6);
        assertEquals(-36.0 / 45.0, value(t, ParameterRef.geometry("pump_radius_m")), 1e-6);
        assertEquals(-9.0 / 45.0, value(t, ParameterRef.geometry("probe_radius_m")), 1e-6);
        assertEquals(0.0, value(t, ParameterRef.layer("glass", "heat_capacity_j_m3k")), 1e-9,
                "a steady state does not depend on heat capacity");
    }

    /** A dataset with its own geometry block names those inputs through the dataset, as the fit block does. */
    @Test
    void aDatasetsOwnBlockIsNamedThroughTheDataset() throws Exception {
        CaseDocument doc = Synthetic.readExisting(DemoDataTest.DEMO);
        SensitivityTable t = Synthetic.fitter().sensitivity(doc, 2, null);
        assertTrue(t.parameters().contains(ParameterRef.geometry("pump_radius_m").inDataset(2)), t.parameters()
                .toString());
        assertTrue(t.phaseLike());
        SensitivityTable tdtr = Synthetic.fitter().sensitivity(doc, 0, null);
        assertTrue(tdtr.parameters().contains(ParameterRef.geometry("pump_radius_m")));
    }

    private static double value(SensitivityTable t, ParameterRef r) {
        int j = t.parameters().indexOf(r);
        assertTrue(j >= 0, r + " in " + t.parameters());
        return t.values()[j][0];
    }
}
