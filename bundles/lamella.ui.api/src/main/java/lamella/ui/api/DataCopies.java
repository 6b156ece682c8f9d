package lamella.ui.api;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;

/**
 * Makes a saved project self-contained: data files outside the case's folder are copied beside the case. A file of
 * the same name and content already there is used as it is; a different one is never replaced, the copy takes a
 * numbered name instead. Each copy appears whole or not at all (temporary name, then move) and gets the user's
 * usual permissions.
 */
final class DataCopies {

    private DataCopies() {
    }

    /** Copies what lies outside folder; the map takes each copied file's absolute path to its copy's. */
    static Map<String, String> besides(Path folder, List<String> dataPaths) throws IOException {
        Map<String, String> copies = new LinkedHashMap<>();
        for (String path : dataPaths) {
            Path source = Path.of(path).toAbsolutePath().normalize();
            if (source.startsWith(folder) || copies.containsKey(path) || !Files.isRegularFile(source)) {
                continue;
            }
            copies.put(path, place(folder, source).toString());
        }
        return copies;
    }

    private static Path place(Path folder, Path source) throws IOException {
        Files.createDirectories(folder);
        String name = source.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String stem = dot > 0 ? name.substring(0, dot) : name;
        String ext = dot > 0 ? name.substring(dot) : "";
        Path target = folder.resolve(name);
        for (int i = 2; Files.exists(target); i++) {
            if (Files.isRegularFile(target) && Files.mismatch(source, target) < 0) {
                return target;
            }
            target = folder.resolve(stem + "-" + i + ext);
        }
        Path tmp = folder.resolve("." + name + "." + UUID.randomUUID() + ".part");
        try {
            try (InputStream in = Files.newInputStream(source)) {
                Files.copy(in, tmp);
            }
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
        return target;
    }
}
