package lab.example.linepair;

import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.ParameterSpec;
import lamella.api.ParameterSpec.Constraint;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.StackKernel;
import lamella.engine.ComplexIntegrand;
import lamella.engine.Geometries;
import lamella.engine.SpectralQuadrature;
import lamella.engine.TopLayer;
import org.osgi.service.component.annotations.Component;

/**
 * Two parallel long strips on the surface, running along y: a heater of half-width b_h, heated uniformly over its
 * width, and a sensor of half-width b_s whose centre is a distance s away along x, read as its width-averaged
 * temperature. Per unit power per unit length of heater,
 * H(ω) = (1/π) ∫₀^∞ Z(k, ω) sinc(k b_h) sinc(k b_s) cos(k s) dk, with sinc(u) = sin(u)/u and Z the stack's
 * response to a surface heat flux varying as cos(kx) (the two-strip form of the line-heater integral of Cahill,
 * Rev. Sci. Instrum. 61, 802, 1990). Heat spreads across the strips, along x, with each layer's Λx.
 *
 * <p>This class is a template for a lab's own geometry. To make another one, change:
 * <ul>
 *   <li>{@link #type()} and {@link #summary()} — the name a case file gives in {@code geometry.type}, and one line
 *       for {@code lamella plugins};</li>
 *   <li>{@link #parameters()} and the checks in {@link #bind} — the case-file keys (unit in the name), and an
 *       {@link InputException} at the key's JSON path for values that do not go together;</li>
 *   <li>{@link #weight} — how the heating and the reading enter the spectral integral;</li>
 *   <li>{@link #tailBound} — an analytic bound on the part of the integral beyond its upper limit, which follows
 *       from how fast the weight decays;</li>
 *   <li>{@link #unit()} — which techniques can use it (K m/W: {@code 3omega}; K/W: the beam techniques).</li>
 * </ul>
 * The evaluation must be thread-safe and must fail with a {@link ModelEvaluationException}, never return NaN.
 */
@Component(service = HeatingGeometry.class)
public final class LinePair implements HeatingGeometry {

    static final String TYPE = "line-pair";
    static final String HEATER_HALF_WIDTH = "heater_half_width_m";
    static final String SENSOR_HALF_WIDTH = "sensor_half_width_m";
    static final String SPACING = "spacing_m";

    /** The part of the integral left out beyond the upper limit is at most this fraction of the result. */
    static final double TAIL_TOLERANCE = 1e-8;

    @Override
    public String type() {
        return TYPE;
    }

    @Override
    public String summary() {
        return "heater strip and sensor strip side by side: the sensor's width-averaged temperature (per unit length)";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(
                ParameterSpec.required(HEATER_HALF_WIDTH, Constraint.POSITIVE, "the heated strip's half-width in m"),
                ParameterSpec.required(SENSOR_HALF_WIDTH, Constraint.POSITIVE, "the sensing strip's half-width in m"),
                ParameterSpec.required(SPACING, Constraint.POSITIVE,
                        "the distance between the two strips' centre lines in m"));
    }

    @Override
    public ResponseUnit unit() {
        return ResponseUnit.KELVIN_METRE_PER_WATT;
    }

    /**
     * No {@code Geometries.requireInPlaneIsotropy} here, unlike an axisymmetric geometry: heat spreads across the
     * strips, along x, with each layer's Λx, so in-plane anisotropic layers are modelled.
     */
    @Override
    public GeometryModel bind(Parameters p, StackKernel stack) throws InputException {
        double heater = p.number(HEATER_HALF_WIDTH);
        double sensor = p.number(SENSOR_HALF_WIDTH);
        double spacing = p.number(SPACING);
        if (spacing <= heater + sensor) {
            throw InputException.at(p.pathOf(SPACING), "the strips' centres are " + spacing + " m apart, so they"
                    + " touch or overlap; expected more than the sum of the half-widths, " + (heater + sensor) + " m");
        }
        return (frequencyHz, out) -> evaluate(stack, heater, sensor, spacing, frequencyHz, out);
    }

