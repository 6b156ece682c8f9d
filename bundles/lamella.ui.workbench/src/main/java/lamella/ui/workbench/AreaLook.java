package lamella.ui.workbench;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;

/** How areas look: flat tabs, the front one marked by a slate bar, quiet gaps between areas. */
final class AreaLook {

    private AreaLook() {
    }

    static CTabFolder folder(Composite parent) {
        CTabFolder folder = new CTabFolder(parent, SWT.BORDER | SWT.FLAT);
        folder.setSimple(true);
        folder.setMaximizeVisible(true);
        folder.setMinimizeVisible(false);
        folder.setTabHeight(Math.max(26, folder.getTabHeight() + 6));
        Display d = parent.getDisplay();
        folder.setSelectionBackground(new Color(d, 226, 234, 242));
        folder.setSelectionForeground(d.getSystemColor(SWT.COLOR_BLACK));
        folder.setSelectionBarThickness(3);
        folder.setBackground(new Color(d, 243, 244, 246));
        folder.setUnselectedCloseVisible(false);
        return folder;
    }

    static Color sashColour(Display d) {
        return new Color(d, 214, 218, 224);
    }

    /** The drop indicator's colour: the slate of the front tab's bar. */
    static Color dropColour(Display d) {
        return new Color(d, 70, 110, 150);
    }
}
