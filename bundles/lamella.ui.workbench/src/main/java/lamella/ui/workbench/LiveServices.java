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

    /** Lamella's version, as the workbench bundle carries it. */
    String version();
}
