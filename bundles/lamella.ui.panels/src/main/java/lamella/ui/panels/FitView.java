package lamella.ui.panels;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lamella.api.CaseDocument;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitService;
import lamella.api.fit.FitSettings;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.ReportWriter;
import lamella.api.fit.SensitivityTable;
import lamella.ui.api.PanelView;
import lamella.ui.api.Project;
import lamella.ui.api.Task;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkResult;
import lamella.ui.charts.ChartCanvas;
import lamella.ui.charts.PlotLook;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.custom.StackLayout;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.program.Program;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;
import org.eclipse.swt.widgets.Spinner;
import org.eclipse.swt.widgets.TabFolder;
import org.eclipse.swt.widgets.TabItem;
import org.eclipse.swt.widgets.Table;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The Fit panel: starts and cancels a fit of the case's fit block in the background, then shows the values ± σ,
 * their correlations, the uncertainty budget and each dataset's residuals, and writes the HTML report. "Use fitted
 * values" takes the best fit into the case as one undoable step; after any other edit the results are marked out of
 * date. The last fit is kept with the project and shown again when it is reopened.
 */
final class FitView implements PanelView {

    private static final int BAR_STEPS = 1000;
    private static final int SIDE_BY_SIDE_PX = 1500;
    static final String USE = "Use fitted values";

    private final Workbench workbench;
    private final Project project;
    private final Composite root;
    private final Button start;
    private final Button cancel;
    private final Button report;
    private final Button use;
    private final Spinner monteCarlo;
    private final ProgressBar bar;
    private final StatusLine status;
    private final Composite body;
    private final StackLayout bodyLayout = new StackLayout();
    private final SashForm sash;
    private final TabFolder tabs;
    private final TabItem tablesTab;
    private final TabItem residualsTab;
    private final ScrolledComposite tablesScroll;
    private final Composite tables;
    private final Composite right;
    private final Table results;
    private final Table correlation;
    private final Table budget;
    private final Combo residualPick;
    private final ChartCanvas residuals;
    private final Project.Listener listener = this::changed;
    private Task running;
    private FitOutcome shown;
    private String shownSummary = "";
    private StatusLine.Tone shownTone = StatusLine.Tone.PLAIN;

