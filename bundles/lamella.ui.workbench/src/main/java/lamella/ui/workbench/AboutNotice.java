package lamella.ui.workbench;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.MessageBox;
import org.eclipse.swt.widgets.Shell;

/** What Lamella is, for Help ▸ About. */
final class AboutNotice {

    private AboutNotice() {
    }

    static void open(Shell parent) {
        MessageBox box = new MessageBox(parent, SWT.ICON_INFORMATION | SWT.OK);
        box.setText("About Lamella");
        box.setMessage("Lamella — thermal properties of layered samples from thermoreflectance (TDTR, FDTR, SSTR)"
                + " and 3ω line-heater measurements.\n\nModels, fits with uncertainty budgets and reports; panels,"
                + " geometries, techniques, importers and material libraries are plug-in bundles.\n\nJava "
                + System.getProperty("java.version") + ", SWT " + SWT.getVersion() + " (" + SWT.getPlatform()
                + ").");
        box.open();
    }
}
