package lamella.geometry.ring;

import java.util.List;
import lamella.api.GeometryModel;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.ParameterSpec;
import lamella.api.ParameterSpec.Constraint;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.StackKernel;
import lamella.engine.GaussianHankel;
import lamella.engine.Geometries;
import lamella.engine.SpectralQuadrature;
import org.osgi.service.component.annotations.Component;

/**
 * Heat deposited on a ring of radius R — an annular pump beam or an annular resistive heater — read by a Gaussian
 * probe of 1/e² radius w₁ at the ring's centre. A thin ring of unit power has the transform J₀(kR); a ring of finite
 * width is modelled as the thin ring blurred by a Gaussian of 1/e² radius σ (accurate for σ ≪ R), so
 * H(ω) = (1/2π) ∫₀^∞ Z(k, ω) J₀(kR) exp(−k²(σ² + w₁²)/8) k dk.
 */
@Component(service = HeatingGeometry.class)
public final class RingSource implements HeatingGeometry {

    static final String RADIUS = "ring_radius_m";
    static final String WIDTH = "ring_width_m";
    static final String PROBE = "probe_radius_m";

    @Override
    public String type() {
        return "ring";
    }

    @Override
    public String summary() {
        return "heat on a ring (annular pump or heater), Gaussian probe at its centre";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(
                ParameterSpec.required(RADIUS, Constraint.POSITIVE, "the ring's radius in m"),
                ParameterSpec.optional(WIDTH, Constraint.NON_NEGATIVE, 0.0,
                        "the ring's Gaussian 1/e² half-width in m (0: a thin ring)"),
                ParameterSpec.required(PROBE, Constraint.POSITIVE, "the probe's 1/e² intensity radius in m"));
    }

    @Override
    public ResponseUnit unit() {
        return ResponseUnit.KELVIN_PER_WATT;
    }

    @Override
    public GeometryModel bind(Parameters p, StackKernel stack) throws InputException {
        Geometries.requireInPlaneIsotropy(stack.stack(), p.path(), type());
        double radius = p.number(RADIUS);
        double width = p.number(WIDTH);
        if (width >= radius) {
            throw InputException.at(p.pathOf(WIDTH), "the ring's width " + width + " m must be below its radius "
                    + radius + " m (a blurred thin ring models only a narrow ring)");
        }
        double w2 = width * width + p.number(PROBE) * p.number(PROBE);
        return (frequencyHz, out) -> {
            double omega = 2 * Math.PI * frequencyHz;
            Geometries.requireSteadyStateExists(stack.stack(), omega, type());
            GaussianHankel.integrate(stack, omega, w2, radius, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE, out);
            Geometries.requireFinite(out, type(), frequencyHz);
        };
    }
}
