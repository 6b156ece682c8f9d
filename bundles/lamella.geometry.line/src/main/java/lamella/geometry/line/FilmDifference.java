package lamella.geometry.line;

import java.util.List;
import lamella.api.GeometryModel;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.ParameterSpec;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.Stack;
import lamella.api.StackKernel;
import lamella.engine.LayeredStack;
import org.osgi.service.component.annotations.Component;

/**
 * The differential 3ω method (Lee & Cahill, J. Appl. Phys. 81, 2590, 1997): the same heater on the film sample and
 * on a reference that lacks the film, at the same power per unit length; the signal is the difference of the two heaters' temperatures. The film is {@code layers[0]}, the
 * layer under the heater; the reference is the same stack without it (the heater then sits on {@code layers[1]}).
 * Keys and heater model are those of {@code line}, for both heaters. For a thin film of low conductivity on a good
 * substrate the in-phase difference is the film's 1-D resistance across the heater's width, d_f/(2bΛ_f) per W/m.
 */
@Component(service = HeatingGeometry.class)
public final class FilmDifference implements HeatingGeometry {

    private final LineHeater line = new LineHeater();

    @Override
    public String type() {
        return "line-film-difference";
    }

    @Override
    public String summary() {
        return "differential 3ω: a strip heater's width-averaged temperature on the stack minus that on the same"
                + " stack without layers[0] (per unit length)";
    }

    @Override
    public List<ParameterSpec> parameters() {
        return line.parameters();
    }

    @Override
    public ResponseUnit unit() {
        return ResponseUnit.KELVIN_METRE_PER_WATT;
    }

    @Override
    public GeometryModel bind(Parameters p, StackKernel stack) throws InputException {
        Stack s = stack.stack();
        if (s.layers().size() < 2) {
            throw InputException.at(p.pathOf("type"), "the differential method needs a film on a substrate: layers[0]"
                    + " is the film that the reference lacks, and the stack has only one layer");
        }
        if (s.optics().inDepth()) {
            throw InputException.at(p.pathOf("type"), "the differential method removes layers[0] for the reference,"
                    + " and that layer is heated or read over a depth; a line heater heats at the plane");
        }
        Stack reference = new Stack(s.layers().subList(1, s.layers().size()), s.bottom(), s.above(), s.top(),
                s.optics());
        LineModel sample = LineHeater.model(p, stack);
        LineModel bare = LineHeater.model(p, new LayeredStack(reference));
        return new GeometryModel() {
            @Override
            public void at(double frequencyHz, double[] out) {
                double[] r = new double[2];
                bare.at(frequencyHz, r);
                sample.at(frequencyHz, out);
                out[0] -= r[0];
                out[1] -= r[1];
            }

            @Override
            public List<String> cautions(double[] heatingFrequenciesHz) {
                return sample.cautions(heatingFrequenciesHz);
            }
        };
    }
}
