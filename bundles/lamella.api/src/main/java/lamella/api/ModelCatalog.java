package lamella.api;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

/**
 * The live geometries and techniques, and the one place that turns a case into a {@link Simulation}: the geometry
 * and technique named by the case are looked up by type, their blocks bound and checked against each other.
 */
public final class ModelCatalog {

    private static final Set<String> TYPE_KEY = Set.of("type");

    private final List<HeatingGeometry> geometries;
    private final List<Technique> techniques;
    private final StackKernels kernels;

    public ModelCatalog(Collection<HeatingGeometry> geometries, Collection<Technique> techniques,
                        StackKernels kernels) {
        this.geometries = List.copyOf(geometries);
        this.techniques = List.copyOf(techniques);
        this.kernels = kernels;
    }

    /** The live geometries, for choosers. */
    public List<HeatingGeometry> geometries() {
        return geometries;
    }

    /** The live techniques, for choosers. */
    public List<Technique> techniques() {
        return techniques;
    }

    public Optional<HeatingGeometry> geometry(String type) {
        return geometries.stream().filter(g -> g.type().equals(type)).findFirst();
    }

    public Optional<Technique> technique(String type) {
        return techniques.stream().filter(t -> t.type().equals(type)).findFirst();
    }

    /** Builds the simulation a case describes, or says precisely what in the case is wrong. */
    public Simulation simulation(Stack stack, Block geometryBlock, Block measurementBlock) throws InputException {
        for (Block b : List.of(geometryBlock, measurementBlock)) {
            if (b.values().isEmpty()) {
                throw InputException.at(b.path(), "missing; the case states its " + b.path() + " only in each dataset"
                        + " of its fit block, and this needs the case's own (fit, or sensitivity --dataset N, use the"
                        + " datasets')");
            }
        }
        String gType = geometryBlock.requireString("type");
        HeatingGeometry g = geometry(gType).orElseThrow(() -> unknown(geometryBlock.pathOf("type"), "geometry",
                gType, geometries.stream().map(HeatingGeometry::type).toList()));
        String tType = measurementBlock.requireString("type");
        Technique t = technique(tType).orElseThrow(() -> unknown(measurementBlock.pathOf("type"), "technique",
                tType, techniques.stream().map(Technique::type).toList()));
        if (g.unit() != t.requiredUnit()) {
            throw InputException.at(geometryBlock.pathOf("type"), "technique '" + t.type() + "' needs a geometry"
                    + " whose response is in " + t.requiredUnit().symbol() + ", but '" + g.type() + "' gives "
                    + g.unit().symbol() + compatibleHint(t));
        }
        Parameters gp = Parameters.bind(geometryBlock, g.parameters(), TYPE_KEY, "geometry '" + g.type() + "'");
        Parameters tp = Parameters.bind(measurementBlock, t.parameters(), TYPE_KEY, "technique '" + t.type() + "'");
        TechniqueModel tm = t.bind(tp);
        if (!stack.heating().isOn()) {
            return new Simulation(t, tm, g.bind(gp, kernels.compile(stack)));
        }
        SelfHeating.Outcome heated = selfHeated(stack, g, gp, t);
        return new Simulation(t, tm, g.bind(gp, kernels.compile(heated.stack())), Optional.of(heated));
    }

    /**
     * The stack's library values consistent with the steady rise the absorbed power causes: the geometry's response
     * at 0 Hz, the estimate {@link Simulation#steadyRisePerWatt()} gives, for the values of every iteration.
     */
    private SelfHeating.Outcome selfHeated(Stack stack, HeatingGeometry g, Parameters gp, Technique t)
            throws InputException {
        String at = stack.heating().path();
        if (t.requiredUnit() != ResponseUnit.KELVIN_PER_WATT) {
            throw InputException.at(at, "self-heating takes the steady rise per watt of a beam geometry; technique '"
                    + t.type() + "' with geometry '" + g.type() + "' gives a response per unit length, so no rise"
                    + " per watt is known (leave the self-heating block out)");
        }
        if (!stack.hasHeatSink()) {
            throw InputException.at(at, "self-heating needs a steady state, and no heat leaves this stack (an"
                    + " adiabatic bottom" + (stack.heatsBothWays() ? " and top" : "") + "); make a side"
                    + " semi-infinite or isothermal, or leave the self-heating block out");
        }
        return stack.heating().settle(stack, s -> {
            double[] h = new double[2];
            g.bind(gp, kernels.compile(s)).at(0, h);
            return h[0];
        });
    }

    /** Builds the simulation of a whole case document. */
    public Simulation simulation(CaseDocument doc) throws InputException {
        try {
            doc.requireOneSample("a simulation (name one with --sample)");
            return simulation(doc.stack(), doc.geometry(), doc.measurement());
        } catch (InputException e) {
            throw doc.locate(e);
        }
    }

    private String compatibleHint(Technique t) {
        List<String> ok = new ArrayList<>();
        for (HeatingGeometry g : geometries) {
            if (g.unit() == t.requiredUnit()) {
                ok.add(g.type());
            }
        }
        return ok.isEmpty() ? "" : "; geometries that fit: " + String.join(", ", ok);
    }

    private static InputException unknown(String path, String what, String type, List<String> known) {
        Set<String> sorted = new TreeSet<>(known);
        String hint = Names.closest(type, sorted).map(k -> " (did you mean '" + k + "'?)").orElse("");
        return InputException.at(path, "unknown " + what + " '" + type + "'" + hint + "; live " + what
                + (what.equals("geometry") ? " types" : "s") + ": " + (sorted.isEmpty() ? "none" : String.join(", ", sorted)));
    }
}
