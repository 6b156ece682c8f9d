package lamella.api;

import java.util.List;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * A heating and sensing geometry — how heat enters the surface and how the temperature is read — offered as a
 * service. It declares its case-file parameters and turns them into a {@link GeometryModel}.
 * A case file selects a geometry by {@link #type()} in {@code geometry.type}.
 *
 * <p><b>Transform convention</b> (the one of {@link StackKernel}): wavenumbers are angular (rad/m); the transform of
 * what heats is 1 at k = 0 for a source of unit power, and that of what senses is 1 at k = 0 for a probe whose
 * weighting integrates to one; the inverse is (1/2π) ∫₀^∞ … k dk for an axisymmetric geometry and
 * (1/4π²) ∫∫ … dsx dsy in general. A geometry whose response is in K/W (beams) thus returns
 * H(ω) = (1/2π) ∫₀^∞ Z(k, ω) S(k) P(k) k dk; one in K m/W (a long line heater along y) integrates over sx alone,
 * H(ω) = (1/2π) ∫ Z(sx, 0, ω) S(sx) P(sx) dsx with S and P the transforms across the line, 1 at sx = 0 per watt per
 * metre. {@code lamella.engine.RadialIntegral} evaluates the axisymmetric integral for a weight S(k)P(k).
 *
 * <p><b>Guards a geometry keeps.</b> {@link #bind} refuses a stack it cannot model with an {@link InputException}
 * at the geometry's JSON path (an axisymmetric geometry: a layer that is not in-plane isotropic, through
 * {@code lamella.engine.Geometries.requireInPlaneIsotropy}); the model fails with a {@link ModelEvaluationException},
 * never NaN, when no steady state exists at zero frequency ({@code Geometries.requireSteadyStateExists}) or a result
 * is not finite ({@code Geometries.requireFinite}).
 */
@ConsumerType
public interface HeatingGeometry {

    /** The case-file name, such as {@code gaussian}. Unique among live geometries. */
    String type();

    /** One line saying what this geometry models. */
    String summary();

    /** The keys of its case-file block (besides {@code type}). */
    List<ParameterSpec> parameters();

    /** The unit of its response. */
    ResponseUnit unit();

    /**
     * Builds the model for validated parameters and a stack. Throws when the two cannot go together (for example an
     * in-plane anisotropic layer under an axisymmetric geometry), naming the JSON path.
     */
    GeometryModel bind(Parameters parameters, StackKernel stack) throws InputException;
}
