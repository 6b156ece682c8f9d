package lamella.ui.plan;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.ModelEvaluationException;
import lamella.api.ParameterRef;
import lamella.api.fit.Progress;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlanService;
import lamella.api.plan.PlanSetting;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PredictedSigma;
import lamella.charts.plan.PlanCharts;
import lamella.charts.plan.PlanGrid;
import lamella.charts.plan.TradeUnit;
import lamella.ui.api.InputNames;
import lamella.ui.api.PanelView;
import lamella.ui.api.Project;
import lamella.ui.api.Task;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkResult;
import lamella.ui.charts.ChartCanvas;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;
import org.eclipse.swt.widgets.Spinner;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;

/**
 * The Plan panel: on the left the plan block — targets (the fit block's free inputs whose σ matters) and design
 * variables (a key, a range in the key's unit with its steps and spacing, how many values are measured together) —
 * each change one undoable edit of the case; the Plan button ranks the plans in the background (progress, Stop, a
 * new run supersedes a running one). On the right the ranked plans and the case as written, "Use this plan" (the
 * chosen plan's values written into the case as one undoable step) and the objective map over two varied keys.
 */
final class PlanView implements PanelView {

    /** Below this width (pixels) the plan block goes above the results instead of beside them. */
    static final int SIDE_BY_SIDE_WIDTH = 900;
    /** The plan block's editor needs this width (pixels) to show its fields; narrower, it scrolls. */
    private static final int MIN_SETUP_WIDTH = 380;
    /** The design variable's key chooser starts this wide (pixels) and widens with the group. */
    private static final int KEY_WIDTH = 140;

    private final Workbench workbench;
    private final Project project;
    private final PlanService planner;
    final SashForm root;
    final Table targets;
    final Table variables;
    final Combo key;
    final Text from;
    final Text to;
    final Label fromUnit;
    final Label toUnit;
    final Spinner steps;
    final Button log;
    final Text together;
    final Button planButton;
    final Button stopButton;
    final ProgressBar progress;
    final Label status;
    final Label summary;
    final Table plans;
    final Button use;
    final Combo mapX;
    final Combo mapY;
    final ChartCanvas map;
    private final Project.Listener listener = c -> refresh();

    private List<Variable> candidates = List.of();
    private Task running;
    private int generation;
    private PlanOutcome outcome;
    private CaseDocument planned;
    private String plannedJson;
    private List<PlannedResult> rows = List.of();
    private List<Integer> mappable = List.of();
    private boolean filling;

