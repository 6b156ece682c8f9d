package lamella.ui.workbench;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;

/** A window of reading: a heading, wrapped text that scrolls, and a button to close it. Does not block. */
final class HelpWindow {

    private HelpWindow() {
    }

    static Shell open(Shell parent, String title, String heading, String text, int width, int height) {
        Shell w = new Shell(parent, SWT.DIALOG_TRIM | SWT.RESIZE);
        w.setText(title);
        GridLayout layout = new GridLayout(1, false);
        layout.marginWidth = 16;
        layout.marginHeight = 14;
        layout.verticalSpacing = 12;
        w.setLayout(layout);
        Label h = new Label(w, SWT.WRAP);
        h.setText(heading);
        h.setFont(Fonts.bold(h));
        h.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        Text body = new Text(w, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.V_SCROLL);
        body.setText(text);
        body.setTabs(24);
        GridData bd = new GridData(SWT.FILL, SWT.FILL, true, true);
        bd.widthHint = width;
        bd.heightHint = height;
        body.setLayoutData(bd);
        Button close = new Button(w, SWT.PUSH);
        close.setText("Close");
        GridData cd = new GridData(SWT.END, SWT.CENTER, false, false);
        cd.widthHint = 100;
        close.setLayoutData(cd);
        close.addListener(SWT.Selection, e -> w.close());
        w.setDefaultButton(close);
        w.pack();
        Dialogs.centre(w, parent);
        w.open();
        return w;
    }
}
