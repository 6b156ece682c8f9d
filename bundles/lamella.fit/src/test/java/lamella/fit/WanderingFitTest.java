package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import lamella.api.ModelEvaluationException;

/**
 * A fit with no bounds can wander to values where the model cannot be evaluated (a conductivity of 1e-300, or a
 * negative one); the failure then names the free inputs and the values they reached, in the case's words, and says
 * what to do, instead of only the geometry's fault. Common practice, no source.
 */
class WanderingFitTest {

    @TempDir
    Path dir;

    @Test
    void aFailureWhereTheFitWentNamesTheFreeInputsAndTheirValues() throws Exception {
        FitProblem problem = SearchStopTest.filmAndCapFree(dir, Synthetic.logSpaced(1e4, 2e7, 12), 5);
        for (double k : new double[] {-1.0, 1e-300, Double.NaN}) {
            ModelEvaluationException e = assertThrows(ModelEvaluationException.class,
                    () -> problem.model(new double[] {k, 5e7}), "k = " + k);
            String m = e.getMessage();
            assertTrue(m.contains("film.k_through_w_mk = " + String.format(java.util.Locale.ROOT, "%.4g", k))
                    && m.contains("cap.conductance_below_w_m2k = 5.000e+07"), m);
            assertTrue(!m.contains("Exception") && !m.contains("lamella."), m);
        }
    }
}
