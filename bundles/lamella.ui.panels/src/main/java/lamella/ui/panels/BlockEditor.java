package lamella.ui.panels;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import lamella.api.ParameterRef;
import lamella.api.ParameterSpec;
import lamella.ui.api.Project;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;

/**
 * A chooser of the service type and a field per parameter of one case block: the case's own (dataset −1), or a
 * fit dataset's. A dataset's editor has a check "own settings": unchecked, it shows the case's block it takes
 * (greyed); checking copies the case's block into the dataset to be changed there, unchecking gives the dataset
 * the case's again. Every change is one undoable edit of the project.
 */
final class BlockEditor {

    private final Project project;
    private final String block;
    private final Function<String, List<ParameterSpec>> specs;
    private final Function<String, String> summary;
    private final Group group;
    private final Button own;
    private final Combo type;
    private final Label about;
    private final Composite fields;
    private final StatusLine problem;
    private final List<QuantityField> inputs = new ArrayList<>();
    private int dataset;
    private String shownType;
    private boolean editable = true;

    BlockEditor(Composite parent, Project project, String title, String block, int dataset, List<String> types,
                Function<String, List<ParameterSpec>> specs, Function<String, String> summary) {
        this.project = project;
        this.block = block;
        this.dataset = dataset;
        this.specs = specs;
        this.summary = summary;
        group = new Group(parent, SWT.NONE);
        group.setText(title);
        group.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        group.setLayout(new GridLayout(2, false));
        if (dataset >= 0) {
            own = new Button(group, SWT.CHECK);
            own.setText("own settings (unchecked: the case's, as shown)");
            own.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
            own.addListener(SWT.Selection, e -> project.setDatasetBlock(this.dataset, block, own.getSelection()));
        } else {
            own = null;
        }
        Label tl = new Label(group, SWT.NONE);
        tl.setText("type:");
        type = new Combo(group, SWT.READ_ONLY);
        type.setItems(types.stream().sorted().toArray(String[]::new));
        type.addListener(SWT.Selection, e -> changeType(type.getText()));
        about = new Label(group, SWT.WRAP);
        GridData agd = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        agd.widthHint = 300;
        about.setLayoutData(agd);
        fields = new Composite(group, SWT.NONE);
        fields.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));
        GridLayout fl = new GridLayout(3, false);
        fl.marginWidth = 0;
        fields.setLayout(fl);
        problem = new StatusLine(group, 2);
    }

    Group group() {
        return group;
    }

    /** The case's block, for the case's editor. */
    void show(JsonNode values) {
        show(values, true);
    }

    /**
     * Shows a block's values; for a dataset, ownValues tells whether they are its own (editable) or the case's
     * it takes (shown greyed).
     */
    void show(JsonNode values, boolean ownValues) {
        if (own != null) {
            own.setSelection(ownValues);
        }
        editable = ownValues;
        String t = values.path("type").asText("");
        if (!t.equals(shownType)) {
            build(t);
        }
        List<ParameterSpec> ps = specs.apply(t);
        for (int i = 0; i < ps.size() && i < inputs.size(); i++) {
            inputs.get(i).show(values.path(ps.get(i).key()));
            inputs.get(i).text().setEnabled(editable);
        }
        type.setEnabled(editable);
    }

    /** For a dataset editor that now shows another dataset. */
    void dataset(int index, String title) {
        if (index != dataset) {
            dataset = index;
            shownType = null;
        }
        group.setText(title);
    }

    QuantityField field(String key) {
        List<ParameterSpec> ps = specs.apply(shownType);
        for (int i = 0; i < ps.size(); i++) {
            if (ps.get(i).key().equals(key)) {
                return inputs.get(i);
            }
        }
        throw new IllegalArgumentException("no field " + key);
    }

    String problemText() {
        return problem.text();
    }

    private void build(String t) {
        shownType = t;
        type.select(List.of(type.getItems()).indexOf(t));
        about.setText(summary.apply(t));
        for (Control c : fields.getChildren()) {
            c.dispose();
        }
        inputs.clear();
        problem.show("", StatusLine.Tone.PLAIN);
        int at = dataset;
        for (ParameterSpec s : specs.apply(t)) {
            ParameterRef ref = block.equals("geometry") ? ParameterRef.geometry(s.key())
                    : ParameterRef.measurement(s.key());
            ParameterRef where = at >= 0 ? ref.inDataset(at) : ref;
            inputs.add(new QuantityField(fields, s, block + "." + s.key(),
                    (value, visit) -> project.put(where, value, visit), problem));
        }
    }

    /**
     * The new type takes the values it had when last chosen and those of the old type it also reads; the old
     * type's values are remembered with the project for the way back.
     */
    private void changeType(String t) {
        project.switchType(block, dataset, t, specs.apply(t).stream().map(ParameterSpec::key).toList());
    }
}
