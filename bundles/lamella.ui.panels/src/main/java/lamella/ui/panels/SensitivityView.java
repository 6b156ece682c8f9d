package lamella.ui.panels;

import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.ModelEvaluationException;
import lamella.api.fit.FitService;
import lamella.api.fit.SensitivityTable;
import lamella.ui.api.PanelView;
import lamella.ui.api.Project;
import lamella.ui.api.Workbench;
import lamella.ui.charts.ChartCanvas;
import lamella.ui.charts.PlotLook;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The Sensitivity panel: the sensitivity of the chosen curve's signal to every numeric input of the case, over the
 * dataset's x values (or the case's own), recomputed in the background when the case changes.
 */
final class SensitivityView implements PanelView {

    static final String WHERE = "the Sensitivity panel";

    private final Workbench workbench;
    private final Project project;
    private final Composite root;
    private final CurvePicker picker;
    private final StatusLine status;
    private final ChartCanvas canvas;
    private final LatestOnly<Outcome<SensitivityTable>> work;
    private final Project.Listener listener = this::changed;
    private String lastProblem;
    private SensitivityTable shown;

    SensitivityView(Composite parent, Workbench workbench) {
        this.workbench = workbench;
        this.project = workbench.project();
        this.work = new LatestOnly<>(workbench, "Sensitivities");
        root = new Composite(parent, SWT.NONE);
        root.setLayout(new GridLayout(2, false));
        picker = new CurvePicker(root, this::recompute);
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

    SensitivityTable shown() {
        return shown;
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
    }

    private void recompute() {
        FitService fitter = workbench.fitter().orElse(null);
        CaseDocument doc = project.problem().isPresent() ? null : project.current().orElse(null);
        if (fitter == null || doc == null) {
            work.cancel();
            canvas.setChart(null);
            shown = null;
            status.show(fitter == null ? "No fitting service is live, so no sensitivities can be computed."
                    : "No sensitivities while the case has a problem: " + project.problem().map(Words::problem)
                    .orElse(""), StatusLine.Tone.PROBLEM);
            return;
        }
        int dataset = picker.selected();
        work.submit(p -> {
            try {
                return Outcome.of(fitter.sensitivity(doc, dataset, null));
            } catch (InputException e) {
                return Outcome.failed(e.getMessage());
            } catch (ModelEvaluationException e) {
                return Outcome.failed(e.getMessage());
            }
        }, new LatestOnly.View<>() {
            @Override
            public void done(Outcome<SensitivityTable> o) {
                show(o);
            }

            @Override
            public void problem(String problem) {
                // Messages has it already, from the background work.
                lastProblem = problem;
                failed(problem);
            }

            @Override
            public void stopped() {
                status.show("Stopped: the sensitivities shown are for earlier values; change a value to compute"
                        + " them again.", StatusLine.Tone.CAUTION);
            }

            @Override
            public void slow() {
                status.show("Computing sensitivities… the plot shown is for the earlier values (Stop, in the"
                        + " status line, cancels).", StatusLine.Tone.CAUTION);
            }
        });
    }

    private void failed(String problem) {
        if (root.isDisposed()) {
            return;
        }
        canvas.setChart(null);
        shown = null;
        status.show("The sensitivities could not be computed: " + problem, StatusLine.Tone.PROBLEM);
        if (!problem.equals(lastProblem)) {
            workbench.messages().error("The sensitivities could not be computed: " + problem, null);
            lastProblem = problem;
        }
        workbench.showProblem(WHERE, "the sensitivities could not be computed: " + problem);
    }

    private void show(Outcome<SensitivityTable> o) {
        if (root.isDisposed()) {
            return;
        }
        if (!o.ok()) {
            failed(o.problem());
            return;
        }
        lastProblem = null;
        workbench.showProblem(WHERE, null);
        SensitivityTable t = o.value();
        shown = t;
        XYSeriesCollection set = new XYSeriesCollection();
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        for (int p = 0; p < t.parameters().size(); p++) {
            XYSeries s = new XYSeries(Words.parameter(t.parameters().get(p), t.quantities().get(p)), false, true);
            for (int i = 0; i < t.x().length; i++) {
                s.add(t.x()[i], t.values()[p][i], false);
            }
            set.addSeries(s);
            r.setSeriesPaint(p, PlotLook.seriesPaint(p));
            r.setSeriesStroke(p, PlotLook.seriesStroke(p));
        }
        String technique = project.model().map(m -> m.measurement().get("type")).map(String::valueOf).orElse("");
        XYPlot plot = new XYPlot(set, PlotLook.xAxis(Words.x(t.xColumn(), technique),
                SignalCurve.logarithmic(t.xColumn()), t.x()), PlotLook.linear(Words.sensitivity(t.phaseLike())), r);
        canvas.setChart(PlotLook.chart(null, plot, true));
        status.show("Sensitivity of the " + Words.signal(t.signal()) + " to " + t.parameters().size()
                + " inputs over " + t.x().length + " points of x; larger |S| means the signal tells more about the"
                + " input.", StatusLine.Tone.PLAIN);
    }
}
