package lamella.geometry.elliptic;

import java.util.List;
import lamella.api.GeometryModel;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.ParameterSpec;
import lamella.api.ParameterSpec.Constraint;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.StackKernel;
import org.osgi.service.component.annotations.Component;

/**
 * Elliptic Gaussian pump and probe, axes along x and y, the probe offset by (x₀, y₀), over layers whose in-plane
 * conductivity may differ along x and y (Schmidt, Chen & Chen, Rev. Sci. Instrum. 79, 114902, 2008; offset beams:
 * Feser & Cahill, Rev. Sci. Instrum. 83, 104901, 2012). The response needs the two-dimensional spectral integral
 * H(ω) = (1/4π²) ∬ Z(sx, sy, ω) exp(−(sx² Wx² + sy² Wy²)/8) cos(sx x₀ + sy y₀) dsx dsy, Wx² = w₀ₓ² + w₁ₓ²;
 * see {@link EllipticModel}.
 */
@Component(service = HeatingGeometry.class)
public final class EllipticBeams implements HeatingGeometry {

    static final String PUMP_X = "pump_radius_x_m";
    static final String PUMP_Y = "pump_radius_y_m";
    static final String PROBE_X = "probe_radius_x_m";
    static final String PROBE_Y = "probe_radius_y_m";
    static final String OFFSET_X = "offset_x_m";
    static final String OFFSET_Y = "offset_y_m";

    @Override
    public String type() {
        return "elliptic";
    }

    @Override
    public String summary() {
        return "elliptic Gaussian pump and probe with x/y offsets, for in-plane anisotropic layers";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(
                ParameterSpec.required(PUMP_X, Constraint.POSITIVE, "the pump's 1/e² radius along x in m"),
                ParameterSpec.required(PUMP_Y, Constraint.POSITIVE, "the pump's 1/e² radius along y in m"),
                ParameterSpec.required(PROBE_X, Constraint.POSITIVE, "the probe's 1/e² radius along x in m"),
                ParameterSpec.required(PROBE_Y, Constraint.POSITIVE, "the probe's 1/e² radius along y in m"),
                ParameterSpec.optional(OFFSET_X, Constraint.FINITE, 0.0, "the probe centre's offset along x in m"),
                ParameterSpec.optional(OFFSET_Y, Constraint.FINITE, 0.0, "the probe centre's offset along y in m"));
    }

    @Override
    public ResponseUnit unit() {
        return ResponseUnit.KELVIN_PER_WATT;
    }

    @Override
    public GeometryModel bind(Parameters p, StackKernel stack) throws InputException {
        double wx = p.number(PUMP_X);
        double px = p.number(PROBE_X);
        double wy = p.number(PUMP_Y);
        double py = p.number(PROBE_Y);
        return new EllipticModel(stack, wx * wx + px * px, wy * wy + py * py, p.number(OFFSET_X),
                p.number(OFFSET_Y));
    }
}
