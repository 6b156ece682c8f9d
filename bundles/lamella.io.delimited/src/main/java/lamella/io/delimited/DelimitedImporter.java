package lamella.io.delimited;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import lamella.api.InputException;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.ImportLimits;
import org.osgi.service.component.annotations.Component;

/** Delimited text tables: the reader of last resort for any instrument that exports a table with a header. */
@Component(service = DataImporter.class)
public final class DelimitedImporter implements DataImporter {

    @Override
    public String id() {
        return DelimitedTable.FORMAT;
    }

    @Override
    public String summary() {
        return "Text tables separated by comma, tab, semicolon or spaces, with units in the header.";
    }

    /**
     * Sure enough to win over nothing, unsure enough that any importer that recognises its own format wins: a table
     * can be read by this importer but it is never declared as this format.
     */
    @Override
    public double confidence(Path file, byte[] head) {
        for (byte b : head) {
            if (b == 0) {
                return 0;
            }
        }
        String text = new String(head, StandardCharsets.UTF_8);
        String[] lines = text.split("\r\n|\r|\n");
        // A head cut at the limit ends in a partial line, which says nothing.
        int complete = head.length < ImportLimits.HEAD_BYTES ? lines.length : lines.length - 1;
        String previous = null;
        for (int i = 0; i < complete; i++) {
            String t = lines[i].strip();
            if (t.isEmpty() || DelimitedTable.isComment(t)) {
                continue;
            }
            if (Dialect.detect(t, null).isPresent()) {
                return previous != null && Dialect.detect(t, previous).isPresent() ? 0.5 : 0.1;
            }
            previous = t;
        }
        return 0.1;
    }

    @Override
    public Dataset read(Path file) throws InputException {
        return DelimitedTable.read(file);
    }
}
