import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Makes the invented raw demo files from Lamella's own model signals, as an instrument would record them: a lock-in
 * gain to volts, a detection phase offset (TDTR) or an instrument phase (FDTR), and Gaussian noise, with fixed seeds
 * so that the files are reproducible. Run from demo-data/raw after writing the model CSVs with lamella simulate:
 *
 *   ../../lamella simulate make/oxide-film-tdtr-across-zero.json --out SCRATCH/tdtr-model.csv
 *   ../../lamella simulate ../cases/oxide-film-fdtr.json --out SCRATCH/fdtr-model.csv
 *   java make/RawDemoFiles.java SCRATCH/tdtr-model.csv SCRATCH/fdtr-model.csv .
 */
public final class RawDemoFiles {

    /** The invented detection phase offset that conditioning should find again, degrees. */
    static final double TDTR_DETECTION_OFFSET_DEG = -17.5;
    /** Invented lock-in volts per K/W of model response. */
    static final double TDTR_GAIN_V_PER_K_PER_W = 4.0e-8;
    static final double FDTR_GAIN_V_PER_K_PER_W = 2.0e-9;
    /** Invented instrument phase: a constant and a 3.2 ns signal delay, degrees. */
    static final double INSTRUMENT_PHASE_DEG = -12.0;
    static final double INSTRUMENT_DELAY_S = 3.2e-9;

    public static void main(String[] args) throws IOException {
        List<double[]> tdtr = rows(Path.of(args[0]));
        List<double[]> fdtr = rows(Path.of(args[1]));
        Path out = Path.of(args[2]);
        Files.writeString(out.resolve("oxide-film-tdtr.lamx"), tdtrExchange(tdtr), StandardCharsets.UTF_8);
        Files.writeString(out.resolve("oxide-film-fdtr.csv"), fdtrTable(fdtr), StandardCharsets.UTF_8);
        Files.writeString(out.resolve("fdtr-reference-phase.csv"), referenceTable(fdtr), StandardCharsets.UTF_8);
    }

    private static String tdtrExchange(List<double[]> model) {
        StringBuilder sb = new StringBuilder();
        sb.append("lamella-exchange 1\n");
        sb.append("# Invented demo data, made from Lamella's model of demo-data/raw/make/oxide-film-tdtr-across-zero.json\n");
        sb.append("# with a detection phase offset of ").append(TDTR_DETECTION_OFFSET_DEG).append(" deg and noise; not a measurement.\n");
        sb.append("technique: tdtr\nmodulation_hz: 9e6\nrepetition_hz: 7.6e7\npump_radius_m: 1e-5\nprobe_radius_m: 6e-6\n");
        sb.append("sample: FH-0417 oxide film (invented)\ndate: 2024-05-12T14:03:00Z\n");
        sb.append("operator: demo\ninstrument: Fenwick Hall TDTR bench (invented)\n");
        sb.append("x: delay_s\nsignal_unit: uV\n");
        sb.append("channels: in_phase out_of_phase sigma_in_phase sigma_out_of_phase\n");
        double full = 0;
        for (double[] r : model) {
            full = Math.max(full, Math.hypot(r[1], r[2]));
        }
        double noise = 0.002 * full * TDTR_GAIN_V_PER_K_PER_W * 1e6;
        double phi = Math.toRadians(TDTR_DETECTION_OFFSET_DEG);
        for (int scan = 1; scan <= 2; scan++) {
            Random random = new Random(1000 + scan);
            sb.append("scan ").append(scan).append('\n');
            for (double[] r : model) {
                double x = r[1] * TDTR_GAIN_V_PER_K_PER_W * 1e6;
                double y = r[2] * TDTR_GAIN_V_PER_K_PER_W * 1e6;
                double xr = x * Math.cos(phi) - y * Math.sin(phi) + noise * random.nextGaussian();
                double yr = x * Math.sin(phi) + y * Math.cos(phi) + noise * random.nextGaussian();
                sb.append(String.format(Locale.ROOT, "%.4e %.6f %.6f %.6f %.6f%n", r[0], xr, yr, noise, noise));
            }
        }
        sb.append("end\n");
        return sb.toString();
    }

    private static double instrumentPhaseDeg(double f) {
        return INSTRUMENT_PHASE_DEG - 360.0 * f * INSTRUMENT_DELAY_S;
    }

    private static String fdtrTable(List<double[]> model) {
        StringBuilder sb = new StringBuilder();
        sb.append("# Invented demo data, made from Lamella's model of demo-data/cases/oxide-film-fdtr.json with an\n");
        sb.append("# instrument phase (").append(INSTRUMENT_PHASE_DEG).append(" deg and a ").append(INSTRUMENT_DELAY_S)
                .append(" s signal delay) and noise; not a measurement. Three sweeps.\n");
        sb.append("sample: FH-0417 oxide film (invented)\n");
        sb.append("date: 2024-05-13\n");
        Random random = new Random(2024);
        for (int sweep = 1; sweep <= 3; sweep++) {
            sb.append("f (kHz), X (µV), Y (µV)\n");
            for (double[] r : model) {
                double phase = Math.toRadians(r[4] + instrumentPhaseDeg(r[0]) + 0.05 * random.nextGaussian());
                double amplitude = r[3] * FDTR_GAIN_V_PER_K_PER_W * 1e6 * (1 + 0.002 * random.nextGaussian());
                sb.append(String.format(Locale.ROOT, "%.6g, %.6f, %.6f%n", r[0] / 1e3, amplitude * Math.cos(phase),
                        amplitude * Math.sin(phase)));
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    private static String referenceTable(List<double[]> model) {
        StringBuilder sb = new StringBuilder();
        sb.append("# Invented demo: the instrument phase of the FDTR set-up, pump sent to the detector; not a measurement.\n");
        sb.append("# Written with decimal commas and semicolons, as some acquisition programs do.\n");
        sb.append("frequency (Hz);phase (deg)\n");
        Random random = new Random(77);
        for (double[] r : model) {
            String line = String.format(Locale.ROOT, "%.6g;%.4f%n", r[0], instrumentPhaseDeg(r[0])
                    + 0.01 * random.nextGaussian());
            sb.append(line.replace('.', ','));
        }
        return sb.toString();
    }

    private static List<double[]> rows(Path csv) throws IOException {
        List<double[]> rows = new ArrayList<>();
        List<String> lines = Files.readAllLines(csv, StandardCharsets.UTF_8);
        for (String line : lines.subList(1, lines.size())) {
            String[] cells = line.split(",");
            double[] r = new double[cells.length];
            for (int i = 0; i < cells.length; i++) {
                r[i] = Double.parseDouble(cells[i]);
            }
            rows.add(r);
        }
        return rows;
    }
}
