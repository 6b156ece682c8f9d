package lamella.io.exchange;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import lamella.api.InputException;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import org.osgi.service.component.annotations.Component;

/** Lamella's open exchange format for lock-in exports: the file declares itself on its first line. */
@Component(service = DataImporter.class)
public final class ExchangeImporter implements DataImporter {

    private static final byte[] MAGIC = ExchangeFile.MAGIC.getBytes(StandardCharsets.US_ASCII);
    private static final int BOM = 3;

    @Override
    public String id() {
        return ExchangeFile.FORMAT;
    }

    @Override
    public String summary() {
        return "Lamella exchange format, version 1: metadata, lock-in channels with standard deviations, scans.";
    }

    @Override
    public double confidence(Path file, byte[] head) {
        int start = head.length >= BOM && head[0] == (byte) 0xEF && head[1] == (byte) 0xBB && head[2] == (byte) 0xBF
                ? BOM : 0;
        if (head.length - start < MAGIC.length) {
            return 0;
        }
        for (int i = 0; i < MAGIC.length; i++) {
            if (head[start + i] != MAGIC[i]) {
                return 0;
            }
        }
        return 1;
    }

    @Override
    public Dataset read(Path file) throws InputException {
        return ExchangeFile.read(file);
    }
}
