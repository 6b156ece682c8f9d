package lamella.ui.panels;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Font;
import org.eclipse.swt.graphics.FontData;
import org.eclipse.swt.widgets.Control;

/** A bold version of a control's font, released with the control. */
final class Fonts {

    private Fonts() {
    }

    static Font bold(Control c) {
        FontData[] data = c.getFont().getFontData();
        for (FontData d : data) {
            d.setStyle(SWT.BOLD);
            d.setHeight(d.getHeight() + 1);
        }
        Font f = new Font(c.getDisplay(), data);
        c.addDisposeListener(e -> f.dispose());
        return f;
    }
}
