package lamella.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.ParameterRef;
import lamella.api.fit.Progress;
import lamella.api.fit.SensitivityTable;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlanService;
import lamella.api.plan.PlanSetting;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PlannedSensitivity;
import lamella.api.plan.PredictedSigma;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.xml.sax.InputSource;

/**
 * The report's plan section for a case with a plan block, from a stand-in plan service whose plans are invented
 * (the σ of each is a made-up function of its two values: these check the section, not the physics).
 */
class PlanSectionTest {

    private static final double[] F = {1e6, 2e6, 4e6, 8e6, 1.6e7};
    private static final double[] R = {3e-6, 6e-6, 1.2e-5, 2.4e-5};

    @TempDir
    Path dir;

    static PlanOutcome outcome() {
        List<PlannedResult> plans = new ArrayList<>();
        ParameterRef k = ParameterRef.layer("film", "k_through_w_mk");
        for (double f : F) {
            for (double r : R) {
                double a = Math.log(f / 4e6);
                double b = Math.log(r / 6e-6);
                double rel = 0.02 * (1 + a * a + b * b);
                plans.add(new PlannedResult(0, List.of(f, r), PlannedResult.Status.RANKED, "", rel,
                        List.of(new PredictedSigma(k, "through-plane Λz", 1.3, rel * 1.3, rel, rel, true)), List.of(),
                        100, 1.0, 1));
            }
        }
        plans.sort((x, y) -> Double.compare(x.objective(), y.objective()));
        List<PlannedResult> ranked = new ArrayList<>();
        for (int i = 0; i < plans.size(); i++) {
            ranked.add(plans.get(i).ranked(i + 1));
        }
        PlannedResult baseline = new PlannedResult(0, List.of(9.8e6, 1e-5), PlannedResult.Status.BASELINE, "", 0.05,
                List.of(new PredictedSigma(k, "through-plane Λz", 1.3, 0.065, 0.05, 0.05, true)), List.of(), 100,
                1.0, 1);
        return new PlanOutcome("the largest relative σ of the targets", List.of("film.k_through_w_mk"),
                List.of("measurement.modulation_hz", "geometry.pump_radius_m"), List.of("ratio: 1 % of its value"),
                List.of("steady rise at most 10 K at 0.01 W absorbed"), baseline, ranked, List.of());
    }

    /** A plan service that answers with {@link #outcome()}, or refuses the plan block. */
    record StandIn(InputException refusal) implements PlanService {

        @Override
        public PlanOutcome plan(CaseDocument doc, int threads, Progress progress) throws InputException {
            if (refusal != null) {
                throw refusal;
            }
            return outcome();
        }

        @Override
        public List<PlanSetting> settings(CaseDocument doc, PlannedResult plan) {
            return List.of();
        }

        @Override
        public List<PlannedSensitivity> sensitivity(CaseDocument doc, PlannedResult plan) {
            double[] x = {1e-10, 1e-9, 4e-9};
            return List.of(new PlannedSensitivity("dataset 0", new SensitivityTable("delay_s", x, "ratio", false,
                    List.of(ParameterRef.layer("film", "k_through_w_mk")), List.of("through-plane Λz"),
                    new double[][] {{-0.3, -0.5, -0.6}})));
        }
    }

    private static CaseDocument withPlan(CaseDocument d) {
        Map<String, Object> root = new LinkedHashMap<>(d.root().values());
        root.put("plan", new Block("plan", Map.of("vary", List.of())));
        return new CaseDocument(d.file(), d.stack(), d.geometry(), d.measurement(), new Block("", root), Map.of());
    }

    private static FitReportWriter writer(PlanService planner) {
        return new FitReportWriter("0.1.0.test", Clock.fixed(Instant.parse("2026-01-02T03:04:05Z"), ZoneOffset.UTC),
                planner);
    }

    @Test
    void aCaseWithAPlanBlockGetsTheBestPlansTheMapAndTheCurves() throws Exception {
        FitReportWriter w = writer(new StandIn(null));
        Path page = w.write(withPlan(SyntheticFit.caseDocument()), SyntheticFit.outcome(), SyntheticFit.sensitivities(),
                dir.resolve("report"));
        String html = Files.readString(page);
        assertTrue(html.contains("<h2>Experiment plan</h2>"), "the plan section");
        Matcher rows = Pattern.compile("<tr><th scope=\"row\">(\\d+|as written)</th><td>([^<]*)</td>"
                + "<td>([^<]*)</td>").matcher(html.substring(html.indexOf("<h2>Experiment plan</h2>")));
        List<String> listed = new ArrayList<>();
        while (rows.find()) {
            listed.add(rows.group(1) + " " + rows.group(2) + " " + rows.group(3));
        }
        PlanOutcome o = outcome();
        assertEquals(PlanSection.LISTED + 1, listed.size(), listed.toString());
        for (int i = 0; i < PlanSection.LISTED; i++) {
            PlannedResult p = o.plans().get(i);
            assertEquals((i + 1) + " " + Numbers.plain((Double) p.values().get(0)) + " "
                    + Numbers.plain((Double) p.values().get(1)), listed.get(i), "the best plans in their order");
        }
        assertEquals("as written " + Numbers.plain(9.8e6) + " " + Numbers.plain(1e-5), listed.get(PlanSection.LISTED));
        for (String f : List.of("plan-objective.png", "plan-objective.svg", "plan-sensitivity.png",
                "plan-sensitivity.svg")) {
            assertTrue(Files.isRegularFile(page.resolveSibling(f)), f);
            assertTrue(w.writes(f), f);
            assertTrue(html.contains("href=\"" + f + "\""), "linked: " + f);
        }
        DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(new InputSource(new StringReader(
                Files.readString(page.resolveSibling("plan-objective.svg")))));
    }

    @Test
    void aPlanBlockThatCannotBeEvaluatedIsSaidAndTheReportIsWritten() throws Exception {
        Path page = writer(new StandIn(InputException.at("plan.vary", "a plan without vary"))).write(
                withPlan(SyntheticFit.caseDocument()), SyntheticFit.outcome(), SyntheticFit.sensitivities(),
                dir.resolve("report"));
        String html = Files.readString(page);
        assertTrue(html.contains("The plan block cannot be evaluated: plan.vary: a plan without vary"), html);
        assertFalse(Files.exists(page.resolveSibling("plan-objective.png")));
        assertTrue(html.contains("<h2>Fitted parameters</h2>"));
    }

    @Test
    void aCaseWithoutAPlanBlockHasNoPlanSection() throws Exception {
        Path page = writer(new StandIn(null)).write(SyntheticFit.caseDocument(), SyntheticFit.outcome(),
                SyntheticFit.sensitivities(), dir.resolve("report"));
        assertFalse(Files.readString(page).contains("Experiment plan"));
        assertFalse(Files.exists(page.resolveSibling("plan-objective.png")));
    }
}
