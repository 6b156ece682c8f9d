package lamella.ui.panels;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.util.List;
import java.util.Optional;
import lamella.api.CaseDocument;
import lamella.api.fit.DatasetFit;
import lamella.ui.api.PanelView;
import lamella.ui.api.Project;
import lamella.ui.api.Workbench;
import lamella.ui.charts.ChartCanvas;
import lamella.ui.charts.PlotLook;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The Signal panel: the chosen dataset's points, the model line over them and, after a fit, the best fit of the
 * last fit for that dataset (dashed; grey and marked out of date once the case is edited). Every change of the
 * case's inputs recomputes the model in the background; only the newest edit's curve is drawn, and the axes keep
 * their zoom.
 */
final class SignalView implements PanelView {

    static final String WHERE = "the Signal panel";

    private final Workbench workbench;
    private final Project project;
    private final Composite root;
    private final CurvePicker picker;
    private final Combo signalCombo;
    private final StatusLine status;
    private final ChartCanvas canvas;
    private final LatestOnly<Outcome<SignalCurve>> work;
    private final DataFiles files = new DataFiles();
    private final Project.Listener listener = this::changed;
    private String lastProblem;
    private XYSeries model;
    private XYSeries bestFit;
    private String modelText = "";
    private XYLineAndShapeRenderer renderer;
    private String shownKey;

