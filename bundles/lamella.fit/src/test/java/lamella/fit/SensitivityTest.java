package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
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
     * ΔT = P/(√(2π) Λ √(w₀² + w₁²)), so S_Λ = −1 and S_w₀ = −w₀²/(w₀² + w₁²). The glass states one conductivity, so
     * it is one input, perturbed in every direction.
     */
    @Test
    void steadyHalfSpaceSensitivitiesFollowLax() throws Exception {
        CaseDocument doc = Synthetic.read(dir, """
                {"stack": {"layers": [{"name": "glass", "k_through_w_mk": 1.4, "heat_capacity_j_m3k": 1.6e6}]},
                 "geometry": {"type": "gaussian", "pump_radius_m": 6e-6, "probe_radius_m": 3e-6},
                 "measurement": {"type": "sstr"}}""");
        SensitivityTable t = Synthetic.fitter().sensitivity(doc, -1, null);
        assertEquals(-1.0, value(t, ParameterRef.layer("glass", "k_w_mk")), 1e-6, "isotropic Λ");
        assertEquals("isotropic Λ", t.quantities().get(t.parameters().indexOf(ParameterRef.layer("glass", "k_w_mk"))));
        assertFalse(t.parameters().contains(ParameterRef.layer("glass", "k_through_w_mk")),
                "one conductivity stated, one input: " + t.parameters());
        assertEquals(-36.0 / 45.0, value(t, ParameterRef.geometry("pump_radius_m")), 1e-6);
        assertEquals(-9.0 / 45.0, value(t, ParameterRef.geometry("probe_radius_m")), 1e-6);
        assertEquals(0.0, value(t, ParameterRef.layer("glass", "heat_capacity_j_m3k")), 1e-9,
                "a steady state does not depend on heat capacity");
    }

    /**
     * Lax (1977) for an anisotropic half-space, scaled by √(Λz/Λr) in depth: ΔT ∝ 1/√(Λz Λr), so with Λz and Λr
     * written apart each carries half.
     */
    @Test
    void conductivitiesWrittenApartEachCarryHalf() throws Exception {
        CaseDocument doc = Synthetic.read(dir, """
                {"stack": {"layers": [{"name": "glass", "k_through_w_mk": 1.4, "k_in_plane_w_mk": 1.4,
                   "heat_capacity_j_m3k": 1.6e6}]},
                 "geometry": {"type": "gaussian", "pump_radius_m": 6e-6, "probe_radius_m": 3e-6},
                 "measurement": {"type": "sstr"}}""");
        SensitivityTable t = Synthetic.fitter().sensitivity(doc, -1, null);
        assertEquals(-0.5, value(t, ParameterRef.layer("glass", "k_through_w_mk")), 1e-6);
        assertEquals(-0.5, value(t, ParameterRef.layer("glass", "k_in_plane_w_mk")), 1e-6);
        assertEquals("glass.k_through_w_mk (through-plane Λz)",
                t.label(t.parameters().indexOf(ParameterRef.layer("glass", "k_through_w_mk"))));
    }

    /**
     * The periodic point source on a half-space (Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed., 1959, §10.3,
     * doubled at the surface): T(r) = e^{−(1+i) q r}/(2π r Λ), q = √(ωC/(2Λ)). Its phase is φ = −q r (radians) and
     * depends on Λ only through q, so ∂φ/∂ln Λ = −φ/2 and ∂ln|T|/∂ln Λ = q r/2 − 1 (derived from the closed form). With
     * Λz and Λr apart the phase depends on Λr alone: ∂φ/∂ln Λz = 0 — the value the old behaviour gave for an
     * isotropic layer. The frequencies keep q r below π, where the phase needs no unwrapping.
     */
    @Test
    void isotropicPhaseSensitivityOfAHalfSpaceIsTheDerivativeOfItsClosedForm() throws Exception {
        double k = 1.4;
        double c = 1.65e6;
        double r = 2e-6;
        String geometry = "\"geometry\": {\"type\": \"point\", \"distance_m\": 2e-6},"
                + " \"measurement\": {\"type\": \"fdtr\", \"frequencies_hz\": [1e3, 1e4, 1e5, 3e5]}}";
        CaseDocument doc = Synthetic.read(dir, "{\"stack\": {\"layers\": [{\"name\": \"glass\", \"k_through_w_mk\":"
                + " 1.4, \"heat_capacity_j_m3k\": 1.65e6}]}, " + geometry);
        SensitivityTable phase = Synthetic.fitter().sensitivity(doc, -1, "phase_deg");
        SensitivityTable amplitude = Synthetic.fitter().sensitivity(doc, -1, "amplitude_k_per_w");
        int j = phase.parameters().indexOf(ParameterRef.layer("glass", "k_w_mk"));
        assertTrue(j >= 0, phase.parameters().toString());
        double[] f = {1e3, 1e4, 1e5, 3e5};
        for (int i = 0; i < f.length; i++) {
            double qr = Math.sqrt(2 * Math.PI * f[i] * c / (2 * k)) * r;
            double phiDeg = -Math.toDegrees(qr);
            assertEquals(-phiDeg / 2, phase.values()[j][i], 1e-5 * Math.abs(phiDeg) + 1e-9, "∂φ/∂ln Λ at " + f[i]);
            assertEquals(qr / 2 - 1, amplitude.values()[j][i], 1e-5, "∂ln|T|/∂ln Λ at " + f[i]);
        }
        CaseDocument apart = Synthetic.read(dir, "{\"stack\": {\"layers\": [{\"name\": \"glass\", \"k_through_w_mk\":"
                + " 1.4, \"k_in_plane_w_mk\": 1.4, \"heat_capacity_j_m3k\": 1.65e6}]}, " + geometry);
        SensitivityTable split = Synthetic.fitter().sensitivity(apart, -1, "phase_deg");
        int z = split.parameters().indexOf(ParameterRef.layer("glass", "k_through_w_mk"));
        int rr = split.parameters().indexOf(ParameterRef.layer("glass", "k_in_plane_w_mk"));
        for (int i = 0; i < f.length; i++) {
            assertEquals(0.0, split.values()[z][i], 1e-9, "Λz alone does not move the phase");
            assertEquals(phase.values()[j][i], split.values()[rr][i], 1e-9, "Λr alone carries all of it");
        }
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

    /** An unknown --signal lists the technique's signals, for the TDTR and the FDTR dataset of the demo. */
    @Test
    void anUnknownSignalListsTheValidOnes() throws Exception {
        CaseDocument doc = Synthetic.readExisting(DemoDataTest.DEMO);
        for (int dataset : new int[] {0, 2}) {
            lamella.api.InputException e = org.junit.jupiter.api.Assertions.assertThrows(
                    lamella.api.InputException.class, () -> Synthetic.fitter().sensitivity(doc, dataset, "phse_deg"));
            assertTrue(e.getMessage().contains("has no signal 'phse_deg'"), e.getMessage());
            assertTrue(e.getMessage().contains("; it gives "), e.getMessage());
            assertTrue(e.getMessage().contains("phase_deg"), e.getMessage());
        }
    }

    private static double value(SensitivityTable t, ParameterRef r) {
        int j = t.parameters().indexOf(r);
        assertTrue(j >= 0, r + " in " + t.parameters());
        return t.values()[j][0];
    }
}
