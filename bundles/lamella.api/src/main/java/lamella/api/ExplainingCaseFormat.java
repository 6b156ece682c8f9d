package lamella.api;

import java.nio.file.Path;
import org.osgi.annotation.versioning.ProviderType;

/** A {@link CaseFormat} that can also say where every value of a case's stack came from. */
@ProviderType
public interface ExplainingCaseFormat extends CaseFormat {

    /** Reads a case as {@link #read} does, keeping the origin of every stack value. */
    ExplainedCase readExplained(Path file) throws InputException;
}