    private static void evaluate(StackKernel stack, double heater, double sensor, double spacing, double frequencyHz,
                                 double[] out) {
        double omega = 2 * Math.PI * frequencyHz;
        // The guards every geometry calls (PLUGINS.md): no steady state where no heat can leave, then this
        // geometry's own stricter rule, and a finite result at the end.
        Geometries.requireSteadyStateExists(stack.stack(), omega, TYPE);
        if (omega == 0 && stack.stack().bottom() != BottomBoundary.ISOTHERMAL) {
            throw new ModelEvaluationException("geometry '" + TYPE + "': long strips have no steady temperature"
                    + " unless the bottom of the stack is isothermal (heat flow in two dimensions); use a frequency"
                    + " above zero");
        }
        Layer top = stack.stack().layers().get(0);
        double topConductivity = Math.sqrt(top.kThrough() * top.kInPlaneX());
        double[] z = new double[2];
        ComplexIntegrand integrand = (k, o) -> {
            stack.response(k, 0.0, omega, z);
            double w = weight(k, heater, sensor, spacing);
            o[0] = z[0] * w;
            o[1] = z[1] * w;
        };
        double[] breaks = stack.featureWavenumbers(omega);
        // Starting panels span one period of the fastest cosine in the weight, which the 21-point rule resolves.
        double panel = 2 * Math.PI / (spacing + heater + sensor);
        // Below the half-space wavenumber the layers beneath still show; the tail bound holds only beyond it.
        double upper = Math.max(TopLayer.halfSpaceWavenumber(stack.stack()), Math.PI / Math.min(heater, sensor));
        SpectralQuadrature q = Geometries.workspace();
        double[] piece = new double[2];
        try {
            q.integrate(integrand, 0.0, upper, breaks, panel, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE, 0.0, out);
            // Doubling the range until what is left out is small against what is in.
            while (tailBound(upper, heater, sensor, spacing, topConductivity)
                    > TAIL_TOLERANCE * Math.hypot(out[0], out[1])) {
                // Absolute tolerance: a piece far out is mostly cancelling oscillation, small against the whole.
                double absolute = TAIL_TOLERANCE * Math.hypot(out[0], out[1]);
                q.integrate(integrand, upper, 2 * upper, breaks, panel, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE,
                        absolute, piece);
                out[0] += piece[0];
                out[1] += piece[1];
                upper *= 2;
            }
        } catch (ModelEvaluationException e) {
            throw new ModelEvaluationException("geometry '" + TYPE + "' at " + frequencyHz + " Hz: " + e.getMessage(),
                    e);
        }
        out[0] /= Math.PI;
        out[1] /= Math.PI;
        Geometries.requireFinite(out, TYPE, frequencyHz);
    }

    /** How heat enters (uniform over the heater) and how temperature is read (averaged over the sensor). */
    static double weight(double k, double heater, double sensor, double spacing) {
        return sinc(k * heater) * sinc(k * sensor) * Math.cos(k * spacing);
    }

    /**
     * A bound on |∫_K^∞ Z sinc(k b_h) sinc(k b_s) cos(k s) dk| for K beyond the half-space wavenumber, where Z is
     * the top layer's half-space response Z∞ = 1/√(Λz(Λx k² + iωC)) to double precision. There
     * |Z∞| ≤ 1/(√(ΛzΛx) k) and |dZ∞/dk| ≤ 1/(√(ΛzΛx) k²). Two bounds, the smaller one used:
     * <ul>
     *   <li>|sinc·sinc·cos| ≤ 1/(k² b_h b_s) gives 1/(2 √(ΛzΛx) b_h b_s K²);</li>
     *   <li>the product of sines and cosine is a sum of four cosines cos(a k)/4 with a = s ± b_h ± b_s, all at
     *       least the gap g = s − b_h − b_s > 0; integrating each by parts once gives at most
     *       2/(a √(ΛzΛx) b_h b_s K³), so together 2/(g √(ΛzΛx) b_h b_s K³), far smaller once K ≫ 1/g.</li>
     * </ul>
     */
    static double tailBound(double upper, double heater, double sensor, double spacing, double topConductivity) {
        double gap = spacing - heater - sensor;
        double scale = 1 / (topConductivity * heater * sensor * upper * upper);
        return scale * Math.min(0.5, 2 / (gap * upper));
    }

    private static double sinc(double u) {
        return Math.abs(u) < 1e-4 ? 1 - u * u / 6 : Math.sin(u) / u;
    }
}
