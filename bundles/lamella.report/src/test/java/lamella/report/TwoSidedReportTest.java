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
import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.CaseDocument;
import lamella.api.Layer;
import lamella.api.Stack;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The report of a stack heated inside: the model in words, the layers above, and the same in result.json. */
class TwoSidedReportTest {

    @TempDir
    Path dir;

    @Test
    void theReportSaysWhereTheHeatGoesAndListsTheLayersAbove() throws Exception {
        CaseDocument one = SyntheticFit.caseDocument();
        Stack stack = new Stack(one.stack().layers(), BottomBoundary.SEMI_INFINITE,
                List.of(Layer.isotropic("window", 1e-3, 1.36, 1.63e6).withConductanceBelow(1.5e8)),
                BottomBoundary.ISOTHERMAL);
        CaseDocument doc = new CaseDocument(one.file(), stack, one.geometry(), one.measurement(), one.root(),
                one.lines());
        Path page = new FitReportWriter("0.1.0.test", Clock.fixed(Instant.parse("2026-01-02T03:04:05Z"),
                ZoneOffset.UTC)).write(doc, SyntheticFit.outcome(), SyntheticFit.sensitivities(), dir.resolve("r"));
        String html = Files.readString(page, StandardCharsets.UTF_8);
        assertTrue(html.contains("Heated and read inside the stack, at the top of layer &#39;transducer&#39;")
                || html.contains("Heated and read inside the stack, at the top of layer 'transducer'"), html);
        assertTrue(html.contains("Layers above the heated plane, from it up"));
        assertTrue(html.contains("Above the outermost layer above: isothermal."));
        JsonNode json = new ObjectMapper().readTree(dir.resolve("r").resolve("result.json").toFile());
        assertEquals("window", json.at("/case/stack/above/0/name").asText());
        assertEquals(1.5e8, json.at("/case/stack/above/0/conductance_below_w_m2k").asDouble());
        assertEquals("isothermal", json.at("/case/stack/top").asText());
        assertEquals(stack.heatFlowInWords(), json.at("/case/stack/model").asText());
    }

    @Test
    void aStackHeatedAtItsSurfaceIsDescribedSo() {
        assertEquals("Heated and read at the surface (the top of layer 'transducer'); heat flows down through 3"
                + " layers to a semi-infinite bottom; none leaves through the surface.",
                SyntheticFit.caseDocument().stack().heatFlowInWords());
    }

    @Test
    void theReportRecordsTheOpticalDepths() throws Exception {
        CaseDocument one = SyntheticFit.caseDocument();
        Stack stack = one.stack().withOptics(new lamella.api.OpticalDepths(1.5e-8, 4e-8, false));
        CaseDocument doc = new CaseDocument(one.file(), stack, one.geometry(), one.measurement(), one.root(),
                one.lines());
        Path page = new FitReportWriter("0.1.0.test", Clock.fixed(Instant.parse("2026-01-02T03:04:05Z"),
                ZoneOffset.UTC)).write(doc, SyntheticFit.outcome(), SyntheticFit.sensitivities(), dir.resolve("r"));
        String html = Files.readString(page, StandardCharsets.UTF_8);
        assertTrue(html.contains("δₛ = 4E-8 m (sensing depth)"), "the page says how deep the probe reads");
        JsonNode json = new ObjectMapper().readTree(dir.resolve("r").resolve("result.json").toFile());
        assertEquals(1.5e-8, json.at("/case/stack/absorption_depth_m").asDouble());
        assertEquals(4e-8, json.at("/case/stack/sensing_depth_m").asDouble());
        assertEquals(false, json.at("/case/stack/sensing_follows_absorption").asBoolean());
    }
}
