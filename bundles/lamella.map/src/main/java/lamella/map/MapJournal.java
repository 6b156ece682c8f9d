package lamella.map;

import java.io.IOException;
import java.io.Serializable;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import lamella.api.AtomicText;

/**
 * What a map run has done so far, tile by tile, in {@code DIR/map.journal/}: {@code inputs.sha256} (a fingerprint of
 * the case, the map data and the tiling) and one {@code tile-NNNNNN.txt} per finished tile, written atomically as the
 * tile is done. A run that finds the journal of the same inputs reads those tiles back instead of fitting them again,
 * so a killed run resumes and loses nothing; a journal of other inputs is cleared. The map's own files are written
 * only when every tile is done, and then the journal is removed. Values are kept exactly (Java's round-trip decimal
 * text), so a resumed map equals one run in one go. Serializable, so that a Spark task writes its tiles itself.
 */
public final class MapJournal implements Serializable {

    private static final long serialVersionUID = 1L;

    public static final String FOLDER = "map.journal";
    static final String INPUTS = "inputs.sha256";
    private static final String VERSION = "lamella map journal 1, tile side " + MapEngine.TILE_SIDE;

    /** No journal: nothing read back, nothing kept. */
    public static final MapJournal NONE = new MapJournal(null);

    private final String folder;
    private final transient AtomicInteger readBack = new AtomicInteger();

    private MapJournal(String folder) {
        this.folder = folder;
    }

    /**
     * The journal in {@code out} for inputs of this fingerprint: kept when it belongs to them, cleared otherwise; its
     * unfinished temporary files are removed either way.
     */
    public static MapJournal open(Path out, String fingerprint) throws IOException {
        Path dir = out.resolve(FOLDER);
        Path stamp = dir.resolve(INPUTS);
        if (Files.isDirectory(dir)) {
            boolean same = Files.isRegularFile(stamp) && Files.readString(stamp, StandardCharsets.UTF_8).strip()
                    .equals(fingerprint);
            try (Stream<Path> files = Files.list(dir)) {
                for (Path f : (Iterable<Path>) files::iterator) {
                    String name = f.getFileName().toString();
                    if (!same || name.endsWith(".part")) {
                        Files.deleteIfExists(f);
                    }
                }
            }
        }
        AtomicText.write(stamp, fingerprint + "\n");
        return new MapJournal(dir.toString());
    }

    /** SHA-256 of the tiling and of every input file (a folder, such as a Parquet dataset, file by file). */
    public static String fingerprint(List<Path> inputs) throws IOException {
        MessageDigest d;
        try {
            d = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException impossible) {
            throw new IllegalStateException(impossible);
        }
        d.update((VERSION + "\n").getBytes(StandardCharsets.UTF_8));
        for (Path in : inputs) {
            List<Path> files = new ArrayList<>();
            if (Files.isDirectory(in)) {
                try (Stream<Path> walk = Files.walk(in)) {
                    walk.filter(Files::isRegularFile).sorted().forEach(files::add);
                }
            } else if (Files.isRegularFile(in)) {
                files.add(in);
            }
            for (Path f : files) {
                Path name = f.equals(in) ? f.getFileName() : in.relativize(f);
                d.update(("\n" + name + "\n").getBytes(StandardCharsets.UTF_8));
                d.update(Files.readAllBytes(f));
            }
        }
        return HexFormat.of().formatHex(d.digest());
    }

    /** The journal's folder, or null for {@link #NONE}. */
    public Path folder() {
        return folder == null ? null : Path.of(folder);
    }

    /** How many positions this run has read back from the journal. */
    public int positionsReadBack() {
        return readBack.get();
    }

    private Path tileFile(int tile) {
        return Path.of(folder).resolve(String.format(Locale.ROOT, "tile-%06d.txt", tile));
    }

    /** The results of a tile of {@code size} positions done before, or null (none, or unreadable: fitted again). */
    public MapEngine.Result[] read(int tile, int size) {
        if (folder == null) {
            return null;
        }
        Path f = tileFile(tile);
        if (!Files.isRegularFile(f)) {
            return null;
        }
        try {
            List<String> lines = Files.readAllLines(f, StandardCharsets.UTF_8);
            if (lines.size() != size + 1 || !lines.get(0).equals(header(tile, size))) {
                return null;
            }
            MapEngine.Result[] results = new MapEngine.Result[size];
            for (int i = 0; i < size; i++) {
                results[i] = parse(lines.get(i + 1));
            }
            if (readBack != null) {
                readBack.addAndGet(size);
            }
            return results;
        } catch (IOException | RuntimeException unreadable) {
            return null;
        }
    }

    /** Keeps a finished tile. */
    public void write(int tile, MapEngine.Result[] results) throws IOException {
        if (folder == null) {
            return;
        }
        StringBuilder sb = new StringBuilder(128 * (results.length + 1));
        sb.append(header(tile, results.length)).append('\n');
        for (MapEngine.Result r : results) {
            sb.append(r.status().word()).append('\t').append(r.fromNeighbour() ? 1 : 0).append('\t')
                    .append(r.converged() ? 1 : 0).append('\t').append(r.reducedChiSquare()).append('\t')
                    .append(r.values().length);
            for (double v : r.values()) {
                sb.append('\t').append(v);
            }
            for (double s : r.sigmas()) {
                sb.append('\t').append(s);
            }
            sb.append('\t').append(escape(r.message())).append('\n');
        }
        AtomicText.write(tileFile(tile), sb.toString());
    }

    /** Removes the journal once the map's files are written. */
    public void remove() throws IOException {
        if (folder == null || !Files.isDirectory(Path.of(folder))) {
            return;
        }
        try (Stream<Path> files = Files.list(Path.of(folder))) {
            for (Path f : (Iterable<Path>) files::iterator) {
                Files.deleteIfExists(f);
            }
        }
        Files.deleteIfExists(Path.of(folder));
    }

    private static String header(int tile, int size) {
        return "# " + VERSION + ": tile " + tile + ", " + size + " positions";
    }

    private static MapEngine.Result parse(String line) {
        String[] c = line.split("\t", -1);
        int n = Integer.parseInt(c[4]);
        if (c.length != 6 + 2 * n) {
            throw new IllegalArgumentException("a line of " + c.length + " cells");
        }
        double[] v = new double[n];
        double[] s = new double[n];
        for (int a = 0; a < n; a++) {
            v[a] = Double.parseDouble(c[5 + a]);
            s[a] = Double.parseDouble(c[5 + n + a]);
        }
        return new MapEngine.Result(v, s, Double.parseDouble(c[3]),
                MapEngine.Status.valueOf(c[0].toUpperCase(Locale.ROOT)), unescape(c[5 + 2 * n]), c[1].equals("1"),
                c[2].equals("1"));
    }

    private static String escape(String s) {
        return s.replace("\\", "\\\\").replace("\t", "\\t").replace("\n", "\\n").replace("\r", "\\r");
    }

    private static String unescape(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            if (ch == '\\' && i + 1 < s.length()) {
                char next = s.charAt(++i);
                sb.append(next == 't' ? '\t' : next == 'n' ? '\n' : next == 'r' ? '\r' : next);
            } else {
                sb.append(ch);
            }
        }
        return sb.toString();
    }
}
