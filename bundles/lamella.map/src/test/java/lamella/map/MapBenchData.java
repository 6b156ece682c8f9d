package lamella.map;

import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.CaseDocument;

/**
 * Writes the benchmark's map — the one {@link MapBench} fits: SIDE × SIDE positions of the demo wafer's case, made by
 * Lamella's own model with noise (invented data) — as {@code DIR/case.json} and {@code DIR/map.csv}, for timing whole
 * {@code lamella map} commands ({@code bench/map-engines}). Arguments: DIR [positions per side].
 */
public final class MapBenchData {

    private MapBenchData() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Files.createDirectories(Path.of(args[0]));
        int side = args.length > 1 ? Integer.parseInt(args[1]) : 100;
        Path caseFile = Files.writeString(dir.resolve("case.json"),
                Files.readString(Path.of("demo-data/wafer-map/case.json")));
        CaseDocument doc = SyntheticMap.read(caseFile);
        Files.writeString(dir.resolve("map.csv"), MapBench.table(doc, side));
    }
}
