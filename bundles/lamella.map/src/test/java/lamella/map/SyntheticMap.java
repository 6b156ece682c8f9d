package lamella.map;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.ParameterRef;
import lamella.casefile.CaseFileReader;
import lamella.engine.Engine;
import lamella.fit.Fitter;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.technique.fdtr.FrequencyDomain;
import lamella.technique.tdtr.TimeDomain;

/**
 * Map data made by Lamella's own model: at every position the case's FDTR phase with the film's conductivity and the
 * transducer's boundary conductance that a field gives there, plus seeded Gaussian noise. Invented data, for the demo,
 * the tests (the values that made them are known) and the benchmark.
 */
final class SyntheticMap {

    static final ModelCatalog CATALOG = new ModelCatalog(List.of(new GaussianBeams()),
            List.of(new FrequencyDomain(), new TimeDomain()), new Engine());
    static final ParameterRef FILM_K = ParameterRef.layer("film", "k_through_w_mk");
    static final ParameterRef TRANSDUCER_G = ParameterRef.layer("transducer", "conductance_below_w_m2k");

    /** The truth at a position: film conductivity and boundary conductance. */
    interface Field {
        double[] at(double xM, double yM);
    }

    /** A position of the map. */
    record Spot(double xM, double yM) {
    }

    private SyntheticMap() {
    }

    static Fitter fitter() {
        return new Fitter(new Engine(), List.of(new GaussianBeams()), List.of(new FrequencyDomain(),
                new TimeDomain()));
    }

    static CaseDocument read(Path caseFile) throws InputException {
        return new CaseFileReader().read(caseFile);
    }

    /** Positions of an nx × ny grid of this step, from (x0, y0). */
    static List<Spot> grid(int nx, int ny, double step, double x0, double y0) {
        List<Spot> spots = new ArrayList<>();
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                spots.add(new Spot(x0 + i * step, y0 + j * step));
            }
        }
        return spots;
    }

    /** The noiseless phase, degrees, of the case at each frequency with the field's values at one position. */
    static double[] phase(CaseDocument doc, double[] frequencies, double[] truth) throws InputException {
        CaseModel m = new CaseModel(doc.stack(), doc.geometry(), doc.measurement()).with(FILM_K, truth[0])
                .with(TRANSDUCER_G, truth[1]);
        return m.simulation(CATALOG).run(frequencies).column("phase_deg");
    }

    /**
     * The long table: a comment, the header, then one row per position and frequency (13 significant digits, the
     * position's rows together, frequencies rising).
     */
    static String table(CaseDocument doc, List<Spot> spots, Field field, double[] frequencies, double sigmaDeg,
                        long seed, String comment) throws InputException {
        SplittableRandom rng = new SplittableRandom(seed);
        StringBuilder sb = new StringBuilder(comment).append("x_m,y_m,frequency_hz,phase_deg,sigma_phase_deg\n");
        for (Spot s : spots) {
            double[] clean = phase(doc, frequencies, field.at(s.xM(), s.yM()));
            for (int i = 0; i < frequencies.length; i++) {
                sb.append(String.format(Locale.ROOT, "%.6e,%.6e,%.6e,%.12e,%.3e%n", s.xM(), s.yM(), frequencies[i],
                        clean[i] + sigmaDeg * rng.nextGaussian(), sigmaDeg));
            }
        }
        return sb.toString();
    }

    static Path write(Path file, String table) throws IOException {
        return Files.writeString(file, table);
    }
}
