package lamella.ui.panels;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import lamella.api.HeatingGeometry;
import lamella.api.ParameterSpec;
import lamella.api.Technique;
import lamella.api.data.DataImporter;
import lamella.api.fit.DatasetFit;
import lamella.ui.api.PanelView;
import lamella.ui.api.Project;
import lamella.ui.api.Workbench;
import lamella.ui.charts.ChartCanvas;
import lamella.ui.charts.PlotLook;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.Text;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * The Datasets panel: every dataset of the fit in one table, numbered as the case file, the report and the
 * commands number them (from 0), with its file, technique, signal, points, fitted x range, the points left out and
 * where its σ comes from; and for the chosen one its own settings — the technique and geometry blocks (its own or
 * the case's), the fitted x range, the ranges left out and the σ source, each editable as one undoable step — and
 * its data drawn with σ bars, the points left out in grey.
 */
final class DatasetsView implements PanelView {

    static final String WHERE = "the Datasets panel";
    private static final String SHOWN = "lamella.shown";
    private static final String[] WEIGHTS = {"the fit block's", "auto", "data", "residuals"};

    private final Workbench workbench;
    private final Project project;
    private final Composite root;
    private final Table list;
    private final Group fitting;
    private final Text from;
    private final Text to;
    private final Text leftOut;
    private final Combo weights;
    private static final String NO_GAIN = "(none)";
    private static final List<String> NO_GAIN_SIGNALS = List.of("phase_deg", "ratio");
    private static final String GAIN_TIP = "a named gain of the fit (Set-up panel) that multiplies this dataset's"
            + " modelled signal; (none): the signal as modelled";
    private final Label sampleLabel;
    private final Combo sample;
    private final Combo gain;
    private final StatusLine rangeProblem;
    private final BlockEditor technique;
    private final BlockEditor geometry;
    private final StatusLine status;
    private final ChartCanvas chart;
    private final Composite editors;
    private static final int MIN_SCROLL_HEIGHT = 120;
    private final ScrolledComposite scroll;
    private final DataFiles files = new DataFiles();
    private final LatestOnly<Outcome<List<DatasetPoints>>> work;
    private final Project.Listener listener = c -> refresh();
    private int selected;
    private List<DatasetPoints> points = List.of();

    DatasetsView(Composite parent, Workbench workbench) {
        this.workbench = workbench;
        this.project = workbench.project();
        this.work = new LatestOnly<>(workbench, "Read the datasets");
        root = new Composite(parent, SWT.NONE);
        root.setLayout(new GridLayout(2, false));
        list = Tables.create(root);
        GridData lgd = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
        lgd.heightHint = 96;
        list.setLayoutData(lgd);
        list.addListener(SWT.Selection, e -> {
            if (list.getSelectionIndex() >= 0) {
                selected = list.getSelectionIndex();
                refresh();
            }
        });
        scroll = new ScrolledComposite(root, SWT.V_SCROLL);
        Tables.startWithRoom(scroll);
        GridData sgd = new GridData(SWT.FILL, SWT.FILL, false, true);
        sgd.widthHint = 430;
        // Never laid out shorter than its scroll bar can be drawn (GTK warns about a negative size otherwise).
        sgd.minimumHeight = MIN_SCROLL_HEIGHT;
        scroll.setLayoutData(sgd);
        scroll.setExpandHorizontal(true);
        scroll.setExpandVertical(true);
        editors = new Composite(scroll, SWT.NONE);
        editors.setLayout(new GridLayout(1, false));
        scroll.setContent(editors);
        fitting = new Group(editors, SWT.NONE);
        fitting.setText("Fitted points");
        fitting.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        fitting.setLayout(new GridLayout(2, false));
        from = field(fitting, "fit from:", "the smallest x fitted, with its unit (100 ps, 1 kHz); empty: from the"
                + " first point");
        to = field(fitting, "fit to:", "the largest x fitted, with its unit (4 ns, 20 MHz); empty: to the last"
                + " point");
        leftOut = field(fitting, "leave out:", "ranges of x left out of the fit, such as 0 ps to 80 ps; 1.2 ns to"
                + " 1.3 ns; empty: none");
        for (Text t : List.of(from, to, leftOut)) {
            t.addListener(SWT.DefaultSelection, e -> takeRows());
            t.addListener(SWT.FocusOut, e -> takeRows());
        }
        Label wl = new Label(fitting, SWT.NONE);
        wl.setText("σ per point from:");
        weights = new Combo(fitting, SWT.READ_ONLY);
        weights.setItems(WEIGHTS);
        weights.setToolTipText("data: the file's σ columns; residuals: estimated from the fit's residuals; auto:"
                + " the data's where present, else the residuals'");
        weights.addListener(SWT.Selection, e -> takeWeights());
        sampleLabel = new Label(fitting, SWT.NONE);
        sampleLabel.setText("measured on sample:");
        sampleLabel.setLayoutData(new GridData(SWT.LEFT, SWT.CENTER, false, false));
        sample = new Combo(fitting, SWT.READ_ONLY);
        sample.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        sample.setToolTipText("the sample these data were measured on; its stack (and own geometry) model them");
        sample.addListener(SWT.Selection, e -> takeSample());
        Label gl = new Label(fitting, SWT.NONE);
        gl.setText("gain:");
        gain = new Combo(fitting, SWT.READ_ONLY);

        gain.addListener(SWT.Selection, e -> takeGain());
        rangeProblem = new StatusLine(fitting, 2);
        technique = new BlockEditor(editors, project, "Technique", "measurement", 0,
                workbench.catalog().techniques().stream().map(Technique::type).toList(), this::techniqueSpecs,
                t -> workbench.catalog().technique(t).map(Technique::summary).orElse(""));
        geometry = new BlockEditor(editors, project, "Heating geometry", "geometry", 0,
                workbench.catalog().geometries().stream().map(HeatingGeometry::type).toList(),
                g -> workbench.catalog().geometry(g).map(HeatingGeometry::parameters).orElse(List.of()),
                g -> workbench.catalog().geometry(g).map(HeatingGeometry::summary).orElse(""));
        Composite right = new Composite(root, SWT.NONE);
        right.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        right.setLayout(new GridLayout(1, false));
        status = new StatusLine(right, 1);
        chart = new ChartCanvas(right, SWT.NONE);
        GridData cgd = new GridData(SWT.FILL, SWT.FILL, true, true);
        cgd.widthHint = 300;
        cgd.heightHint = 260;
        chart.setLayoutData(cgd);
        project.addListener(listener);
        refresh();
    }

    @Override
    public Control control() {
        return root;
    }

    @Override
    public void close() {
        project.removeListener(listener);
        work.cancel();
    }

    Table list() {
        return list;
    }

    Text from() {
        return from;
    }

    Text to() {
        return to;
    }

    Text leftOut() {
        return leftOut;
    }

    Combo weights() {
        return weights;
    }

    Combo sample() {
        return sample;
    }

    Combo gain() {
        return gain;
    }

    BlockEditor technique() {
        return technique;
    }

    String statusText() {
        return status.text();
    }

    ChartCanvas chart() {
        return chart;
    }

    /** Chooses a dataset as a click on its row does. */
    void select(int index) {
        list.setSelection(index);
        list.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
    }

    /** A technique's parameters but its x list: a dataset's x values come from its data. */
    private List<ParameterSpec> techniqueSpecs(String type) {
        Optional<Technique> t = workbench.catalog().technique(type);
        String x = t.flatMap(Technique::xParameter).orElse("");
        return t.map(Technique::parameters).orElse(List.of()).stream().filter(p -> !p.key().equals(x)).toList();
    }

    private static Text field(Composite parent, String label, String tip) {
        Label l = new Label(parent, SWT.NONE);
        l.setText(label);
        Text t = new Text(parent, SWT.BORDER);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        gd.widthHint = 200;
        t.setLayoutData(gd);
        t.setToolTipText(tip);
        t.setMessage(tip.substring(tip.indexOf("empty:")));
        return t;
    }

    private void refresh() {
        if (root.isDisposed()) {
            return;
        }
        List<ObjectNode> ds = project.datasets();
        if (ds.isEmpty()) {
            Tables.fill(list, headings(), List.of());
            status.show("No datasets yet: drop a data file on the window or use File ▸ Import data….",
                    StatusLine.Tone.PLAIN);
            chart.setChart(null);
            editors.setEnabled(false);
            return;
        }
        editors.setEnabled(true);
        selected = Math.min(selected, ds.size() - 1);
        ObjectNode tree = project.tree();
        showSettings(tree, ds.get(selected));
        List<DatasetPoints.Request> requests = new ArrayList<>();
        for (int i = 0; i < ds.size(); i++) {
            requests.add(DatasetPoints.request(tree, i, workbench.catalog()));
        }
        fillTable(requests, points);
        List<DataImporter> importers = workbench.importers();
        work.submit(p -> DatasetPoints.readAll(requests, importers, files), new LatestOnly.View<>() {
            @Override
            public void done(Outcome<List<DatasetPoints>> o) {
                if (root.isDisposed()) {
                    return;
                }
                if (!o.ok()) {
                    status.show("The data could not be read: " + o.problem(), StatusLine.Tone.PROBLEM);
                    return;
                }
                points = o.value();
                fillTable(requests, points);
                draw();
            }

            @Override
            public void problem(String problem) {
                status.show("The data could not be read: " + problem, StatusLine.Tone.PROBLEM);
            }

            @Override
            public void stopped() {
                status.show("Stopped reading the data; change a value or choose a dataset to read it again.",
                        StatusLine.Tone.CAUTION);
            }

            @Override
            public void slow() {
                status.show("Reading the data…", StatusLine.Tone.PLAIN);
            }
        });
    }

    private static String[] headings() {
        return new String[] {"Dataset", "Data file", "Technique", "Signal", "Points", "Fitted x range", "Left out",
            "σ from"};
    }

    private void fillTable(List<DatasetPoints.Request> requests, List<DatasetPoints> read) {
        List<String[]> rows = new ArrayList<>();
        for (int i = 0; i < requests.size(); i++) {
            DatasetPoints.Request r = requests.get(i);
            DatasetPoints p = i < read.size() && read.get(i).request().equals(r) ? read.get(i) : null;
            rows.add(new String[] {Integer.toString(i), r.file().getFileName().toString(), r.technique(),
                r.signal(), p == null ? "…" : Integer.toString(p.x().length),
                p == null ? r.rangeWords() : p.fittedRangeWords(), p == null ? "…" : p.leftOutWords(),
                p == null ? r.weightsWords() : p.sigmaWords()});
        }
        Tables.fill(list, headings(), rows);
        if (selected < list.getItemCount()) {
            list.setSelection(selected);
        }
    }

    private void showSettings(ObjectNode tree, ObjectNode d) {
        String name = "dataset " + selected + " · " + Path.of(d.path("data").asText("?")).getFileName();
        fitting.setText("Fitted points of " + name);
        technique.dataset(selected, "Technique of " + name);
        geometry.dataset(selected, "Heating geometry of " + name);
        technique.show(d.has("measurement") ? d.get("measurement") : tree.path("measurement"),
                d.has("measurement"));
        geometry.show(d.has("geometry") ? d.get("geometry") : tree.path("geometry"), d.has("geometry"));
        String x = DatasetPoints.xColumn(tree, d, workbench.catalog());
        JsonNode range = d.path("x_range");
        show(from, range.isArray() && range.size() == 2 ? DatasetPoints.format(range.get(0).asDouble(), x) : "");
        show(to, range.isArray() && range.size() == 2 ? DatasetPoints.format(range.get(1).asDouble(), x) : "");
        List<String> out = new ArrayList<>();
        for (JsonNode r : d.path("exclude")) {
            if (r.isArray() && r.size() == 2) {
                out.add(DatasetPoints.format(r.get(0).asDouble(), x) + " to "
                        + DatasetPoints.format(r.get(1).asDouble(), x));
            }
        }
        show(leftOut, String.join("; ", out));
        String w = d.path("weights").asText("");
        weights.select(w.isEmpty() ? 0 : Math.max(0, List.of(WEIGHTS).indexOf(w)));
        List<String> samples = project.sampleNames();
        boolean several = !samples.isEmpty();
        for (Control c : List.of(sampleLabel, sample)) {
            ((GridData) c.getLayoutData()).exclude = !several;
            c.setVisible(several);
        }
        sample.setItems(samples.toArray(String[]::new));
        sample.select(samples.indexOf(d.path("sample").asText()));
        List<String> gains = new ArrayList<>();
        gains.add(NO_GAIN);
        tree.path("fit").path("gains").fieldNames().forEachRemaining(gains::add);
        gain.setItems(gains.toArray(String[]::new));
        gain.select(Math.max(0, gains.indexOf(d.path("gain").asText(NO_GAIN))));
        // A phase or the TDTR ratio carries no detector gain: the fit refuses one there, so it is not offered.
        String signal = DatasetPoints.request(tree, selected, workbench.catalog()).signal();
        boolean scales = !NO_GAIN_SIGNALS.contains(signal);
        gain.setEnabled(gains.size() > 1 && (scales || d.has("gain")));
        gain.setToolTipText(scales ? GAIN_TIP : "the " + signal + " signal carries no detector gain; a gain is for"
                + " an amplitude or a voltage");
        editors.layout(true, true);
        scroll.setMinSize(editors.computeSize(SWT.DEFAULT, SWT.DEFAULT));
    }

    /**
     * A field keeps what is being typed into it; one that still says what it was last given takes the new value,
     * also with the focus (an undo while the cursor is in it).
     */
    private void show(Text t, String text) {
        String before = (String) t.getData(SHOWN);
        boolean typing = t.isFocusControl() && before != null && !t.getText().equals(before);
        if (!typing && !t.getText().equals(text)) {
            t.setText(text);
        }
        t.setData(SHOWN, typing ? before : text);
    }

    private void takeRows() {
        List<ObjectNode> ds = project.datasets();
        if (selected >= ds.size()) {
            return;
        }
        ObjectNode d = ds.get(selected);
        String x = DatasetPoints.xColumn(project.tree(), d, workbench.catalog());
        try {
            JsonNode range = rangeNode(from.getText().strip(), to.getText().strip(), x);
            JsonNode exclude = excludeNode(leftOut.getText().strip(), x);
            rangeProblem.show("", StatusLine.Tone.PLAIN);
            for (Text t : List.of(from, to, leftOut)) {
                t.setData(SHOWN, t.getText());
            }
            if (!java.util.Objects.equals(range, d.get("x_range"))) {
                project.setDatasetKey(selected, "x_range", range, range == null ? "fit the whole x range"
                        : "set the fitted x range");
            }
            if (!java.util.Objects.equals(exclude, d.get("exclude"))) {
                project.setDatasetKey(selected, "exclude", exclude, exclude == null ? "leave out no points"
                        : "set the ranges left out");
            }
        } catch (QuantityText.Refusal e) {
            rangeProblem.show(e.getMessage(), StatusLine.Tone.PROBLEM);
        }
    }

    private JsonNode rangeNode(String a, String b, String x) throws QuantityText.Refusal {
        if (a.isEmpty() && b.isEmpty()) {
            return null;
        }
        double lo = a.isEmpty() ? 0 : DatasetPoints.parse(a, x);
        double hi = b.isEmpty() ? Double.NaN : DatasetPoints.parse(b, x);
        if (b.isEmpty()) {
            DatasetPoints shownPoints = selected < points.size() ? points.get(selected) : null;
            if (shownPoints == null || shownPoints.allX().length == 0) {
                throw new QuantityText.Refusal("give both ends of the fitted range (the data are not read yet)");
            }
            double[] all = shownPoints.allX();
            hi = all[all.length - 1];
        }
        if (!(hi > lo)) {
            throw new QuantityText.Refusal("the fitted range ends below its start");
        }
        ArrayNode n = JsonNodeFactory.instance.arrayNode();
        n.add(lo);
        n.add(hi);
        return n;
    }

    private static JsonNode excludeNode(String text, String x) throws QuantityText.Refusal {
        if (text.isEmpty()) {
            return null;
        }
        ArrayNode all = JsonNodeFactory.instance.arrayNode();
        for (String part : text.split(";")) {
            String[] ends = part.strip().split("\\s+to\\s+");
            if (ends.length != 2) {
                throw new QuantityText.Refusal("'" + part.strip() + "': write a range left out as FROM to TO, such"
                        + " as 0 ps to 80 ps; ranges apart by ;");
            }
            double lo = DatasetPoints.parse(ends[0], x);
            double hi = DatasetPoints.parse(ends[1], x);
            if (!(hi >= lo)) {
                throw new QuantityText.Refusal("'" + part.strip() + "' ends below its start");
            }
            ArrayNode r = all.addArray();
            r.add(lo);
            r.add(hi);
        }
        return all;
    }

    private void takeSample() {
        int i = sample.getSelectionIndex();
        if (i >= 0) {
            String name = sample.getItem(i);
            project.setDatasetKey(selected, "sample", JsonNodeFactory.instance.textNode(name),
                    "set the sample to '" + name + "'");
        }
    }

    private void takeGain() {
        int i = gain.getSelectionIndex();
        String name = i <= 0 ? null : gain.getItem(i);
        project.setDatasetKey(selected, "gain", name == null ? null : JsonNodeFactory.instance.textNode(name),
                name == null ? "remove the gain" : "set the gain to '" + name + "'");
    }

    private void takeWeights() {
        int i = weights.getSelectionIndex();
        project.setDatasetKey(selected, "weights", i <= 0 ? null : JsonNodeFactory.instance.textNode(WEIGHTS[i]),
                i <= 0 ? "take σ as the fit block says" : "take σ from " + WEIGHTS[i]);
    }

    /** The chosen dataset's points with σ bars, those left out in grey; after a fit, its σ where the data had none. */
    private void draw() {
        if (selected >= points.size()) {
            chart.setChart(null);
            return;
        }
        DatasetPoints p = points.get(selected);
        Optional<DatasetFit> fit = project.lastFit().flatMap(o -> o.datasets().stream()
                .filter(d -> d.index() == p.index() && d.signal().equals(p.request().signal())).findFirst());
        YIntervalSeries kept = new YIntervalSeries("fitted points ± σ");
        YIntervalSeries out = new YIntervalSeries("left out");
        double[] sigma = p.sigma();
        String sigmaFrom = sigma != null ? "the data's σ" : "no σ in the data";
        if (sigma == null && fit.isPresent() && fit.get().x().length > 0) {
            sigma = p.sigmaFromFit(fit.get());
            sigmaFrom = "σ estimated from the last fit's residuals";
        }
        for (int i = 0; i < p.x().length; i++) {
            double s = sigma == null || Double.isNaN(sigma[i]) ? 0 : sigma[i];
            (p.fitted()[i] ? kept : out).add(p.x()[i], p.y()[i], p.y()[i] - s, p.y()[i] + s);
        }
        YIntervalSeriesCollection set = new YIntervalSeriesCollection();
        set.addSeries(kept);
        set.addSeries(out);
        XYErrorRenderer r = new XYErrorRenderer();
        r.setDrawXError(false);
        r.setDefaultLinesVisible(false);
        r.setSeriesShape(0, new Ellipse2D.Double(-3, -3, 6, 6));
        r.setSeriesShape(1, new Ellipse2D.Double(-3, -3, 6, 6));
        r.setSeriesPaint(0, PlotLook.DATA);
        r.setSeriesPaint(1, PlotLook.REFERENCE);
        r.setSeriesShapesFilled(1, false);
        r.setErrorStroke(new BasicStroke(1f));
        boolean log = SignalCurve.logarithmic(p.request().xColumn());
        XYPlot plot = new XYPlot(set, PlotLook.xAxis(Words.x(p.request().xColumn(), p.request().technique()), log,
                p.x()), PlotLook.linear(Words.signal(p.request().signal())), r);
        chart.setChart(PlotLook.chart(null, plot, true));
        status.show("dataset " + p.index() + ": " + p.x().length + " points of " + p.request().signal() + ", "
                + p.leftOutWords() + " left out; bars: " + sigmaFrom + ".", StatusLine.Tone.PLAIN);
    }
}
