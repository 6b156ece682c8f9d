package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.MonteCarloSummary;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A layer that states one conductivity is isotropic, and is fitted, propagated and perturbed as isotropic. The
 * sample is a metal transducer on sapphire, written with one conductivity each (sapphire near 35 W/(m K) is the
 * case reported against the old behaviour; the values are inputs of a self-consistency check — data made by the
 * model must give back what made them — not material data: common practice, no source).
 */
class IsotropicFitTest {

    static final double K_SAPPHIRE = 35.0;
    static final double G = 1.0e8;
    static final double K_METAL = 180.0;

    static final String STACK = """
            "stack": {"layers": [
              {"name": "transducer", "thickness_m": 8e-8, "k_through_w_mk": %s, "heat_capacity_j_m3k": 2.42e6,
               "conductance_below_w_m2k": %s},
              {"name": "sapphire", "k_through_w_mk": %s, "heat_capacity_j_m3k": 3.06e6}]},
            "geometry": {"type": "gaussian", "pump_radius_m": 2e-6, "probe_radius_m": 1.5e-6},
            "measurement": {"type": "fdtr"}""";

    @TempDir
    Path dir;

    @BeforeEach
    void data() throws Exception {
        double[] f = Synthetic.logSpaced(1e4, 2e7, 30);
        double[] clean = Synthetic.model(dir, "{" + STACK.formatted(K_METAL, G, K_SAPPHIRE) + "}", f, "phase_deg");
        Synthetic.data(dir.resolve("fdtr.csv"), "frequency_hz", f, "phase_deg", clean, 0.1, 17, true);
    }

    private CaseDocument fitCase(String property, String uncertain) throws Exception {
        return Synthetic.read(dir, "{" + STACK.formatted(K_METAL, 5e7, 20.0) + ", \"fit\": {\"datasets\": [{\"data\":"
                + " \"fdtr.csv\"}], \"free\": [{\"layer\": \"sapphire\", \"property\": \"" + property + "\"},"
                + " {\"layer\": \"transducer\", \"property\": \"conductance_below_w_m2k\"}]" + uncertain + "}}");
    }

    private static FitOutcome fit(CaseDocument doc) throws InputException {
        return Synthetic.fitter().fit(doc, FitSettings.defaults(), Progress.NONE);
    }

    @Test
    void sapphireWrittenOnceIsFittedBackFromAStartOfTwenty() throws Exception {
        FitOutcome o = fit(fitCase("k_through_w_mk", ""));
        assertTrue(o.converged(), o.warnings().toString());
        FittedParameter k = o.parameters().get(0);
        FittedParameter g = o.parameters().get(1);
        assertEquals(K_SAPPHIRE, k.value(), 3 * k.sigma(), k.toString());
        assertEquals(G, g.value(), 3 * g.sigma(), g.toString());
        assertTrue(k.sigma() < 0.05 * K_SAPPHIRE, "determined: " + k);
        assertEquals(1.0, o.reducedChiSquare(), 0.5, "χ² per degree of freedom with the data's own σ of 0.1°");
        assertEquals("isotropic Λ", k.quantity());
        assertEquals("sapphire.k_through_w_mk (isotropic Λ)", k.label());
        assertEquals("", g.quantity());
    }

    @Test
    void theIsotropicNameFitsTheSameQuantity() throws Exception {
        FittedParameter byThrough = fit(fitCase("k_through_w_mk", "")).parameters().get(0);
        FittedParameter byName = fit(fitCase("k_w_mk", "")).parameters().get(0);
        assertEquals(byThrough.value(), byName.value(), 1e-6 * byThrough.value());
        assertEquals(byThrough.sigma(), byName.sigma(), 1e-3 * byThrough.sigma());
        assertEquals("sapphire.k_w_mk (isotropic Λ)", byName.label());
    }

    /**
     * The budget's contribution of an uncertain isotropic input, against an independent computation: refits with that
     * input written in the case at ±1 % (a central difference of the fitted value, σ_k·|∂p/∂p_k|). The transducer's
     * in-plane conduction spreads heat under 2 µm beams, so moving only its Λz would give a far smaller share.
     */
    @Test
    void anUncertainIsotropicInputMovesEveryDirection() throws Exception {
        double rel = 0.05;
        String uncertain = ", \"uncertain\": [{\"layer\": \"transducer\", \"property\": \"k_through_w_mk\","
                + " \"sigma_relative\": " + rel + "}]";
        FitOutcome o = fit(fitCase("k_through_w_mk", uncertain));
        BudgetLine metal = o.budget().get(1);
        assertEquals("transducer.k_through_w_mk (isotropic Λ)", metal.label());
        double h = 0.01;
        double up = refit(K_METAL * (1 + h));
        double down = refit(K_METAL * (1 - h));
        double oracle = Math.abs((up - down) / (2 * h * K_METAL)) * rel * K_METAL;
        assertEquals(oracle, metal.contributions()[0], 0.05 * oracle, "σ contribution to sapphire's Λ");
        assertTrue(oracle > 0.3 * o.parameters().get(0).sigmaNoise(), "the check is not lost in the noise");
    }

