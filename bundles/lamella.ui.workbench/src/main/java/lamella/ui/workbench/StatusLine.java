package lamella.ui.workbench;

import lamella.ui.api.Project;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/** The line along the bottom: whether the case is valid (what is wrong, in red, if not) and the work running. */
final class StatusLine {

    private final Composite bar;
    private final Label validity;
    private final Label work;

    StatusLine(Composite parent) {
        bar = new Composite(parent, SWT.NONE);
        GridLayout layout = new GridLayout(2, false);
        layout.marginHeight = 3;
        layout.marginWidth = 8;
        bar.setLayout(layout);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        validity = new Label(bar, SWT.NONE);
        validity.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        work = new Label(bar, SWT.RIGHT);
        GridData w = new GridData(SWT.END, SWT.CENTER, false, false);
        w.widthHint = 420;
        work.setLayoutData(w);
    }

    void showProject(Project p) {
        if (bar.isDisposed()) {
            return;
        }
        String state = p.dirty() ? "unsaved changes" : p.file().isPresent() ? "saved" : "not saved yet";
        if (p.problem().isPresent()) {
            validity.setForeground(bar.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
            validity.setText("Case invalid: " + oneLine(p.problem().get().getMessage()) + "   (" + state + ")");
        } else {
            validity.setForeground(bar.getDisplay().getSystemColor(SWT.COLOR_WIDGET_FOREGROUND));
            String model = p.current().map(d -> d.geometry().get("type") + " heating, "
                    + d.measurement().get("type") + " measurement, " + d.stack().layers().size() + " layers")
                    .orElse("");
            validity.setText("Case valid: " + model + "   (" + state + ")");
        }
        validity.setToolTipText(p.problem().map(Throwable::getMessage).orElse(null));
        bar.layout();
    }

    void showWork(String summary) {
        if (bar.isDisposed()) {
            return;
        }
        work.setText(summary.isEmpty() ? "No background work" : "Running: " + summary);
        bar.layout();
    }

    String text() {
        return validity.getText() + " | " + work.getText();
    }

    private static String oneLine(String s) {
        return s == null ? "" : s.replace('\n', ' ');
    }
}
