package lamella.geometry.ring;

import java.util.Arrays;
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
 * width is an annulus whose intensity across the width is exp(−2 (r − R)²/w²), w its 1/e² half-width, with the
 * transform G(k) of {@link AnnulusTransform} (computed exactly by quadrature at each wavenumber), so
 * H(ω) = (1/2π) ∫₀^∞ Z(k, ω) G(k) exp(−k² w₁²/8) k dk.
 */
@Component(service = HeatingGeometry.class)
public final class RingSource implements HeatingGeometry {

    static final String RADIUS = "ring_radius_m";
    static final String WIDTH = "ring_width_m";
    static final String PROBE = "probe_radius_m";
    /** Beyond the cut-off wavenumber the Gaussian weights are below exp(−25) ≈ 1.4e-11. */
    private static final double CUTOFF = 25.0;

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
                        "the 1/e² half-width in m of the ring's Gaussian radial profile about its radius"
                                + " (0: a thin ring)"),
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
        double probe = p.number(PROBE);
        if (width == 0) {
            double w2 = probe * probe;
            return (frequencyHz, out) -> {
                double omega = 2 * Math.PI * frequencyHz;
                Geometries.requireSteadyStateExists(stack.stack(), omega, type());
                GaussianHankel.integrate(stack, omega, w2, radius, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE,
                        out);
                Geometries.requireFinite(out, type(), frequencyHz);
            };
        }
        AnnulusTransform annulus = new AnnulusTransform(radius, width);
        double eighthProbe2 = probe * probe / 8.0;
        // the annulus' transform decays like exp(−k² w²/8) once clear of the centre; nearer it, only the probe's does
        double kMax = Math.sqrt(CUTOFF * 8.0 / (probe * probe + (annulus.clearOfCentre() ? width * width : 0)));
        // panels start on one grid of the ring's period for every frequency (with that frequency's features added as
        // breaks), so the nodes of successive integrals coincide and G(k) is computed once per node, not per frequency
        double[] grid = periodGrid(kMax, 2 * Math.PI / radius);
        ThreadLocal<WavenumberMemo> memo = ThreadLocal.withInitial(() -> new WavenumberMemo(annulus::at));
        return (frequencyHz, out) -> {
            double omega = 2 * Math.PI * frequencyHz;
            Geometries.requireSteadyStateExists(stack.stack(), omega, type());
            double[] features = stack.featureWavenumbers(omega);
            double[] breaks = Arrays.copyOf(grid, grid.length + features.length);
            System.arraycopy(features, 0, breaks, grid.length, features.length);
            WavenumberMemo g = memo.get();
            double[] z = new double[2];
            Geometries.workspace().integrate((k, o) -> {
                stack.radialResponse(k, omega, z);
                double w = k * Math.exp(-eighthProbe2 * k * k) * g.at(k);
                o[0] = z[0] * w;
                o[1] = z[1] * w;
            }, 0.0, kMax, breaks, 0.0, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE, 0.0, out);
            out[0] /= 2 * Math.PI;
            out[1] /= 2 * Math.PI;
            Geometries.requireFinite(out, type(), frequencyHz);
        };
    }

    /** The multiples of the period inside (0, kMax): at most one panel per oscillation of J₀(kR) to begin with. */
    static double[] periodGrid(double kMax, double period) {
        int n = (int) Math.min(Math.ceil(kMax / period) - 1, SpectralQuadrature.MAX_PANELS - 1);
        double step = kMax / (n + 1);
        double[] grid = new double[Math.max(n, 0)];
        for (int i = 0; i < grid.length; i++) {
            grid[i] = (i + 1) * step;
        }
        return grid;
    }
}
