package lamella.ui.api;

import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import lamella.api.CaseFormat;
import lamella.api.ModelCatalog;
import lamella.api.data.DataImporter;
import lamella.api.fit.FitService;
import lamella.api.fit.ReportWriter;
import lamella.api.material.MaterialCatalog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.MessageBox;
import org.eclipse.swt.widgets.Shell;

/** What every panel is given. Call on the UI thread unless a method says otherwise. */
public interface Workbench {

    Display display();

    Shell shell();

    /** The project being edited. */
    Project project();

    Messages messages();

    /** The live geometries, techniques and stack kernel, as they are now. */
    ModelCatalog catalog();

    CaseFormat caseFormat();

    Optional<FitService> fitter();

    Optional<ReportWriter> reports();

    Optional<MaterialCatalog> materials();

    List<DataImporter> importers();

    /**
     * Runs work off the UI thread; onDone receives its result on the UI thread, unless it was cancelled or failed
     * (a failure goes to {@link #messages()} with the label).
     */
    <T> Task background(String label, BackgroundWork<T> work, Consumer<T> onDone);

    /** Brings a panel to the front, opening it if it is closed. */
    void show(String panelId);

    /**
     * Asks before a step the user may not have meant, such as removing a layer: true when the user chose the
     * action. The question names what will happen; action is the button's label ("Remove layer").
     */
    default boolean confirm(String title, String question, String action) {
        MessageBox box = new MessageBox(shell(), SWT.ICON_QUESTION | SWT.OK | SWT.CANCEL);
        box.setText(title);
        box.setMessage(question);
        return box.open() == SWT.OK;
    }
}
