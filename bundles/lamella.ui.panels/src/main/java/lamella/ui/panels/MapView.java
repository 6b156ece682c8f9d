package lamella.ui.panels;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.ModelEvaluationException;
import lamella.api.ParameterRef;
import lamella.api.fit.CurveFit;
import lamella.api.fit.CurveFitService;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.map.MapBlock;
import lamella.map.MapData;
import lamella.map.MapEngine;
import lamella.map.MapImages;
import lamella.map.MapJournal;
import lamella.ui.api.PanelView;
import lamella.ui.api.Project;
import lamella.ui.api.Workbench;
import lamella.ui.charts.ChartCanvas;
import lamella.ui.charts.PlotLook;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * The Map panel: the project's {@code map} block fitted here in the background (every position, on this machine's
 * cores, with the {@code map} command's engine and neighbour starts), or the results of an earlier {@code lamella map}
 * opened from its {@code map.csv}; one image at a time — a free input, its σ or the reduced χ² — with the position,
 * value, σ and status under the cursor; a click shows that position's data with σ bars and its fit.
 */
final class MapView implements PanelView {

    static final String WHERE = "the Map panel";
    /** The width the data source's words and the image chooser start from; they wrap or widen as room allows. */
    private static final int SOURCE_WIDTH = 120;

    /** Data and fit rules of the project's map block, read in the background. */
    record Loaded(CaseDocument doc, MapData data, CurveFit fit, String dataName) {
    }

    private final Workbench workbench;
    private final Project project;
    private final CurveFitService curves;
    private final Composite root;
    private final Label source;
    private final Button fitButton;
    private final Button openButton;
    private final Combo show;
    private final StatusLine status;
    private final ChartCanvas mapCanvas;
    private final Label position;
    private final ChartCanvas curveCanvas;
    private final LatestOnly<Outcome<Loaded>> loading;
    private final LatestOnly<Outcome<MapResults>> fitting;
    private final LatestOnly<Outcome<FitOutcome>> positionFit;
    private final Project.Listener listener = this::changed;
    private Loaded loaded;
    private MapResults results;
    private Map<Long, Integer> dataIndex = Map.of();
    private int selected = -1;

