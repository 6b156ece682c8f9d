package lamella.ui.panels;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import lamella.api.CaseModel;
import lamella.api.HeatingGeometry;
import lamella.api.SelfHeating;
import lamella.api.Technique;
import lamella.ui.api.PanelView;
import lamella.ui.api.Project;
import lamella.ui.api.Workbench;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

/**
 * The Set-up panel: the technique and the heating geometry with their case-file parameters (SI values, units from
 * the keys), and an estimate of the steady temperature rise from an absorbed power. The power is a panel setting
 * until self-heating is ticked: it is then the case's {@code self_heating.absorbed_power_w}, and the estimate is the
 * rise consistent with the library values taken at the heated temperature.
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
    private final GainsEditor gains;
    private final Text power;
    private final Button selfHeating;
    private final StatusLine rise;
    private final LatestOnly<Outcome<SteadyRise.Estimate>> work;
    private final Project.Listener listener = c -> refresh();

    SetupView(Composite parent, Workbench workbench) {
        this.workbench = workbench;
        this.project = workbench.project();
        this.work = new LatestOnly<>(workbench, "Steady temperature rise");
        root = new Composite(parent, SWT.NONE);
        // Two columns, the model's blocks beside the fit's gains and the heating estimate, so that everything is in
        // view at 1280×800 without scrolling.
        root.setLayout(new GridLayout(2, true));
        Composite left = column(root);
        Composite right = column(root);
        technique = new BlockEditor(left, project, "Technique", "measurement", -1,
                workbench.catalog().techniques().stream().map(Technique::type).toList(),
                type -> workbench.catalog().technique(type).map(Technique::parameters).orElse(List.of()),
                type -> workbench.catalog().technique(type).map(Technique::summary).orElse(""));
        geometry = new BlockEditor(left, project, "Heating geometry", "geometry", -1,
                workbench.catalog().geometries().stream().map(HeatingGeometry::type).toList(),
                type -> workbench.catalog().geometry(type).map(HeatingGeometry::parameters).orElse(List.of()),
                type -> workbench.catalog().geometry(type).map(HeatingGeometry::summary).orElse(""));
        gains = new GainsEditor(right, workbench);
        Group heat = new Group(right, SWT.NONE);
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
        power.addListener(SWT.DefaultSelection, e -> powerEntered());
        power.addListener(SWT.FocusOut, e -> powerEntered());
        selfHeating = new Button(heat, SWT.CHECK);
        selfHeating.setText("self-heating: library values at the heated temperature");
        selfHeating.setToolTipText("writes the absorbed power into the case as self_heating.absorbed_power_w");
        selfHeating.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        selfHeating.addListener(SWT.Selection, e -> selfHeatingToggled());
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

    private static Composite column(Composite parent) {
        Composite c = new Composite(parent, SWT.NONE);
        GridLayout l = new GridLayout(1, false);
        l.marginWidth = 0;
        l.marginHeight = 0;
        c.setLayout(l);
        c.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        return c;
    }

    void setPower(String milliwatts) {
        power.setText(milliwatts);
        estimate();
    }

    String riseText() {
        return rise.text();
    }

    /** Ticks or clears the self-heating box as a user would, for tests. */
    void setSelfHeating(boolean on) {
        selfHeating.setSelection(on);
        selfHeatingToggled();
    }

    boolean selfHeatingShown() {
        return selfHeating.getSelection();
    }

    /** A field of the technique's or the geometry's block, by its case-file key, for tests. */
    QuantityField field(String block, String key) {
        return (block.equals("geometry") ? geometry : technique).field(key);
    }

    GainsEditor gains() {
        return gains;
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
        gains.show();
        JsonNode heating = tree.path(SELF_HEATING);
        selfHeating.setSelection(heating.isObject());
        JsonNode watts = heating.path(POWER_KEY);
        Double shown = NumberText.parse(power.getText());
        if (watts.isNumber() && (shown == null || shown * 1e-3 != watts.asDouble())) {
            power.setText(NumberText.format(watts.asDouble() * 1e3));
        }
        root.layout(true, true);
        estimate();
    }

    private static final String SELF_HEATING = "self_heating";
    private static final String POWER_KEY = "absorbed_power_w";

    /** With self-heating on, the power typed is the case's; otherwise it only feeds the estimate. */
    private void powerEntered() {
        Double mw = NumberText.parse(power.getText());
        if (selfHeating.getSelection() && mw != null && mw >= 0) {
            double watts = mw * 1e-3;
            project.edit("absorbed power " + NumberText.format(mw) + " mW", t -> t.putObject(SELF_HEATING)
                    .put(POWER_KEY, watts));
        }
        estimate();
    }

    private void selfHeatingToggled() {
        if (!selfHeating.getSelection()) {
            project.edit("turn off self-heating", t -> t.remove(SELF_HEATING));
            return;
        }
        Double mw = NumberText.parse(power.getText());
        if (mw == null || !(mw >= 0)) {
            selfHeating.setSelection(false);
            rise.show("self-heating needs an absorbed power: " + (mw == null ? NumberText.notANumber(power.getText())
                    : "a power is 0 mW or more"), StatusLine.Tone.PROBLEM);
            return;
        }
        double watts = mw * 1e-3;
        project.edit("turn on self-heating", t -> t.putObject(SELF_HEATING).put(POWER_KEY, watts));
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
            public void done(Outcome<SteadyRise.Estimate> o) {
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

    private void showRise(Outcome<SteadyRise.Estimate> o, double mw, double watts) {
        if (root.isDisposed()) {
            return;
        }
        if (!o.ok()) {
            rise.show(o.problem(), StatusLine.Tone.CAUTION);
            return;
        }
        double perWatt = o.value().perWatt();
        double k = perWatt * watts;
        String text = "Predicted steady temperature rise: " + NumberText.format(k) + " K ("
                + NumberText.format(perWatt) + " K/W at 0 Hz × " + NumberText.format(mw) + " mW)."
                + o.value().heating().map(SetupView::selfHeatingText).orElse("");
        if (k > SteadyRise.WARNING_K) {
            rise.show(text + " That is large: properties at this temperature may differ from those in the"
                    + " case; lower the power"
                    + (o.value().heating().isPresent() ? "." : ", or tick self-heating to take library values at the"
                    + " heated temperature."), StatusLine.Tone.PROBLEM);
        } else if (k > SteadyRise.CAUTION_K) {
            rise.show(text + " Consider whether the properties still hold at this temperature.",
                    StatusLine.Tone.CAUTION);
        } else {
            rise.show(text, StatusLine.Tone.PLAIN);
        }
    }

    /** What self-heating did, in a sentence for the rise line. */
    private static String selfHeatingText(SelfHeating.Outcome h) {
        int n = h.values().size();
        String s = n == 0 ? " Self-heating is on, but no layer takes a value from a library: nothing is shifted."
                : " Self-heating is on: " + n + " library value" + (n == 1 ? "" : "s") + " taken at the heated"
                + " temperature (" + h.iterations() + " evaluations to settle).";
        return h.warnings().isEmpty() ? s : s + " " + h.warnings().size() + " outside the library's range: "
                + h.warnings().get(0);
    }
}
