package lamella.ui.panels;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import lamella.api.ParameterRef;
import lamella.ui.api.Project;
import lamella.ui.api.Workbench;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.Text;

/**
 * The fit's named gains ({@code fit.gains}): a factor on the modelled signal of every dataset that names it, such as
 * a detector's calibration. Each is added, renamed, given a value or removed as one step, and fixed, free or
 * uncertain like any input; which dataset carries which gain is chosen in the Datasets panel.
 */
final class GainsEditor {

    private static final String[] ROLES = {"fixed", "free", "uncertain ± σ"};
    /** The range the case reader accepts for a gain. */
    private static final double LEAST = 1e-12;
    private static final double MOST = 1e12;

    private final Workbench workbench;
    private final Project project;
    private final Group group;
    private final Table table;
    private final Text name;
    private final Text value;
    private final Combo role;
    private final Text sigma;
    private final StatusLine status;
    private List<String> names = List.of();

    GainsEditor(Composite parent, Workbench workbench) {
        this.workbench = workbench;
        this.project = workbench.project();
        group = new Group(parent, SWT.NONE);
        group.setText("Gains of the fit (× the signal of each dataset naming it)");
        group.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        group.setLayout(new GridLayout(4, false));
        table = Tables.create(group);
        GridData tgd = new GridData(SWT.FILL, SWT.TOP, true, false, 4, 1);
        tgd.heightHint = 60;
        table.setLayoutData(tgd);
        table.addListener(SWT.Selection, e -> selected());
        label("name:");
        name = text(90, "a gain's name, such as detector; datasets name it in the Datasets panel");
        label("value (×):");
        value = text(60, "a positive factor on the modelled signal, " + NumberText.format(LEAST) + " to "
                + NumberText.format(MOST));
        label("role in a fit:");
        role = new Combo(group, SWT.READ_ONLY);
        role.setItems(ROLES);
        role.select(0);
        label("σ (%):");
        sigma = text(60, "the σ of an uncertain gain in % of its value, such as 2");
        Composite buttons = new Composite(group, SWT.NONE);
        GridLayout bl = new GridLayout(4, false);
        bl.marginWidth = 0;
        buttons.setLayout(bl);
        buttons.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 4, 1));
        button(buttons, "Add gain", this::add);
        button(buttons, "Rename", this::rename);
        button(buttons, "Set value and role", this::apply);
        button(buttons, "Remove", this::remove);
        status = new StatusLine(group, 4);
    }

    Table table() {
        return table;
    }

    Text name() {
        return name;
    }

    Text value() {
        return value;
    }

    Combo role() {
        return role;
    }

    Text sigma() {
        return sigma;
    }

    String statusText() {
        return status.text();
    }

    void show() {
        Map<String, Double> gains = project.gains();
        List<String> now = new ArrayList<>(gains.keySet());
        List<String[]> rows = new ArrayList<>();
        for (String g : now) {
            ParameterRef ref = ParameterRef.gain(g);
            rows.add(new String[] {g, NumberText.format(gains.get(g)), roleWords(ref), datasetsNaming(g)});
        }
        int keep = table.getSelectionIndex();
        Tables.fill(table, new String[] {"gain", "value (×)", "role in a fit", "datasets"}, rows);
        names = now;
        if (keep >= 0 && keep < names.size()) {
            table.setSelection(keep);
        }
    }

    /** Chooses a gain as a click on its row does. */
    void select(int index) {
        table.setSelection(index);
        selected();
    }

    private String roleWords(ParameterRef ref) {
        return switch (project.role(ref)) {
            case FIXED -> "fixed";
            case FREE -> "free";
            case UNCERTAIN -> {
                double s = project.relativeSigma(ref);
                yield Double.isNaN(s) ? "uncertain" : "uncertain ± " + NumberText.format(100 * s) + " %";
            }
        };
    }

    private String datasetsNaming(String gain) {
        List<String> out = new ArrayList<>();
        List<ObjectNode> ds = project.datasets();
        for (int i = 0; i < ds.size(); i++) {
            if (ds.get(i).path("gain").asText().equals(gain) && ds.get(i).has("gain")) {
                out.add(Integer.toString(i));
            }
        }
        return out.isEmpty() ? "none yet (Datasets ▸ gain)" : String.join(", ", out);
    }

    private void selected() {
        int i = table.getSelectionIndex();
        if (i < 0 || i >= names.size()) {
            return;
        }
        String g = names.get(i);
        ParameterRef ref = ParameterRef.gain(g);
        name.setText(g);
        value.setText(NumberText.format(project.gains().get(g)));
        role.select(project.role(ref).ordinal());
        double s = project.relativeSigma(ref);
        sigma.setText(Double.isNaN(s) ? "" : NumberText.format(100 * s));
    }

    /** The value typed, or null with the refusal shown: a gain is a positive factor within the reader's range. */
    private Double typedValue() {
        Double v = NumberText.parse(value.getText());
        if (v == null || !(v >= LEAST && v <= MOST)) {
            status.show("gain value: " + (v == null ? NumberText.notANumber(value.getText())
                    : NumberText.format(v) + " is outside the range") + "; a gain is a factor from "
                    + NumberText.format(LEAST) + " to " + NumberText.format(MOST) + ", such as 1",
                    StatusLine.Tone.PROBLEM);
            return null;
        }
        return v;
    }

    private boolean nameTaken(String n, String except) {
        Optional<String> problem = project.gainNameProblem(n, except);
        problem.ifPresent(p -> status.show("gain name: " + p, StatusLine.Tone.PROBLEM));
        return problem.isPresent();
    }

    void add() {
        String n = name.getText().strip();
        if (nameTaken(n, null)) {
            return;
        }
        Double v = value.getText().isBlank() ? Double.valueOf(1) : typedValue();
        if (v == null) {
            return;
        }
        project.addGain(n, v);
        select(names.indexOf(n));
        status.show("Added gain '" + n + "'; let a dataset name it (Datasets panel, gain:), as the case needs.",
                StatusLine.Tone.CAUTION);
    }

    void rename() {
        String old = chosen();
        if (old == null) {
            return;
        }
        String n = name.getText().strip();
        if (n.equals(old) || nameTaken(n, old)) {
            return;
        }
        project.renameGain(old, n);
        status.show("", StatusLine.Tone.PLAIN);
    }

    /** Takes the value typed and the role chosen for the selected gain; each change is its own undoable step. */
    void apply() {
        String g = chosen();
        if (g == null) {
            return;
        }
        Double v = typedValue();
        if (v == null) {
            return;
        }
        ParameterRef ref = ParameterRef.gain(g);
        Double pct = null;
        if (role.getSelectionIndex() == 2) {
            pct = NumberText.parse(sigma.getText());
            if (pct == null || !(pct > 0)) {
                status.show("σ of gain '" + g + "': " + (pct == null ? NumberText.notANumber(sigma.getText())
                        : "a σ is positive") + "; give it in % of the value, such as 2", StatusLine.Tone.PROBLEM);
                return;
            }
        }
        if (v.doubleValue() != project.gains().get(g)) {
            project.set(ref, v);
        }
        switch (role.getSelectionIndex()) {
            case 1 -> {
                if (project.role(ref) != Project.Role.FREE) {
                    project.setFree(ref, Double.NaN, Double.NaN);
                }
            }
            case 2 -> project.setUncertain(ref, pct / 100);
            default -> project.setFixed(ref);
        }
        status.show("", StatusLine.Tone.PLAIN);
    }

    /** Removes the selected gain after asking, saying which datasets lose it. */
    void remove() {
        String g = chosen();
        if (g == null) {
            return;
        }
        String naming = datasetsNaming(g);
        String question = "Remove gain '" + g + "' from the fit?" + (naming.startsWith("none") ? ""
                : " Datasets " + naming + " are then modelled without it.") + "\n\nEdit ▸ Undo brings it back.";
        if (workbench.confirm("Remove gain", question, "Remove gain")) {
            project.removeGain(g);
            status.show("", StatusLine.Tone.PLAIN);
        }
    }

    private String chosen() {
        int i = table.getSelectionIndex();
        if (i < 0 || i >= names.size()) {
            status.show("Choose a gain in the list first.", StatusLine.Tone.CAUTION);
            return null;
        }
        return names.get(i);
    }

    private void label(String text) {
        new Label(group, SWT.NONE).setText(text);
    }

    private Text text(int width, String tip) {
        Text t = new Text(group, SWT.BORDER);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, false, false);
        gd.widthHint = width;
        t.setLayoutData(gd);
        t.setToolTipText(tip);
        return t;
    }

    private static void button(Composite parent, String text, Runnable action) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        b.addListener(SWT.Selection, e -> action.run());
    }
}
