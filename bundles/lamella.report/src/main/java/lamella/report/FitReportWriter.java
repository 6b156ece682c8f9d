package lamella.report;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lamella.api.CaseDocument;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.ReportWriter;
import lamella.api.fit.SensitivityTable;
import lamella.api.plan.PlanService;
import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.osgi.service.component.annotations.ReferencePolicyOption;

/**
 * Writes a fit's report folder: {@code index.html}, PNG and SVG plots of every dataset (data with model,
 * residuals), of each sensitivity table and of the uncertainty budget, the numbers as CSV, and everything in
 * {@code result.json}. All files are made in memory first and then written by {@link ReportFiles}, so a failure
 * leaves no partial or temporary file.
 */
@Component(service = ReportWriter.class)
public final class FitReportWriter implements ReportWriter {

    static final String PAGE = "index.html";
    /** Every name {@link #write} can give a file: the fixed ones and those numbered per dataset or table. */
    private static final java.util.regex.Pattern NAMES = java.util.regex.Pattern.compile(
            "index\\.html|result\\.json|(parameters|correlation|budget|montecarlo)\\.csv|budget\\.(png|svg)"
            + "|dataset-\\d+-fit\\.(csv|png|svg)|dataset-\\d+-residuals\\.(png|svg)|sensitivity-\\d+\\.(png|svg)"
            + "|plan-(objective|sensitivity)\\.(png|svg)");

    private final String version;
    private final Clock clock;

    /** The plan service, for the plan section of a case with a plan block; the report is written without it. */
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC,
            policyOption = ReferencePolicyOption.GREEDY)
    private volatile PlanService planner;

    @Activate
    public FitReportWriter(BundleContext context) {
        this(context.getBundle().getVersion().toString(), Clock.systemUTC());
    }

    FitReportWriter(String version, Clock clock) {
        Headless.ensure();
        this.version = version;
        this.clock = clock;
    }

    FitReportWriter(String version, Clock clock, PlanService planner) {
        this(version, clock);
        this.planner = planner;
    }

    @Override
    public Path write(CaseDocument doc, FitOutcome outcome, List<SensitivityTable> sensitivities, Path folder)
            throws IOException {
        ReportStamp stamp = new ReportStamp(version, clock.instant());
        ReportFiles files = new ReportFiles();
        Map<String, String> contents = new LinkedHashMap<>();

        List<Figure> datasetPlots = new ArrayList<>();
        for (DatasetFit d : outcome.datasets()) {
            String base = "dataset-" + d.index();
            datasetPlots.add(Figure.draw(files, base + "-fit", DatasetCharts.fit(d), d.sigmaFromData()
                    ? "Measured points with their 1σ from the data file, and the model at the best fit."
                    : "Measured points and the model at the best fit; the σ per point was estimated from the"
                    + " residuals, so no error bars are drawn."));
            datasetPlots.add(Figure.draw(files, base + "-residuals", DatasetCharts.residuals(d),
                    "(data − model)/σ per point; dashed lines at ±2. Scatter without a trend is what a good fit"
                    + " leaves."));
            describe(contents, base + "-fit", "data with the model of " + DatasetCharts.title(d));
            describe(contents, base + "-residuals", "normalised residuals of " + DatasetCharts.title(d));
            String csv = base + "-fit.csv";
            files.add(csv, CsvTables.datasetFit(d));
            contents.put(csv, "x, data, σ, model, residual and normalised residual of dataset " + d.index());
        }

        List<Figure> budgetPlots = new ArrayList<>();
        if (!outcome.budget().isEmpty()) {
            budgetPlots.add(Figure.draw(files, "budget", BudgetChart.of(outcome),
                    "Each source's 1σ contribution to each fitted parameter, and the total, relative to the"
                    + " fitted value."));
            describe(contents, "budget", "the uncertainty budget chart");
        }

        List<Figure> sensitivityPlots = new ArrayList<>();
        for (int k = 0; k < sensitivities.size(); k++) {
            SensitivityTable t = sensitivities.get(k);
            String base = "sensitivity-" + k;
            sensitivityPlots.add(Figure.draw(files, base, SensitivityChart.of(t, techniqueOf(t, doc, outcome)),
                    (t.phaseLike() ? "Change of the phase in degrees" : "Relative change of the signal")
                    + " per relative change of each input; the larger |S|, the better the data pin it down."));
            describe(contents, base, SensitivityChart.title(t));
        }

        files.add("parameters.csv", CsvTables.parameters(outcome));
        contents.put("parameters.csv", "fitted values, σ (total and noise only), flags; one unit column");
        files.add("correlation.csv", CsvTables.correlation(outcome));
        contents.put("correlation.csv", "correlation coefficients of the fitted parameters (dimensionless)");
        files.add("budget.csv", CsvTables.budget(outcome));
        contents.put("budget.csv", "σ contribution of every source to every parameter, variance share as a"
                + " fraction, and the totals");
        outcome.monteCarlo().ifPresent(mc -> {
            files.add("montecarlo.csv", CsvTables.monteCarlo(outcome, mc));
            contents.put("montecarlo.csv", "Monte Carlo mean, σ and percentiles per parameter");
        });
        PlanService plans = planner;
        PlanSection plan = plans != null && doc.states("plan") ? PlanSection.of(doc, plans, files, contents) : null;

        files.add("result.json", ResultJson.of(doc, outcome, sensitivities, stamp));
        contents.put("result.json", "the inputs, every result and every number above, SI units");

        // Last, so that a reader who finds the new page also finds every file it links.
        files.add(PAGE, ReportPage.of(doc, outcome, new PageFigures(datasetPlots, budgetPlots, sensitivityPlots),
                plan, contents, stamp));
        files.writeInto(folder);
        return folder.resolve(PAGE);
    }

    @Override
    public boolean writes(String fileName) {
        return NAMES.matcher(fileName).matches();
    }

    private static void describe(Map<String, String> contents, String base, String what) {
        contents.put(base + ".png", what + " (PNG)");
        contents.put(base + ".svg", what + " (SVG)");
    }

    /** A table taken at a dataset's x values belongs to its technique; otherwise to the case's measurement. */
    private static String techniqueOf(SensitivityTable t, CaseDocument doc, FitOutcome o) {
        for (DatasetFit d : o.datasets()) {
            if (d.xColumn().equals(t.xColumn()) && Arrays.equals(d.x(), t.x())) {
                return d.technique();
            }
        }
        return CaseText.technique(doc);
    }
}
