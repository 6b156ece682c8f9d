package lamella.ui.panels;

import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import lamella.api.GeometryModel;
import lamella.api.HeatingGeometry;
import lamella.api.ModelEvaluationException;
import lamella.api.ParameterSpec;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.StackKernel;

/**
 * Plug-in geometries that misbehave, as a lab's own might: one that computes for a long time and never looks at the
 * interrupt, one that cannot be evaluated. Their responses are made up (1/(1 + f) K/W); only their timing and
 * failure matter.
 */
final class TroubleGeometries {

    /** Evaluations of the slow geometry that ran to their end. */
    static final AtomicInteger SLOW_FINISHED = new AtomicInteger();

    private TroubleGeometries() {
    }

    /** Type {@code slow-test}: 150 ms of busy work per frequency, deaf to interrupts. */
    static HeatingGeometry slow() {
        return geometry("slow-test", (f, out) -> {
            long until = System.nanoTime() + 150_000_000L;
            while (System.nanoTime() < until) {
                Thread.onSpinWait();
            }
            out[0] = 1 / (1 + f);
            out[1] = 0;
            SLOW_FINISHED.incrementAndGet();
        });
    }

    /** Type {@code broken-test}: always says it cannot be evaluated. */
    static HeatingGeometry broken() {
        return geometry("broken-test", (f, out) -> {
            throw new ModelEvaluationException("the spectral integral did not converge at " + f + " Hz");
        });
    }

    private static HeatingGeometry geometry(String type, GeometryModel model) {
        return new HeatingGeometry() {
            @Override
            public String type() {
                return type;
            }

            @Override
            public String summary() {
                return "a test geometry that misbehaves";
            }

            @Override
            public List<ParameterSpec> parameters() {
                return List.of(ParameterSpec.required("probe_radius_m", ParameterSpec.Constraint.POSITIVE,
                        "probe 1/e² radius"));
            }

            @Override
            public ResponseUnit unit() {
                return ResponseUnit.KELVIN_PER_WATT;
            }

            @Override
            public GeometryModel bind(Parameters parameters, StackKernel stack) {
                return model;
            }
        };
    }
}
