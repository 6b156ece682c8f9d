package lamella.ui.api;

import java.nio.file.Path;
import lamella.api.CaseDocument;
import lamella.api.InputException;

/** Reads and checks a case file: the live {@link lamella.api.CaseFormat}'s read method. */
@FunctionalInterface
public interface CaseReader {
    CaseDocument read(Path file) throws InputException;
}
