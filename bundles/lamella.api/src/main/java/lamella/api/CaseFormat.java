package lamella.api;

import java.nio.file.Path;
import org.osgi.annotation.versioning.ProviderType;

/** Reads case files; offered as a service by the case-file bundle. */
@ProviderType
public interface CaseFormat {

    /**
     * Reads and checks a case file. Every problem is an {@link InputException} naming the file and the JSON path
     * (or line, for a syntax error).
     */
    CaseDocument read(Path file) throws InputException;
}
