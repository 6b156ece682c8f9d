package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import lamella.api.InputException;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Hostile fit blocks over samples and gains: every mistake is an error at its JSON path, never guessed around. */
class SampleCaseTest {

    static final String BEAMS = "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 5e-6, \"probe_radius_m\": 4e-6}";
    static final String FDTR = "\"measurement\": {\"type\": \"fdtr\"}";
    static final String THIN = "{\"name\": \"thin\", \"stack\": " + SampleSeriesTest.stack(2e-8, 5, 1e8) + "}";
    static final String THICK = "{\"name\": \"thick\", \"stack\": " + SampleSeriesTest.stack(1.8e-7, 5, 1e8) + "}";
    /** A sample without the film: the bare transducer on the substrate. */
    static final String BARE = "{\"name\": \"bare\", \"stack\": {\"layers\": [{\"name\": \"cap\", \"thickness_m\":"
            + " 8e-8, \"k_through_w_mk\": 200, \"heat_capacity_j_m3k\": 2.45e6, \"conductance_below_w_m2k\": 2e8},"
            + " {\"name\": \"base\", \"k_through_w_mk\": 140, \"heat_capacity_j_m3k\": 1.63e6}]}}";
    static final String FREE_K = "{\"layer\": \"film\", \"property\": \"k_through_w_mk\"}";
    static final String DATA = "{\"data\": \"thin.csv\", \"sample\": \"thin\"}, {\"data\": \"thick.csv\","
            + " \"sample\": \"thick\"}";

    @TempDir
    Path dir;

    @BeforeEach
    void data() throws Exception {
        double[] f = Synthetic.logSpaced(1e4, 1e7, 12);
        for (String[] s : new String[][] {{"thin", "2e-8"}, {"thick", "1.8e-7"}, {"bare", "0"}}) {
            String stack = s[0].equals("bare") ? BARE.substring(BARE.indexOf("{\"layers\""), BARE.length() - 1)
                    : SampleSeriesTest.stack(Double.parseDouble(s[1]), 5, 1e8);
            Synthetic.data(dir.resolve(s[0] + ".csv"), "frequency_hz", f, "phase_deg",
                    Synthetic.model(dir, "{\"stack\": " + stack + "," + BEAMS + "," + FDTR + "}", f, "phase_deg"),
                    0.1, 3, false);
        }
    }

    private static String doc(String samples, String fit) {
        return "{\"samples\": [" + samples + "]," + BEAMS + "," + FDTR + ",\n\"fit\": " + fit + "}";
    }

    private InputException fails(String json) {
        return assertThrows(InputException.class, () -> Synthetic.fitter().fit(Synthetic.read(dir, json),
                FitSettings.defaults(), Progress.NONE));
    }

    private FitOutcome fits(String json) throws Exception {
        return Synthetic.fitter().fit(Synthetic.read(dir, json), FitSettings.defaults(), Progress.NONE);
    }

    @Test
    void aDatasetNamesItsSampleWhenThereAreSeveral() {
        InputException e = fails(doc(THIN + "," + THICK, "{\"datasets\": [{\"data\": \"thin.csv\"}], \"free\": ["
                + FREE_K + "]}"));
        assertEquals("fit.datasets[0].sample", e.path());
        assertTrue(e.getMessage().contains("thin, thick"), e.getMessage());
        assertTrue(e.file() != null && e.line() > 0, "located in the file");
    }

    @Test
    void anUnknownSampleIsNamedWithTheList() {
        InputException e = fails(doc(THIN + "," + THICK, "{\"datasets\": [{\"data\": \"thin.csv\", \"sample\":"
                + " \"thn\"}], \"free\": [" + FREE_K + "]}"));
        assertEquals("fit.datasets[0].sample", e.path());
        assertTrue(e.getMessage().contains("there is no sample 'thn' (did you mean 'thin'?); samples: thin, thick"),
                e.getMessage());
        InputException free = fails(doc(THIN + "," + THICK, "{\"datasets\": [" + DATA + "], \"free\": ["
                + "{\"sample\": \"thik\", \"layer\": \"film\", \"property\": \"k_through_w_mk\"}]}"));
        assertEquals("fit.free[0].sample", free.path());
    }

