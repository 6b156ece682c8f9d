package lamella.ui.panels;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import lamella.api.CaseModel;
import lamella.api.Layer;
import lamella.api.ParameterRef;
import lamella.ui.api.PanelView;
import lamella.ui.api.Project;
import lamella.ui.api.Workbench;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.custom.CCombo;
import org.eclipse.swt.custom.TableEditor;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;

/**
 * The Stack panel: one row per layer from the heated surface down; a click on a value edits it in place, and the
 * strip below sets the selected value's role in a fit (fixed, free, or uncertain by a relative σ).
 */
final class StackView implements PanelView {

    private static final int NAME = 0;
    private static final int MATERIAL = 1;
    private static final int FIRST_VALUE = 2;
    private static final String EXPLICIT = "(own values)";
    private static final String[] ROLES = {"fixed", "free", "uncertain ± σ"};

    private final Workbench workbench;
    private final Project project;
    private final Composite root;
    private final Table table;
    private final TableEditor editor;
    private final StatusLine status;
    private final Label selectedLabel;
    private final Combo roleCombo;
    /** The sample whose stack is shown, and the means to add, rename and remove samples. */
    private final Composite sampleRow;
    private final Combo sampleCombo;
    private final Text sampleName;
    private final Text sigmaText;
    /** The top layer's depths of heating and of reading (layers[0] only); blank: at the surface. */
    private static final List<LayerColumn> DEPTHS = List.of(
            new LayerColumn("absorption_depth_m", "absorption depth", "the depth over which the top layer absorbs"
                    + " the pump, heating as e^(−z/δ); blank: heated at its surface", DisplayUnit.of(
                    "absorption_depth_m", true)),
            new LayerColumn("sensing_depth_m", "sensing depth", "the depth over which the top layer's temperature"
                    + " is read, weighted as e^(−z/δ); blank: read at its surface", DisplayUnit.of("sensing_depth_m",
                    true)));
    private final Label topLabel;
    private final Text[] depthText = new Text[DEPTHS.size()];
    private final Label[] depthRole = new Label[DEPTHS.size()];
    private final CrossSection drawing;
    private final Project.Listener listener = c -> refresh();
    /** The unit chosen for each value column, kept for the session. */
    private static final Map<Integer, DisplayUnit> CHOSEN_UNITS = new ConcurrentHashMap<>();
    private final DisplayUnit[] units = new DisplayUnit[LayerColumn.VALUES.size()];
    /** Layer names by table row: those above the heated plane (outermost first), then those of layers. */
    private List<String> names = List.of();
    private int aboveCount;
    private final Combo topCombo;
    private static final String[] TOPS = {"semi-infinite", "adiabatic", "isothermal"};
    private ParameterRef selected;
    private boolean projectProblemShown;

