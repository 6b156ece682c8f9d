package lamella.api.fit;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import lamella.api.CaseDocument;
import org.osgi.annotation.versioning.ProviderType;

/**
 * Writes a fit's report into a folder: an HTML page with data and fit, residuals, sensitivities and the uncertainty
 * budget as PNG and SVG plots, and the numbers as CSV and JSON. Offered as a service by the report bundle.
 */
@ProviderType
public interface ReportWriter {

    /**
     * Writes the report; the folder is created, and its files are replaced only once each is complete.
     *
     * @return the HTML page
     */
    Path write(CaseDocument doc, FitOutcome outcome, List<SensitivityTable> sensitivities, Path folder)
            throws IOException;

    /**
     * Whether a report may write a file of this name into its folder, so that a command can refuse a folder holding
     * one of its own inputs under such a name before it computes anything. The default assumes every name.
     */
    default boolean writes(String fileName) {
        return true;
    }
}
