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
 */
@Component(service = HeatingGeometry.class)
public final class LineHeater implements HeatingGeometry {

    static final String HALF_WIDTH = "half_width_m";
    static final String LENGTH = "length_m";

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
                        "the heater's length in m, checked to be long compared with its width"));
    }

    @Override
    public ResponseUnit unit() {
        return ResponseUnit.KELVIN_METRE_PER_WATT;
    }

    @Override
    public GeometryModel bind(Parameters p, StackKernel stack) throws InputException {
        double b = p.number(HALF_WIDTH);
        if (p.has(LENGTH) && p.number(LENGTH) < MIN_LENGTH_OVER_WIDTH * 2 * b) {
            throw InputException.at(p.pathOf(LENGTH), "the heater is " + p.number(LENGTH) + " m long but " + 2 * b
                    + " m wide; the line-heater model needs a length of at least " + MIN_LENGTH_OVER_WIDTH
                    + " widths");
        }
        return new LineModel(stack, b);
    }
}
