package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lamella.api.CaseDocument;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A thickness series: the same film at three thicknesses, sharing its conductivity Λ and its boundary conductance G
 * to the substrate, each sample measured by FDTR. The film's resistance adds to the boundary's, d/Λ + 1/G, linear in
 * the thickness d with slope 1/Λ and intercept 1/G (common practice, no source), so one thin film alone sees mainly
 * the sum while the series separates the two. The stack values are typical of a metal transducer on a dielectric film
 * on a crystal; they are known truth for the fit, not material data. The data are made by the model itself with
 * seeded Gaussian noise.
 */
class SampleSeriesTest {

    static final double K_FILM = 5.0;
    static final double G_FILM = 1.0e8;
    static final double[] THICKNESS = {2e-8, 6e-8, 1.8e-7};
    static final String[] NAMES = {"film-20nm", "film-60nm", "film-180nm"};
    static final String BEAMS = "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 5e-6, \"probe_radius_m\": 4e-6}";
    static final String FDTR = "\"measurement\": {\"type\": \"fdtr\"}";
    static final String FREE = "\"free\": [{\"layer\": \"film\", \"property\": \"k_through_w_mk\", \"initial\": 2.0,"
            + " \"min\": 0.05, \"max\": 200}, {\"layer\": \"film\", \"property\": \"conductance_below_w_m2k\","
            + " \"initial\": 3e7}]";

    @TempDir
    Path dir;

    static String stack(double thickness, double k, double g) {
        return """
                {"layers": [
                  {"name": "cap", "thickness_m": 8e-8, "k_through_w_mk": 200, "heat_capacity_j_m3k": 2.45e6,
                   "conductance_below_w_m2k": 2e8},
                  {"name": "film", "thickness_m": %s, "k_through_w_mk": %s, "heat_capacity_j_m3k": 2.0e6,
                   "conductance_below_w_m2k": %s},
                  {"name": "base", "k_through_w_mk": 140, "heat_capacity_j_m3k": 1.63e6}]}"""
                .formatted(thickness, k, g);
    }

    /** Writes one FDTR phase file per sample, made from the truth with noise of {@code noiseDeg}. */
    private void data(long seed, double noiseDeg) throws Exception {
        double[] f = Synthetic.logSpaced(1e4, 2e7, 25);
        for (int i = 0; i < NAMES.length; i++) {
            String truth = "{\"stack\": " + stack(THICKNESS[i], K_FILM, G_FILM) + "," + BEAMS + "," + FDTR + "}";
            Synthetic.data(dir.resolve(NAMES[i] + ".csv"), "frequency_hz", f, "phase_deg",
                    Synthetic.model(dir, truth, f, "phase_deg"), noiseDeg, seed * 31 + i, true);
        }
    }

    /** The case of the whole series: three samples, one dataset each, Λ and G named once for all. */
    private CaseDocument series() throws Exception {
        List<String> samples = new ArrayList<>();
        List<String> datasets = new ArrayList<>();
        for (int i = 0; i < NAMES.length; i++) {
            samples.add("{\"name\": \"" + NAMES[i] + "\", \"stack\": " + stack(THICKNESS[i], 2.0, 3e7) + "}");
            datasets.add("{\"data\": \"" + NAMES[i] + ".csv\", \"sample\": \"" + NAMES[i] + "\"}");
        }
        return Synthetic.read(dir, "{\"samples\": [" + String.join(",", samples) + "]," + BEAMS + "," + FDTR
                + ", \"fit\": {\"datasets\": [" + String.join(",", datasets) + "], " + FREE + "}}");
    }

    /** The middle thickness alone, as a case of one stack. */
    private CaseDocument single(int i) throws Exception {
        return Synthetic.read(dir, "{\"stack\": " + stack(THICKNESS[i], 2.0, 3e7) + "," + BEAMS + "," + FDTR
                + ", \"fit\": {\"datasets\": [{\"data\": \"" + NAMES[i] + ".csv\"}], " + FREE + "}}");
    }

    /**
     * The series recovers Λ and G within 3σ, each to a few per cent, and their correlation stays moderate; the
     * middle thickness alone, fitted with the same data, leaves both at least three times as uncertain and almost
     * fully correlated (measured: series σ 1.3 % and 1.8 %, correlation −0.81; 60 nm alone 8 % and 9 %, −0.978).
     */
    @Test
    void theSeriesSeparatesTheFilmFromItsBoundaryWhereOneThicknessCannot() throws Exception {
        data(5, 0.2);
        FitOutcome o = Synthetic.fitter().fit(series(), FitSettings.defaults(), Progress.NONE);
        assertTrue(o.converged());
        FittedParameter k = o.parameters().get(0);
        FittedParameter g = o.parameters().get(1);
        assertEquals("film.k_through_w_mk", k.ref().toString());
        assertEquals(K_FILM, k.value(), 3 * k.sigma(), k.toString());
        assertEquals(G_FILM, g.value(), 3 * g.sigma(), g.toString());
        assertTrue(k.sigma() < 0.05 * K_FILM && g.sigma() < 0.05 * G_FILM, o.parameters().toString());
        assertTrue(Math.abs(o.correlation()[0][1]) < 0.9, "correlation " + o.correlation()[0][1]);
        assertEquals(3, o.datasets().size());

        FitOutcome alone = Synthetic.fitter().fit(single(1), FitSettings.defaults(), Progress.NONE);
        FittedParameter k1 = alone.parameters().get(0);
        FittedParameter g1 = alone.parameters().get(1);
        assertTrue(k1.sigma() / k1.value() > 3 * k.sigma() / k.value(), k1 + " against " + k);
        assertTrue(g1.sigma() / g1.value() > 3 * g.sigma() / g.value(), g1 + " against " + g);
        assertTrue(Math.abs(alone.correlation()[0][1]) > 0.95, "correlation " + alone.correlation()[0][1]);
    }

    /**
     * The thinnest film alone cannot see its conductivity at all: its resistance d/Λ = 4e-9 m² K/W is less than half
     * the boundary's 1/G = 1e-8, and the fit runs to a bound of Λ or calls it not identifiable.
     */
    @Test
    void theThinnestFilmAloneDoesNotDetermineItsConductivity() throws Exception {
        data(5, 0.2);
        FitOutcome alone = Synthetic.fitter().fit(single(0), FitSettings.defaults(), Progress.NONE);
        FittedParameter k = alone.parameters().get(0);
        assertTrue(k.atBound() || !k.identifiable() || k.sigma() > 0.3 * k.value(), k.toString());
    }

    /**
     * Coverage over seeds, as for single fits: over 60 noise realisations the truth lies within 2σ in about 95 % of
     * the 120 checks; the binomial spread is ±2 %, so 88–100 % is asked for (common practice, no source).
     */
    @Test
    void twoSigmaIntervalsOfTheSeriesCoverTheTruth() throws Exception {
        int inside = 0;
        int checks = 0;
        for (long seed = 1; seed <= 60; seed++) {
            data(seed, 0.2);
            FitOutcome o = Synthetic.fitter().fit(series(), FitSettings.defaults().withThreads(1), Progress.NONE);
            double[] truth = {K_FILM, G_FILM};
            for (int a = 0; a < 2; a++) {
                FittedParameter p = o.parameters().get(a);
                checks++;
                if (Math.abs(p.value() - truth[a]) <= 2 * p.sigma()) {
                    inside++;
                }
            }
        }
        double fraction = (double) inside / checks;
        assertTrue(fraction >= 0.88, "coverage " + fraction);
    }
}
