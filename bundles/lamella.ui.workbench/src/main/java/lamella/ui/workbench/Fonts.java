package lamella.ui.workbench;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Font;
import org.eclipse.swt.graphics.FontData;
import org.eclipse.swt.widgets.Control;

/** Variants of a control's own font, released with the control. */
final class Fonts {

    private Fonts() {
    }

    static Font bold(Control c) {
        FontData[] data = c.getFont().getFontData();
        for (FontData d : data) {
            d.setStyle(SWT.BOLD);
        }
        Font f = new Font(c.getDisplay(), data);
        c.addListener(SWT.Dispose, e -> f.dispose());
        return f;
    }
}
