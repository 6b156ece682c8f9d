package lamella.ui.api;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.MonteCarloSummary;

/**
 * The last fit as the project keeps it in the case file's {@code workbench} object ({@code workbench.last_fit}):
 * the outcome (values, σ, correlations, budget, each dataset's data and best-fit model) and the fingerprints of the
 * inputs it was fitted to and, when the fitted values were taken into the case, of the inputs after that, so that
 * a reopened project knows whether its results still belong to its inputs. No model reads it.
 *
 * @param outcome the fit's outcome
 * @param basis   fingerprint of the inputs the fit started from
 * @param applied fingerprint of the inputs after "use fitted values", or null
 */
record FitRecord(FitOutcome outcome, String basis, String applied) {

    static final String KEY = "last_fit";

    /** Absent values are left out (the case reader takes no null), NaN is written as the text "NaN". */
    private static final ObjectMapper JSON = new ObjectMapper()
            .configure(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES, false)
            .setSerializationInclusion(com.fasterxml.jackson.annotation.JsonInclude.Include.NON_NULL);

    /** A fit's outcome as recorded, in a form without Optional (Monte Carlo may be null). */
    private record Stored(List<FittedParameter> parameters, double[][] correlation, List<StoredDataset> datasets,
                          List<BudgetLine> budget, MonteCarloSummary monteCarlo, List<String> warnings,
                          int evaluations, double reducedChiSquare, boolean converged, String basis,
                          String applied) {
    }

    /**
     * A dataset's fit as recorded: its data and best-fit model. The self-heating state at the best fit is not kept
     * (it holds the library entries themselves); the fit's output and report carry it.
     */
    private record StoredDataset(int index, String source, String technique, String signal, String xColumn,
                                 double[] x, double[] data, double[] sigma, double[] model, boolean sigmaFromData,
                                 double reducedChiSquare) {

        static StoredDataset of(DatasetFit d) {
            return new StoredDataset(d.index(), d.source(), d.technique(), d.signal(), d.xColumn(), d.x(), d.data(),
                    d.sigma(), d.model(), d.sigmaFromData(), d.reducedChiSquare());
        }

        DatasetFit fit() {
            return new DatasetFit(index, source, technique, signal, xColumn, x, data, sigma, model, sigmaFromData,
                    reducedChiSquare);
        }
    }

    ObjectNode toJson() {
        FitOutcome o = outcome;
        return JSON.valueToTree(new Stored(o.parameters(), o.correlation(),
                o.datasets().stream().map(StoredDataset::of).toList(), o.budget(), o.monteCarlo().orElse(null),
                o.warnings(), o.evaluations(), o.reducedChiSquare(), o.converged(), basis, applied));
    }

    /** Reads a recorded fit; an IllegalArgumentException says what is wrong with it. */
    static FitRecord of(JsonNode node) {
        Stored s;
        try {
            s = JSON.treeToValue(node, Stored.class);
        } catch (Exception e) {
            throw new IllegalArgumentException(e.getMessage().lines().findFirst().orElse("unreadable"), e);
        }
        if (s == null || s.parameters() == null || s.datasets() == null || s.correlation() == null
                || s.budget() == null || s.basis() == null) {
            throw new IllegalArgumentException("values, correlations, datasets, budget or the inputs' fingerprint"
                    + " are missing");
        }
        if (s.datasets().stream().anyMatch(d -> d == null)) {
            throw new IllegalArgumentException("a dataset of the recorded fit is empty");
        }
        FitOutcome o = new FitOutcome(s.parameters(), s.correlation(),
                s.datasets().stream().map(StoredDataset::fit).toList(), s.budget(),
                Optional.ofNullable(s.monteCarlo()), s.warnings() == null ? List.of() : s.warnings(),
                s.evaluations(), s.reducedChiSquare(), s.converged());
        return new FitRecord(o, s.basis(), s.applied());
    }

    FitRecord withApplied(String fingerprint) {
        return new FitRecord(outcome, basis, fingerprint);
    }

    /** Whether the inputs with this fingerprint are those the fit belongs to (fitted, or with its values used). */
    boolean belongsTo(String fingerprint) {
        return fingerprint.equals(basis) || fingerprint.equals(applied);
    }

    /**
     * The fingerprint of a case document's inputs: everything but the {@code workbench} object, with each dataset's
     * data file replaced by the digest of its content, so that an edited data file makes the fit out of date while
     * moving or re-saving the project with the same data keeps it (SHA-256). Data paths are absolute, as the
     * project holds them.
     */
    static String fingerprint(ObjectNode document, DataDigests data) {
        ObjectNode c = document.deepCopy();
        c.remove(Project.WORKBENCH_KEY);
        for (JsonNode ds : c.path("fit").path("datasets")) {
            if (ds instanceof ObjectNode o && o.path("data").isTextual()) {
                o.put("data", data.of(Path.of(o.get("data").asText())));
            }
        }
        try {
            MessageDigest md = DataDigests.sha256();
            return HexFormat.of().formatHex(md.digest(JSON.writeValueAsString(c).getBytes(StandardCharsets.UTF_8)));
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException("a document of the project is always writable as JSON", e);
        }
    }
}