    StackView(Composite parent, Workbench workbench) {
        this.workbench = workbench;
        this.project = workbench.project();
        root = new Composite(parent, SWT.NONE);
        root.setLayout(new GridLayout(1, false));
        sampleRow = new Composite(root, SWT.NONE);
        GridLayout srl = new GridLayout(6, false);
        srl.marginWidth = 0;
        srl.marginHeight = 0;
        sampleRow.setLayout(srl);
        sampleRow.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        new Label(sampleRow, SWT.NONE).setText("Sample:");
        sampleCombo = new Combo(sampleRow, SWT.READ_ONLY);
        sampleCombo.setToolTipText("the sample whose stack this panel shows and edits; a role set here names the"
                + " layer in every sample that has it");
        sampleCombo.addListener(SWT.Selection, e -> {
            if (sampleCombo.getSelectionIndex() >= 0 && !project.sampleNames().isEmpty()) {
                project.showSample(sampleCombo.getSelectionIndex());
            }
        });
        sampleName = new Text(sampleRow, SWT.BORDER);
        GridData ngd = new GridData(SWT.FILL, SWT.CENTER, false, false);
        ngd.widthHint = 110;
        sampleName.setLayoutData(ngd);
        sampleName.setMessage("name");
        sampleName.setToolTipText("the name for Add sample or Rename: not blank, without '[', ']' or control"
                + " characters, not used by another sample");
        button(sampleRow, "Add sample", this::addSample);
        button(sampleRow, "Rename", this::renameSample);
        button(sampleRow, "Remove sample", this::removeSample);
        // The table on top across the whole width, so that every column stays in view; the drawing below it.
        SashForm sash = new SashForm(root, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        Composite left = new Composite(sash, SWT.NONE);
        left.setLayout(new GridLayout(1, false));
        table = new Table(left, SWT.BORDER | SWT.FULL_SELECTION | SWT.SINGLE | SWT.H_SCROLL | SWT.V_SCROLL);
        Tables.startWithRoom(table);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        GridData tgd = new GridData(SWT.FILL, SWT.FILL, true, true);
        tgd.heightHint = 120;
        table.setLayoutData(tgd);
        Tables.keepLeastHeight(table);
        column("layer", 80);
        column("material", 90);
        for (int c = 0; c < LayerColumn.VALUES.size(); c++) {
            units[c] = CHOSEN_UNITS.getOrDefault(c, LayerColumn.VALUES.get(c).unit());
            TableColumn tc = column(heading(c), 80);
            int index = c;
            tc.setToolTipText(LayerColumn.VALUES.get(c).meaning() + "; click to choose the unit (the case file stays"
                    + " in SI)");
            tc.addListener(SWT.Selection, e -> chooseUnit(index));
        }
        editor = new TableEditor(table);
        editor.grabHorizontal = true;
        table.addListener(SWT.MouseDown, e -> clicked(new Point(e.x, e.y)));
        Composite buttons = new Composite(left, SWT.NONE);
        GridLayout bl = new GridLayout(7, false);
        bl.marginWidth = 0;
        buttons.setLayout(bl);
        buttons.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        button(buttons, "Add layer", this::addLayer);
        button(buttons, "Remove layer", this::removeLayer);
        button(buttons, "Move up", () -> move(-1));
        button(buttons, "Move down", () -> move(1));
        button(buttons, "Add layer above", this::addLayerAbove).setToolTipText("a layer above the heated plane"
                + " (stack.above: a window, a liquid, a second solid), next to the plane; heat then flows both ways");
        Label tl = new Label(buttons, SWT.NONE);
        tl.setText("top:");
        tl.setToolTipText("beyond the outermost layer above (stack.top): semi-infinite (that layer has no"
                + " thickness), adiabatic or isothermal (it needs one); only with layers above");
        topCombo = new Combo(buttons, SWT.READ_ONLY);
        topCombo.setItems(TOPS);
        topCombo.setToolTipText(tl.getToolTipText());
        topCombo.addListener(SWT.Selection, e -> takeTop());
        Composite depths = new Composite(left, SWT.NONE);
        depths.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        GridLayout dl = new GridLayout(7, false);
        dl.marginWidth = 0;
        dl.marginHeight = 0;
        depths.setLayout(dl);
        topLabel = new Label(depths, SWT.NONE);
        for (int i = 0; i < DEPTHS.size(); i++) {
            depthText[i] = depthField(depths, i);
            depthRole[i] = new Label(depths, SWT.NONE);
            depthRole[i].setLayoutData(new GridData(SWT.LEFT, SWT.CENTER, i == DEPTHS.size() - 1, false));
        }
        Composite strip = new Composite(left, SWT.NONE);
        strip.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        GridLayout sl0 = new GridLayout(5, false);
        sl0.marginWidth = 0;
        strip.setLayout(sl0);
        selectedLabel = new Label(strip, SWT.NONE);
        selectedLabel.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        roleCombo = new Combo(strip, SWT.READ_ONLY);
        roleCombo.setItems(ROLES);
        Label sl = new Label(strip, SWT.NONE);
        sl.setText("σ (% of value):");
        sigmaText = new Text(strip, SWT.BORDER | SWT.RIGHT);
        GridData sgd = new GridData(SWT.LEFT, SWT.CENTER, false, false);
        sgd.widthHint = 60;
        sigmaText.setLayoutData(sgd);
        button(strip, "Set role", this::applyRole);
        status = new StatusLine(left, 1);
        drawing = new CrossSection(sash);
        // The table and its controls take most of the height, so that five or six layers stay in view at 1280×800.
        sash.setWeights(new int[] {70, 30});
        select(null);
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
    }

    Table table() {
        return table;
    }

    String statusText() {
        return status.text();
    }

    private static final int COLUMN_PADDING = 2;

    private TableColumn column(String heading, int width) {
        TableColumn c = new TableColumn(table, SWT.LEFT);
        c.setText(heading);
        c.pack();
        c.setWidth(Math.max(c.getWidth() + COLUMN_PADDING, width));
        return c;
    }

    private String heading(int valueColumn) {
        LayerColumn c = LayerColumn.VALUES.get(valueColumn);
        return c.words() + " (" + units[valueColumn].unit() + ")";
    }

    /** A click on a value column's heading offers the units of its quantity. */
    private void chooseUnit(int valueColumn) {
        List<DisplayUnit> choices = DisplayUnit.choices(LayerColumn.VALUES.get(valueColumn).key());
        if (choices.size() < 2) {
            return;
        }
        Menu menu = new Menu(table);
        for (DisplayUnit u : choices) {
            MenuItem item = new MenuItem(menu, SWT.RADIO);
            item.setText(u.unit());
            item.setSelection(u.equals(units[valueColumn]));
            item.addListener(SWT.Selection, e -> {
                if (item.getSelection()) {
                    useUnit(valueColumn, u);
                }
            });
        }
        menu.setVisible(true);
    }

    /** Shows a value column in another unit (also for tests, as the heading's menu would). */
    void useUnit(int valueColumn, DisplayUnit u) {
        units[valueColumn] = u;
        CHOSEN_UNITS.put(valueColumn, u);
        table.getColumn(FIRST_VALUE + valueColumn).setText(heading(valueColumn));
        refresh();
    }

    /**
     * Every column as wide as its heading or its widest cell, so that nothing in the table is cut; GTK's own cell
     * padding is enough, a few pixels more keep the seven columns within the left column at 1280 px.
     */
    private void fitColumns() {
        for (TableColumn c : table.getColumns()) {
            c.pack();
            c.setWidth(c.getWidth() + COLUMN_PADDING);
        }
    }

    /** The sample chooser: the case's sample names when it has a samples list, else its one stack. */
    private void showSamples() {
        List<String> samples = project.sampleNames();
        List<String> items = samples.isEmpty() ? List.of(ONE_STACK) : samples;
        if (!List.of(sampleCombo.getItems()).equals(items)) {
            sampleCombo.setItems(items.toArray(String[]::new));
            sampleRow.layout(true);
        }
        sampleCombo.setEnabled(!samples.isEmpty());
        if (sampleCombo.getSelectionIndex() != Math.min(project.shownSample(), items.size() - 1)) {
            sampleCombo.select(Math.min(project.shownSample(), items.size() - 1));
        }
    }

    private static final String ONE_STACK = "(the case's one stack)";

    Text sampleName() {
        return sampleName;
    }

    Combo sampleCombo() {
        return sampleCombo;
    }

    /** A copy of the shown sample under the name typed; the first turns a one-stack case into samples. */
    void addSample() {
        String name = sampleName.getText().strip();
        Optional<String> problem = project.sampleNameProblem(name, -1);
        if (problem.isPresent()) {
            status.show("Sample name \"" + name + "\": " + problem.get(), StatusLine.Tone.PROBLEM);
            return;
        }
        boolean convert = project.sampleNames().isEmpty();
        project.addSample(name);
        sampleName.setText("");
        status.show("Added sample '" + name + "', a copy of " + (convert ? "the stack, now sample '"
                + Project.FIRST_SAMPLE + "'" : "the one shown") + "; its data name it in Datasets ▸ sample.",
                StatusLine.Tone.CAUTION);
    }

    void renameSample() {
        if (project.sampleNames().isEmpty()) {
            status.show("The case has one stack and no samples to rename; Add sample makes it a case of samples.",
                    StatusLine.Tone.CAUTION);
            return;
        }
        String name = sampleName.getText().strip();
        int i = project.shownSample();
        if (name.equals(project.sampleNames().get(i))) {
            return;
        }
        Optional<String> problem = project.sampleNameProblem(name, i);
        if (problem.isPresent()) {
            status.show("Sample name \"" + name + "\": " + problem.get(), StatusLine.Tone.PROBLEM);
            return;
        }
        project.renameSample(i, name);
        sampleName.setText("");
        status.show("", StatusLine.Tone.PLAIN);
    }

    /** Asks first; refuses, saying why, the only sample and one that datasets still name. */
    void removeSample() {
        List<String> samples = project.sampleNames();
        if (samples.size() < 2) {
            status.show("A case needs a sample: the " + (samples.isEmpty() ? "one stack" : "only sample")
                    + " cannot be removed.", StatusLine.Tone.PROBLEM);
            return;
        }
        int i = project.shownSample();
        String name = samples.get(i);
        List<Integer> datasets = project.datasetsOf(name);
        if (!datasets.isEmpty()) {
            status.show("Sample '" + name + "' is not removed: dataset" + (datasets.size() == 1 ? " " : "s ")
                    + datasets.stream().map(String::valueOf).collect(java.util.stream.Collectors.joining(", "))
                    + " were measured on it; remove them or let them name another sample (Datasets panel) first.",
                    StatusLine.Tone.PROBLEM);
            return;
        }
        if (workbench.confirm("Remove sample", "Remove sample '" + name + "' and the fit inputs that name it?"
                + "\n\nEdit ▸ Undo brings it back.", "Remove sample")) {
            project.removeSample(i);
            status.show("", StatusLine.Tone.PLAIN);
        }
    }

    private Text depthField(Composite parent, int i) {
        LayerColumn c = DEPTHS.get(i);
        Label l = new Label(parent, SWT.NONE);
        l.setText(c.words() + " (" + c.unit().unit() + "):");
        l.setToolTipText(c.meaning());
        Text t = new Text(parent, SWT.BORDER | SWT.RIGHT);
        GridData gd = new GridData(SWT.LEFT, SWT.CENTER, false, false);
        gd.widthHint = 60;
        t.setLayoutData(gd);
        t.setToolTipText(c.meaning() + "; click it to set its role in a fit below");
        t.setMessage("not set");
        Object[] visit = {new Object()};
        t.addListener(SWT.FocusIn, e -> {
            visit[0] = new Object();
            if (names.size() > aboveCount) {
                select(ParameterRef.layer(names.get(aboveCount), c.key()));
            }
        });
        t.addListener(SWT.Modify, e -> {
            if (t.isFocusControl()) {
                takeDepth(i, t.getText(), visit[0], false);
            }
        });
        t.addListener(SWT.DefaultSelection, e -> takeDepth(i, t.getText(), visit[0], true));
        t.addListener(SWT.FocusOut, e -> takeDepth(i, t.getText(), visit[0], true));
        return t;
    }

    /** The depth field of the top layer, by key, for tests. */
    Text depth(String key) {
        return depthText[DEPTHS.stream().map(LayerColumn::key).toList().indexOf(key)];
    }

    /**
     * A depth typed in its field (nm unless the text names a unit), or blank for none, which removes the key; a
     * depth that is not positive is refused in words. True when taken.
     */
    boolean takeDepth(int i, String text, Object visit, boolean finishing) {
        if (names.size() <= aboveCount) {
            return false;
        }
        LayerColumn c = DEPTHS.get(i);
        String top = names.get(aboveCount);
        ParameterRef ref = ParameterRef.layer(top, c.key());
        String where = top + " · " + c.words() + " (" + c.unit().unit() + "): ";
        if (text.isBlank()) {
            if (project.stackTree().path("layers").path(0).has(c.key())) {
                if (project.role(ref) != Project.Role.FIXED) {
                    if (finishing) {
                        status.show(where + "a free or uncertain depth needs a value; fix it first to leave it"
                                + " unset", StatusLine.Tone.PROBLEM);
                    }
                    return false;
                }
                project.put(ref, null, visit);
            }
            status.show("", StatusLine.Tone.PLAIN);
            return true;
        }
        double si = positive(text, c.key(), c.unit(), where, finishing,
                "a depth is positive (blank: at the surface)");
        if (Double.isNaN(si)) {
            return false;
        }
        status.show("", StatusLine.Tone.PLAIN);
        project.set(ref, si, visit);
        return true;
    }

    private void showDepths(JsonNode layers) {
        boolean any = names.size() > aboveCount;
        String first = any ? names.get(aboveCount) : "";
        topLabel.setText(any ? "Heated layer '" + first + "':" : "");
        for (int i = 0; i < DEPTHS.size(); i++) {
            LayerColumn c = DEPTHS.get(i);
            JsonNode v = layers.path(0).path(c.key());
            depthText[i].setEnabled(any);
            if (!depthText[i].isFocusControl()) {
                String shown = v.isNumber() ? NumberText.format(c.unit().shown(v.asDouble())) : "";
                if (!depthText[i].getText().equals(shown)) {
                    depthText[i].setText(shown);
                }
            }
            depthRole[i].setText(any ? roleMark(ParameterRef.layer(first, c.key())).strip() : "");
        }
        topLabel.getParent().layout(true);
    }

    private static Button button(Composite parent, String text, Runnable action) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        b.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, false, false));
        b.addListener(SWT.Selection, e -> action.run());
        return b;
    }

    private void refresh() {
        if (root.isDisposed()) {
            return;
        }
        showSamples();
        ObjectNode tree = project.stackTree();
        JsonNode layers = tree.path(Project.LAYERS);
        // Rows from the top of the drawing down: the layers above the heated plane outermost first, then layers.
        List<JsonNode> rows = new ArrayList<>();
        JsonNode above = tree.path(Project.ABOVE);
        for (int i = above.size() - 1; i >= 0; i--) {
            rows.add(above.get(i));
        }
        layers.forEach(rows::add);
        aboveCount = above.size();
        List<String> now = new ArrayList<>();
        rows.forEach(l -> now.add(l.path("name").asText()));
        names = now;
        Optional<CaseModel> model = project.model();
        int keep = table.getSelectionIndex();
        // Rows are rewritten in place, so that a cell being edited keeps its editor.
        while (table.getItemCount() > names.size()) {
            table.remove(table.getItemCount() - 1);
        }
        while (table.getItemCount() < names.size()) {
            new TableItem(table, SWT.NONE);
        }
        for (int i = 0; i < names.size(); i++) {
            JsonNode node = rows.get(i);
            TableItem item = table.getItem(i);
            item.setText(NAME, (i < aboveCount ? "↑ " : "") + names.get(i)
                    + (i == aboveCount && aboveCount > 0 ? " ◂ heated" : ""));
            item.setText(MATERIAL, node.path("material").asText(EXPLICIT));
            String name = names.get(i);
            Optional<Layer> resolved = model.flatMap(m -> m.stack().layer(name));
            for (int c = 0; c < LayerColumn.VALUES.size(); c++) {
                item.setText(FIRST_VALUE + c, cell(names.get(i), c, resolved, node));
            }
        }
        fitColumns();
        showDepths(layers);
        showTop(tree);
        if (keep >= 0 && keep < names.size()) {
            table.setSelection(keep);
        }
        model.ifPresent(m -> drawing.show(m.stack()));
        if (project.problem().isPresent()) {
            status.show("The case as edited has a problem (the drawing shows the last valid stack): "
                    + Words.problem(project.problem().get()), StatusLine.Tone.PROBLEM);
            projectProblemShown = true;
        } else if (projectProblemShown) {
            status.show("", StatusLine.Tone.PLAIN);
            projectProblemShown = false;
        }
    }

    private String cell(String layer, int valueColumn, Optional<Layer> resolved, JsonNode node) {
        LayerColumn c = LayerColumn.VALUES.get(valueColumn);
        ParameterRef ref = ParameterRef.layer(layer, c.key());
        double v = resolved.map(l -> value(l, c.key())).orElse(node.path(c.key()).asDouble(Double.NaN));
        String text;
        if (Double.isInfinite(v)) {
            text = c.key().equals("thickness_m") ? "semi-infinite" : "perfect contact";
        } else {
            text = NumberText.format(units[valueColumn].shown(v));
        }
        if (!node.has(c.key()) && node.has("material") && Double.isFinite(v)) {
            text += " (material)";
        }
        return text + roleMark(ref);
    }

    private String roleMark(ParameterRef ref) {
        return switch (project.role(ref)) {
            case FIXED -> "";
            case FREE -> " ▸ free";
            case UNCERTAIN -> {
                double s = project.relativeSigma(ref);
                yield Double.isNaN(s) ? " ± σ" : " ± " + NumberText.format(100 * s) + " %";
            }
        };
    }

    private static double value(Layer l, String key) {
        return switch (key) {
            case "thickness_m" -> l.thickness();
            case "k_through_w_mk" -> l.kThrough();
            case "k_in_plane_w_mk" -> l.kInPlaneX();
            case "heat_capacity_j_m3k" -> l.heatCapacity();
            default -> l.conductanceBelow();
        };
    }

    private void clicked(Point p) {
        TableItem item = table.getItem(p);
        if (item == null) {
            return;
        }
        int row = table.indexOf(item);
        for (int c = 0; c < table.getColumnCount(); c++) {
            if (item.getBounds(c).contains(p)) {
                if (c == MATERIAL) {
                    editMaterial(item, row);
                } else if (c >= FIRST_VALUE) {
                    select(ParameterRef.layer(names.get(row), LayerColumn.VALUES.get(c - FIRST_VALUE).key()));
                    editValue(item, row, c);
                }
                return;
            }
        }
    }

    private void editValue(TableItem item, int row, int column) {
        disposeEditor();
        Text t = new Text(table, SWT.NONE);
        String shown = item.getText(column);
        int cut = shown.indexOf(' ');
        String number = cut > 0 ? shown.substring(0, cut) : shown;
        t.setText(NumberText.parse(number) == null ? "" : number);
        t.selectAll();
        // One visit to the cell is one undoable step, however many keystrokes it takes.
        Object visit = new Object();
        t.addListener(SWT.Modify, e -> take(row, column, t.getText(), visit, false));
        t.addListener(SWT.DefaultSelection, e -> {
            if (take(row, column, t.getText(), visit, true)) {
                disposeEditor();
            }
        });
        t.addListener(SWT.Traverse, e -> {
            if (e.detail == SWT.TRAVERSE_ESCAPE) {
                disposeEditor();
            }
        });
        t.addListener(SWT.FocusOut, e -> {
            if (!t.isDisposed() && take(row, column, t.getText(), visit, true)) {
                disposeEditor();
            }
        });
        editor.setEditor(t, item, column);
        t.setFocus();
    }

    /**
     * Sets one value from the text typed in its cell, in the column's unit unless the text names another of the
     * same quantity ({@code 0.1 µm}); a text that is not a positive value is refused with a message, never clamped.
     * True when the value was taken.
     */
    boolean commit(int row, int column, String text) {
        return take(row, column, text, new Object(), true);
    }

    /**
     * The positive SI value a text gives in the unit shown, or NaN when it gives none; finishing, the status line says
     * why (the text's own problem, or the rule a value breaks), after {@code where}.
     */
    private double positive(String text, String key, DisplayUnit unit, String where, boolean finishing,
                            String rule) {
        double si;
        try {
            si = QuantityText.parse(text, key, unit).si();
        } catch (QuantityText.Refusal e) {
            if (finishing) {
                status.show(where + e.getMessage(), StatusLine.Tone.PROBLEM);
            }
            return Double.NaN;
        }
        if (!(si > 0)) {
            if (finishing) {
                status.show(where + NumberText.format(unit.shown(si)) + " is not allowed; " + rule,
                        StatusLine.Tone.PROBLEM);
            }
            return Double.NaN;
        }
        return si;
    }

    /** While typing (not finishing) a text that is not yet a value is left alone without a word. */
    private boolean take(int row, int column, String text, Object visit, boolean finishing) {
        int valueColumn = column - FIRST_VALUE;
        LayerColumn c = LayerColumn.VALUES.get(valueColumn);
        String layer = names.get(row);
        String where = layer + " · " + heading(valueColumn) + ": ";
        double si = positive(text, c.key(), units[valueColumn], where, finishing, "a layer's values are positive");
        if (Double.isNaN(si)) {
            return false;
        }
        status.show("", StatusLine.Tone.PLAIN);
        project.set(ParameterRef.layer(layer, c.key()), si, visit);
        return true;
    }

    private void editMaterial(TableItem item, int row) {
        disposeEditor();
        // A flat chooser that fits inside its cell (a native combo is wider and taller than a row and covered the
        // layer's name); its list opens below the cell as wide as the longest entry.
        CCombo combo = new CCombo(table, SWT.READ_ONLY | SWT.FLAT);
        // Each entry in effect, by id with its name and library, so that "silicon" is told from a film of the same
        // name in the facility's library; the cell keeps the id, as the case file does.
        List<String> ids = new ArrayList<>();
        List<String> shown = new ArrayList<>();
        ids.add(EXPLICIT);
        shown.add(EXPLICIT);
        workbench.materials().ifPresent(m -> m.effective().forEach(x -> {
            ids.add(x.id());
            shown.add(x.id() + " — " + x.name() + " (" + x.library().label() + ")");
        }));
        combo.setItems(shown.toArray(String[]::new));
        combo.setVisibleItemCount(Math.min(20, shown.size()));
        combo.select(Math.max(0, ids.indexOf(item.getText(MATERIAL))));
        combo.addListener(SWT.Selection, e -> {
            String layer = names.get(row);
            String choice = ids.get(Math.max(0, combo.getSelectionIndex()));
            disposeEditor();
            if (choice.equals(EXPLICIT)) {
                project.clearLayerKey(layer, "material");
            } else {
                project.setLayerText(layer, "material", choice);
            }
        });
        combo.addListener(SWT.FocusOut, e -> disposeEditor());
        editor.horizontalAlignment = SWT.LEFT;
        editor.setEditor(combo, item, MATERIAL);
        combo.setFocus();
    }

    private void disposeEditor() {
        Control old = editor.getEditor();
        if (old != null && !old.isDisposed()) {
            old.dispose();
        }
    }

    private void select(ParameterRef ref) {
        selected = ref;
        boolean any = ref != null;
        roleCombo.setEnabled(any);
        sigmaText.setEnabled(any);
        if (!any) {
            selectedLabel.setText("Click a value to edit it and to set its role in a fit.");
            return;
        }
        selectedLabel.setText("Role in a fit of " + named(ref) + ":");
        Project.Role role = project.role(ref);
        roleCombo.select(role.ordinal());
        double s = project.relativeSigma(ref);
        sigmaText.setText(Double.isNaN(s) ? "" : NumberText.format(100 * s));
        selectedLabel.getParent().layout(true);
    }

    /** The selected value's name, saying when a conductivity stated once moves every direction. */
    private String named(ParameterRef ref) {
        return Words.parameter(ref, project.model().map(m -> m.quantity(ref)).orElse(""));
    }

    private void applyRole() {
        if (selected == null) {
            return;
        }
        switch (roleCombo.getSelectionIndex()) {
            case 1 -> project.setFree(selected, Double.NaN, Double.NaN);
            case 2 -> {
                Double pct = NumberText.parse(sigmaText.getText());
                if (pct == null || !(pct > 0)) {
                    status.show("σ of " + named(selected) + ": "
                            + (pct == null ? NumberText.notANumber(sigmaText.getText()) : "a σ is positive")
                            + "; give it in % of the value, such as 3", StatusLine.Tone.PROBLEM);
                    return;
                }
                project.setUncertain(selected, pct / 100);
            }
            default -> project.setFixed(selected);
        }
        status.show("", StatusLine.Tone.PLAIN);
    }

    /** A new layer above the bottom one, with placeholder values shown in the table for the user to replace. */
    private void addLayer() {
        int n = names.size() + 1;
        String name = "layer " + n;
        while (names.contains(name)) {
            name = "layer " + (++n);
        }
        ObjectNode l = JsonNodeFactory.instance.objectNode();
        l.put("name", name);
        l.put("thickness_m", 1e-7);
        l.put("k_through_w_mk", 1.0);
        l.put("heat_capacity_j_m3k", 2e6);
        int at = Math.max(0, names.size() - aboveCount - 1);
        project.addLayer(at, l);
        table.setSelection(aboveCount + at);
        status.show("Added '" + name + "' with placeholder values (100 nm, 1 W/(m K), 2 MJ/(m³ K)); replace them"
                + " with the sample's.", StatusLine.Tone.CAUTION);
    }

    private void removeLayer() {
        int i = table.getSelectionIndex();
        if (i < 0) {
            status.show("Select the layer to remove first.", StatusLine.Tone.CAUTION);
            return;
        }
        if (i >= aboveCount && names.size() - aboveCount == 1) {
            status.show("A stack needs at least one layer below the heated plane.", StatusLine.Tone.PROBLEM);
            return;
        }
        String name = names.get(i);
        long roles = LayerColumn.VALUES.stream().filter(c -> project.role(ParameterRef.layer(name, c.key()))
                != Project.Role.FIXED).count();
        String question = "Remove layer '" + name + "' from the stack?" + (roles > 0 ? " Its " + roles + " free or"
                + " uncertain input" + (roles == 1 ? "" : "s") + " leave the fit with it." : "")
                + "\n\nEdit ▸ Undo brings it back.";
        if (workbench.confirm("Remove layer", question, "Remove layer")) {
            if (i < aboveCount) {
                project.removeLayerAbove(aboveCount - 1 - i);
            } else {
                project.removeLayer(i - aboveCount);
            }
        }
    }

    /**
     * A new layer above the heated plane, next to it; the first is a semi-infinite window (no thickness) for the
     * default top, later ones 100 nm films between it and the plane.
     */
    void addLayerAbove() {
        int n = 1;
        String name = "above " + n;
        while (names.contains(name)) {
            name = "above " + (++n);
        }
        ObjectNode l = JsonNodeFactory.instance.objectNode();
        l.put("name", name);
        boolean first = aboveCount == 0;
        if (!first) {
            l.put("thickness_m", 1e-7);
        }
        l.put("k_through_w_mk", 1.0);
        l.put("heat_capacity_j_m3k", 2e6);
        project.addLayerAbove(0, l);
        table.setSelection(aboveCount - 1);
        status.show("Added '" + name + "' above the heated plane with placeholder values (" + (first
                ? "semi-infinite, " : "100 nm, ") + "1 W/(m K), 2 MJ/(m³ K)); replace them with the sample's.",
                StatusLine.Tone.CAUTION);
    }

    private void showTop(ObjectNode tree) {
        boolean any = aboveCount > 0;
        topCombo.setEnabled(any);
        int at = any ? Math.max(0, List.of(TOPS).indexOf(tree.path("top").asText(TOPS[0]))) : -1;
        if (topCombo.getSelectionIndex() != at) {
            if (at < 0) {
                topCombo.deselectAll();
            } else {
                topCombo.select(at);
            }
        }
    }

    Combo topCombo() {
        return topCombo;
    }

    private void takeTop() {
        int i = topCombo.getSelectionIndex();
        if (i >= 0 && aboveCount > 0) {
            project.setTop(i == 0 ? null : TOPS[i]);
        }
    }

    private void move(int by) {
        int i = table.getSelectionIndex();
        int to = i + by;
        // A layer moves within its side of the heated plane.
        if (i < 0 || to < 0 || to >= names.size() || (i < aboveCount) != (to < aboveCount)) {
            return;
        }
        if (i < aboveCount) {
            project.moveLayerAbove(aboveCount - 1 - i, aboveCount - 1 - to);
        } else {
            project.moveLayer(i - aboveCount, to - aboveCount);
        }
        table.setSelection(to);
    }
}