    /** Monte Carlo draws the uncertain isotropic input the same way: its σ agrees with the linearised one. */
    @Test
    void monteCarloDrawsTheIsotropicInputInEveryDirection() throws Exception {
        CaseDocument doc = fitCase("k_through_w_mk", ", \"uncertain\": [{\"layer\": \"transducer\", \"property\":"
                + " \"k_through_w_mk\", \"sigma_relative\": 0.05}]");
        FitOutcome o = Synthetic.fitter().fit(doc, FitSettings.defaults().withMonteCarlo(150).withSeed(5),
                Progress.NONE);
        MonteCarloSummary mc = o.monteCarlo().orElseThrow();
        assertTrue(mc.failed() < 5, mc.failed() + " refits failed");
        assertEquals(1.0, mc.stdOverLinearised()[0], 0.2, "sapphire Λ: Monte Carlo σ over linearised σ");
        assertEquals(K_SAPPHIRE, mc.percentiles()[0][2], 3 * o.parameters().get(0).sigma(), "median");
    }

    private double refit(double metal) throws Exception {
        CaseDocument doc = Synthetic.read(dir, "{" + STACK.formatted(metal, 5e7, 20.0) + ", \"fit\": {\"datasets\":"
                + " [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\": \"sapphire\", \"property\": \"k_w_mk\"},"
                + " {\"layer\": \"transducer\", \"property\": \"conductance_below_w_m2k\"}]}}");
        return fit(doc).parameters().get(0).value();
    }

    @Test
    void aDirectionNamedTwiceIsRefused() throws Exception {
        InputException both = assertThrows(InputException.class, () -> fit(fitCase("k_w_mk",
                ", \"uncertain\": [{\"layer\": \"sapphire\", \"property\": \"k_in_plane_w_mk\", \"sigma\": 1}]")));
        assertEquals("fit.uncertain[0]", both.path());
        assertTrue(both.getMessage().contains("both move the conductivity of layer 'sapphire'"), both.getMessage());
        InputException inPlane = assertThrows(InputException.class, () -> fit(fitCase("k_in_plane_w_mk",
                ", \"uncertain\": [{\"layer\": \"sapphire\", \"property\": \"k_in_plane_x_w_mk\", \"sigma\": 1}]")));
        assertTrue(inPlane.getMessage().contains("an in-plane conductivity"), inPlane.getMessage());
    }

    /**
     * Λz and Λr named apart on a layer stated once: Λz then moves alone, and the outputs say so. The case states the
     * value the data were made with, so that Λr held there leaves Λz to be found from a start of 20.
     */
    @Test
    void namingTheInPlaneConductivityToo() throws Exception {
        CaseDocument doc = Synthetic.read(dir, "{" + STACK.formatted(K_METAL, 5e7, K_SAPPHIRE) + ", \"fit\":"
                + " {\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\": \"sapphire\", \"property\":"
                + " \"k_through_w_mk\", \"initial\": 20}, {\"layer\": \"transducer\", \"property\":"
                + " \"conductance_below_w_m2k\"}], \"uncertain\": [{\"layer\": \"sapphire\", \"property\":"
                + " \"k_in_plane_w_mk\", \"sigma_relative\": 0.02}]}}");
        FitOutcome o = fit(doc);
        FittedParameter kz = o.parameters().get(0);
        assertEquals("sapphire.k_through_w_mk (through-plane Λz)", kz.label());
        assertEquals("sapphire.k_in_plane_w_mk (in-plane Λr)", o.budget().get(1).label());
        assertEquals(K_SAPPHIRE, kz.value(), 3 * kz.sigma(), kz.toString());
        assertEquals(1.0, o.reducedChiSquare(), 0.5);
    }

    @Test
    void anIsotropicStartOnAnAnisotropicLayerNeedsAnInitialValue() throws Exception {
        String stack = STACK.formatted(K_METAL, 5e7, 20.0).replace("\"k_through_w_mk\": 20.0,",
                "\"k_through_w_mk\": 20.0, \"k_in_plane_w_mk\": 25.0,");
        String fit = ", \"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\": \"sapphire\","
                + " \"property\": \"k_w_mk\"%s}, {\"layer\": \"transducer\", \"property\": \"conductance_below_w_m2k\"}]}";
        InputException e = assertThrows(InputException.class, () -> fit(Synthetic.read(dir, "{" + stack
                + fit.formatted("") + "}")));
        assertEquals("fit.free[0]", e.path());
        assertTrue(e.getMessage().contains("no one isotropic Λ"), e.getMessage());
        FitOutcome o = fit(Synthetic.read(dir, "{" + stack + fit.formatted(", \"initial\": 20") + "}"));
        assertEquals(K_SAPPHIRE, o.parameters().get(0).value(), 3 * o.parameters().get(0).sigma(),
                "fitted as isotropic from an explicit start");
    }
}
