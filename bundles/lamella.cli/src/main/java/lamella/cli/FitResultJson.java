package lamella.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import lamella.api.CaseDocument;
import lamella.api.ParameterRef;
import lamella.api.ValueOrigin;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.MonteCarloSummary;

/**
 * The result file of {@code lamella fit}: every free parameter (as {@code layer}/{@code geometry}/{@code measurement}
 * with {@code property}, as its one-line {@code parameter} path, and with {@code quantity} saying what a conductivity
 * path moved), value, total σ and noise σ, correlations,
 * per-dataset reduced χ² and residuals, the uncertainty budget, Monte Carlo statistics, and every stack value taken
 * from a material library with its library, tier, entry version and source ({@code library_values}). SI units; a
 * value that is not finite (an unidentifiable σ) is written as null.
 */
final class FitResultJson {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private FitResultJson() {
    }

    static String format(CaseDocument doc, FitOutcome o) throws JsonProcessingException {
        return text(tree(doc, o));
    }

    /** A result (or any tree) as the file holds it: indented, ending in a newline. */
    static String text(ObjectNode root) throws JsonProcessingException {
        return MAPPER.writeValueAsString(root) + "\n";
    }

    /** The result as a tree, for commands that add their own record to it (batch). */
    static ObjectNode tree(CaseDocument doc, FitOutcome o) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("case", doc.file().toString());
        root.put("converged", o.converged());
        number(root, "reduced_chi_square", o.reducedChiSquare());
        root.put("model_evaluations", o.evaluations());
        ArrayNode params = root.putArray("parameters");
        for (FittedParameter p : o.parameters()) {
            ObjectNode n = params.addObject();
            reference(n, p.ref(), p.quantity());
            number(n, "value", p.value());
            number(n, "sigma", p.sigma());
            number(n, "sigma_noise", p.sigmaNoise());
            n.put("unit", p.ref().unit());
            number(n, "initial", p.initial());
            n.put("at_bound", p.atBound());
            n.put("identifiable", p.identifiable());
        }
        ObjectNode corr = root.putObject("correlation");
        ArrayNode names = corr.putArray("parameters");
        o.parameters().forEach(p -> names.add(p.ref().toString()));
        ArrayNode matrix = corr.putArray("matrix");
        for (double[] row : o.correlation()) {
            numbers(matrix.addArray(), row);
        }
        ArrayNode datasets = root.putArray("datasets");
        for (DatasetFit d : o.datasets()) {
            ObjectNode n = datasets.addObject();
            n.put("index", d.index());
            n.put("data", d.source());
            n.put("technique", d.technique());
            n.put("signal", d.signal());
            n.put("x_column", d.xColumn());
            number(n, "reduced_chi_square", d.reducedChiSquare());
            n.put("sigma_from", d.sigmaFromData() ? "data" : "residuals");
            numbers(n.putArray("x"), d.x());
            numbers(n.putArray("data_values"), d.data());
            numbers(n.putArray("model_values"), d.model());
            numbers(n.putArray("sigma"), d.sigma());
            double[] r = new double[d.x().length];
            for (int i = 0; i < r.length; i++) {
                r[i] = d.data()[i] - d.model()[i];
            }
            numbers(n.putArray("residuals"), r);
            d.heating().ifPresent(h -> n.set("self_heating", MAPPER.valueToTree(h.record())));
        }
        ArrayNode budget = root.putArray("budget");
        for (BudgetLine b : o.budget()) {
            ObjectNode n = budget.addObject();
            if (b.source() == null) {
                n.put("source", "noise");
            } else {
                n.put("source", b.source().toString());
                reference(n.putObject("input"), b.source(), b.quantity());
                number(n, "input_sigma", b.inputSigma());
            }
            ObjectNode contributions = n.putObject("contributions");
            for (int a = 0; a < o.parameters().size(); a++) {
                number(contributions, o.parameters().get(a).ref().toString(), b.contributions()[a]);
            }
        }
        o.monteCarlo().ifPresent(mc -> monteCarlo(root.putObject("monte_carlo"), mc, o.parameters()));
        ArrayNode library = root.putArray("library_values");
        for (ValueOrigin v : doc.libraryValues()) {
            library.add(MAPPER.valueToTree(v.provenance()));
        }
        ArrayNode warnings = root.putArray("warnings");
        o.warnings().forEach(warnings::add);
        return root;
    }

    private static void monteCarlo(ObjectNode n, MonteCarloSummary mc, List<FittedParameter> params) {
        n.put("samples", mc.samples());
        n.put("failed", mc.failed());
        numbers(n.putArray("percentile_levels"), MonteCarloSummary.LEVELS);
        ArrayNode per = n.putArray("parameters");
        for (int a = 0; a < params.size(); a++) {
            ObjectNode p = per.addObject();
            p.put("parameter", params.get(a).ref().toString());
            number(p, "mean", mc.mean()[a]);
            number(p, "std", mc.std()[a]);
            numbers(p.putArray("percentiles"), mc.percentiles()[a]);
            number(p, "std_over_linearised", mc.stdOverLinearised()[a]);
        }
    }

    /** The path, its parts, and what it moved in words ("isotropic Λ") where the key alone does not say. */
    static void reference(ObjectNode n, ParameterRef r, String quantity) {
        n.put("parameter", r.toString());
        switch (r.scope()) {
            case LAYER -> n.put("layer", r.layer());
            case GEOMETRY -> n.put("geometry", r.key());
            case MEASUREMENT -> n.put("measurement", r.key());
            case GAIN -> n.put("gain", r.key());
        }
        n.put("property", r.key());
        if (r.sample() != null) {
            n.put("sample", r.sample());
        }
        if (!quantity.isEmpty()) {
            n.put("quantity", quantity);
        }
        if (r.dataset() >= 0) {
            n.put("dataset", r.dataset());
        }
    }

    private static void number(ObjectNode n, String key, double v) {
        if (Double.isFinite(v)) {
            n.put(key, v);
        } else {
            n.putNull(key);
        }
    }

    private static void numbers(ArrayNode a, double[] values) {
        for (double v : values) {
            if (Double.isFinite(v)) {
                a.add(v);
            } else {
                a.addNull();
            }
        }
    }
}
