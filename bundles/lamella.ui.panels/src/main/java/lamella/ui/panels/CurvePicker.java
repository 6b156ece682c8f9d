package lamella.ui.panels;

import java.util.List;
import lamella.ui.api.Project;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/** Chooses which curve a plot shows; keeps the choice when the fit block's datasets change, where it can. */
final class CurvePicker {

    private final Combo combo;
    private List<CurveChoice> choices = List.of();

    CurvePicker(Composite parent, Runnable onChange) {
        Label l = new Label(parent, SWT.NONE);
        l.setText("Curve:");
        combo = new Combo(parent, SWT.READ_ONLY);
        combo.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        combo.addListener(SWT.Selection, e -> onChange.run());
    }

    /** Re-reads the datasets; true when the selected curve changed as a result. */
    boolean refresh(Project project) {
        int before = selected();
        choices = CurveChoice.of(project);
        combo.setItems(choices.stream().map(CurveChoice::label).toArray(String[]::new));
        int index = 0;
        for (int i = 0; i < choices.size(); i++) {
            if (choices.get(i).dataset() == before) {
                index = i;
            }
        }
        combo.select(index);
        return selected() != before;
    }

    /** The dataset index, −1 for the case's own measurement. */
    int selected() {
        int i = combo.getSelectionIndex();
        return i < 0 || i >= choices.size() ? Integer.MIN_VALUE : choices.get(i).dataset();
    }

    void select(int dataset) {
        for (int i = 0; i < choices.size(); i++) {
            if (choices.get(i).dataset() == dataset) {
                combo.select(i);
                combo.notifyListeners(SWT.Selection, null);
            }
        }
    }
}