    @Test
    void aSampleIsRefusedInACaseOfOneStack() {
        InputException e = fails("{\"stack\": " + SampleSeriesTest.stack(2e-8, 5, 1e8) + "," + BEAMS + "," + FDTR
                + ", \"fit\": {\"datasets\": [{\"data\": \"thin.csv\", \"sample\": \"thin\"}], \"free\": [" + FREE_K
                + "]}}");
        assertEquals("fit.datasets[0].sample", e.path());
        assertTrue(e.getMessage().contains("no samples list"), e.getMessage());
    }

    @Test
    void aPathNamingASampleWithoutTheLayerIsAnError() {
        InputException e = fails(doc(THIN + "," + BARE, "{\"datasets\": [{\"data\": \"thin.csv\", \"sample\":"
                + " \"thin\"}, {\"data\": \"bare.csv\", \"sample\": \"bare\"}], \"free\": [{\"sample\": \"bare\","
                + " \"layer\": \"film\", \"property\": \"k_through_w_mk\"}]}"));
        assertEquals("fit.free[0].layer", e.path());
        assertTrue(e.getMessage().contains("sample 'bare' has no layer 'film'; its layers: cap, base"),
                e.getMessage());
    }

    @Test
    void aPathMatchingNoSamplesLayerIsAnError() {
        InputException e = fails(doc(THIN + "," + THICK, "{\"datasets\": [" + DATA + "], \"free\": [{\"layer\":"
                + " \"flim\", \"property\": \"k_through_w_mk\"}]}"));
        assertEquals("fit.free[0]", e.path());
        assertTrue(e.getMessage().contains("no sample has a layer 'flim'; layers by sample: thin: cap, film, base;"
                + " thick: cap, film, base"), e.getMessage());
    }

    @Test
    void aPathNamedForEverySampleAndForOneIsAnError() {
        InputException e = fails(doc(THIN + "," + THICK, "{\"datasets\": [" + DATA + "], \"free\": [" + FREE_K
                + ", {\"sample\": \"thin\", \"layer\": \"film\", \"property\": \"k_through_w_mk\"}]}"));
        assertEquals("fit.free[1]", e.path());
        assertTrue(e.getMessage().contains("samples[thin].film.k_through_w_mk and film.k_through_w_mk"
                + " (fit.free[0]) name the same input"), e.getMessage());
        InputException mixed = fails(doc(THIN + "," + THICK, "{\"datasets\": [" + DATA + "], \"free\": [{\"sample\":"
                + " \"thin\", \"layer\": \"film\", \"property\": \"k_through_w_mk\"}], \"uncertain\": [{\"layer\":"
                + " \"film\", \"property\": \"k_through_w_mk\", \"sigma_relative\": 0.1}]}"));
        assertEquals("fit.uncertain[0]", mixed.path());
        InputException directions = fails(doc(THIN + "," + THICK, "{\"datasets\": [" + DATA + "], \"free\": ["
                + "{\"layer\": \"film\", \"property\": \"k_w_mk\", \"initial\": 3}, {\"sample\": \"thick\","
                + " \"layer\": \"film\", \"property\": \"k_in_plane_w_mk\", \"initial\": 3}]}"));
        assertTrue(directions.getMessage().contains("both move"), directions.getMessage());
    }

    @Test
    void aSharedPathWhoseValuesDifferNeedsAStartOrASample() throws Exception {
        String uncertain = "{\"datasets\": [" + DATA + "], \"free\": [" + FREE_K + "], \"uncertain\": [{\"layer\":"
                + " \"film\", \"property\": \"thickness_m\", \"sigma_relative\": 0.05}]}";
        InputException e = fails(doc(THIN + "," + THICK, uncertain));
        assertEquals("fit.uncertain[0]", e.path());
        assertTrue(e.getMessage().contains("differs between them (thin: 2.0E-8, thick: 1.8E-7)"), e.getMessage());
        FitOutcome o = fits(doc(THIN + "," + THICK, "{\"datasets\": [" + DATA + "], \"free\": [" + FREE_K
                + "], \"uncertain\": [{\"sample\": \"thin\", \"layer\": \"film\", \"property\": \"thickness_m\","
                + " \"sigma_relative\": 0.05}, {\"sample\": \"thick\", \"layer\": \"film\", \"property\":"
                + " \"thickness_m\", \"sigma_relative\": 0.05}]}"));
        assertEquals("samples[thin].film.thickness_m", o.budget().get(1).label());
        assertEquals("samples[thick].film.thickness_m", o.budget().get(2).label());
        assertTrue(o.budget().get(1).contributions()[0] > 0 && o.budget().get(2).contributions()[0] > 0,
                "both thicknesses reach the film's Λ");
    }

