package lamella.geometry.elliptic;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import lamella.api.GeometryModel;
import lamella.api.InputException;
import lamella.api.Stack;

/**
 * Prints the time of 200 modulation frequencies (1 kHz–100 MHz) with elliptic beams on the three-layer stack of
 * {@link EllipticBeamsTest}, beside round Gaussian beams on the same stack: in-plane isotropic layers with and
 * without an offset, and an in-plane anisotropic film with and without an offset and with round beams. A benchmark, not a test: run by bench/elliptic-speed.
 * Arguments: [RUNS].
 */
public final class EllipticBench {

    private static final int WARM_UP = 20;

    private EllipticBench() {
    }

    public static void main(String[] args) throws InputException {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 40;
        double[] f = new double[200];
        for (int i = 0; i < f.length; i++) {
            f[i] = 1e3 * Math.pow(1e5, i / (f.length - 1.0));
        }
        Stack isotropic = EllipticBeamsTest.threeLayers(1.4, 1.4);
        Stack anisotropic = EllipticBeamsTest.threeLayers(6.0, 0.8);
        System.out.println("200 frequencies (1 kHz-100 MHz), 3 layers, one thread, " + runs + " runs after " + WARM_UP
                + " warm-up runs; load average " + load());
        time("round Gaussian beams 6 / 4 um (gaussian)", runs, f, EllipticBeamsTest.gaussian(isotropic, 6e-6, 4e-6, 0));
        time("elliptic 8x4 / 5x3 um, isotropic layers", runs, f,
                EllipticBeamsTest.elliptic(isotropic, 8e-6, 4e-6, 5e-6, 3e-6, 0, 0));
        time("elliptic 8x4 / 5x3 um, offset (3, 1) um", runs, f,
                EllipticBeamsTest.elliptic(isotropic, 8e-6, 4e-6, 5e-6, 3e-6, 3e-6, 1e-6));
        time("elliptic 8x4 / 5x3 um, film 6 / 0.8 W/mK", runs, f,
                EllipticBeamsTest.elliptic(anisotropic, 8e-6, 4e-6, 5e-6, 3e-6, 0, 0));
        time("elliptic 8x4 / 5x3 um, offset, film 6 / 0.8", runs, f,
                EllipticBeamsTest.elliptic(anisotropic, 8e-6, 4e-6, 5e-6, 3e-6, 3e-6, 1e-6));
        time("round 6 / 4 um, film 6 / 0.8 W/mK", runs, f,
                EllipticBeamsTest.elliptic(anisotropic, 6e-6, 6e-6, 4e-6, 4e-6, 0, 0));
    }

    private static void time(String label, int runs, double[] f, GeometryModel model) {
        double[] out = new double[2];
        for (int i = 0; i < WARM_UP; i++) {
            for (double x : f) {
                model.at(x, out);
            }
        }
        double[] ms = new double[runs];
        for (int r = 0; r < runs; r++) {
            long t0 = System.nanoTime();
            for (double x : f) {
                model.at(x, out);
            }
            ms[r] = (System.nanoTime() - t0) / 1e6;
        }
        Arrays.sort(ms);
        System.out.println(String.format(Locale.ROOT, "  %-45s median %8.2f ms   fastest %8.2f ms", label,
                ms[runs / 2], ms[0]));
    }

    private static String load() {
        try {
            return Files.readString(Path.of("/proc/loadavg")).split(" ")[0];
        } catch (Exception e) {
            return "unknown";
        }
    }
}
