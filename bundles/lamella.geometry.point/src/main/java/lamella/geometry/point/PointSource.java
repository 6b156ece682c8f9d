package lamella.geometry.point;

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
 * A harmonic point source of unit power on the surface, temperature read at one surface point a distance r away:
 * H(ω) = (1/2π) ∫₀^∞ Z(k, ω) J₀(k r) k dk. The top layer's half-space part is integrated in closed form,
 * e^(−a r)/(2π r √(Λz Λr)) with a = √(iωC/Λr) (Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed., 1959,
 * §10.3: the periodic point source, doubled at a surface); only the remainder, which decays exponentially in k, is
 * integrated numerically.
 */
@Component(service = HeatingGeometry.class)
public final class PointSource implements HeatingGeometry {

    static final String DISTANCE = "distance_m";

    @Override
    public String type() {
        return "point";
    }

    @Override
    public String summary() {
        return "point heat source on the surface, temperature read at a distance";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return List.of(ParameterSpec.required(DISTANCE, Constraint.POSITIVE,
                "the distance from the source to where the temperature is read, in m"));
    }

    @Override
    public ResponseUnit unit() {
        return ResponseUnit.KELVIN_PER_WATT;
    }

    @Override
    public GeometryModel bind(Parameters p, StackKernel stack) throws InputException {
        Geometries.requireInPlaneIsotropy(stack.stack(), p.path(), type());
        if (stack.stack().heatsBothWays()) {
            // the closed form that carries this geometry's oscillating tail is the top layer's half-space alone
            throw InputException.at(p.path() + ".type", "geometry 'point' takes the heat to flow only downward from"
                    + " the surface; this stack has layers above the heated plane (stack.above): use 'gaussian'"
                    + " (a small probe radius approaches a point) or leave stack.above out");
        }
        if (stack.stack().optics().inDepth()) {
            throw InputException.at(p.path() + ".type", "geometry 'point' heats and reads at the surface; this stack's"
                    + " first layer is heated or read over a depth (absorption_depth_m, sensing_depth_m): use"
                    + " 'gaussian' or leave the depths out");
        }
        return new PointModel(stack, p.number(DISTANCE));
    }
}
