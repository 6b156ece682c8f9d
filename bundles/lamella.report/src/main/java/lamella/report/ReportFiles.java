package lamella.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

/**
 * The files of one report, held in memory until all are made, then written into the folder. Every file is first
 * written in full under a temporary name in the same folder and then renamed into place, so a reader never sees
 * half a file; when anything fails, the temporary files are removed and the folder keeps its earlier files.
 */
final class ReportFiles {

    /** Temporary names start with a dot and end so, which no report file does. */
    static final String TEMPORARY_SUFFIX = ".part";

    private final Map<String, byte[]> files = new LinkedHashMap<>();

    void add(String name, byte[] content) {
        if (files.putIfAbsent(name, content) != null) {
            throw new IllegalStateException("report file " + name + " is made twice");
        }
    }

    void add(String name, String text) {
        add(name, text.getBytes(StandardCharsets.UTF_8));
    }

    void writeInto(Path folder) throws IOException {
        Files.createDirectories(folder);
        List<Path> staged = new ArrayList<>();
        try {
            for (Map.Entry<String, byte[]> f : files.entrySet()) {
                // Not Files.createTempFile: its owner-only permissions would stay with the report after the move.
                Path tmp = folder.resolve("." + f.getKey() + "-" + UUID.randomUUID() + TEMPORARY_SUFFIX);
                staged.add(tmp);
                Files.write(tmp, f.getValue(), StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
            }
            int i = 0;
            for (String name : files.keySet()) {
                move(staged.get(i++), folder.resolve(name));
            }
        } catch (IOException | RuntimeException e) {
            for (Path tmp : staged) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException cleanup) {
                    e.addSuppressed(cleanup);
                }
            }
            throw e;
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