    MapView(Composite parent, Workbench workbench, CurveFitService curves) {
        this.workbench = workbench;
        this.project = workbench.project();
        this.curves = curves;
        this.loading = new LatestOnly<>(workbench, "Map data");
        this.fitting = new LatestOnly<>(workbench, "Fitting the map");
        this.positionFit = new LatestOnly<>(workbench, "A map position's fit");
        root = new Composite(parent, SWT.NONE);
        // The source and its buttons on one row, the image chooser on the next: both fit a third of 1280 px.
        root.setLayout(new GridLayout(4, false));
        Label l = new Label(root, SWT.NONE);
        l.setText("Map data:");
        source = new Label(root, SWT.WRAP);
        GridData sourceData = new GridData(SWT.FILL, SWT.CENTER, true, false);
        sourceData.widthHint = SOURCE_WIDTH;
        source.setLayoutData(sourceData);
        fitButton = new Button(root, SWT.PUSH);
        fitButton.setText("Fit map");
        fitButton.setToolTipText("Fit every position of the case's map block in the background (Stop, in the status"
                + " line, cancels)");
        fitButton.addListener(SWT.Selection, e -> fitMap());
        openButton = new Button(root, SWT.PUSH);
        openButton.setText("Open results…");
        openButton.setToolTipText("Show the map.csv that `lamella map … --out DIR` wrote");
        openButton.addListener(SWT.Selection, e -> chooseResults());
        Label s = new Label(root, SWT.NONE);
        s.setText("Show:");
        show = new Combo(root, SWT.READ_ONLY | SWT.DROP_DOWN);
        GridData sd = new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1);
        sd.widthHint = SOURCE_WIDTH;
        show.setLayoutData(sd);
        show.addListener(SWT.Selection, e -> drawMap());
        status = new StatusLine(root, 4);
        SashForm sash = new SashForm(root, SWT.HORIZONTAL);
        GridData gd = new GridData(SWT.FILL, SWT.FILL, true, true, 4, 1);
        gd.widthHint = 640;
        gd.heightHint = 380;
        sash.setLayoutData(gd);
        mapCanvas = new ChartCanvas(sash, SWT.NONE);
        mapCanvas.setReading(this::reading);
        mapCanvas.onClick(this::clicked);
        Composite right = new Composite(sash, SWT.NONE);
        GridLayout rl = new GridLayout(1, false);
        rl.marginWidth = 0;
        right.setLayout(rl);
        position = new Label(right, SWT.WRAP);
        GridData pd = new GridData(SWT.FILL, SWT.TOP, true, false);
        pd.widthHint = 200;
        position.setLayoutData(pd);
        position.setText("Click a position on the map to see its data and fit.");
        curveCanvas = new ChartCanvas(right, SWT.NONE);
        curveCanvas.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        sash.setWeights(new int[] {55, 45});
        project.addListener(listener);
        reload();
    }

    @Override
    public Control control() {
        return root;
    }

    @Override
    public void close() {
        project.removeListener(listener);
        loading.cancel();
        fitting.cancel();
        positionFit.cancel();
        workbench.showProblem(WHERE, null);
    }

    MapResults results() {
        return results;
    }

    Loaded loaded() {
        return loaded;
    }

    int selected() {
        return selected;
    }

    String positionText() {
        return position.getText();
    }

    String statusText() {
        return status.text();
    }

    ChartCanvas mapCanvas() {
        return mapCanvas;
    }

    ChartCanvas curveCanvas() {
        return curveCanvas;
    }

    Combo showChoice() {
        return show;
    }

    private void changed(Project.Change change) {
        if (root.isDisposed()) {
            return;
        }
        if (change == Project.Change.INPUTS || change == Project.Change.FIT_SETUP || change == Project.Change.FILE) {
            reload();
        }
    }

    /** Reads the project's map block, its data and its fit rules again. */
    private void reload() {
        CaseDocument doc = project.problem().isPresent() ? null : project.current().orElse(null);
        if (doc == null) {
            loaded = null;
            fitButton.setEnabled(false);
            source.setText("—");
            status.show("No map while the case has a problem: " + project.problem().map(Words::problem).orElse(""),
                    StatusLine.Tone.PROBLEM);
            return;
        }
        if (!doc.root().has("map")) {
            loaded = null;
            loading.cancel();
            fitButton.setEnabled(false);
            source.setText("the case has no map block");
            if (results == null) {
                status.show("To fit a map here, add \"map\": {\"data\": FILE} beside the case's fit block (README,"
                        + " Property maps); or open the map.csv that `lamella map` wrote with Open results….",
                        StatusLine.Tone.PLAIN);
            }
            return;
        }
        Path folder = project.folder();
        loading.submit(p -> {
            try {
                MapBlock block = MapBlock.read(doc);
                Path data = folder.resolve(block.given()).normalize();
                CurveFit fit = curves.curves(doc, block.signal());
                MapData d = MapData.read(data, fit.xColumn(), fit.signal());
                fit.check(d.x, d.hasSigma, "map.data");
                return Outcome.of(new Loaded(doc, d, fit, block.given()));
            } catch (InputException e) {
                return Outcome.failed(e.getMessage());
            }
        }, o -> {
            if (root.isDisposed()) {
                return;
            }
            if (!o.ok()) {
                loaded = null;
                fitButton.setEnabled(false);
                source.setText("cannot be read");
                status.show("The map data cannot be used: " + o.problem(), StatusLine.Tone.PROBLEM);
                workbench.showProblem(WHERE, "the map data cannot be used: " + o.problem());
                return;
            }
            workbench.showProblem(WHERE, null);
            boolean hadResults = results != null && results.fromCase();
            loaded = o.value();
            indexData();
            fitButton.setEnabled(true);
            MapData d = loaded.data();
            source.setText(loaded.dataName() + " — " + d.positions.size() + " positions × " + d.x.length + " "
                    + Words.x(d.xColumn, technique()).replaceAll(" \\(.*", "") + " values, " + Words.signal(d.signal)
                    + (d.hasSigma ? ", σ from the file" : ", σ from each fit's residuals"));
            source.getParent().layout(new Control[] {source});
            if (hadResults) {
                status.show("The case changed since the map shown was fitted; Fit map fits it again.",
                        StatusLine.Tone.CAUTION);
            } else if (results == null) {
                status.show("Fit map fits all " + d.positions.size() + " positions on "
                        + Runtime.getRuntime().availableProcessors() + " cores; each starts from a fitted neighbour.",
                        StatusLine.Tone.PLAIN);
            }
        });
    }

    private String technique() {
        return project.model().map(m -> m.measurement().get("type")).map(String::valueOf).orElse("");
    }

    private void indexData() {
        Map<Long, Integer> index = new HashMap<>();
        if (loaded != null) {
            List<MapData.Position> ps = loaded.data().positions;
            for (int i = 0; i < ps.size(); i++) {
                index.put(key(ps.get(i).xM(), ps.get(i).yM()), i);
            }
        }
        dataIndex = index;
    }

    private static long key(double x, double y) {
        return Double.doubleToLongBits(x) * 31 + Double.doubleToLongBits(y);
    }

    private void fitMap() {
        Loaded l = loaded;
        if (l == null) {
            return;
        }
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        int n = l.data().positions.size();
        status.show("Fitting " + n + " positions on " + threads + " cores…", StatusLine.Tone.CAUTION);
        long start = System.nanoTime();
        fitting.submit(p -> {
            MapEngine engine = new MapEngine(l.fit(), l.data().x, threads);
            MapEngine.Result[] r = engine.run(l.data().positions, done -> p.update("Fitting the map", done, n),
                    MapJournal.NONE);
            return Outcome.of(MapResults.of(l.data(), r, l.fit(), "fitted here from " + l.dataName()));
        }, new LatestOnly.View<>() {
            @Override
            public void done(Outcome<MapResults> o) {
                if (root.isDisposed()) {
                    return;
                }
                double seconds = (System.nanoTime() - start) / 1e9;
                showResults(o.value());
                status.show(String.format(Locale.ROOT, "Fitted %d positions in %.1f s: %s.", n, seconds,
                        results.counts()), StatusLine.Tone.PLAIN);
            }

            @Override
            public void problem(String problem) {
                if (!root.isDisposed()) {
                    status.show("The map could not be fitted: " + problem, StatusLine.Tone.PROBLEM);
                }
            }

            @Override
            public void stopped() {
                if (!root.isDisposed()) {
                    status.show("Stopped: the map was not fitted to the end; Fit map starts again.",
                            StatusLine.Tone.CAUTION);
                }
            }

            @Override
            public void slow() {
                // The status line says so already.
            }
        });
    }

    private void chooseResults() {
        FileDialog dialog = new FileDialog(workbench.shell(), SWT.OPEN);
        dialog.setText("Open the results of a map");
        dialog.setFilterNames(new String[] {"Map results (map.csv)", "All files"});
        dialog.setFilterExtensions(new String[] {"map.csv;*.csv", "*"});
        dialog.setFilterPath(project.folder().toString());
        String chosen = dialog.open();
        if (chosen != null) {
            openResults(Path.of(chosen));
        }
    }

    /** Reads a map.csv in the background and shows it. */
    void openResults(Path file) {
        fitting.submit(p -> {
            try {
                return Outcome.of(MapResults.read(file));
            } catch (InputException e) {
                return Outcome.failed(e.getMessage());
            }
        }, o -> {
            if (root.isDisposed()) {
                return;
            }
            if (!o.ok()) {
                status.show("These map results cannot be shown: " + o.problem(), StatusLine.Tone.PROBLEM);
                workbench.messages().error("These map results cannot be shown: " + o.problem(), null);
                return;
            }
            showResults(o.value());
            int matched = 0;
            for (int i = 0; i < results.size(); i++) {
                if (dataIndex.containsKey(key(results.xM()[i], results.yM()[i]))) {
                    matched++;
                }
            }
            status.show(results.size() + " positions from " + file.getFileName() + ": " + results.counts() + ". "
                    + (loaded == null ? "Without the case's map block, a click shows a position's values only."
                    : matched + " of them are positions of the case's map data, whose data and fit a click shows."),
                    StatusLine.Tone.PLAIN);
        });
    }

    private void showResults(MapResults r) {
        results = r;
        selected = -1;
        List<String> items = new ArrayList<>();
        for (int a = 0; a < r.names().size(); a++) {
            items.add(r.names().get(a) + " (" + r.units().get(a) + ")");
            items.add("σ of " + r.names().get(a));
        }
        items.add("reduced χ²");
        int was = show.getSelectionIndex();
        show.setItems(items.toArray(String[]::new));
        show.select(was >= 0 && was < items.size() ? was : 0);
        root.layout(new Control[] {show});
        drawMap();
    }

    private double[] shownValues() {
        int choice = Math.max(0, show.getSelectionIndex());
        int parameters = results.names().size();
        double[] v = new double[results.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = choice == 2 * parameters ? results.chi()[i]
                    : choice % 2 == 0 ? results.values()[i][choice / 2] : results.sigmas()[i][choice / 2];
        }
        return v;
    }

    private void drawMap() {
        if (results == null) {
            mapCanvas.setChart(null);
            return;
        }
        int choice = Math.max(0, show.getSelectionIndex());
        int parameters = results.names().size();
        String title;
        String bar;
        if (choice == 2 * parameters) {
            title = "reduced χ² of each position's fit";
            bar = "reduced χ² (1)";
        } else {
            String name = results.names().get(choice / 2);
            String unit = results.units().get(choice / 2);
            title = choice % 2 == 0 ? name : "1σ of " + name;
            bar = (choice % 2 == 0 ? name : "σ of " + name) + " (" + unit + ")";
        }
        mapCanvas.setChart(MapImages.chart(title, bar, results.xM(), results.yM(), shownValues()));
    }

    /** The read-out under the cursor: the nearest position within half a spacing, its value, σ and status. */
    private String reading(double xUm, double yUm) {
        int i = nearest(xUm, yUm);
        return i < 0 ? "" : describe(i, true);
    }

    private int nearest(double xUm, double yUm) {
        if (results == null) {
            return -1;
        }
        return results.nearest(xUm * 1e-6, yUm * 1e-6);
    }

    private String describe(int i, boolean oneLine) {
        int choice = Math.max(0, show.getSelectionIndex());
        int parameters = results.names().size();
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "position (%s, %s) µm", num(results.xM()[i] * 1e6),
                num(results.yM()[i] * 1e6)));
        if (oneLine) {
            int a = choice == 2 * parameters ? -1 : choice / 2;
            if (a >= 0) {
                sb.append(": ").append(valueText(i, a));
            }
            sb.append(" · χ²ᵣ ").append(num(results.chi()[i])).append(" · ").append(results.status()[i]);
            return sb.toString();
        }
        sb.append(" — ").append(results.status()[i]);
        for (int a = 0; a < parameters; a++) {
            sb.append('\n').append(results.names().get(a)).append(" = ").append(valueText(i, a));
        }
        sb.append("\nreduced χ² ").append(num(results.chi()[i]));
        if (!results.message()[i].isEmpty()) {
            sb.append('\n').append(results.message()[i]);
        }
        return sb.toString();
    }

    private String valueText(int i, int a) {
        double v = results.values()[i][a];
        double s = results.sigmas()[i][a];
        if (!Double.isFinite(v)) {
            return "no value";
        }
        String unit = results.units().get(a);
        if (unit.equals("W/(m² K)")) {
            // Boundary conductances read in MW/(m² K), as everywhere in the workbench.
            v *= 1e-6;
            s *= 1e-6;
            unit = "MW/(m² K)";
        }
        String shown = Double.isFinite(s) && s > 0 ? SigmaRounding.valueAndSigma(v, s)
                : num(v) + (Double.isInfinite(s) ? " (not identifiable)" : "");
        return shown + " " + unit;
    }

    static String num(double v) {
        if (!Double.isFinite(v)) {
            return Double.isNaN(v) ? "—" : "∞";
        }
        double a = Math.abs(v);
        if (a != 0 && (a < 1e-3 || a >= 1e5)) {
            return String.format(Locale.ROOT, "%.3e", v).replace("e", "×10^").replace("^+", "^");
        }
        return String.format(Locale.ROOT, "%.4g", v);
    }

    private void clicked(double xUm, double yUm) {
        int i = nearest(xUm, yUm);
        if (i >= 0) {
            select(i);
        }
    }

    /** Shows one position: its values, and — when it is a position of the case's map data — its data and fit. */
    void select(int i) {
        selected = i;
        position.setText(describe(i, false));
        position.getParent().layout(new Control[] {position});
        Loaded l = loaded;
        Integer at = dataIndex.get(key(results.xM()[i], results.yM()[i]));
        if (l == null || at == null) {
            curveCanvas.setChart(null);
            return;
        }
        MapData.Position p = l.data().positions.get(at);
        if (p.problem() != null && !p.problem().isEmpty()) {
            curveCanvas.setChart(null);
            position.setText(position.getText() + "\n" + p.problem());
            return;
        }
        double[] start = results.values()[i].clone();
        boolean usable = start.length == l.fit().free().size();
        for (double v : start) {
            usable &= Double.isFinite(v);
        }
        double[] from = usable ? start : null;
        positionFit.submit(w -> {
            try {
                return Outcome.of(l.fit().fit(l.data().x, p.y(), p.sigma(), from));
            } catch (ModelEvaluationException e) {
                return Outcome.failed(e.getMessage());
            }
        }, o -> {
            if (root.isDisposed() || selected != i) {
                return;
            }
            if (!o.ok()) {
                curveCanvas.setChart(null);
                position.setText(describe(i, false) + "\nthe model cannot be evaluated here: " + o.problem());
                return;
            }
            drawCurve(o.value().datasets().get(0), p);
        });
    }

    private void drawCurve(DatasetFit d, MapData.Position p) {
        YIntervalSeries points = new YIntervalSeries(d.sigmaFromData() ? "data ± σ (from the file)"
                : "data ± σ (from the residuals)");
        XYSeries model = new XYSeries("fit", false, true);
        for (int k = 0; k < d.x().length; k++) {
            points.add(d.x()[k], d.data()[k], d.data()[k] - d.sigma()[k], d.data()[k] + d.sigma()[k]);
            model.add(d.x()[k], d.model()[k]);
        }
        YIntervalSeriesCollection pointSet = new YIntervalSeriesCollection();
        pointSet.addSeries(points);
        XYErrorRenderer bars = new XYErrorRenderer();
        bars.setDefaultLinesVisible(false);
        bars.setSeriesPaint(0, PlotLook.DATA);
        bars.setErrorPaint(PlotLook.DATA);
        XYLineAndShapeRenderer line = new XYLineAndShapeRenderer(true, false);
        line.setSeriesPaint(0, PlotLook.MODEL);
        XYPlot plot = new XYPlot(pointSet, PlotLook.xAxis(Words.x(d.xColumn(), technique()),
                SignalCurve.logarithmic(d.xColumn()), d.x()), PlotLook.linear(Words.signal(d.signal())), bars);
        plot.setDataset(1, new XYSeriesCollection(model));
        plot.setRenderer(1, line);
        curveCanvas.setChart(PlotLook.chart(String.format(Locale.ROOT, "(%s, %s) µm · χ²ᵣ %s", num(p.xM() * 1e6),
                num(p.yM() * 1e6), num(d.reducedChiSquare())), plot, true));
    }

    /** Names of the free inputs as the images and map.csv give them, with their units. */
    static List<String> names(CurveFit fit) {
        List<String> names = new ArrayList<>();
        for (ParameterRef p : fit.free()) {
            names.add(p.toString());
        }
        return names;
    }
}