    SignalView(Composite parent, Workbench workbench) {
        this.workbench = workbench;
        this.project = workbench.project();
        this.work = new LatestOnly<>(workbench, "Model signal");
        root = new Composite(parent, SWT.NONE);
        // The curve and its signal on rows of their own: a dataset's name and the signal both stay in view when
        // the plots have a third of the window.
        root.setLayout(new GridLayout(2, false));
        picker = new CurvePicker(root, this::recompute);
        Label sl = new Label(root, SWT.NONE);
        sl.setText("Signal:");
        signalCombo = new Combo(root, SWT.READ_ONLY);
        signalCombo.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false));
        signalCombo.addListener(SWT.Selection, e -> recompute());
        status = new StatusLine(root, 2);
        canvas = new ChartCanvas(root, SWT.NONE);
        GridData gd = new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1);
        gd.widthHint = 640;
        gd.heightHint = 420;
        canvas.setLayoutData(gd);
        project.addListener(listener);
        picker.refresh(project);
        recompute();
    }

    @Override
    public Control control() {
        return root;
    }

    @Override
    public void close() {
        project.removeListener(listener);
        work.cancel();
        workbench.showProblem(WHERE, null);
    }

    ChartCanvas canvas() {
        return canvas;
    }

    /** The model line as drawn, for tests. */
    double[] modelValues() {
        if (model == null) {
            return new double[0];
        }
        double[] y = new double[model.getItemCount()];
        for (int i = 0; i < y.length; i++) {
            y[i] = model.getY(i).doubleValue();
        }
        return y;
    }

    CurvePicker picker() {
        return picker;
    }

    String statusText() {
        return status.text();
    }

    private void changed(Project.Change change) {
        if (root.isDisposed()) {
            return;
        }
        if (change == Project.Change.FIT_SETUP || change == Project.Change.FILE) {
            picker.refresh(project);
        }
        if (change == Project.Change.INPUTS || change == Project.Change.FIT_SETUP) {
            recompute();
        }
        if (change == Project.Change.RESULT || change == Project.Change.FILE) {
            // A new result changes only the dashed line, so the status line can say so; after an edit the model's
            // own recomputation brings the status line up to date.
            drawBestFit(change == Project.Change.RESULT);
        }
    }

    /**
     * The last fit's model at the data points of the dataset shown, when it fitted the signal shown; its legend says
     * whether it still belongs to the case's inputs.
     */
    private void drawBestFit(boolean tellStatus) {
        if (bestFit == null || root.isDisposed()) {
            return;
        }
        bestFit.clear();
        int dataset = picker.selected();
        String signal = signalCombo.getText();
        Optional<DatasetFit> fit = project.lastFit().flatMap(o -> o.datasets().stream()
                .filter(d -> d.index() == dataset && d.signal().equals(signal)).findFirst());
        String fitText = "";
        if (fit.isPresent()) {
            DatasetFit d = fit.get();
            boolean current = project.lastFitCurrent();
            for (int i = 0; i < d.x().length; i++) {
                bestFit.add(d.x()[i], d.model()[i], false);
            }
            bestFit.setKey(current ? "best fit (this dataset's reduced χ² " + NumberText.format(d.reducedChiSquare())
                    + ")" : "best fit, out of date (case edited since)");
            renderer.setSeriesPaint(2, current ? PlotLook.seriesPaint(1) : PlotLook.REFERENCE);
            // A joint fit's reduced χ² (the Fit panel's) is over every dataset; this one is over the shown one only.
            fitText = current ? " Dashed: the best fit of the last fit (reduced χ² of this dataset alone "
                    + NumberText.format(d.reducedChiSquare()) + "; the Fit panel gives the whole fit's)."
                    : " Dashed grey: the last fit's best fit, out of date since the case was edited.";
        } else {
            bestFit.setKey("best fit (none yet)");
        }
        bestFit.fireSeriesChanged();
        if (tellStatus && !modelText.isEmpty()) {
            status.show(modelText + fitText, StatusLine.Tone.PLAIN);
        }
    }

    private void recompute() {
        if (project.problem().isPresent()) {
            work.cancel();
            clearModel();
            workbench.showProblem(WHERE, null);
            status.show("No model line while the case has a problem: " + Words.problem(project.problem().get()),
                    StatusLine.Tone.PROBLEM);
            return;
        }
        CaseDocument doc = project.current().orElse(null);
        if (doc == null) {
            return;
        }
        int dataset = picker.selected();
        String signal = signalCombo.getSelectionIndex() < 0 ? null : signalCombo.getText();
        long started = System.nanoTime();
        work.submit(progress -> SignalCurve.compute(doc, dataset, signal, workbench.catalog(),
                workbench.importers(), files), new LatestOnly.View<>() {
                    @Override
                    public void done(Outcome<SignalCurve> outcome) {
                        show(outcome, started);
                    }

                    @Override
                    public void problem(String problem) {
                        // Messages has it already, from the background work.
                        lastProblem = problem;
                        failed(problem);
                    }

                    @Override
                    public void stopped() {
                        markStale();
                        status.show("Stopped: the model line is for earlier values; change a value to compute it"
                                + " again.", StatusLine.Tone.CAUTION);
                    }

                    @Override
                    public void slow() {
                        markStale();
                        status.show("Computing the model… the grey line is for the earlier values (Stop, in the"
                                + " status line, cancels).", StatusLine.Tone.CAUTION);
                    }
                });
    }

    /** The model could not be computed: no line is better than a line that belongs to other values. */
    private void failed(String problem) {
        if (root.isDisposed()) {
            return;
        }
        modelText = "";
        clearModel();
        status.show("The model could not be computed: " + problem, StatusLine.Tone.PROBLEM);
        if (!problem.equals(lastProblem)) {
            workbench.messages().error("The model signal could not be computed: " + problem, null);
            lastProblem = problem;
        }
        workbench.showProblem(WHERE, "the model could not be computed: " + problem);
    }

    private void clearModel() {
        if (model != null) {
            model.clear();
        }
    }

    private void markStale() {
        if (renderer != null) {
            renderer.setSeriesPaint(1, PlotLook.REFERENCE);
        }
    }

    private void show(Outcome<SignalCurve> outcome, long started) {
        if (root.isDisposed()) {
            return;
        }
        if (!outcome.ok()) {
            failed(outcome.problem());
            return;
        }
        lastProblem = null;
        workbench.showProblem(WHERE, null);
        if (renderer != null) {
            renderer.setSeriesPaint(1, PlotLook.MODEL);
        }
        SignalCurve c = outcome.value();
        List<String> items = List.of(signalCombo.getItems());
        if (!items.equals(c.signals())) {
            signalCombo.setItems(c.signals().toArray(String[]::new));
            signalCombo.select(c.signals().indexOf(c.signal()));
            // As wide as its longest signal's name: it was laid out empty, before the first model came.
            root.layout(new Control[] {signalCombo});
        }
        signalCombo.select(c.signals().indexOf(c.signal()));
        String key = picker.selected() + "|" + c.signal() + "|" + c.xColumn();
        if (!key.equals(shownKey)) {
            canvas.setChart(chart(c));
            shownKey = key;
        } else {
            model.clear();
            for (int i = 0; i < c.modelX().length; i++) {
                model.add(c.modelX()[i], c.modelY()[i], false);
            }
            model.fireSeriesChanged();
        }
        long ms = (System.nanoTime() - started) / 1_000_000;
        modelText = c.technique().toUpperCase() + " model of " + c.modelX().length + " points"
                + (c.dataName().isEmpty() ? "" : " over " + c.dataX().length + " data points of " + c.dataName())
                + ", computed in " + ms + " ms.";
        status.show(modelText, StatusLine.Tone.PLAIN);
        drawBestFit(true);
    }

    private JFreeChart chart(SignalCurve c) {
        XYSeries data = new XYSeries(c.dataName().isEmpty() ? "data" : "data: " + c.dataName(), false, true);
        for (int i = 0; i < c.dataX().length; i++) {
            data.add(c.dataX()[i], c.dataY()[i], false);
        }
        model = new XYSeries("model", false, true);
        for (int i = 0; i < c.modelX().length; i++) {
            model.add(c.modelX()[i], c.modelY()[i], false);
        }
        bestFit = new XYSeries("best fit", false, true);
        XYSeriesCollection set = new XYSeriesCollection();
        set.addSeries(data);
        set.addSeries(model);
        set.addSeries(bestFit);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer();
        renderer = r;
        r.setSeriesLinesVisible(0, false);
        r.setSeriesShapesVisible(0, true);
        r.setSeriesShape(0, new Ellipse2D.Double(-3, -3, 6, 6));
        r.setSeriesShapesFilled(0, false);
        r.setSeriesPaint(0, PlotLook.DATA);
        r.setSeriesLinesVisible(1, true);
        r.setSeriesShapesVisible(1, false);
        r.setSeriesPaint(1, PlotLook.MODEL);
        r.setSeriesStroke(1, new BasicStroke(2f));
        r.setSeriesLinesVisible(2, true);
        r.setSeriesShapesVisible(2, false);
        r.setSeriesPaint(2, PlotLook.seriesPaint(1));
        r.setSeriesStroke(2, PlotLook.seriesStroke(1));
        boolean log = SignalCurve.logarithmic(c.xColumn());
        XYPlot plot = new XYPlot(set, PlotLook.xAxis(Words.x(c.xColumn(), c.technique()), log, c.modelX()),
                PlotLook.linear(Words.signal(c.signal())), r);
        plot.getRangeAxis().setAutoRangeMinimumSize(PlotLook.leastSpan(c.modelY()));
        return PlotLook.chart(null, plot, true);
    }
}
