package lamella.map;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import lamella.api.AtomicText;
import lamella.api.ParameterRef;
import lamella.api.fit.CurveFit;

/**
 * What {@code lamella map} writes into its folder: {@code map.csv} (one row per position: {@code x_m,y_m}, per free
 * input its value and {@code sigma_} column, {@code reduced_chi_square}, {@code status}, {@code message}), an image
 * per free input, per its σ and of the reduced χ² (PNG and SVG), and {@code summary.txt}. Each file appears complete.
 */
public final class MapOutputs {

    public static final String TABLE = "map.csv";
    public static final String SUMMARY = "summary.txt";

    private MapOutputs() {
    }

    /** Every file a map of these free inputs writes, for the refusal to overwrite an input. */
    public static List<Path> files(Path out, CurveFit fit) {
        List<Path> files = new ArrayList<>(List.of(out.resolve(TABLE), out.resolve(SUMMARY)));
        for (String stem : imageStems(fit)) {
            files.add(out.resolve(stem + ".png"));
            files.add(out.resolve(stem + ".svg"));
        }
        return files;
    }

    static List<String> imageStems(CurveFit fit) {
        List<String> stems = new ArrayList<>();
        for (ParameterRef p : fit.free()) {
            stems.add(p.toString());
            stems.add("sigma_" + p);
        }
        stems.add("reduced_chi_square");
        return stems;
    }

    /**
     * Writes map.csv, the images and summary.txt (each file complete or not at all) and returns the summary.
     *
     * @param engine     what fitted the map, for the summary ("2 threads", "Spark local[2]")
     * @param readBack   positions read back from an earlier run's journal
     */
    public static String write(Path out, Path caseFile, MapData data, MapEngine.Result[] results, CurveFit fit,
                               double seconds, String engine, int readBack) throws IOException {
        AtomicText.write(out.resolve(TABLE), table(data, results, fit));
        images(out, data, results, fit);
        String summary = summary(data, results, fit, seconds, engine, readBack);
        AtomicText.write(out.resolve(SUMMARY), "# lamella map " + caseFile + "\n" + summary);
        return summary;
    }

    /** Whether at least one position has a value. */
    public static boolean anyFitted(MapEngine.Result[] results) {
        for (MapEngine.Result r : results) {
            if (r.status() != MapEngine.Status.FAILED) {
                return true;
            }
        }
        return false;
    }

    static String table(MapData data, MapEngine.Result[] results, CurveFit fit) {
        StringBuilder sb = new StringBuilder(64 * (results.length + 1));
        sb.append("x_m,y_m");
        for (ParameterRef p : fit.free()) {
            sb.append(',').append(p).append(",sigma_").append(p);
        }
        sb.append(",reduced_chi_square,status,message\n");
        for (int i = 0; i < results.length; i++) {
            MapData.Position p = data.positions.get(i);
            MapEngine.Result r = results[i];
            sb.append(AtomicText.number(p.xM())).append(',').append(AtomicText.number(p.yM()));
            for (int a = 0; a < r.values().length; a++) {
                sb.append(',').append(num(r.values()[a])).append(',').append(num(r.sigmas()[a]));
            }
            sb.append(',').append(num(r.reducedChiSquare())).append(',').append(r.status().word()).append(',')
                    .append(cell(r.message())).append('\n');
        }
        return sb.toString();
    }

