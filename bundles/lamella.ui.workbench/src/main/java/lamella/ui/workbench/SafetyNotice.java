package lamella.ui.workbench;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;

/** The laser and heater caution of the Help menu, in a small window of its own. */
final class SafetyNotice {

    static final String TITLE = "Laser and heater safety";

    static final String TEXT = String.join("\n",
            "Thermoreflectance (TDTR, FDTR, SSTR) uses Class 3B and Class 4 lasers. Their direct and scattered"
                    + " beams can injure the eye and the skin before you can react.",
            "",
            "• Wear eye protection rated for every wavelength in use (pump and probe) whenever a beam can reach you.",
            "• Work only inside interlocked enclosures, and never defeat an interlock.",
            "• Follow your facility's laser safety programme and the instructions of its laser safety officer.",
            "",
            "3ω line heaters are driven electrically: limit the drive current, and remember that a heater and"
                    + " its sample can become hot enough to damage fragile films or burn.",
            "",
            "The pump also heats the sample steadily, by several kelvin to tens of kelvin; Lamella warns when a"
                    + " set-up's predicted steady temperature rise is large.",
            "",
            "Lamella reminds; it does not replace local codes, your facility's rules or licensed practice.");

    private SafetyNotice() {
    }

    /** Opens the notice without waiting for it to close: the caller's event loop serves it. */
    static Shell open(Shell parent) {
        Shell dialog = new Shell(parent, SWT.DIALOG_TRIM | SWT.APPLICATION_MODAL | SWT.RESIZE);
        dialog.setText(TITLE);
        GridLayout layout = new GridLayout(1, false);
        layout.marginWidth = 16;
        layout.marginHeight = 14;
        layout.verticalSpacing = 12;
        dialog.setLayout(layout);
        Label heading = new Label(dialog, SWT.NONE);
        heading.setText("Caution: lasers and heated samples");
        heading.setFont(Fonts.bold(heading));
        Text body = new Text(dialog, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.V_SCROLL);
        body.setText(TEXT);
        GridData bodyData = new GridData(SWT.FILL, SWT.FILL, true, true);
        bodyData.widthHint = 560;
        bodyData.heightHint = 300;
        body.setLayoutData(bodyData);
        Button ok = new Button(dialog, SWT.PUSH);
        ok.setText("Understood");
        GridData okData = new GridData(SWT.END, SWT.CENTER, false, false);
        okData.widthHint = 120;
        ok.setLayoutData(okData);
        ok.addListener(SWT.Selection, e -> dialog.close());
        dialog.setDefaultButton(ok);
        dialog.pack();
        Dialogs.centre(dialog, parent);
        dialog.open();
        return dialog;
    }
}
