package lamella.geometry.line;

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
 * A long metal strip of half-width b on the surface, heated uniformly over its width and read as its own
 * width-averaged temperature (a 3ω heater): per unit power per unit length,
 * H(ω) = (1/π) ∫₀^∞ Z(k, ω) [sin(kb)/(kb)]² dk (Cahill, Rev. Sci. Instrum. 61, 802, 1990; layered and
 * anisotropic: Borca-Tasciuc, Kumar & Chen, Rev. Sci. Instrum. 72, 2139, 2001). The strip runs along y, so heat
 * spreads along x with Λx.
 *
 * <p>Optionally the strip is a lumped body of its own (Borca-Tasciuc, Kumar & Chen 2001): a heat capacity per unit
 * area (ρc d)_h from {@code heater_thickness_m} and {@code heater_heat_capacity_j_m3k}, and a boundary resistance R
 * per unit area between strip and sample ({@code heater_boundary_resistance_m2k_w}). Per unit length the strip
 * stores iω (ρc d)_h 2b T_h and passes 2b (T_h − T_s)/R to the sample, whose width-averaged rise is T_s = H q_s:
 * H_h = (H + R/(2b)) / (1 + iω (ρc d)_h (R + 2b H)).
 */
@Component(service = HeatingGeometry.class)
public final class LineHeater implements HeatingGeometry {

    static final String HALF_WIDTH = "half_width_m";
    static final String LENGTH = "length_m";
    static final String HEATER_THICKNESS = "heater_thickness_m";
    static final String HEATER_HEAT_CAPACITY = "heater_heat_capacity_j_m3k";
    static final String BOUNDARY_RESISTANCE = "heater_boundary_resistance_m2k_w";

    /** The model treats the strip as infinitely long; shorter than this many widths it is not. */
    static final double MIN_LENGTH_OVER_WIDTH = 10.0;

    @Override
    public String type() {
        return "line";
    }

    @Override
    public String summary() {
        return "long strip heater of half-width b, temperature averaged over its width (per unit length)";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(
                ParameterSpec.required(HALF_WIDTH, Constraint.POSITIVE, "the heater's half-width b in m"),
                ParameterSpec.optional(LENGTH, Constraint.POSITIVE, Double.NaN,
                        "the heater's length in m, checked to be long compared with its width"),
                ParameterSpec.optional(HEATER_THICKNESS, Constraint.NON_NEGATIVE, Double.NaN,
                        "the heater metal's thickness in m, for its heat capacity (with "
                                + HEATER_HEAT_CAPACITY + "; 0: a massless heater)"),
                ParameterSpec.optional(HEATER_HEAT_CAPACITY, Constraint.POSITIVE, Double.NaN,
                        "the heater metal's volumetric heat capacity in J/(m³ K) (with " + HEATER_THICKNESS + ")"),
                ParameterSpec.optional(BOUNDARY_RESISTANCE, Constraint.NON_NEGATIVE, 0.0,
                        "the thermal boundary resistance between heater and sample in m² K/W (0: perfect"
                                + " contact)"));
    }

    @Override
    public ResponseUnit unit() {
        return ResponseUnit.KELVIN_METRE_PER_WATT;
    }

    @Override
    public GeometryModel bind(Parameters p, StackKernel stack) throws InputException {
        return model(p, stack);
    }

    /** The heater of these parameters on a stack; {@link FilmDifference} binds it twice. */
    static LineModel model(Parameters p, StackKernel stack) throws InputException {
        double b = p.number(HALF_WIDTH);
        if (p.has(LENGTH) && p.number(LENGTH) < MIN_LENGTH_OVER_WIDTH * 2 * b) {
            throw InputException.at(p.pathOf(LENGTH), "the heater is " + p.number(LENGTH) + " m long but " + 2 * b
                    + " m wide; the line-heater model needs a length of at least " + MIN_LENGTH_OVER_WIDTH
                    + " widths");
        }
        if (p.has(HEATER_THICKNESS) != p.has(HEATER_HEAT_CAPACITY)) {
            String missing = p.has(HEATER_THICKNESS) ? HEATER_HEAT_CAPACITY : HEATER_THICKNESS;
            String given = p.has(HEATER_THICKNESS) ? HEATER_THICKNESS : HEATER_HEAT_CAPACITY;
            throw InputException.at(p.pathOf(missing), "missing; the heater's heat capacity needs both "
                    + HEATER_THICKNESS + " and " + HEATER_HEAT_CAPACITY + ", and " + given + " is given without it");
        }
        double massPerArea = p.has(HEATER_THICKNESS) ? p.number(HEATER_THICKNESS) * p.number(HEATER_HEAT_CAPACITY)
                : 0.0;
        return new LineModel(stack, b, p.number(LENGTH, Double.NaN), massPerArea,
                p.number(BOUNDARY_RESISTANCE, 0.0));
    }
}
