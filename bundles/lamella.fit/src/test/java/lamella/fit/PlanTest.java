package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PredictedSigma;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PlanTest {

    static final String BEAMS = "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 6e-6, \"probe_radius_m\": 4e-6}";
    static final String FREE = "\"free\": [{\"layer\": \"film\", \"property\": \"k_through_w_mk\"},"
            + " {\"layer\": \"cap\", \"property\": \"conductance_below_w_m2k\"}]";
    static final String UNCERTAIN = "\"uncertain\": [{\"layer\": \"cap\", \"property\": \"thickness_m\","
            + " \"sigma_relative\": 0.03}, {\"geometry\": \"pump_radius_m\", \"sigma_relative\": 0.04}]";

    @TempDir
    Path dir;

    private CaseDocument fdtrPlan(String plan) throws Exception {
        return Synthetic.read(dir, "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + "," + BEAMS + ","
                + "\"measurement\": {\"type\": \"fdtr\", \"frequencies_hz\": " + list(Synthetic.logSpaced(1e4, 2e7, 30))
                + "}, \"fit\": {" + FREE + "," + UNCERTAIN + "}, \"plan\": " + plan + "}");
    }

    private static String list(double[] v) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < v.length; i++) {
            sb.append(i == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.6e", v[i]));
        }
        return sb.append(']').toString();
    }

    private static PlanOutcome plan(CaseDocument doc) throws InputException {
        return Synthetic.fitter().plan(doc, 2, Progress.NONE);
    }

    /**
     * The plan's σ of the case as written is the fit's own linearised σ and budget (Yang, Ziade & Schmidt, Rev. Sci.
     * Instrum. 87, 014901, 2016) for noise-free data at the case's values with the plan's noise as their σ column:
     * the same propagation, the plan by forward and the fit by central differences, so to 1 %.
     */
    @Test
    void theCaseAsWrittenPredictsWhatItsFitReports() throws Exception {
        double[] f = Synthetic.logSpaced(1e4, 2e7, 30);
        String blocks = Synthetic.STACK.formatted(1.2e8, 1.4) + "," + BEAMS + ", \"measurement\": {\"type\": \"fdtr\"}";
        double[] clean = Synthetic.model(dir, "{" + blocks + "}", f, "phase_deg");
        StringBuilder csv = new StringBuilder("frequency_hz,phase_deg,sigma_phase_deg\n");
        for (int i = 0; i < f.length; i++) {
            csv.append(String.format(Locale.ROOT, "%.12e,%.12e,0.2%n", f[i], clean[i]));
        }
        Files.writeString(dir.resolve("fdtr.csv"), csv);
        CaseDocument doc = Synthetic.read(dir, "{" + blocks + ", \"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}],"
                + FREE + "," + UNCERTAIN + "}, \"plan\": {\"vary\": [{\"geometry\": \"pump_radius_m\", \"values\":"
                + " [6e-6, 1e-5]}], \"noise\": {\"phase_deg\": 0.2}}}");
        FitOutcome fit = Synthetic.fitter().fit(doc, FitSettings.defaults(), Progress.NONE);
        PlannedResult baseline = plan(doc).baseline();
        assertEquals(PlannedResult.Status.BASELINE, baseline.status());
        for (int a = 0; a < 2; a++) {
            PredictedSigma s = baseline.predicted().get(a);
            assertEquals(fit.parameters().get(a).ref(), s.ref());
            assertEquals(fit.parameters().get(a).sigma(), s.sigma(), 0.01 * s.sigma(), s.label());
            assertEquals(fit.parameters().get(a).sigmaNoise(), s.sigmaNoise(), 0.01 * s.sigmaNoise(), s.label());
            for (int k = 0; k < fit.budget().size(); k++) {
                BudgetLine fl = fit.budget().get(k);
                BudgetLine pl = baseline.budget().get(k);
                assertEquals(fl.label(), pl.label());
                assertEquals(fl.contributions()[a], pl.contributions()[a], 0.01 * s.sigma(), fl.label());
            }
        }
        PlannedResult same = plan(doc).plans().stream().filter(p -> p.values().get(0).equals(6e-6)).findFirst()
                .orElseThrow();
        assertEquals(baseline.objective(), same.objective(), 1e-12, "the plan at the case's own radius");
    }

    /** σ of a linear least-squares estimate is proportional to the noise (common practice, no source). */
    @Test
    void theNoiseOnlySigmaScalesWithTheNoise() throws Exception {
        String vary = "\"vary\": [{\"geometry\": \"pump_radius_m\", \"min\": 3e-6, \"max\": 2e-5, \"steps\": 3}]";
        PlanOutcome low = plan(fdtrPlan("{" + vary + ", \"noise\": {\"phase_deg\": 0.1}}"));
        PlanOutcome high = plan(fdtrPlan("{" + vary + ", \"noise\": {\"phase_deg\": 0.4}}"));
        assertEquals(3, low.plans().size());
        for (PlannedResult a : low.plans()) {
            PlannedResult b = high.plans().stream().filter(p -> p.values().equals(a.values())).findFirst()
                    .orElseThrow();
            for (int t = 0; t < 2; t++) {
                double ratio = b.predicted().get(t).sigmaNoise() / a.predicted().get(t).sigmaNoise();
                assertEquals(4.0, ratio, 1e-9, a.values() + " " + a.predicted().get(t).label());
            }
        }
        List<Double> radii = low.plans().stream().map(p -> (Double) p.values().get(0)).sorted().toList();
        double[] expected = {3e-6, 3e-6 * Math.sqrt(2e-5 / 3e-6), 2e-5};
        for (int i = 0; i < 3; i++) {
            assertEquals(expected[i], radii.get(i), 1e-12 * expected[i], "radii spread evenly in ln by default");
        }
    }

    /**
     * Measuring more never tells less: the noise covariance (JᵀJ)⁻¹ of stacked rows is at most that of either part
     * (common practice, no source), so two modulation frequencies fitted together give a noise σ no larger than
     * either alone.
     */
    @Test
    void twoFrequenciesTogetherSeeAtLeastAsMuchAsEither() throws Exception {
        CaseDocument doc = Synthetic.read(dir, "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + "," + BEAMS + ","
                + "\"measurement\": {\"type\": \"tdtr\", \"modulation_hz\": 9.8e6, \"repetition_hz\": 7.6e7,"
                + " \"delays_s\": " + list(Synthetic.logSpaced(1e-10, 4e-9, 12)) + "},"
                + "\"fit\": {" + FREE + "," + UNCERTAIN + "}, \"plan\": {\"vary\": [{\"measurement\":"
                + " \"modulation_hz\", \"values\": [1e6, 3e6, 1e7], \"choose\": [1, 2]}]}}");
        PlanOutcome o = plan(doc);
        assertEquals(6, o.plans().size(), "3 singles and 3 pairs");
        for (PlannedResult joint : o.plans()) {
            if (!(joint.values().get(0) instanceof List<?> pair)) {
                continue;
            }
            assertEquals(2, joint.measurements());
            for (Object single : pair) {
                PlannedResult alone = o.plans().stream().filter(p -> p.values().get(0).equals(single)).findFirst()
                        .orElseThrow();
                for (int t = 0; t < 2; t++) {
                    assertTrue(joint.predicted().get(t).sigmaNoise()
                            <= alone.predicted().get(t).sigmaNoise() * (1 + 1e-9), joint.values() + " vs " + single);
                }
            }
        }
        for (int i = 1; i < o.plans().size(); i++) {
            assertTrue(o.plans().get(i - 1).objective() <= o.plans().get(i).objective(), "ranked best first");
            assertEquals(i + 1, o.plans().get(i).rank());
        }
        assertTrue(o.baseline().reason().isEmpty());
    }

    /**
     * The steady rise is Lax's (J. Appl. Phys. 48, 3919, 1977) for Gaussian heating of a half-space read by a
     * Gaussian probe, ΔT = P/(√(2π) Λ √(w₀² + w₁²)); a plan above the rise limit is kept, marked and not ranked.
     */
    @Test
    void theSteadyRiseIsLaxsAndItsLimitIsKept() throws Exception {
        CaseDocument doc = Synthetic.read(dir, """
                {"stack": {"layers": [{"name": "glass", "k_through_w_mk": 1.4, "heat_capacity_j_m3k": 1.6e6}]},
                 "geometry": {"type": "gaussian", "pump_radius_m": 6e-6, "probe_radius_m": 3e-6},
                 "measurement": {"type": "fdtr", "frequencies_hz": [1e3, 1e4, 1e5, 1e6, 1e7]},
                 "fit": {"free": [{"layer": "glass", "property": "k_w_mk"}]},
                 "plan": {"vary": [{"geometry": "pump_radius_m", "values": [2e-6, 2e-5]}],
                          "limits": {"absorbed_power_w": 0.005, "max_rise_k": 100}}}""");
        PlanOutcome o = plan(doc);
        for (PlannedResult p : o.plans()) {
            double w0 = (Double) p.values().get(0);
            double lax = 1 / (Math.sqrt(2 * Math.PI) * 1.4 * Math.sqrt(w0 * w0 + 9e-12));
            assertEquals(lax, p.risePerWatt(), 1e-6 * lax, "w0 = " + w0);
            assertEquals(0.005 * lax, p.rise(), 1e-6 * lax);
        }
        PlannedResult small = o.plans().stream().filter(p -> p.values().get(0).equals(2e-6)).findFirst().orElseThrow();
        PlannedResult large = o.plans().stream().filter(p -> p.values().get(0).equals(2e-5)).findFirst().orElseThrow();
        assertEquals(PlannedResult.Status.BEYOND_LIMIT, small.status(), "about 400 K at 5 mW on a 2 µm spot");
        assertTrue(small.reason().contains("exceeds 100 K"), small.reason());
        assertEquals(PlannedResult.Status.RANKED, large.status());
        assertEquals(large, o.best());
        assertEquals(1, small.predicted().size(), "a plan beyond a limit still shows what it would give");
    }

    /** A combination the technique refuses (modulation above half the repetition rate) is reported, not dropped. */
    @Test
    void plansTheModelCannotTakeAreReported() throws Exception {
        CaseDocument doc = Synthetic.read(dir, "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + "," + BEAMS + ","
                + "\"measurement\": {\"type\": \"tdtr\", \"modulation_hz\": 1e6, \"repetition_hz\": 7.6e7,"
                + " \"delays_s\": " + list(Synthetic.logSpaced(1e-10, 4e-9, 8)) + "},"
                + "\"fit\": {" + FREE + "}, \"plan\": {\"vary\": ["
                + "{\"measurement\": \"modulation_hz\", \"values\": [1e6, 9e6]},"
                + "{\"measurement\": \"repetition_hz\", \"values\": [7.6e7, 1.2e7]}]}}");
        PlanOutcome o = plan(doc);
        assertEquals(4, o.plans().size());
        assertEquals(1, o.count(PlannedResult.Status.NOT_EVALUABLE));
        PlannedResult bad = o.plans().get(3);
        assertEquals(List.of(9e6, 1.2e7), bad.values());
        assertTrue(bad.reason().contains("must be below"), bad.reason());
        assertTrue(o.warnings().stream().anyMatch(w -> w.contains("1 of 4 plans cannot be evaluated")), o.warnings()
                .toString());
    }

    private InputException refused(String plan) throws Exception {
        CaseDocument doc = fdtrPlan(plan);
        return assertThrows(InputException.class, () -> plan(doc));
    }

    @Test
    void badPlansAreRefusedAtTheirJsonPath() throws Exception {
        assertEquals("plan.vary[0].valeus", refused("{\"vary\": [{\"geometry\": \"pump_radius_m\", \"valeus\": [1e-5]}]}")
                .path());
        InputException key = refused("{\"vary\": [{\"geometry\": \"pump_radus_m\", \"values\": [1e-5]}]}");
        assertEquals("plan.vary[0].geometry", key.path());
        assertTrue(key.getMessage().contains("did you mean 'pump_radius_m'"), key.getMessage());
        InputException thin = refused("{\"vary\": [{\"layer\": \"film\", \"property\": \"thickness_m\","
                + " \"values\": [3e-7, -1e-8]}]}");
        assertEquals("plan.vary[0].values[1]", thin.path());
        InputException spot = refused("{\"vary\": [{\"geometry\": \"probe_radius_m\", \"min\": 2e-7, \"max\": 1e-5,"
                + " \"steps\": 5}]}");
        assertEquals("plan.vary[0].min", spot.path());
        assertTrue(spot.getMessage().contains("smallest beam radius"), spot.getMessage());
        InputException target = refused("{\"targets\": [{\"layer\": \"film\", \"property\": \"heat_capacity_j_m3k\"}],"
                + " \"vary\": [{\"geometry\": \"pump_radius_m\", \"values\": [1e-5]}]}");
        assertEquals("plan.targets[0]", target.path());
        assertTrue(target.getMessage().contains("not a free input"), target.getMessage());
        assertEquals("plan.vary", refused("{}").path());
        assertEquals("plan.vary", refused("{\"vary\": []}").path());
        assertEquals("plan.noise.phase", refused("{\"vary\": [{\"geometry\": \"pump_radius_m\", \"values\": [1e-5]}],"
                + " \"noise\": {\"phase\": 0.2}}").path());
        assertEquals("plan.vary[0].choose", refused("{\"vary\": [{\"layer\": \"film\", \"property\": \"thickness_m\","
                + " \"values\": [1e-7, 2e-7], \"choose\": 2}]}").path());
        InputException list = refused("{\"vary\": [{\"measurement\": \"frequencies_hz\", \"values\": [1e7, 5e7]}]}");
        assertEquals("plan.vary[0]", list.path());
        assertTrue(list.getMessage().contains("\"end\": \"first\" or \"last\""), list.getMessage());
        CaseDocument none = Synthetic.read(dir, "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + "," + BEAMS + ","
                + "\"measurement\": {\"type\": \"fdtr\", \"frequencies_hz\": [1e4, 1e5, 1e6]}, \"fit\": {" + FREE + "}}");
        assertEquals("plan", assertThrows(InputException.class, () -> plan(none)).path());
    }

    /** Moving the last frequency of a sweep keeps its points evenly spread in ln between the ends. */
    @Test
    void theEndOfASweepMovesAndItsPointsFollow() throws Exception {
        PlanOutcome o = plan(fdtrPlan("{\"vary\": [{\"measurement\": \"frequencies_hz\", \"end\": \"last\","
                + " \"values\": [1e6, 5e7]}]}"));
        assertEquals(List.of("measurement.frequencies_hz[last]"), o.varied());
        assertEquals(2, o.count(PlannedResult.Status.RANKED));
        CaseDocument doc = fdtrPlan("{\"vary\": [{\"geometry\": \"pump_radius_m\", \"values\": [1e-5]}]}");
        lamella.api.CaseModel m = new lamella.api.CaseModel(doc.stack(), doc.geometry(), doc.measurement());
        lamella.api.CaseModel moved = Designs.apply(m, lamella.api.ParameterRef.measurement("frequencies_hz"), "last",
                1e6);
        List<?> f = (List<?>) moved.measurement().get("frequencies_hz");
        assertEquals(30, f.size());
        List<?> old = (List<?>) doc.measurement().get("frequencies_hz");
        double first = (Double) old.get(0);
        double span = Math.log((Double) old.get(29) / first);
        for (int i = 0; i < 30; i++) {
            double expected = first * Math.pow(1e6 / first, Math.log((Double) old.get(i) / first) / span);
            assertEquals(expected, (Double) f.get(i), 1e-9 * expected, "point " + i);
        }
    }

    /**
     * A plan's settings are its values as the case holds them: a number in place, a moved end as the whole list
     * (the list as Designs.apply moves it, checked above); values measured together cannot go into one case and are
     * refused at their plan entry. Common practice, no source.
     */
    @Test
    void aPlansSettingsAreItsValuesInTheCase() throws Exception {
        CaseDocument doc = fdtrPlan("{\"vary\": [{\"geometry\": \"pump_radius_m\", \"values\": [3e-6, 1.5e-5]},"
                + " {\"measurement\": \"frequencies_hz\", \"end\": \"last\", \"values\": [1e6, 5e7]}]}");
        PlanOutcome o = plan(doc);
        assertTrue(Synthetic.fitter().settings(doc, o.baseline()).isEmpty(), "the case as written changes nothing");
        List<?> sweep = (List<?>) doc.measurement().get("frequencies_hz");
        assertEquals(List.of(6e-6, sweep.get(sweep.size() - 1)), o.baseline().values(), "the case's own values");
        for (PlannedResult p : o.plans()) {
            List<lamella.api.plan.PlanSetting> s = Synthetic.fitter().settings(doc, p);
            assertEquals(2, s.size());
            assertEquals(lamella.api.ParameterRef.geometry("pump_radius_m"), s.get(0).ref());
            assertEquals(p.values().get(0), s.get(0).value());
            List<?> f = (List<?>) s.get(1).value();
            assertEquals(30, f.size());
            assertEquals(p.values().get(1), f.get(29));
            assertEquals(doc.measurement().get("frequencies_hz") instanceof List<?> l ? l.get(0) : null, f.get(0));
        }
        CaseDocument pairs = fdtrPlan("{\"vary\": [{\"geometry\": \"pump_radius_m\", \"values\": [3e-6, 1e-5,"
                + " 1.5e-5], \"choose\": [2]}]}");
        InputException joint = assertThrows(InputException.class,
                () -> Synthetic.fitter().settings(pairs, plan(pairs).plans().get(0)));
        assertEquals("plan.vary[0]", joint.path());
    }

    /**
     * A plan's sensitivity curves are those of the case with the plan's values written in (the same central
     * differences as lamella sensitivity, so equal to rounding; common practice, no source), one table per
     * measurement of a joint plan.
     */
    @Test
    void aPlansSensitivitiesAreThoseOfTheCaseAtItsValues() throws Exception {
        CaseDocument doc = fdtrPlan("{\"vary\": [{\"geometry\": \"pump_radius_m\", \"values\": [3e-6, 1.5e-5]}]}");
        PlanOutcome o = plan(doc);
        for (PlannedResult p : List.of(o.baseline(), o.plans().get(0), o.plans().get(1))) {
            double radius = (Double) p.values().get(0);
            CaseDocument at = Synthetic.read(dir, "{" + Synthetic.STACK.formatted(1.2e8, 1.4) + ","
                    + BEAMS.replace("6e-6", String.valueOf(radius)) + ", \"measurement\": {\"type\": \"fdtr\","
                    + " \"frequencies_hz\": " + list(Synthetic.logSpaced(1e4, 2e7, 30)) + "}}");
            lamella.api.fit.SensitivityTable expected = Synthetic.fitter().sensitivity(at, -1, null);
            List<lamella.api.plan.PlannedSensitivity> got = Synthetic.fitter().sensitivity(doc, p);
            assertEquals(1, got.size());
            assertEquals("dataset 0", got.get(0).measurement());
            lamella.api.fit.SensitivityTable t = got.get(0).table();
            assertEquals(expected.signal(), t.signal());
            for (int j = 0; j < expected.parameters().size(); j++) {
                int k = t.parameters().indexOf(expected.parameters().get(j));
                assertTrue(k >= 0, expected.label(j));
                for (int i = 0; i < t.x().length; i++) {
                    assertEquals(expected.values()[j][i], t.values()[k][i], 1e-9, expected.label(j) + " at " + i);
                }
            }
        }
        CaseDocument pairs = fdtrPlan("{\"vary\": [{\"geometry\": \"pump_radius_m\", \"values\": [3e-6, 1.5e-5],"
                + " \"choose\": [2]}]}");
        List<lamella.api.plan.PlannedSensitivity> two = Synthetic.fitter().sensitivity(pairs, plan(pairs).plans().get(0));
        assertEquals(2, two.size());
        assertEquals("dataset 0, measurement at geometry.pump_radius_m = 3.000e-06",
                two.get(0).measurement());
    }
}
