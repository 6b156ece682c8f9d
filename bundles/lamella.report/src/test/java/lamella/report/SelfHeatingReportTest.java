package lamella.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import lamella.api.CaseDocument;
import lamella.api.SelfHeating;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The report of a fit under self-heating: the model in words, the rise and the temperature of every library value at
 * the best fit, on the page and in result.json. The state is invented for the page (a 12.5 K rise), not computed.
 */
class SelfHeatingReportTest {

    @TempDir
    Path dir;

    @Test
    void theReportShowsTheRiseAndTheTemperaturesOfTheLibraryValues() throws Exception {
        CaseDocument doc = SyntheticFit.caseDocument();
        FitOutcome plain = SyntheticFit.outcome();
        SelfHeating.Outcome heated = new SelfHeating.Outcome(2.5e-3, 12.5, 6, doc.stack(),
                List.of(new SelfHeating.ShiftedValue("substrate", "k_through_w_mk", 312.5, 148, 139.9)),
                List.of("layer 'substrate': an invented warning"));
        List<DatasetFit> datasets = new ArrayList<>();
        for (DatasetFit d : plain.datasets()) {
            datasets.add(new DatasetFit(d.index(), d.source(), d.technique(), d.signal(), d.xColumn(), d.x(),
                    d.data(), d.sigma(), d.model(), d.sigmaFromData(), d.reducedChiSquare(),
                    d.index() == 0 ? Optional.of(heated) : Optional.empty()));
        }
        FitOutcome o = new FitOutcome(plain.parameters(), plain.correlation(), datasets, plain.budget(),
                plain.monteCarlo(), plain.warnings(), plain.evaluations(), plain.reducedChiSquare(), plain.converged());
        Path page = new FitReportWriter("0.1.0.test", Clock.fixed(Instant.parse("2026-01-02T03:04:05Z"),
                ZoneOffset.UTC)).write(doc, o, SyntheticFit.sensitivities(), dir.resolve("r"));
        String html = Files.readString(page, StandardCharsets.UTF_8);
        assertTrue(html.contains("Self-heating at the best fit"), html);
        assertTrue(html.contains("Self-heating: 2.5 mW absorbed raise the heated plane by 12.5 K in steady state"),
                html);
        assertTrue(html.contains("312.5") && html.contains("139.9"), "the temperature and the value used");
        assertTrue(html.contains("an invented warning"));
        JsonNode json = new ObjectMapper().readTree(dir.resolve("r").resolve("result.json").toFile());
        JsonNode s = json.at("/fit/datasets/0/self_heating");
        assertEquals(2.5e-3, s.path("absorbed_power_w").asDouble());
        assertEquals(12.5, s.path("steady_rise_k").asDouble());
        assertEquals(6, s.path("evaluations").asInt());
        assertEquals(312.5, s.at("/values/0/temperature_k").asDouble());
        assertEquals(148, s.at("/values/0/value_as_read").asDouble());
        assertEquals(139.9, s.at("/values/0/value_used").asDouble());
        assertEquals("W/(m K)", s.at("/values/0/unit").asText());
        assertTrue(json.at("/fit/datasets/1/self_heating").isMissingNode(), "the other dataset has none");
    }
}
