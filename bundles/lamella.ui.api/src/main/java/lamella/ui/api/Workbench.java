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
import org.osgi.annotation.versioning.ProviderType;

/** What every panel is given. Call on the UI thread unless a method says otherwise. */
@ProviderType
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
    default <T> Task background(String label, BackgroundWork<T> work, Consumer<T> onDone) {
        return start(label, work, onDone::accept);
    }

    /**
     * Runs work off the UI thread and tells what became of it on the UI thread. {@link Task#cancel()} sets the
     * work's {@link lamella.api.fit.Progress#cancelled()} and interrupts its thread, which is how the engine learns
     * to stop ({@link java.util.concurrent.CancellationException}); a failure goes to {@link #messages()} in words,
     * with the label, and to {@link WorkResult#failed}.
     */
    <T> Task start(String label, BackgroundWork<T> work, WorkResult<T> result);

    /**
     * Tells the window's status line what is wrong in a panel ("Signal" · "the model cannot be evaluated: …"), or
     * that it is fine again (problem null), so that the status line never says more than is true.
     */
    default void showProblem(String where, String problem) {
    }

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
