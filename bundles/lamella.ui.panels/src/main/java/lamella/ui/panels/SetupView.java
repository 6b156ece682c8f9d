package lamella.ui.panels;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import lamella.api.CaseModel;
import lamella.api.HeatingGeometry;
import lamella.api.Technique;
import lamella.ui.api.PanelView;
import lamella.ui.api.Project;
import lamella.ui.api.Workbench;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

/**
 * The Set-up panel: the technique and the heating geometry with their case-file parameters (SI values, units from
 * the keys), and an estimate of the steady temperature rise from an absorbed power, which is a panel setting and
 * not part of the case.
 */
final class SetupView implements PanelView {

    private static final String CAUTION = "Lasers of Class 3B/4 and driven heaters: follow your facility's safety"
            + " procedures (eye protection for every wavelength, interlocks, current limits); this estimate does not"
            + " replace them.";

    private final Workbench workbench;
    private final Project project;
    private final Composite root;
    private final BlockEditor technique;
    private final BlockEditor geometry;
    private final Text power;
    private final StatusLine rise;
    private final LatestOnly<Outcome<Double>> work;
    private final Project.Listener listener = c -> refresh();

    SetupView(Composite parent, Workbench workbench) {
        this.workbench = workbench;
        this.project = workbench.project();
        this.work = new LatestOnly<>(workbench, "Steady temperature rise");
        root = new Composite(parent, SWT.NONE);
        root.setLayout(new GridLayout(1, false));
        technique = new BlockEditor(root, project, "Technique", "measurement", -1,
                workbench.catalog().techniques().stream().map(Technique::type).toList(),
                type -> workbench.catalog().technique(type).map(Technique::parameters).orElse(List.of()),
                type -> workbench.catalog().technique(type).map(Technique::summary).orElse(""));
        geometry = new BlockEditor(root, project, "Heating geometry", "geometry", -1,
                workbench.catalog().geometries().stream().map(HeatingGeometry::type).toList(),
                type -> workbench.catalog().geometry(type).map(HeatingGeometry::parameters).orElse(List.of()),
                type -> workbench.catalog().geometry(type).map(HeatingGeometry::summary).orElse(""));
        Group heat = new Group(root, SWT.NONE);
        heat.setText("Steady heating");
        heat.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        heat.setLayout(new GridLayout(2, false));
        Label pl = new Label(heat, SWT.NONE);
        pl.setText("absorbed power (mW):");
        power = new Text(heat, SWT.BORDER | SWT.RIGHT);
        GridData pgd = new GridData(SWT.LEFT, SWT.CENTER, false, false);
        pgd.widthHint = 90;
        power.setLayoutData(pgd);
        power.setText("10");
        power.addListener(SWT.DefaultSelection, e -> estimate());
        power.addListener(SWT.FocusOut, e -> estimate());
        rise = new StatusLine(heat, 2);
        Label caution = new Label(heat, SWT.WRAP);
        GridData cgd = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        cgd.widthHint = 300;
        caution.setLayoutData(cgd);
        caution.setText(CAUTION);
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

    void setPower(String milliwatts) {
        power.setText(milliwatts);
        estimate();
    }

    String riseText() {
        return rise.text();
    }

    /** A field of the technique's or the geometry's block, by its case-file key, for tests. */
    QuantityField field(String block, String key) {
        return (block.equals("geometry") ? geometry : technique).field(key);
    }

    String problemText(String block) {
        return (block.equals("geometry") ? geometry : technique).problemText();
    }

    private void refresh() {
        if (root.isDisposed()) {
            return;
        }
        ObjectNode tree = project.tree();
        technique.show(tree.path("measurement"));
        geometry.show(tree.path("geometry"));
        root.layout(true, true);
        estimate();
    }

    private void estimate() {
        Double mw = NumberText.parse(power.getText());
        if (mw == null || !(mw > 0)) {
            rise.show("absorbed power: " + (mw == null ? NumberText.notANumber(power.getText())
                    : "a power is positive"), StatusLine.Tone.PROBLEM);
            return;
        }
        CaseModel model = project.problem().isPresent() ? null : project.model().orElse(null);
        if (model == null) {
            work.cancel();
            rise.show("No estimate while the case has a problem: " + project.problem().map(Words::problem)
                    .orElse(""), StatusLine.Tone.PROBLEM);
            return;
        }
        double watts = mw * 1e-3;
        work.submit(p -> SteadyRise.perWatt(model, workbench.catalog()), new LatestOnly.View<>() {
            @Override
            public void done(Outcome<Double> o) {
                showRise(o, mw, watts);
            }

            @Override
            public void problem(String problem) {
                rise.show("The steady temperature rise could not be estimated: " + problem,
                        StatusLine.Tone.PROBLEM);
            }

            @Override
            public void stopped() {
                rise.show("Stopped: no estimate for the present values; change a value to estimate again.",
                        StatusLine.Tone.CAUTION);
            }

            @Override
            public void slow() {
                rise.show("Estimating the steady temperature rise… (Stop, in the status line, cancels)",
                        StatusLine.Tone.CAUTION);
            }
        });
    }

    private void showRise(Outcome<Double> o, double mw, double watts) {
        if (root.isDisposed()) {
            return;
        }
        if (!o.ok()) {
            rise.show(o.problem(), StatusLine.Tone.CAUTION);
            return;
        }
        double k = o.value() * watts;
        String text = "Predicted steady temperature rise: " + NumberText.format(k) + " K ("
                + NumberText.format(o.value()) + " K/W at 0 Hz × " + NumberText.format(mw) + " mW).";
        if (k > SteadyRise.WARNING_K) {
            rise.show(text + " That is large: properties at this temperature may differ from those in the"
                    + " case; lower the power or model the heated sample.", StatusLine.Tone.PROBLEM);
        } else if (k > SteadyRise.CAUTION_K) {
            rise.show(text + " Consider whether the properties still hold at this temperature.",
                    StatusLine.Tone.CAUTION);
        } else {
            rise.show(text, StatusLine.Tone.PLAIN);
        }
    }
}