    FitView(Composite parent, Workbench workbench) {
        this.workbench = workbench;
        this.project = workbench.project();
        root = new Composite(parent, SWT.NONE);
        root.setLayout(new GridLayout(1, false));
        Composite controls = new Composite(root, SWT.NONE);
        controls.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        controls.setLayout(new GridLayout(7, false));
        start = push(controls, "Start fit", this::startFit);
        cancel = push(controls, "Cancel", this::cancelFit);
        cancel.setEnabled(false);
        Label mc = new Label(controls, SWT.NONE);
        mc.setText("Monte Carlo refits (0: linearised σ only):");
        monteCarlo = new Spinner(controls, SWT.BORDER);
        monteCarlo.setValues(0, 0, 5000, 0, 10, 100);
        bar = new ProgressBar(controls, SWT.SMOOTH);
        bar.setMaximum(BAR_STEPS);
        GridData bgd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        bgd.minimumWidth = 120;
        bar.setLayoutData(bgd);
        report = push(controls, "Write report…", this::writeReport);
        report.setEnabled(false);
        new Label(controls, SWT.NONE);
        status = new StatusLine(root, 1);
        body = new Composite(root, SWT.NONE);
        body.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        Tables.keepLeastHeight(body);
        body.setLayout(bodyLayout);
        sash = new SashForm(body, SWT.HORIZONTAL);
        tabs = new TabFolder(body, SWT.TOP);
        tablesScroll = new ScrolledComposite(sash, SWT.V_SCROLL);
        Tables.startWithRoom(tablesScroll);
        tablesScroll.setExpandHorizontal(true);
        tablesScroll.setExpandVertical(true);
        tables = new Composite(tablesScroll, SWT.NONE);
        tables.setLayout(new GridLayout(1, false));
        tablesScroll.setContent(tables);
        tablesScroll.addListener(SWT.Resize, e -> fitTables());
        Composite valuesHead = new Composite(tables, SWT.NONE);
        GridLayout vh = new GridLayout(2, false);
        vh.marginWidth = 0;
        vh.marginHeight = 0;
        valuesHead.setLayout(vh);
        valuesHead.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        heading(valuesHead, "Fitted values (1σ; total includes every uncertain input)");
        use = push(valuesHead, USE, this::useFittedValues);
        use.setToolTipText("take the best-fit values into the case as one step (Edit ▸ Undo takes them back)");
        use.setEnabled(false);
        results = table(tables);
        heading(tables, "Correlation of the fitted values (dimensionless)");
        correlation = table(tables);
        heading(tables, "Uncertainty budget: 1σ from each source for fitted value (1), (2), …, its share of the"
                + " variance in %, and the total");
        budget = table(tables);
        right = new Composite(sash, SWT.NONE);
        right.setLayout(new GridLayout(2, false));
        Label rl = new Label(right, SWT.NONE);
        rl.setText("Residuals of:");
        residualPick = new Combo(right, SWT.READ_ONLY);
        residualPick.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        residualPick.addListener(SWT.Selection, e -> drawResiduals());
        residuals = new ChartCanvas(right, SWT.NONE);
        GridData cgd = new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1);
        cgd.widthHint = 420;
        cgd.heightHint = 300;
        residuals.setLayoutData(cgd);
        tablesTab = new TabItem(tabs, SWT.NONE);
        tablesTab.setText("Values, correlation, budget");
        residualsTab = new TabItem(tabs, SWT.NONE);
        residualsTab.setText("Residuals");
        arrange(false);
        // Tables and residuals side by side where there is room for both, else each on a tab of its own, so that
        // neither squeezes the other's rows or axes away.
        root.addListener(SWT.Resize, e -> arrange(root.getClientArea().width >= SIDE_BY_SIDE_PX));
        project.addListener(listener);
        project.lastFit().ifPresent(o -> {
            show(o);
            shownSummary = "The last fit, kept with the project: " + summary(o, "");
            shownTone = tone(o);
            freshness();
        });
        if (project.lastFit().isEmpty()) {
            status.show(project.lastFitProblem().map(p -> "No fit to show: " + p + ". ").orElse("")
                    + (workbench.fitter().isPresent() ? "Press Start fit to fit the free inputs of the case's fit"
                    + " block; the values and their uncertainty appear here." : "No fitting service is live, so"
                    + " no fit can run (check that bundle lamella.fit runs)."), StatusLine.Tone.PLAIN);
        }
    }

    @Override
    public Control control() {
        return root;
    }

    @Override
    public void close() {
        project.removeListener(listener);
        cancelFit();
    }

    Table results() {
        return results;
    }

    Table budget() {
        return budget;
    }

    Button startButton() {
        return start;
    }

    String statusText() {
        return status.text();
    }

    private static Button push(Composite parent, String text, Runnable action) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        b.addListener(SWT.Selection, e -> action.run());
        return b;
    }

    private static void heading(Composite parent, String text) {
        Label l = new Label(parent, SWT.WRAP);
        l.setText(text);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        gd.widthHint = 200;
        l.setLayoutData(gd);
    }

    private static Table table(Composite parent) {
        Table t = Tables.create(parent);
        t.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        Tables.showEveryRow(t);
        return t;
    }

    /** Side by side (wide) or on two tabs; the controls move between the two holders. */
    private void arrange(boolean wide) {
        Composite holder = wide ? sash : tabs;
        if (tablesScroll.getParent() == holder && bodyLayout.topControl == holder) {
            return;
        }
        tablesTab.setControl(null);
        residualsTab.setControl(null);
        tablesScroll.setParent(holder);
        right.setParent(holder);
        if (wide) {
            tablesScroll.moveAbove(right);
            sash.setWeights(new int[] {55, 45});
        } else {
            tablesTab.setControl(tablesScroll);
            residualsTab.setControl(right);
        }
        bodyLayout.topControl = holder;
        body.layout(true, true);
        fitTables();
    }

    /** The tables' column as tall as their rows need at the width there is; the column scrolls when taller. */
    private void fitTables() {
        int width = tablesScroll.getClientArea().width;
        if (width > 0) {
            tablesScroll.setMinSize(tables.computeSize(width, SWT.DEFAULT));
        }
    }

    /** The results' tab, when results and residuals are on tabs (null side by side); for tests. */
    TabFolder resultTabs() {
        return bodyLayout.topControl == tabs ? tabs : null;
    }

    Table correlation() {
        return correlation;
    }

    private void changed(Project.Change change) {
        if (root.isDisposed()) {
            return;
        }
        if (change == Project.Change.RESULT) {
            project.lastFit().ifPresent(o -> {
                if (o != shown) {
                    show(o);
                }
            });
        }
        freshness();
    }

    /**
     * Says whether the results shown belong to the case as it is: fitted to it, taken into it, or out of date
     * because of an edit since; "Use fitted values" is offered only for results that belong to the case.
     */
    private void freshness() {
        if (shown == null || running != null) {
            use.setEnabled(false);
            return;
        }
        boolean current = shown == project.lastFit().orElse(null) && project.lastFitCurrent();
        boolean inUse = current && project.fittedValuesInUse();
        use.setEnabled(current && !inUse);
        if (!current) {
            status.show("Out of date: the case was edited after this fit, so the values, σ and budget below belong to"
                    + " the case as it was then. Start fit again (or undo the edits).", StatusLine.Tone.CAUTION);
        } else if (inUse) {
            status.show(shownSummary + " The case holds the fitted values now (Edit ▸ Undo use fitted values takes"
                    + " them back).", shownTone);
        } else {
            status.show(shownSummary, shownTone);
        }
    }

    private void useFittedValues() {
        if (shown != null && project.lastFitCurrent()) {
            project.useFittedValues();
        }
    }

    private void startFit() {
        FitService fitter = workbench.fitter().orElse(null);
        if (fitter == null) {
            status.show("No fitting service is live (check that bundle lamella.fit runs).", StatusLine.Tone.PROBLEM);
            return;
        }
        if (project.problem().isPresent()) {
            status.show("Fix the case first: " + Words.problem(project.problem().get()), StatusLine.Tone.PROBLEM);
            return;
        }
        CaseDocument doc = project.current().orElseThrow();
        FitSettings settings = FitSettings.defaults().withMonteCarlo(monteCarlo.getSelection());
        start.setEnabled(false);
        cancel.setEnabled(true);
        bar.setSelection(0);
        status.show("Fitting…", StatusLine.Tone.PLAIN);
        long t0 = System.nanoTime();
        com.fasterxml.jackson.databind.node.ObjectNode fitted = project.tree();
        use.setEnabled(false);
        running = workbench.start("Fit", p -> fitter.fit(doc, settings,
                new ProgressRelay(p, root.getDisplay(), this::progress)), new WorkResult<FitOutcome>() {
                    @Override
                    public void done(FitOutcome outcome) {
                        if (ended()) {
                            bar.setSelection(BAR_STEPS);
                            shownSummary = summary(outcome, " in " + String.format(java.util.Locale.ROOT,
                                    "%.1f", (System.nanoTime() - t0) / 1e9) + " s");
                            shownTone = tone(outcome);
                            show(outcome);
                            project.setLastFit(outcome, fitted);
                        }
                    }

                    @Override
                    public void failed(String problem, Throwable cause) {
                        if (ended()) {
                            bar.setSelection(0);
                            status.show("The fit failed: " + problem, StatusLine.Tone.PROBLEM);
                        }
                    }

                    @Override
                    public void stopped() {
                        if (ended()) {
                            bar.setSelection(0);
                            status.show("Fit cancelled.", StatusLine.Tone.CAUTION);
                        }
                    }
                });
    }

    /** The fit is over: the buttons come back; false when the panel is gone. */
    private boolean ended() {
        running = null;
        if (root.isDisposed()) {
            return false;
        }
        start.setEnabled(true);
        cancel.setEnabled(false);
        return true;
    }

    private void progress(String stage, double fraction) {
        if (root.isDisposed() || running == null) {
            return;
        }
        if (!Double.isNaN(fraction)) {
            bar.setSelection((int) Math.round(fraction * BAR_STEPS));
        }
        status.show(stage, StatusLine.Tone.PLAIN);
    }

    private void cancelFit() {
        if (running != null) {
            running.cancel();
            running = null;
            if (!root.isDisposed()) {
                start.setEnabled(true);
                cancel.setEnabled(false);
                bar.setSelection(0);
                status.show("Fit cancelled.", StatusLine.Tone.CAUTION);
            }
        }
    }

    private static String summary(FitOutcome o, String when) {
        String s = (o.converged() ? "Converged" : "Did not converge") + " after " + o.evaluations()
                + " model evaluations" + when + "; reduced χ² " + NumberText.format(o.reducedChiSquare())
                + (o.datasets().size() > 1 ? " over all " + o.datasets().size() + " datasets together" : "") + ".";
        return o.warnings().isEmpty() ? s : s + " " + String.join(" ", o.warnings());
    }

    private static StatusLine.Tone tone(FitOutcome o) {
        return o.warnings().isEmpty() && o.converged() ? StatusLine.Tone.PLAIN : StatusLine.Tone.CAUTION;
    }

    private void show(FitOutcome o) {
        shown = o;
        List<FittedParameter> ps = o.parameters();
        FitTables values = FitTables.results(o);
        Tables.fill(results, values.headings(), values.rows());
        List<String[]> corr = new ArrayList<>();
        String[] ch = new String[ps.size() + 1];
        ch[0] = "parameter";
        for (int i = 0; i < ps.size(); i++) {
            ch[i + 1] = "(" + (i + 1) + ")";
            String[] r = new String[ps.size() + 1];
            r[0] = "(" + (i + 1) + ") " + Words.parameter(ps.get(i).ref(), ps.get(i).quantity());
            for (int j = 0; j < ps.size(); j++) {
                r[j + 1] = String.format(java.util.Locale.ROOT, "%+.3f", o.correlation()[i][j]).replace('-', '−');
            }
            corr.add(r);
        }
        Tables.fill(correlation, ch, corr);
        FitTables shares = FitTables.budget(o);
        Tables.fill(budget, shares.headings(), shares.rows());
        residualPick.setItems(o.datasets().stream().map(d -> "dataset " + d.index() + ": "
                + Path.of(d.source()).getFileName() + " (" + d.signal() + ")").toArray(String[]::new));
        residualPick.select(0);
        drawResiduals();
        report.setEnabled(workbench.reports().isPresent());
        for (Table t : List.of(results, correlation, budget)) {
            Tables.showEveryRow(t);
        }
        root.layout(true, true);
        fitTables();
    }

    private void drawResiduals() {
        int i = residualPick.getSelectionIndex();
        if (shown == null || i < 0 || i >= shown.datasets().size()) {
            residuals.setChart(null);
            return;
        }
        DatasetFit d = shown.datasets().get(i);
        XYSeries s = new XYSeries("(data − model)/σ, this dataset's reduced χ² "
                + NumberText.format(d.reducedChiSquare()),
                false, true);
        for (int k = 0; k < d.x().length; k++) {
            s.add(d.x()[k], (d.data()[k] - d.model()[k]) / d.sigma()[k], false);
        }
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, true);
        r.setSeriesShape(0, new Ellipse2D.Double(-3, -3, 6, 6));
        r.setSeriesPaint(0, PlotLook.MODEL);
        r.setSeriesStroke(0, new BasicStroke(1f));
        XYPlot plot = new XYPlot(new XYSeriesCollection(s), PlotLook.xAxis(Words.x(d.xColumn(), d.technique()),
                SignalCurve.logarithmic(d.xColumn()), d.x()), PlotLook.linear("normalised residual (dimensionless)"), r);
        plot.addRangeMarker(new ValueMarker(0, PlotLook.REFERENCE, new BasicStroke(1f)));
        residuals.setChart(PlotLook.chart(null, plot, true));
    }

    private void writeReport() {
        ReportWriter writer = workbench.reports().orElse(null);
        FitService fitter = workbench.fitter().orElse(null);
        if (writer == null || fitter == null || shown == null || project.current().isEmpty()) {
            status.show("A report needs a finished fit and a live report service.", StatusLine.Tone.PROBLEM);
            return;
        }
        DirectoryDialog d = new DirectoryDialog(root.getShell());
        d.setText("Folder for the report");
        d.setMessage("The report's page, plots and tables are written into this folder.");
        String folder = d.open();
        if (folder == null) {
            return;
        }
        CaseDocument doc = project.current().get();
        FitOutcome outcome = shown;
        status.show("Writing the report…", StatusLine.Tone.PLAIN);
        workbench.background("Report", p -> {
            List<SensitivityTable> sens = new ArrayList<>();
            for (int i = 0; i < outcome.datasets().size(); i++) {
                sens.add(fitter.sensitivity(doc, outcome.datasets().get(i).index(), null));
            }
            return writer.write(doc, outcome, sens, Path.of(folder));
        }, page -> {
            status.show("Report written: " + page, StatusLine.Tone.PLAIN);
            Program.launch(page.toString());
        });
    }
}
