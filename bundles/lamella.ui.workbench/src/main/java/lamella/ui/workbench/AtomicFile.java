package lamella.ui.workbench;

import java.io.IOException;
import java.nio.file.Path;
import lamella.api.AtomicText;

/** Writes a file next to its target and moves it into place, so that a reader never sees half of it. */
final class AtomicFile {

    private AtomicFile() {
    }

    static void write(Path target, String content) throws IOException {
        AtomicText.write(target, content);
    }
}