    PlanView(Composite parent, Workbench workbench, PlanService planner) {
        this.workbench = workbench;
        this.project = workbench.project();
        this.planner = planner;
        root = new SashForm(parent, SWT.HORIZONTAL);

        ScrolledComposite scroll = new ScrolledComposite(root, SWT.V_SCROLL | SWT.H_SCROLL);
        scroll.setExpandHorizontal(true);
        scroll.setExpandVertical(true);
        Composite left = new Composite(scroll, SWT.NONE);
        scroll.setContent(left);
        left.setLayout(new GridLayout(1, false));
        Group t = group(left, "Targets: free inputs whose σ matters", false);
        targets = new Table(t, SWT.CHECK | SWT.BORDER | SWT.V_SCROLL);
        targets.setLayoutData(fill(true, 4));
        targets.addListener(SWT.Selection, e -> {
            if (e.detail == SWT.CHECK && !filling) {
                writeTargets();
            }
        });

        Group v = group(left, "Design variables", true);
        variables = new Table(v, SWT.BORDER | SWT.FULL_SELECTION | SWT.SINGLE | SWT.V_SCROLL);
        variables.setHeaderVisible(true);
        variables.setLinesVisible(true);
        variables.setLayoutData(fill(true, 4));
        for (String h : List.of("key", "values", "together")) {
            new TableColumn(variables, SWT.LEFT).setText(h);
        }
        variables.addListener(SWT.Selection, e -> showSelectedVariable());

        Composite editor = new Composite(v, SWT.NONE);
        editor.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        editor.setLayout(new GridLayout(3, false));
        label(editor, "key");
        key = new Combo(editor, SWT.READ_ONLY | SWT.DROP_DOWN);
        // Its longest key would set the editor's least width; it takes what the group has instead.
        GridData kd = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        kd.widthHint = KEY_WIDTH;
        key.setLayoutData(kd);
        key.addListener(SWT.Selection, e -> showUnits());
        label(editor, "from");
        from = new Text(editor, SWT.BORDER);
        from.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        fromUnit = label(editor, "");
        label(editor, "to");
        to = new Text(editor, SWT.BORDER);
        to.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        toUnit = label(editor, "");
        label(editor, "steps");
        steps = new Spinner(editor, SWT.BORDER);
        steps.setValues(5, 1, 200, 0, 1, 5);
        log = new Button(editor, SWT.CHECK);
        log.setText("spread in ln");
        label(editor, "measured together");
        together = new Text(editor, SWT.BORDER);
        together.setText("1");
        together.setToolTipText("how many values are measured together and fitted jointly: 1, or a list such as 1, 2");
        together.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        Composite edits = new Composite(v, SWT.NONE);
        edits.setLayout(new GridLayout(3, false));
        button(edits, "Add", () -> writeVariable(false));
        button(edits, "Replace selected", () -> writeVariable(true));
        button(edits, "Remove selected", this::removeVariable);

        Composite run = new Composite(left, SWT.NONE);
        run.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        run.setLayout(new GridLayout(3, false));
        planButton = button(run, "Plan", this::run);
        stopButton = button(run, "Stop", this::stop);
        stopButton.setEnabled(false);
        progress = new ProgressBar(run, SWT.HORIZONTAL | SWT.SMOOTH);
        progress.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        status = new Label(left, SWT.WRAP);
        GridData sd = new GridData(SWT.FILL, SWT.TOP, true, false);
        sd.widthHint = 200;
        status.setLayoutData(sd);

        SashForm right = new SashForm(root, SWT.VERTICAL);
        Composite top = new Composite(right, SWT.NONE);
        top.setLayout(new GridLayout(2, false));
        summary = new Label(top, SWT.WRAP);
        GridData su = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
        su.widthHint = 300;
        summary.setLayoutData(su);
        summary.setText("Press Plan to rank the plans of the case's plan block.");
        plans = new Table(top, SWT.BORDER | SWT.FULL_SELECTION | SWT.SINGLE | SWT.V_SCROLL | SWT.H_SCROLL);
        plans.setHeaderVisible(true);
        plans.setLinesVisible(true);
        plans.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1));
        plans.addListener(SWT.Selection, e -> planChosen());
        plans.addListener(SWT.DefaultSelection, e -> usePlan());
        use = button(top, "Use this plan", this::usePlan);
        use.setEnabled(false);
        use.setToolTipText("writes the chosen plan's values into the case, as one step that Undo takes back");
        Label hint = new Label(top, SWT.WRAP);
        hint.setText("A plan of values measured together needs one dataset per measurement; set those by hand.");
        hint.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));

        Composite bottom = new Composite(right, SWT.NONE);
        bottom.setLayout(new GridLayout(4, false));
        label(bottom, "map over");
        mapX = new Combo(bottom, SWT.READ_ONLY | SWT.DROP_DOWN);
        label(bottom, "and");
        mapY = new Combo(bottom, SWT.READ_ONLY | SWT.DROP_DOWN);
        mapX.addListener(SWT.Selection, e -> drawMap());
        mapY.addListener(SWT.Selection, e -> drawMap());
        map = new ChartCanvas(bottom, SWT.NONE);
        map.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 4, 1));
        right.setWeights(45, 55);
        root.setWeights(36, 64);
        scroll.addListener(SWT.Resize, e -> scroll.setMinSize(left.computeSize(MIN_SETUP_WIDTH, SWT.DEFAULT)));
        root.addListener(SWT.Resize, e -> arrange());

        project.addListener(listener);
        refresh();
    }

    /** Side by side when the panel is wide, the plan block above the results when it is narrow. */
    private void arrange() {
        int width = root.getClientArea().width;
        int orientation = width < SIDE_BY_SIDE_WIDTH ? SWT.VERTICAL : SWT.HORIZONTAL;
        if (root.getOrientation() != orientation) {
            root.setOrientation(orientation);
            root.setWeights(orientation == SWT.VERTICAL ? new int[] {42, 58} : new int[] {36, 64});
        }
    }

    @Override
    public Control control() {
        return root;
    }

    @Override
    public void close() {
        project.removeListener(listener);
        if (running != null) {
            running.cancel();
        }
    }

    // ------------------------------------------------------------------ the plan block

    private void refresh() {
        if (root.isDisposed()) {
            return;
        }
        ObjectNode doc = project.tree();
        filling = true;
        try {
            JsonNode plan = doc.path("plan");
            List<String> named = new ArrayList<>();
            plan.path("targets").forEach(x -> named.add(refOf(x).map(ParameterRef::toString).orElse("")));
            targets.removeAll();
            for (JsonNode f : doc.path("fit").path("free")) {
                Optional<ParameterRef> ref = refOf(f);
                if (ref.isEmpty()) {
                    continue;
                }
                TableItem item = new TableItem(targets, SWT.NONE);
                item.setText(InputNames.of(ref.get()) + "   (" + ref.get() + ")");
                item.setData(f);
                item.setChecked(!plan.has("targets") || named.contains(ref.get().toString()));
            }
            int selected = variables.getSelectionIndex();
            variables.removeAll();
            for (JsonNode entry : plan.path("vary")) {
                Variable var = Variable.of(entry, doc);
                TableItem item = new TableItem(variables, SWT.NONE);
                item.setText(new String[] {var == null ? "(unknown key)" : var.label(),
                        var == null ? "" : var.describe(entry), Variable.choose(entry)});
                item.setData(entry);
            }
            for (TableColumn c : variables.getColumns()) {
                c.pack();
            }
            if (selected >= 0 && selected < variables.getItemCount()) {
                variables.setSelection(selected);
            }
            candidates = Variable.candidates(doc);
            String chosen = key.getText();
            key.removeAll();
            candidates.forEach(c -> key.add(c.label()));
            int at = key.indexOf(chosen);
            key.select(Math.max(0, at));
            showUnits();
        } finally {
            filling = false;
        }
        boolean current = outcome != null && stripped(doc).equals(plannedJson);
        if (outcome != null && !current && running == null) {
            status.setText("The case has changed since these plans were ranked; press Plan to rank them again.");
        }
        use.setEnabled(usable());
        root.layout(true, true);
    }

    private static String stripped(ObjectNode doc) {
        ObjectNode copy = doc.deepCopy();
        copy.remove(Project.WORKBENCH_KEY);
        return copy.toString();
    }

    private static Optional<ParameterRef> refOf(JsonNode n) {
        ParameterRef ref = null;
        if (n.hasNonNull("layer") && n.hasNonNull("property")) {
            ref = ParameterRef.layer(n.get("layer").asText(), n.get("property").asText());
        } else if (n.hasNonNull("geometry")) {
            ref = ParameterRef.geometry(n.get("geometry").asText());
        } else if (n.hasNonNull("measurement")) {
            ref = ParameterRef.measurement(n.get("measurement").asText());
        }
        if (ref != null && n.path("dataset").isInt()) {
            ref = ref.inDataset(n.get("dataset").asInt());
        }
        return Optional.ofNullable(ref);
    }

    private void writeTargets() {
        List<JsonNode> checked = new ArrayList<>();
        for (TableItem item : targets.getItems()) {
            if (item.getChecked()) {
                checked.add((JsonNode) item.getData());
            }
        }
        if (checked.isEmpty()) {
            status.setText("Keep at least one target: a plan is ranked by the σ of its targets.");
            refresh();
            return;
        }
        project.edit("choose the plan's targets", d -> {
            ArrayNode a = planNode(d).putArray("targets");
            for (JsonNode f : checked) {
                ObjectNode t = a.addObject();
                for (String k : List.of("layer", "property", "geometry", "measurement", "dataset")) {
                    if (f.has(k)) {
                        t.set(k, f.get(k).deepCopy());
                    }
                }
            }
        });
    }

    private static ObjectNode planNode(ObjectNode d) {
        return d.get("plan") instanceof ObjectNode p ? p : d.putObject("plan");
    }

    private void showSelectedVariable() {
        int i = variables.getSelectionIndex();
        if (i < 0) {
            return;
        }
        JsonNode entry = (JsonNode) variables.getItem(i).getData();
        Variable var = Variable.of(entry, project.tree());
        if (var == null) {
            return;
        }
        int at = key.indexOf(var.label());
        if (at >= 0) {
            key.select(at);
        }
        TradeUnit u = var.unit();
        double[] values = Variable.values(entry);
        if (values.length > 0) {
            from.setText(PlanGrid.number(u.factor() * values[0]));
            to.setText(PlanGrid.number(u.factor() * values[values.length - 1]));
        }
        steps.setSelection(entry.path("values").isArray() ? values.length : Math.max(1, entry.path("steps").asInt()));
        log.setSelection(entry.hasNonNull("spacing") ? entry.get("spacing").asText().equals("log") : var.logByDefault());
        together.setText(Variable.choose(entry));
        showUnits();
    }

    private Variable chosenKey() {
        int i = key.getSelectionIndex();
        return i < 0 || i >= candidates.size() ? null : candidates.get(i);
    }

    private void showUnits() {
        Variable var = chosenKey();
        String unit = var == null ? "" : var.unit().symbol();
        fromUnit.setText(unit);
        toUnit.setText(unit);
        fromUnit.getParent().layout();
    }

    private void writeVariable(boolean replace) {
        Variable var = chosenKey();
        int selected = variables.getSelectionIndex();
        if (var == null) {
            status.setText("Choose the key to vary.");
            return;
        }
        if (replace && selected < 0) {
            status.setText("Select the design variable to replace in the list above.");
            return;
        }
        double f;
        double t;
        List<Integer> choose = new ArrayList<>();
        try {
            f = number(from.getText(), "from") / var.unit().factor();
            t = steps.getSelection() == 1 ? f : number(to.getText(), "to") / var.unit().factor();
            for (String part : together.getText().split(",")) {
                int c = Integer.parseInt(part.trim());
                if (c < 1) {
                    throw new NumberFormatException();
                }
                choose.add(c);
            }
        } catch (IllegalArgumentException e) {
            status.setText(e instanceof NumberFormatException && e.getMessage() != null
                    && e.getMessage().startsWith("'") ? e.getMessage()
                    : "'measured together' takes counts of 1 or more, such as 1 or 1, 2; got '" + together.getText()
                    + "'");
            return;
        }
        if (steps.getSelection() > 1 && f == t) {
            status.setText("'from' and 'to' are equal; a range of " + steps.getSelection() + " steps needs two ends.");
            return;
        }
        if (log.getSelection() && !(f > 0 && t > 0)) {
            status.setText("Values spread in ln must be positive.");
            return;
        }
        ObjectNode entry = var.entry(Math.min(f, t), Math.max(f, t), steps.getSelection(), log.getSelection(), choose);
        String words = (replace ? "replace" : "add") + " design variable " + var.label();
        project.edit(words, d -> {
            JsonNode existing = planNode(d).get("vary");
            ArrayNode vary = existing instanceof ArrayNode a ? a : planNode(d).putArray("vary");
            if (replace && selected < vary.size()) {
                vary.set(selected, entry);
            } else {
                vary.add(entry);
            }
        });
        status.setText("");
    }

    private static double number(String text, String field) {
        try {
            double v = Double.parseDouble(text.trim().replace('−', '-'));
            if (!Double.isFinite(v)) {
                throw new NumberFormatException();
            }
            return v;
        } catch (NumberFormatException e) {
            throw new NumberFormatException("'" + field + "' takes a number in the unit beside it; got '" + text
                    + "'");
        }
    }

    private void removeVariable() {
        int selected = variables.getSelectionIndex();
        if (selected < 0) {
            status.setText("Select the design variable to remove.");
            return;
        }
        String name = variables.getItem(selected).getText(0);
        project.edit("remove design variable " + name, d -> {
            if (planNode(d).get("vary") instanceof ArrayNode a && selected < a.size()) {
                a.remove(selected);
            }
        });
    }

    // ------------------------------------------------------------------ ranking in the background

    private void run() {
        Optional<CaseDocument> doc = project.current();
        if (doc.isEmpty()) {
            status.setText("The case cannot be planned: " + project.problem().map(Throwable::getMessage)
                    .orElse("it does not read"));
            return;
        }
        if (running != null) {
            running.cancel();
        }
        CaseDocument d = doc.get();
        String json = stripped(project.tree());
        int mine = ++generation;
        planButton.setText("Plan again");
        stopButton.setEnabled(true);
        progress.setSelection(0);
        status.setText("Ranking plans …");
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        running = workbench.start("Ranking plans", p -> planner.plan(d, threads, relay(p, mine)),
                new WorkResult<>() {
                    @Override
                    public void done(PlanOutcome value) {
                        if (mine != generation || root.isDisposed()) {
                            return;
                        }
                        finished();
                        outcome = value;
                        planned = d;
                        plannedJson = json;
                        show(value);
                    }

                    @Override
                    public void failed(String problem, Throwable cause) {
                        if (mine != generation || root.isDisposed()) {
                            return;
                        }
                        finished();
                        status.setText("The plans cannot be ranked: " + problem);
                        workbench.showProblem("Plan", problem);
                    }

                    @Override
                    public void stopped() {
                        if (mine != generation || root.isDisposed()) {
                            return;
                        }
                        finished();
                        status.setText("Stopped; the plans shown (if any) are those of the run before.");
                    }
                });
    }

    private void finished() {
        running = null;
        stopButton.setEnabled(false);
        progress.setSelection(0);
    }

    private void stop() {
        if (running != null) {
            running.cancel();
        }
    }

    /** The work's progress, passed on to the workbench's and drawn in the panel's bar at most every 100 ms. */
    private Progress relay(Progress outer, int mine) {
        return new Progress() {
            private long last;

            @Override
            public void update(String stage, int done, int total) {
                outer.update(stage, done, total);
                long now = System.nanoTime();
                if (now - last < 100_000_000L && done < total) {
                    return;
                }
                last = now;
                workbench.display().asyncExec(() -> {
                    if (!progress.isDisposed() && mine == generation && running != null) {
                        progress.setMaximum(Math.max(1, total));
                        progress.setSelection(done);
                        status.setText(String.format(Locale.ROOT, "Ranking plans: %d of %d", done, total));
                    }
                });
            }

            @Override
            public boolean cancelled() {
                return outer.cancelled();
            }
        };
    }

    // ------------------------------------------------------------------ results

    private void show(PlanOutcome o) {
        workbench.showProblem("Plan", null);
        long ranked = o.count(PlannedResult.Status.RANKED);
        summary.setText("Ranked by " + o.objective() + " (1σ, noise and every uncertain input). " + ranked + " of "
                + o.plans().size() + " plans within the limits" + (o.warnings().isEmpty() ? "."
                : ". " + String.join(" ", o.warnings())));
        status.setText(ranked + " plans ranked" + (o.best() == null ? "; none within the limits." : "; the best: "
                + values(o, o.best()) + "."));
        plans.removeAll();
        for (TableColumn c : plans.getColumns()) {
            c.dispose();
        }
        List<String> head = new ArrayList<>(List.of("rank"));
        List<TradeUnit> units = new ArrayList<>();
        for (int k = 0; k < o.varied().size(); k++) {
            TradeUnit u = unitOf(o, k);
            units.add(u);
            head.add(u.label(o.varied().get(k)));
        }
        head.add("objective (%)");
        o.targets().forEach(t -> head.add("σ/|p| " + t + " (%)"));
        head.add("steady rise (K)");
        head.add("note");
        for (String h : head) {
            new TableColumn(plans, SWT.LEFT).setText(h);
        }
        List<PlannedResult> shown = new ArrayList<>(o.plans());
        shown.add(o.baseline());
        rows = shown;
        for (PlannedResult p : shown) {
            TableItem item = new TableItem(plans, SWT.NONE);
            List<String> cells = new ArrayList<>();
            cells.add(p.status() == PlannedResult.Status.RANKED ? Integer.toString(p.rank())
                    : p.status() == PlannedResult.Status.BASELINE ? "as written" : "—");
            for (int k = 0; k < p.values().size(); k++) {
                cells.add(value(p.values().get(k), units.get(k)));
            }
            cells.add(percent(p.objective()));
            if (p.predicted().isEmpty()) {
                o.targets().forEach(x -> cells.add("—"));
            } else {
                for (PredictedSigma s : p.predicted()) {
                    cells.add(percent(s.sigmaRelative()));
                }
            }
            cells.add(Double.isNaN(p.rise()) ? "—" : PlanGrid.number(p.rise()));
            List<String> notes = new ArrayList<>();
            p.predicted().stream().filter(s -> !s.identifiable()).forEach(s -> notes.add(s.ref() + " unidentifiable"));
            if (p.status() != PlannedResult.Status.RANKED && !p.reason().isEmpty()) {
                notes.add(p.reason());
            }
            if (p.measurements() > 1) {
                notes.add(p.measurements() + " measurements");
            }
            cells.add(String.join("; ", notes));
            item.setText(cells.toArray(new String[0]));
            if (p.status() == PlannedResult.Status.BASELINE) {
                item.setBackground(workbench.display().getSystemColor(SWT.COLOR_WIDGET_LIGHT_SHADOW));
            }
        }
        for (TableColumn c : plans.getColumns()) {
            c.pack();
            c.setWidth(Math.min(c.getWidth(), 420));
        }
        if (!shown.isEmpty() && shown.get(0).status() == PlannedResult.Status.RANKED) {
            plans.setSelection(0);
        }
        use.setEnabled(usable());
        mappable = PlanGrid.mappable(o);
        mapX.removeAll();
        mapY.removeAll();
        mappable.forEach(k -> {
            mapX.add(o.varied().get(k));
            mapY.add(o.varied().get(k));
        });
        if (mappable.size() >= 2) {
            mapX.select(0);
            mapY.select(1);
        }
        drawMap();
        root.layout(true, true);
    }

    private TradeUnit unitOf(PlanOutcome o, int k) {
        String name = o.varied().get(k);
        double typical = Double.NaN;
        for (PlannedResult p : o.plans()) {
            if (p.values().size() > k && p.values().get(k) instanceof Double d && Double.isFinite(d)) {
                typical = Double.isNaN(typical) ? d : Math.max(typical, d);
            }
        }
        return TradeUnit.of(name, Double.isNaN(typical) ? 1 : typical);
    }

    private static String value(Object v, TradeUnit u) {
        if (v instanceof List<?> l) {
            List<String> parts = new ArrayList<>();
            l.forEach(x -> parts.add(PlanGrid.number(u.factor() * (Double) x)));
            return String.join(" + ", parts);
        }
        double d = (Double) v;
        return Double.isNaN(d) ? "(none)" : PlanGrid.number(u.factor() * d);
    }

    private static String values(PlanOutcome o, PlannedResult p) {
        List<String> parts = new ArrayList<>();
        for (int k = 0; k < p.values().size(); k++) {
            Object v = p.values().get(k);
            double typical = v instanceof Double d ? d : (Double) ((List<?>) v).get(0);
            TradeUnit u = TradeUnit.of(o.varied().get(k), typical);
            parts.add(o.varied().get(k) + " = " + value(v, u) + " " + u.symbol());
        }
        return String.join(", ", parts);
    }

    private static String percent(double fraction) {
        return Double.isFinite(fraction) ? PlanGrid.number(100 * fraction) : "∞";
    }

    private void drawMap() {
        int xi = mapX.getSelectionIndex();
        int yi = mapY.getSelectionIndex();
        if (outcome == null || xi < 0 || yi < 0 || xi == yi) {
            map.setChart(null);
            return;
        }
        map.setChart(PlanCharts.objectiveMap(PlanGrid.of(outcome, mappable.get(xi), mappable.get(yi))));
    }

    private void planChosen() {
        use.setEnabled(usable());
    }

    private PlannedResult selectedPlan() {
        int i = plans.getSelectionIndex();
        return i < 0 || i >= rows.size() ? null : rows.get(i);
    }

    private boolean usable() {
        PlannedResult p = selectedPlan();
        return p != null && p.status() != PlannedResult.Status.BASELINE && p.status()
                != PlannedResult.Status.NOT_EVALUABLE && p.values().stream().allMatch(Double.class::isInstance);
    }

    /** Writes the chosen plan's values into the case: one undoable step however many keys it sets. */
    private void usePlan() {
        PlannedResult p = selectedPlan();
        if (p == null || planned == null || !usable()) {
            status.setText(p != null && !p.values().stream().allMatch(Double.class::isInstance)
                    ? "This plan measures several values together; give each measurement a dataset of its own and"
                    + " set its values there." : "Choose a plan in the table first.");
            return;
        }
        List<PlanSetting> settings;
        try {
            settings = planner.settings(planned, p);
        } catch (InputException | ModelEvaluationException e) {
            status.setText("This plan cannot be written into the case: " + e.getMessage());
            return;
        }
        Object step = new Object();
        for (PlanSetting s : settings) {
            JsonNode value;
            if (s.value() instanceof List<?> l) {
                ArrayNode a = JsonNodeFactory.instance.arrayNode();
                l.forEach(x -> a.add((Double) x));
                value = a;
            } else {
                value = DoubleNode.valueOf((Double) s.value());
            }
            project.put(s.ref(), value, step);
        }
        status.setText("Plan " + (p.rank() > 0 ? p.rank() + " " : "") + "written into the case (Undo takes it"
                + " back): " + values(outcome, p) + ".");
    }

    // ------------------------------------------------------------------ widgets

    private static Group group(Composite parent, String title, boolean grab) {
        Group g = new Group(parent, SWT.NONE);
        g.setText(title);
        g.setLayout(new GridLayout(1, false));
        g.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, grab));
        return g;
    }

    private static GridData fill(boolean grab, int rows) {
        GridData d = new GridData(SWT.FILL, SWT.FILL, true, grab);
        d.heightHint = rows * 22;
        return d;
    }

    private static Label label(Composite parent, String text) {
        Label l = new Label(parent, SWT.NONE);
        l.setText(text);
        return l;
    }

    private static Button button(Composite parent, String text, Runnable action) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        b.addListener(SWT.Selection, e -> action.run());
        return b;
    }
}
