package lamella.map;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import lamella.api.CaseDocument;
import lamella.api.fit.CurveFit;

/**
 * Prints the speed of the local map engine: a 100 × 100 FDTR map (6 frequencies, 2 free inputs, 2 uncertain ones, the
 * demo wafer's case) made by Lamella's own model with noise, fitted with 1 and with 2 threads; positions per second
 * and per second per thread. Run by {@code bench/map-speed}; arguments: [positions per side] [thread counts…].
 */
public final class MapBench {

    private MapBench() {
    }

    /** The benchmark's map data: a smooth field of film conductivity and a conductance rising along y, with noise. */
    static String table(CaseDocument doc, int side) throws lamella.api.InputException {
        return SyntheticMap.table(doc, SyntheticMap.grid(side, side, 2e-6, 0, 0),
                (x, y) -> new double[] {1.0 + 0.5 * Math.sin(x / 4e-5) * Math.cos(y / 6e-5), 9e7 + 1e11 * y},
                WaferMapDemo.FREQUENCIES_HZ, 0.15, 42, "# invented benchmark map\n");
    }

    public static void main(String[] args) throws Exception {
        int side = args.length > 0 ? Integer.parseInt(args[0]) : 100;
        int[] threads = args.length > 1 ? java.util.Arrays.stream(args, 1, args.length).mapToInt(Integer::parseInt)
                .toArray() : new int[] {1, 2};
        Path tmp = Files.createTempDirectory("lamella-map-bench");
        Path caseFile = Files.writeString(tmp.resolve("case.json"),
                Files.readString(Path.of("demo-data/wafer-map/case.json")));
        CaseDocument doc = SyntheticMap.read(caseFile);
        long t0 = System.nanoTime();
        String table = table(doc, side);
        Files.writeString(tmp.resolve("map.csv"), table);
        System.out.printf(Locale.ROOT, "map of %d × %d positions, %d frequencies, made in %.1f s%n", side, side,
                WaferMapDemo.FREQUENCIES_HZ.length, (System.nanoTime() - t0) * 1e-9);
        t0 = System.nanoTime();
        MapData data = MapData.read(tmp.resolve("map.csv"), "frequency_hz", "phase_deg");
        System.out.printf(Locale.ROOT, "read in %.2f s%n", (System.nanoTime() - t0) * 1e-9);
        CurveFit fit = SyntheticMap.fitter().curves(doc, null);
        // warm-up: the JIT compiles the fitter and the model on a few positions first
        new MapEngine(fit, data.x, 1).run(data.positions.subList(0, Math.min(200, data.positions.size())), n -> { });
        for (int t : threads) {
            long s = System.nanoTime();
            MapEngine.Result[] r = new MapEngine(fit, data.x, t).run(data.positions, n -> { });
            double seconds = (System.nanoTime() - s) * 1e-9;
            long failed = java.util.Arrays.stream(r).filter(x -> x.status() == MapEngine.Status.FAILED).count();
            System.out.printf(Locale.ROOT, "threads %d: %d positions in %.2f s = %.0f positions/s, %.0f per thread"
                    + " (%d failed)%n", t, r.length, seconds, r.length / seconds, r.length / seconds / t, failed);
        }
        for (Path p : List.of(tmp.resolve("map.csv"), caseFile, tmp)) {
            Files.deleteIfExists(p);
        }
    }
}
