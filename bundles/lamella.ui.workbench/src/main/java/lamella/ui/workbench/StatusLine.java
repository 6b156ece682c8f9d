package lamella.ui.workbench;

import java.util.Map;
import lamella.api.InputException;
import lamella.ui.api.Project;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/**
 * The line along the bottom: whether the case is valid, and if not what is wrong and where (its JSON path); what
 * the panels could not compute and why; the work running, with a button that stops it.
 */
final class StatusLine {

    private final Composite bar;
    private final Label validity;
    private final Label state;
    private final Label work;
    private final Button stop;

    StatusLine(Composite parent, Runnable onStop) {
        bar = new Composite(parent, SWT.NONE);
        GridLayout layout = new GridLayout(4, false);
        layout.marginHeight = 2;
        layout.marginWidth = 8;
        bar.setLayout(layout);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        validity = new Label(bar, SWT.NONE);
        GridData v = new GridData(SWT.FILL, SWT.CENTER, true, false);
        v.widthHint = 200;
        validity.setLayoutData(v);
        // Whether the project is saved, on a label of its own: a long problem beside it is cut, never this.
        state = new Label(bar, SWT.NONE);
        state.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false));
        work = new Label(bar, SWT.RIGHT);
        GridData w = new GridData(SWT.END, SWT.CENTER, false, false);
        w.widthHint = 360;
        work.setLayoutData(w);
        stop = new Button(bar, SWT.PUSH);
        stop.setText("Stop");
        stop.setToolTipText("Stops every computation under way (model curves, sensitivities, fits)");
        stop.setEnabled(false);
        stop.addListener(SWT.Selection, e -> onStop.run());
    }

    /** The case's state, then the first panel problem, if any. */
    void showProject(Project p, Map<String, String> panelProblems) {
        if (bar.isDisposed()) {
            return;
        }
        String saved = p.dirty() ? "unsaved changes" : p.file().isPresent() ? "saved" : "not saved yet";
        String text;
        boolean bad;
        if (p.problem().isPresent()) {
            InputException e = p.problem().get();
            String where = e.path() == null || e.path().isEmpty() ? "" : " at " + e.path();
            text = "Case invalid" + where + ": " + oneLine(e.problem());
            bad = true;
        } else {
            String model = p.current().map(d -> d.geometry().get("type") + " heating, "
                    + d.measurement().get("type") + " measurement, " + d.stack().layers().size() + " layers")
                    .orElse("");
            text = "Case valid: " + model;
            bad = false;
            for (Map.Entry<String, String> problem : panelProblems.entrySet()) {
                text = "Case valid, but " + problem.getKey() + ": " + oneLine(problem.getValue());
                bad = true;
                break;
            }
        }
        validity.setForeground(bar.getDisplay().getSystemColor(bad ? SWT.COLOR_DARK_RED
                : SWT.COLOR_WIDGET_FOREGROUND));
        validity.setText(text.replace("&", "&&"));
        state.setText("(" + saved + ")");
        validity.setToolTipText(p.problem().map(Throwable::getMessage)
                .orElse(panelProblems.isEmpty() ? null : String.join("\n", panelProblems.values())));
        bar.layout();
    }

    void showWork(String summary) {
        if (bar.isDisposed()) {
            return;
        }
        work.setText(summary.isEmpty() ? "No background work" : "Running: " + summary);
        stop.setEnabled(!summary.isEmpty());
        bar.layout();
    }

    String text() {
        return validity.getText().replace("&&", "&") + "   " + state.getText() + " | " + work.getText();
    }

    /** The line's controls, for the window control's check of cut texts. */
    Composite bar() {
        return bar;
    }

    void pressStop() {
        if (stop.isEnabled()) {
            stop.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
        }
    }

    private static String oneLine(String s) {
        return s == null ? "" : s.replace('\n', ' ');
    }
}
