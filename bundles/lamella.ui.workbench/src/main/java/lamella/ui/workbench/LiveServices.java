package lamella.ui.workbench;

import java.util.List;
import java.util.Optional;
import lamella.api.CaseFormat;
import lamella.api.ModelCatalog;
import lamella.api.data.DataImporter;
import lamella.api.fit.FitService;
import lamella.api.fit.ReportWriter;
import lamella.api.material.MaterialCatalog;
import lamella.ui.api.WorkbenchPanel;

/** The services the window uses, as they are at the moment of the call. Any thread. */
interface LiveServices {

    CaseFormat caseFormat();

    ModelCatalog catalog();

    Optional<FitService> fitter();

    Optional<ReportWriter> reports();

    Optional<MaterialCatalog> materials();

    List<DataImporter> importers();

    List<WorkbenchPanel> panels();

    /**
     * Runs {@code action} once the runtime says that every shipped bundle (and every plug-in present at launch) has
     * started — at once, on the calling thread, if it already has; otherwise later, on the thread that says so.
     */
    void whenStarted(Runnable action);

    /** Lamella's version, as the workbench bundle carries it. */
    String version();
}
