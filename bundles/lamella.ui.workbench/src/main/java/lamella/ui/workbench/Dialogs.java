package lamella.ui.workbench;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;

/** Small questions the window asks. */
final class Dialogs {

    private Dialogs() {
    }

    static void centre(Shell dialog, Shell over) {
        Rectangle p = over.getBounds();
        Point s = dialog.getSize();
        dialog.setLocation(p.x + Math.max(0, (p.width - s.x) / 2), p.y + Math.max(0, (p.height - s.y) / 3));
    }

    /** Asks for a name; null when cancelled or left empty. */
    static String askName(Shell parent, String title, String prompt, String initial) {
        Shell d = new Shell(parent, SWT.DIALOG_TRIM | SWT.APPLICATION_MODAL);
        d.setText(title);
        d.setLayout(new GridLayout(2, false));
        Label l = new Label(d, SWT.NONE);
        l.setText(prompt);
        l.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        Text t = new Text(d, SWT.BORDER | SWT.SINGLE);
        t.setText(initial);
        GridData td = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        td.widthHint = 320;
        t.setLayoutData(td);
        String[] answer = {null};
        Button ok = new Button(d, SWT.PUSH);
        ok.setText("Save");
        ok.setLayoutData(new GridData(SWT.END, SWT.CENTER, true, false));
        Button cancel = new Button(d, SWT.PUSH);
        cancel.setText("Cancel");
        ok.addListener(SWT.Selection, e -> {
            answer[0] = t.getText().strip();
            d.close();
        });
        cancel.addListener(SWT.Selection, e -> d.close());
        d.setDefaultButton(ok);
        d.pack();
        centre(d, parent);
        d.open();
        while (!d.isDisposed()) {
            if (!d.getDisplay().readAndDispatch()) {
                d.getDisplay().sleep();
            }
        }
        return answer[0] == null || answer[0].isEmpty() ? null : answer[0];
    }

    /**
     * A question with the action's own label on its button and Cancel beside it (Escape cancels too); true when
     * the action was chosen. A window of Lamella's own rather than the system's message box, so that its buttons
     * answer to the same events as every other control.
     */
    static boolean confirm(Shell parent, String title, String question, String action) {
        Shell d = new Shell(parent, SWT.DIALOG_TRIM | SWT.APPLICATION_MODAL);
        d.setText(title);
        GridLayout layout = new GridLayout(2, false);
        layout.marginWidth = 16;
        layout.marginHeight = 14;
        layout.verticalSpacing = 14;
        d.setLayout(layout);
        Label text = new Label(d, SWT.WRAP);
        text.setText(question);
        GridData td = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        td.widthHint = 420;
        text.setLayoutData(td);
        boolean[] chosen = {false};
        Button yes = new Button(d, SWT.PUSH);
        yes.setText(action);
        yes.setLayoutData(new GridData(SWT.END, SWT.CENTER, true, false));
        Button cancel = new Button(d, SWT.PUSH);
        cancel.setText("Cancel");
        yes.addListener(SWT.Selection, e -> {
            chosen[0] = true;
            d.close();
        });
        cancel.addListener(SWT.Selection, e -> d.close());
        d.setDefaultButton(cancel);
        d.pack();
        centre(d, parent);
        d.open();
        cancel.setFocus();
        while (!d.isDisposed()) {
            if (!d.getDisplay().readAndDispatch()) {
                d.getDisplay().sleep();
            }
        }
        return chosen[0];
    }

    /**
     * A notice with an OK button, in a window of Lamella's own that does not wait to be closed: the caller goes on,
     * and the window's event loop serves the notice.
     */
    static Shell tell(Shell parent, String title, String text, int icon) {
        Shell d = new Shell(parent, SWT.DIALOG_TRIM | SWT.APPLICATION_MODAL);
        d.setText(title);
        GridLayout layout = new GridLayout(2, false);
        layout.marginWidth = 16;
        layout.marginHeight = 14;
        layout.horizontalSpacing = 12;
        d.setLayout(layout);
        Label image = new Label(d, SWT.NONE);
        image.setImage(d.getDisplay().getSystemImage(icon));
        image.setLayoutData(new GridData(SWT.CENTER, SWT.TOP, false, false));
        Label message = new Label(d, SWT.WRAP);
        message.setText(text);
        GridData md = new GridData(SWT.FILL, SWT.CENTER, true, false);
        md.widthHint = 440;
        message.setLayoutData(md);
        Button ok = new Button(d, SWT.PUSH);
        ok.setText("OK");
        GridData od = new GridData(SWT.END, SWT.CENTER, true, false, 2, 1);
        od.widthHint = 90;
        ok.setLayoutData(od);
        ok.addListener(SWT.Selection, e -> d.close());
        d.setDefaultButton(ok);
        d.pack();
        centre(d, parent);
        d.open();
        return d;
    }
}
