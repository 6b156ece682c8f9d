package lamella.geometry.gaussian;

import java.util.List;
import lamella.api.GeometryModel;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.ParameterSpec;
import lamella.api.ParameterSpec.Constraint;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.StackKernel;
import lamella.engine.Geometries;
import org.osgi.service.component.annotations.Component;

/**
 * Gaussian pump of 1/e² radius w₀ and Gaussian probe of 1/e² radius w₁, the probe's centre offset by r₀:
 * H(ω) = (1/2π) ∫₀^∞ Z(k, ω) exp(−k²(w₀² + w₁²)/8) J₀(k r₀) k dk, the probe-weighted surface temperature per watt of
 * absorbed pump power (Cahill, Rev. Sci. Instrum. 75, 5119, 2004; offset: Feser & Cahill, Rev. Sci. Instrum. 83,
 * 104901, 2012).
 */
@Component(service = HeatingGeometry.class)
public final class GaussianBeams implements HeatingGeometry {

    static final String PUMP = "pump_radius_m";
    static final String PROBE = "probe_radius_m";
    static final String OFFSET = "offset_m";

    @Override
    public String type() {
        return "gaussian";
    }

    @Override
    public String summary() {
        return "Gaussian pump and probe beams (1/e² radii), probe optionally offset";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(
                ParameterSpec.required(PUMP, Constraint.POSITIVE, "the pump's 1/e² intensity radius in m"),
                ParameterSpec.required(PROBE, Constraint.POSITIVE, "the probe's 1/e² intensity radius in m"),
                ParameterSpec.optional(OFFSET, Constraint.NON_NEGATIVE, 0.0,
                        "the distance between pump and probe centres in m"));
    }

    @Override
    public ResponseUnit unit() {
        return ResponseUnit.KELVIN_PER_WATT;
    }

    @Override
    public GeometryModel bind(Parameters p, StackKernel stack) throws InputException {
        Geometries.requireInPlaneIsotropy(stack.stack(), p.path(), type());
        return new GaussianModel(stack, p.number(PUMP), p.number(PROBE), p.number(OFFSET));
    }
}
