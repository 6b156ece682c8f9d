package lamella.materials;

import java.io.IOException;
import java.io.InputStream;

/**
 * One file of a library, wherever it lives (a folder, a bundle).
 *
 * @param label  how findings name it: a path, or bundle and entry
 * @param name   its file name, such as {@code library.json}
 * @param opener opens it for reading
 */
record SourceFile(String label, String name, Opener opener) {

    interface Opener {
        InputStream open() throws IOException;
    }
}
