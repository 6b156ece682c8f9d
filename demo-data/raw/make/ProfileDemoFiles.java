import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Writes the two invented instruments' files of demo-data/raw that the Fenwick Hall importer profiles read, from the
 * invented demo files beside them (themselves made from Lamella's model with noise): the same numbers in other
 * layouts, encodings and units. Run from the repository's top folder: {@code java demo-data/raw/make/ProfileDemoFiles.java}.
 *
 * <ul>
 * <li>{@code halden-hx2-sweep.txt}: the three FDTR sweeps of {@code oxide-film-fdtr.csv} as the invented "Halden
 * Optics HX-2" exports them — Latin-1 text, tabs, decimal commas, amplitude in µV and phase lag in degrees (positive
 * when lagging), a header with the settings, and a stage-temperature column to leave out.
 * <li>{@code quillon-tdtr-records.csv}: the two TDTR scans of {@code oxide-film-tdtr.lamx} as the invented "Quillon"
 * acquisition script logs them — UTF-8 with a byte-order mark, CRLF, one record per line, every delay's records on
 * consecutive lines, delays in ps and lock-in channels in µV.
 * </ul>
 */
public final class ProfileDemoFiles {

    public static void main(String[] args) throws IOException {
        Path raw = Path.of("demo-data", "raw");
        hx2(raw.resolve("oxide-film-fdtr.csv"), raw.resolve("halden-hx2-sweep.txt"));
        quillon(raw.resolve("oxide-film-tdtr.lamx"), raw.resolve("quillon-tdtr-records.csv"));
    }

    private static String comma(String formatted) {
        return formatted.replace('.', ',');
    }

    private static void hx2(Path from, Path to) throws IOException {
        StringBuilder sb = new StringBuilder();
        sb.append("Halden Optics HX-2 \u00b7 sweep export (invented instrument; demo data made from Lamella's model)\n");
        sb.append("Sample ID:\tFH-0417 oxide film (invented)\n");
        sb.append("Mode:\tFD\n");
        sb.append("Pump 1/e2 radius:\t6,0 \u00b5m\n");
        sb.append("Probe 1/e2 radius:\t4,0 \u00b5m\n");
        sb.append("Date:\t2024-05-13\n");
        sb.append("\n");
        String names = "Freq [kHz]\tR [\u00b5V]\tPhase lag [\u00b0]\tT stage [K]\n";
        boolean inSweep = false;
        int row = 0;
        for (String line : Files.readAllLines(from, StandardCharsets.UTF_8)) {
            String t = line.strip();
            if (t.startsWith("f (kHz)")) {
                if (inSweep) {
                    sb.append('\n');
                }
                sb.append(names);
                inSweep = true;
                continue;
            }
            if (!inSweep || t.isEmpty()) {
                continue;
            }
            String[] c = t.split(",\\s*");
            double f = Double.parseDouble(c[0]);
            double x = Double.parseDouble(c[1]);
            double y = Double.parseDouble(c[2]);
            double r = Math.hypot(x, y);
            double lag = -Math.toDegrees(Math.atan2(y, x));
            double stage = 295.15 + 0.01 * (row++ % 7);
            sb.append(comma(String.format(Locale.ROOT, "%.4f\t%.6f\t%.4f\t%.2f", f, r, lag, stage))).append('\n');
        }
        Files.write(to, sb.toString().getBytes(StandardCharsets.ISO_8859_1));
    }

    private static void quillon(Path from, Path to) throws IOException {
        List<double[][]> scans = new ArrayList<>();
        List<double[]> current = null;
        List<List<double[]>> all = new ArrayList<>();
        for (String line : Files.readAllLines(from, StandardCharsets.UTF_8)) {
            String t = line.strip();
            if (t.startsWith("scan ")) {
                current = new ArrayList<>();
                all.add(current);
                continue;
            }
            if (current == null || t.isEmpty() || t.startsWith("#") || !Character.isDigit(t.charAt(t.startsWith("-") ? 1 : 0))) {
                continue;
            }
            String[] c = t.split("\\s+");
            current.add(new double[] {Double.parseDouble(c[0]), Double.parseDouble(c[1]), Double.parseDouble(c[2])});
        }
        StringBuilder sb = new StringBuilder("\ufeff");
        sb.append("# Quillon acquisition script 3.1 - raw lock-in records (invented; demo data made from Lamella's model)\r\n");
        sb.append("# Modulation (MHz) = 9.0\r\n");
        sb.append("# Repetition (MHz) = 76.0\r\n");
        sb.append("# Pump radius (um) = 10.0\r\n");
        sb.append("# Probe radius (um) = 6.0\r\n");
        sb.append("# Sample = FH-0417 oxide film (invented)\r\n");
        sb.append("t_delay_ps,Vx_uV,Vy_uV\r\n");
        for (int i = 0; i < all.get(0).size(); i++) {
            for (List<double[]> scan : all) {
                double[] r = scan.get(i);
                sb.append(String.format(Locale.ROOT, "%.3f,%.6f,%.6f\r\n", r[0] * 1e12, r[1], r[2]));
            }
        }
        Files.writeString(to, sb.toString(), StandardCharsets.UTF_8);
    }
}