    @Test
    void aSharedLayerReachesOnlyTheSamplesThatHaveIt() throws Exception {
        FitOutcome o = fits(doc(THIN + "," + BARE, "{\"datasets\": [{\"data\": \"thin.csv\", \"sample\": \"thin\"},"
                + " {\"data\": \"bare.csv\", \"sample\": \"bare\"}], \"free\": [" + FREE_K + ", {\"layer\": \"cap\","
                + " \"property\": \"conductance_below_w_m2k\", \"initial\": 1e8}]}"));
        assertEquals(5.0, o.parameters().get(0).value(), 0.5);
        assertEquals(2e8, o.parameters().get(1).value(), 2e7);
        InputException e = fails(doc(THIN + "," + BARE, "{\"datasets\": [{\"data\": \"bare.csv\", \"sample\":"
                + " \"bare\"}], \"free\": [" + FREE_K + "]}"));
        assertEquals("fit.free[0]", e.path());
        assertTrue(e.getMessage().contains("reaches no dataset"), e.getMessage());
    }

    @Test
    void gainsAreNamedDeclaredAndUsed() {
        InputException unknown = fails(doc(THIN, "{\"gains\": {\"detector\": 1.0}, \"datasets\": [{\"data\":"
                + " \"thin.csv\", \"signal\": \"amplitude_k_per_w\", \"gain\": \"detectr\"}], \"free\": [" + FREE_K
                + "]}"));
        assertEquals("fit.datasets[0].gain", unknown.path());
        assertTrue(unknown.getMessage().contains("gains: detector"), unknown.getMessage());
        InputException unused = fails(doc(THIN, "{\"gains\": {\"detector\": 1.0}, \"datasets\": [{\"data\":"
                + " \"thin.csv\"}], \"free\": [" + FREE_K + "]}"));
        assertEquals("fit.gains.detector", unused.path());
        InputException phase = fails(doc(THIN, "{\"gains\": {\"detector\": 1.0}, \"datasets\": [{\"data\":"
                + " \"thin.csv\", \"gain\": \"detector\"}], \"free\": [" + FREE_K + "]}"));
        assertEquals("fit.datasets[0].gain", phase.path());
        assertTrue(phase.getMessage().contains("phase_deg carries none"), phase.getMessage());
        InputException negative = fails(doc(THIN, "{\"gains\": {\"detector\": -2}, \"datasets\": [{\"data\":"
                + " \"thin.csv\", \"gain\": \"detector\"}], \"free\": [" + FREE_K + "]}"));
        assertEquals("fit.gains.detector", negative.path());
        InputException withSample = fails(doc(THIN, "{\"gains\": {\"detector\": 1}, \"datasets\": [{\"data\":"
                + " \"thin.csv\", \"signal\": \"amplitude_k_per_w\", \"gain\": \"detector\"}], \"free\": [{\"gain\":"
                + " \"detector\", \"sample\": \"thin\"}]}"));
        assertEquals("fit.free[0].sample", withSample.path());
    }

    @Test
    void aPlanAndAMapRefuseSeveralSamples() throws Exception {
        InputException e = assertThrows(InputException.class, () -> Synthetic.fitter().plan(Synthetic.read(dir,
                doc(THIN + "," + THICK, "{\"datasets\": [" + DATA + "], \"free\": [" + FREE_K + "]}")), 1,
                Progress.NONE));
        assertEquals("samples", e.path());
        assertTrue(e.getMessage().contains("a plan works on one sample at a time, and this case has 2: thin, thick"),
                e.getMessage());
    }
}
