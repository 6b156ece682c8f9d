package lamella.fit;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.Technique;
import lamella.casefile.CaseFileReader;
import lamella.engine.Engine;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.geometry.line.LineHeater;
import lamella.geometry.point.PointSource;
import lamella.technique.fdtr.FrequencyDomain;
import lamella.technique.sstr.SteadyState;
import lamella.technique.tdtr.TimeDomain;
import lamella.technique.threeomega.ThreeOmega;
import lamella.technique.threeomega.ThreeOmegaVoltage;

/**
 * Test fixtures: the real services, and synthetic data made by the model itself with seeded Gaussian noise. The
 * stack values are typical of a metal transducer on an oxide film on a crystalline substrate; they serve as known
 * truth for the fit, not as material data.
 */
final class Synthetic {

    static final List<HeatingGeometry> GEOMETRIES = List.of(new GaussianBeams(), new LineHeater(), new PointSource());
    static final List<Technique> TECHNIQUES = List.of(new FrequencyDomain(), new TimeDomain(), new SteadyState(),
            new ThreeOmega(), new ThreeOmegaVoltage());
    static final ModelCatalog CATALOG = new ModelCatalog(GEOMETRIES, TECHNIQUES, new Engine());

    static final String STACK = """
            "stack": {"layers": [
              {"name": "cap", "thickness_m": 9e-8, "k_through_w_mk": 200, "heat_capacity_j_m3k": 2.45e6,
               "conductance_below_w_m2k": %s},
              {"name": "film", "thickness_m": 3.5e-7, "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.65e6},
              {"name": "base", "k_through_w_mk": 140, "heat_capacity_j_m3k": 1.63e6}]}""";

    private Synthetic() {
    }

    static Fitter fitter() {
        return new Fitter(new Engine(), GEOMETRIES, TECHNIQUES);
    }

    static double[] logSpaced(double from, double to, int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = from * Math.pow(to / from, (double) i / (n - 1));
        }
        return v;
    }

    /** The model's signal at x for a case written as JSON (stack, geometry, measurement blocks). */
    static double[] model(Path dir, String caseJson, double[] x, String signal) throws IOException, InputException {
        Path f = Files.writeString(dir.resolve("truth.json"), caseJson);
        CaseDocument doc = new CaseFileReader().read(f);
        return new CaseModel(doc.stack(), doc.geometry(), doc.measurement()).simulation(CATALOG).run(x)
                .column(signal);
    }

    /** Writes x, signal + noise and (optionally) a σ column in normalised CSV. */
    static Path data(Path file, String xColumn, double[] x, String signal, double[] clean, double sigma, long seed,
                     boolean withSigma) throws IOException {
        SplittableRandom rng = new SplittableRandom(seed);
        StringBuilder sb = new StringBuilder(xColumn + "," + signal + (withSigma ? ",sigma_" + signal : "") + "\n");
        for (int i = 0; i < x.length; i++) {
            double y = clean[i] + sigma * rng.nextGaussian();
            sb.append(String.format(Locale.ROOT, "%.12e,%.12e", x[i], y));
            if (withSigma) {
                sb.append(String.format(Locale.ROOT, ",%.6e", sigma));
            }
            sb.append('\n');
        }
        return Files.writeString(file, sb.toString());
    }

    static CaseDocument readExisting(Path file) throws InputException {
        return new CaseFileReader().read(file);
    }

    static CaseDocument read(Path dir, String json) throws IOException, InputException {
        return new CaseFileReader().read(Files.writeString(dir.resolve("case.json"), json));
    }
}
