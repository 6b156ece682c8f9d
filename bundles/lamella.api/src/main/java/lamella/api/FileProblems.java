package lamella.api;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.file.AccessDeniedException;
import java.nio.file.DirectoryNotEmptyException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.FileSystemLoopException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import java.util.Locale;

/**
 * The operating system's reason why a file could not be read or written, in words and without any file's name:
 * the caller names the file the user gave, never a temporary one beside it.
 */
public final class FileProblems {

    private FileProblems() {
    }

    /** "no such file or folder", "permission denied", "is a directory", "read-only file system", … */
    public static String reason(IOException e) {
        if (e instanceof NoSuchFileException) {
            return "no such file or folder";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileAlreadyExistsException) {
            return "a file of that name already exists";
        }
        if (e instanceof NotDirectoryException) {
            return "not a folder";
        }
        if (e instanceof DirectoryNotEmptyException) {
            return "the folder is not empty";
        }
        if (e instanceof FileSystemLoopException) {
            return "the folder links form a loop";
        }
        if (e instanceof CharacterCodingException) {
            return "not UTF-8 text";
        }
        if (e instanceof FileSystemException f) {
            return f.getReason() != null ? words(f.getReason()) : "the file system refused the operation";
        }
        String m = e.getMessage();
        if (m == null || m.isBlank() || m.contains("/") || m.contains("\\")) {
            return "an input/output error";
        }
        return words(m);
    }

    /** "cannot read the file: REASON". */
    public static String cannotRead(IOException e) {
        return "cannot read the file: " + reason(e);
    }

    /** "cannot write: REASON". */
    public static String cannotWrite(IOException e) {
        return "cannot write: " + reason(e);
    }

    private static String words(String osText) {
        String t = osText.strip();
        return t.isEmpty() ? t : t.substring(0, 1).toLowerCase(Locale.ROOT) + t.substring(1);
    }
}
