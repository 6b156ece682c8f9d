package lamella.ui.panels;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/** One line of status under a panel's controls: plain for information, amber for a caution, red for a problem. */
final class StatusLine {

    enum Tone { PLAIN, CAUTION, PROBLEM }

    private final Label label;
    private final Color amber;
    private final Color red;

    StatusLine(Composite parent, int columns) {
        label = new Label(parent, SWT.WRAP);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false, columns, 1);
        gd.widthHint = 200;
        label.setLayoutData(gd);
        amber = new Color(parent.getDisplay(), 0xA0, 0x5A, 0x00);
        red = new Color(parent.getDisplay(), 0xB0, 0x1E, 0x1E);
        label.addDisposeListener(e -> {
            amber.dispose();
            red.dispose();
        });
    }

    void show(String text, Tone tone) {
        if (label.isDisposed()) {
            return;
        }
        label.setText(text == null ? "" : text);
        label.setForeground(switch (tone) {
            case PLAIN -> null;
            case CAUTION -> amber;
            case PROBLEM -> red;
        });
        // The shell re-lays every ancestor, so that a longer wrapped text grows its group instead of being cut.
        label.getShell().layout(new org.eclipse.swt.widgets.Control[] {label});
    }

    String text() {
        return label.getText();
    }

    Label control() {
        return label;
    }
}
