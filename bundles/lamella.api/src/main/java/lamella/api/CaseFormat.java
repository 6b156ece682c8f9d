package lamella.api;

import java.nio.file.Path;

/** Reads case files; offered as a service by the case-file bundle. */
public interface CaseFormat {

    /**
     * Reads and checks a case file. Every problem is an {@link InputException} naming the file and the JSON path
     * (or line, for a syntax error).
     */
    CaseDocument read(Path file) throws InputException;
}