    /** Writes the images of every free input, its σ and the reduced χ². */
    static void images(Path out, MapData data, MapEngine.Result[] results, CurveFit fit) throws IOException {
        int n = results.length;
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = data.positions.get(i).xM();
            ys[i] = data.positions.get(i).yM();
        }
        for (int a = 0; a < fit.free().size(); a++) {
            ParameterRef p = fit.free().get(a);
            String label = ParameterRef.label(p, fit.quantities().get(a));
            double[] v = new double[n];
            double[] s = new double[n];
            for (int i = 0; i < n; i++) {
                v[i] = results[i].values()[a];
                s[i] = results[i].sigmas()[a];
            }
            write(out, p.toString(), MapImages.draw(label, p + " (" + p.unit() + ")", xs, ys, v));
            write(out, "sigma_" + p, MapImages.draw("1σ of " + label, "σ of " + p + " (" + p.unit() + ")", xs, ys,
                    s));
        }
        double[] chi = new double[n];
        for (int i = 0; i < n; i++) {
            chi[i] = results[i].reducedChiSquare();
        }
        write(out, "reduced_chi_square", MapImages.draw("reduced χ² of each position's fit", "reduced χ² (1)", xs,
                ys, chi));
    }

    private static void write(Path out, String stem, MapImages.Image image) throws IOException {
        AtomicText.writeBytes(out.resolve(stem + ".png"), image.png());
        AtomicText.write(out.resolve(stem + ".svg"), image.svg());
    }

    /** Counts, time and the spread of each fitted value over the positions that have one. */
    static String summary(MapData data, MapEngine.Result[] results, CurveFit fit, double seconds, String engine,
                          int readBack) {
        int ok = 0;
        int warning = 0;
        int failed = 0;
        int fromNeighbour = 0;
        for (MapEngine.Result r : results) {
            switch (r.status()) {
                case OK -> ok++;
                case WARNING -> warning++;
                case FAILED -> failed++;
            }
            if (r.fromNeighbour()) {
                fromNeighbour++;
            }
        }
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "map %s: %d positions, %d %s values each (%s)%n", data.file,
                results.length, data.x.length, data.xColumn, data.signal));
        sb.append(String.format(Locale.ROOT, "  ok %d, with warnings %d, failed %d; %d started from a neighbour's"
                + " result%n", ok, warning, failed, fromNeighbour));
        sb.append(String.format(Locale.ROOT, "  %.1f s on %s: %.0f positions/s%n", seconds, engine,
                results.length / Math.max(seconds, 1e-9)));
        if (readBack > 0) {
            sb.append(String.format(Locale.ROOT, "  resumed: %d positions read back from the earlier run's journal,"
                    + " %d fitted now%n", readBack, results.length - readBack));
        }
        sb.append("spread over the positions with a value (ok and with warnings):\n");
        sb.append(String.format(Locale.ROOT, "  %-40s %8s %13s %13s %13s %13s %13s %13s %s%n", "parameter", "count",
                "mean", "std", "min", "median", "max", "median σ", "unit"));
        for (int a = 0; a < fit.free().size(); a++) {
            final int k = a;
            double[] v = Arrays.stream(results).filter(r -> r.status() != MapEngine.Status.FAILED)
                    .mapToDouble(r -> r.values()[k]).filter(Double::isFinite).sorted().toArray();
            double[] s = Arrays.stream(results).filter(r -> r.status() != MapEngine.Status.FAILED)
                    .mapToDouble(r -> r.sigmas()[k]).filter(Double::isFinite).sorted().toArray();
            ParameterRef p = fit.free().get(a);
            if (v.length == 0) {
                sb.append(String.format(Locale.ROOT, "  %-40s %8d%n", p, 0));
                continue;
            }
            double mean = Arrays.stream(v).average().orElse(Double.NaN);
            double var = Arrays.stream(v).map(x -> (x - mean) * (x - mean)).sum() / Math.max(1, v.length - 1);
            sb.append(String.format(Locale.ROOT, "  %-40s %8d %13.5g %13.5g %13.5g %13.5g %13.5g %13.5g %s%n",
                    ParameterRef.label(p, fit.quantities().get(a)), v.length, mean, Math.sqrt(var), v[0],
                    median(v), v[v.length - 1], s.length == 0 ? Double.NaN : median(s), p.unit()));
        }
        return sb.toString();
    }

    private static double median(double[] sorted) {
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
    }

    private static String num(double v) {
        return Double.isFinite(v) ? AtomicText.number(v) : "";
    }

    /** A CSV cell, quoted when it holds a comma, a quote or a line break (RFC 4180). */
    static String cell(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }
}
