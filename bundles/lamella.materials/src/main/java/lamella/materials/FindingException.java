package lamella.materials;

import lamella.api.material.LibraryFinding;

/** A problem that stops the reading of one file or one entry; it becomes a finding, and reading goes on. */
final class FindingException extends Exception {

    private static final long serialVersionUID = 1L;

    private final transient LibraryFinding finding;

    FindingException(String file, int line, String path, String message) {
        super(message);
        this.finding = new LibraryFinding(LibraryFinding.Severity.ERROR, file, line, path, message);
    }

    LibraryFinding finding() {
        return finding;
    }
}
