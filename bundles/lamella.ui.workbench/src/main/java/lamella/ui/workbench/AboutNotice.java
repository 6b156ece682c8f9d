package lamella.ui.workbench;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Shell;

/** What Lamella is and which version runs, for Help ▸ About, with the safety caution. */
final class AboutNotice {

    static final String TITLE = "About Lamella";

    private AboutNotice() {
    }

    static String text(String version) {
        return String.join("\n",
                "Lamella " + version,
                "",
                "Thermal properties of layered samples — thin films, coatings, interfaces, anisotropic crystals —"
                        + " from thermoreflectance (TDTR, FDTR, SSTR) and 3ω line-heater measurements: models of the"
                        + " signal, joint fits with an uncertainty budget, and reports.",
                "",
                "Panels, geometries, techniques, importers and material libraries are plug-in bundles; "
                        + "./lamella plugins lists what is live.",
                "",
                "Java " + System.getProperty("java.version") + ", SWT " + SWT.getVersion() + " (" + SWT.getPlatform()
                        + ").",
                "",
                "Safety: lasers of Class 3B and 4 and driven heaters are used in these measurements. Lamella's"
                        + " predictions do not replace your facility's laser safety programme, local codes or"
                        + " licensed practice (Help ▸ Laser and heater safety).");
    }

    static Shell open(Shell parent, String version) {
        return HelpWindow.open(parent, TITLE, "Lamella " + version, text(version), 520, 260);
    }
}
