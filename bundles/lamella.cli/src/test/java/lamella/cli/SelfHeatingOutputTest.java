package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import lamella.api.BottomBoundary;
import lamella.api.CaseDocument;
import lamella.api.Layer;
import lamella.api.ParameterRef;
import lamella.api.SelfHeating;
import lamella.api.Stack;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import org.junit.jupiter.api.Test;

/**
 * The fit's table and result file show the self-heating state at the best fit. The outcome is invented (a 21.25 K
 * rise, no physics behind its numbers); only what is shown is checked.
 */
class SelfHeatingOutputTest {

    private static FitOutcome outcome() {
        Stack stack = new Stack(List.of(Layer.isotropic("bulk", Double.POSITIVE_INFINITY, 1.46, 1.6e6)),
                BottomBoundary.SEMI_INFINITE);
        SelfHeating.Outcome h = new SelfHeating.Outcome(5e-4, 21.25, 5, stack,
                List.of(new SelfHeating.ShiftedValue("bulk", "k_through_w_mk", 321.25, 1.4, 1.4595)), List.of());
        DatasetFit d = new DatasetFit(0, "fdtr.csv", "fdtr", "phase_deg", "frequency_hz", new double[] {1e4, 1e5},
                new double[] {-10, -20}, new double[] {0.1, 0.1}, new double[] {-10, -20}, true, 1.0, Optional.of(h));
        return new FitOutcome(List.of(new FittedParameter(ParameterRef.layer("bulk", "heat_capacity_j_m3k"), "",
                1e6, 1.6e6, 1e4, 1e4, false, true)), new double[][] {{1}}, List.of(d),
                List.of(new BudgetLine(null, "", 0, new double[] {1e4})), Optional.empty(), List.of(), 12, 1.0, true);
    }

    @Test
    void theTableAndTheResultFileShowTheRiseAndTheTemperatures() throws Exception {
        String table = FitSummary.format(outcome());
        assertTrue(table.contains("Dataset 0, at the best fit\nSelf-heating: 0.5 mW absorbed raise the heated plane"
                + " by 21.25 K in steady state"), table);
        assertTrue(table.matches("(?s).*\\n  bulk +k_through_w_mk +321\\.25 +1\\.4 +1\\.4595 +W/\\(m K\\)\\n.*"),
                table);
        JsonNode json = new ObjectMapper().readTree(FitResultJson.format(new CaseDocument(Path.of("case.json"), null,
                null, null, null, Map.of()), outcome()));
        assertEquals(21.25, json.at("/datasets/0/self_heating/steady_rise_k").asDouble());
        assertEquals(321.25, json.at("/datasets/0/self_heating/values/0/temperature_k").asDouble());
        assertEquals(1.4595, json.at("/datasets/0/self_heating/values/0/value_used").asDouble());
    }
}
