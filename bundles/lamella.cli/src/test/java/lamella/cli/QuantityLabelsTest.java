package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import lamella.api.ParameterRef;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.SensitivityTable;
import org.junit.jupiter.api.Test;

/**
 * The fit table, the result file and the sensitivity CSV say which conductivity a path moved. The outcome is
 * invented (no physics behind its numbers); only the words are checked.
 */
class QuantityLabelsTest {

    static final ParameterRef SAPPHIRE = ParameterRef.layer("sapphire", "k_through_w_mk");
    static final ParameterRef METAL = ParameterRef.layer("transducer", "k_w_mk");
    static final ParameterRef G = ParameterRef.layer("transducer", "conductance_below_w_m2k");

    private static FitOutcome outcome() {
        DatasetFit d = new DatasetFit(0, "fdtr.csv", "fdtr", "phase_deg", "frequency_hz", new double[] {1e4, 1e5, 1e6},
                new double[] {-10, -20, -30}, new double[] {0.1, 0.1, 0.1}, new double[] {-10, -20, -30}, true, 1.0);
        return new FitOutcome(List.of(new FittedParameter(SAPPHIRE, "isotropic Λ", 20, 35, 0.5, 0.4, false, true),
                new FittedParameter(G, "", 5e7, 1e8, 1e6, 1e6, false, true)), new double[][] {{1, 0.1}, {0.1, 1}},
                List.of(d), List.of(new BudgetLine(null, "", 0, new double[] {0.4, 1e6}),
                new BudgetLine(METAL, "isotropic Λ", 9, new double[] {0.3, 1e5})), Optional.empty(), List.of(), 40,
                1.0, true);
    }

    @Test
    void theTableAndTheResultFileSayIsotropic() throws Exception {
        String table = FitSummary.format(outcome());
        assertTrue(table.contains("sapphire.k_through_w_mk (isotropic Λ)"), table);
        assertTrue(table.contains("transducer.k_w_mk (isotropic Λ) ± 9"), table);
        JsonNode json = new ObjectMapper().readTree(FitResultJson.format(new lamella.api.CaseDocument(
                Path.of("case.json"), null, null, null, null, java.util.Map.of()), outcome()));
        assertEquals("sapphire.k_through_w_mk", json.at("/parameters/0/parameter").asText());
        assertEquals("isotropic Λ", json.at("/parameters/0/quantity").asText());
        assertTrue(json.at("/parameters/1/quantity").isMissingNode());
        assertEquals("isotropic Λ", json.at("/budget/1/input/quantity").asText());
    }

    @Test
    void theSensitivityHeaderSaysWhatEachConductivityMoves() {
        SensitivityTable t = new SensitivityTable("frequency_hz", new double[] {1e4}, "phase_deg", true,
                List.of(METAL, SAPPHIRE, G), List.of("isotropic Λ", "through-plane Λz", ""),
                new double[][] {{1}, {2}, {3}});
        String header = SensitivityCommand.csv(t).lines().findFirst().orElseThrow();
        assertEquals("frequency_hz,transducer.k_w_mk (isotropic Λ),sapphire.k_through_w_mk (through-plane Λz),"
                + "transducer.conductance_below_w_m2k", header);
        assertFalse(header.contains("()"));
    }
}
