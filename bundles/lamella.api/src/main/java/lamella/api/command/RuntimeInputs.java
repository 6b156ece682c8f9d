package lamella.api.command;

import java.nio.file.Path;
import java.util.List;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * Files the runtime reads for commands beyond those on their command lines (the configured material libraries'
 * files), which no command's output may replace. Offered as a service; the dispatcher hands their union to every
 * command in {@link CommandIO#runtimeInputs()}.
 */
@ConsumerType
public interface RuntimeInputs {

    /** The files as they are now; listing them must be cheap (no parsing). */
    List<Path> files();
}
