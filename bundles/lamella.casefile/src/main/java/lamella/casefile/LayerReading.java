package lamella.casefile;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;
import lamella.api.Block;
import lamella.api.BottomBoundary;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.ValueOrigin;
import lamella.api.material.Material;
import lamella.api.SelfHeating;
import lamella.api.material.MaterialCatalog;
import lamella.api.material.MaterialProperty;
import lamella.api.material.MaterialQuantity;
import lamella.api.material.OutOfRangeException;
import lamella.api.material.PropertyValue;

/**
 * Reads one layer: every value written in the layer wins; what is not written comes from the layer's library
 * material (if it names one) at the layer's temperature, or from the case format's defaults. Records the origin of
 * every value.
 */
final class LayerReading {

    static final String MATERIAL = "material";
    static final String TEMPERATURE = "temperature_k";
    static final String C_AXIS = "c_axis";
    static final double DEFAULT_TEMPERATURE_K = 300.0;
    private static final String DEFAULT_SOURCE = "default";
    private static final String LIBRARY_SOURCE = "library ";

    private final Block l;
    private final Map<String, Integer> lines;
    private final List<ValueOrigin> origins;
    private final List<SelfHeating.LibraryBinding> bindings;
    private final String name;
    private final Optional<Material> material;
    private final double temperature;
    private final String temperaturePath;
    private final Optional<CAxis> cAxis;
    /** Where the conductivity read last came from: a case key, a library quantity, or the default rule. */
    private String source = DEFAULT_SOURCE;

    /** Where the c axis of a uniaxial crystal points in the sample's frame (z normal to the surface). */
    enum CAxis {
        NORMAL("normal"), IN_PLANE_X("in-plane-x"), IN_PLANE_Y("in-plane-y");

        final String caseName;

        CAxis(String caseName) {
            this.caseName = caseName;
        }
    }

    private LayerReading(Block l, String name, Map<String, Integer> lines, List<ValueOrigin> origins,
                         List<SelfHeating.LibraryBinding> bindings, Optional<Material> material, double temperature,
                         String temperaturePath, Optional<CAxis> cAxis) {
        this.l = l;
        this.bindings = bindings;
        this.name = name;
        this.lines = lines;
        this.origins = origins;
        this.material = material;
        this.temperature = temperature;
        this.temperaturePath = temperaturePath;
        this.cAxis = cAxis;
    }

    /**
     * @param caseTemperature     the case's temperature_k, or the default
     * @param caseTemperaturePath where that temperature was set ({@code temperature_k}), or null for the default
     * @param catalog             the live libraries, asked only when the layer names a material
     * @param bindings            receives every value taken from a library, for self-heating
     */
    static Layer read(Block l, boolean last, BottomBoundary bottom, boolean above, double caseTemperature,
                      String caseTemperaturePath, Supplier<MaterialCatalog> catalog, Map<String, Integer> lines,
                      List<ValueOrigin> origins, List<SelfHeating.LibraryBinding> bindings) throws InputException {
        CaseFileReader.onlyKnownKeys(l, CaseFileReader.LAYER_KEYS, "a layer");
        String name = l.requireString(CaseFileReader.NAME);
        if (name.isBlank()) {
            throw InputException.at(l.pathOf(CaseFileReader.NAME), "a layer's name must not be blank");
        }
        Optional<Material> material = Optional.empty();
        if (l.has(MATERIAL)) {
            String wanted = l.requireString(MATERIAL);
            try {
                material = Optional.of(catalog.get().lookup(wanted));
            } catch (InputException e) {
                throw InputException.at(l.pathOf(MATERIAL), e.problem());
            }
        } else {
            for (String key : List.of(TEMPERATURE, C_AXIS)) {
                if (l.has(key)) {
                    throw InputException.at(l.pathOf(key), key + " selects library values and this layer names no "
                            + MATERIAL + "; add one, or leave " + key + " out");
                }
            }
        }
        double temperature = caseTemperature;
        String temperaturePath = caseTemperaturePath;
        if (l.has(TEMPERATURE)) {
            temperature = CaseFileReader.positive(l, TEMPERATURE, "the layer's temperature in K");
            temperaturePath = l.pathOf(TEMPERATURE);
        }
        Optional<CAxis> axis = Optional.empty();
        if (l.has(C_AXIS)) {
            String given = l.requireString(C_AXIS);
            axis = Optional.of(java.util.Arrays.stream(CAxis.values()).filter(a -> a.caseName.equals(given))
                    .findFirst().orElseThrow(() -> InputException.at(l.pathOf(C_AXIS), "unknown c_axis '" + given
                            + "'; expected one of: normal, in-plane-x, in-plane-y")));
        }
        return new LayerReading(l, name, lines, origins, bindings, material, temperature,
                temperaturePath == null ? l.pathOf(MATERIAL) : temperaturePath, axis).layer(last, bottom, above);
    }

    /**
     * @param last   the outermost layer of its side: the last one below the heated plane, or the last above it
     * @param bottom the condition beyond that side ({@code stack.bottom}, or {@code stack.top} for a layer above)
     * @param above  a layer of {@code stack.above}, whose boundary conductance faces the heated plane
     */
    private Layer layer(boolean last, BottomBoundary bottom, boolean above) throws InputException {
        if (material.isPresent()) {
            checkOrientation(material.get());
        }
        boolean semiInfinite = last && bottom == BottomBoundary.SEMI_INFINITE;
        double thickness;
        if (semiInfinite) {
            if (l.has(CaseFileReader.THICKNESS)) {
                throw InputException.at(l.pathOf(CaseFileReader.THICKNESS), above
                        ? "the outermost layer above the heated plane of a stack with a semi-infinite top extends"
                        + " without end; leave out " + CaseFileReader.THICKNESS
                        + ", or set stack.top to 'adiabatic' or 'isothermal'"
                        : "the last layer of a stack with a semi-infinite bottom extends without end; leave out "
                        + CaseFileReader.THICKNESS + ", or set stack.bottom to 'adiabatic' or 'isothermal'");
            }
            thickness = Double.POSITIVE_INFINITY;
            fallback(CaseFileReader.THICKNESS, thickness, above ? "semi-infinite (outermost layer above, semi-infinite"
                    + " top)" : "semi-infinite (last layer, semi-infinite bottom)");
        } else {
            thickness = explicit(CaseFileReader.THICKNESS, "the layer's thickness in m"
                    + (last ? " (the " + (above ? "top" : "bottom") + " is " + bottom.caseName() + ")" : ""));
        }
        double kz = conductivity(CaseFileReader.K_THROUGH, Direction.Z);
        String zSource = source;
        double kx = inPlane(CaseFileReader.K_IN_PLANE_X, Direction.X, kz);
        boolean xFollows = follows(zSource);
        double ky = inPlane(CaseFileReader.K_IN_PLANE_Y, Direction.Y, kz);
        boolean yFollows = follows(zSource);
        double c;
        if (l.has(CaseFileReader.HEAT_CAPACITY) || material.isEmpty()) {
            c = explicit(CaseFileReader.HEAT_CAPACITY, "the volumetric heat capacity in J/(m³ K)");
        } else {
            c = fromLibrary(CaseFileReader.HEAT_CAPACITY, MaterialQuantity.HEAT_CAPACITY, "");
        }
        double g = Double.POSITIVE_INFINITY;
        if (above) {
            if (l.has(CaseFileReader.CONDUCTANCE)) {
                g = explicit(CaseFileReader.CONDUCTANCE, "the thermal boundary conductance toward the heated plane"
                        + " in W/(m² K)");
            } else {
                fallback(CaseFileReader.CONDUCTANCE, g, "perfect contact with the layer toward the heated plane");
            }
        } else if (l.has(CaseFileReader.CONDUCTANCE)) {
            if (last) {
                throw InputException.at(l.pathOf(CaseFileReader.CONDUCTANCE), "the last layer has no layer below it;"
                        + " a boundary conductance belongs to the upper of two neighbouring layers");
            }
            g = explicit(CaseFileReader.CONDUCTANCE, "the thermal boundary conductance to the next layer in W/(m² K)");
        } else if (!last) {
            fallback(CaseFileReader.CONDUCTANCE, g, "perfect contact with the next layer");
        }
        return new Layer(name, thickness, kz, kx, ky, c, g, Layer.Tie.of(xFollows, yFollows));
    }

    /**
     * Whether the direction just read is one quantity with Λz: it took Λz's value by default, or the same library
     * value as Λz (an isotropic entry's k_w_mk, a uniaxial entry's value for both). A key written for it is its own.
     */
    private boolean follows(String zSource) {
        return source.equals(DEFAULT_SOURCE) || (source.startsWith(LIBRARY_SOURCE) && source.equals(zSource));
    }

    private enum Direction {
        Z, X, Y
    }

    private double conductivity(String key, Direction d) throws InputException {
        if (l.has(key) || material.isEmpty()) {
            return explicit(key, "the through-plane thermal conductivity in W/(m K)");
        }
        return libraryConductivity(key, d);
    }

    /** An in-plane direction: its own key, then k_in_plane_w_mk, then the library, then the through-plane value. */
    private double inPlane(String key, Direction d, double kz) throws InputException {
        String what = d == Direction.X ? "the in-plane thermal conductivity along x"
                : "the in-plane thermal conductivity along y";
        if (l.has(key)) {
            return explicit(key, what);
        }
        if (l.has(CaseFileReader.K_IN_PLANE)) {
            double v = CaseFileReader.positive(l, CaseFileReader.K_IN_PLANE, "the in-plane thermal conductivity");
            record(key, v, ValueOrigin.Kind.EXPLICIT, line(CaseFileReader.K_IN_PLANE), CaseFileReader.K_IN_PLANE);
            source = "case " + CaseFileReader.K_IN_PLANE;
            return v;
        }
        if (material.isPresent()) {
            return libraryConductivity(key, d);
        }
        fallback(key, kz, "equal to " + CaseFileReader.K_THROUGH);
        return kz;
    }

    private double libraryConductivity(String key, Direction d) throws InputException {
        Material m = material.orElseThrow();
        switch (m.conductivityForm()) {
            case ISOTROPIC:
                return fromLibrary(key, MaterialQuantity.K, "");
            case FILM:
                return d == Direction.Z ? fromLibrary(key, MaterialQuantity.K_THROUGH, "")
                        : fromLibrary(key, MaterialQuantity.K_IN_PLANE, "");
            case UNIAXIAL: {
                CAxis axis = cAxis.orElseThrow(() -> InputException.at(l.pathOf(C_AXIS), "material '" + m.id()
                        + "' (" + m.label() + ") is a uniaxial crystal; say where its c axis points: c_axis"
                        + " \"normal\" (c-cut: c normal to the surface), \"in-plane-x\" or \"in-plane-y\" (c in the"
                        + " surface, along x or y), or give " + key + " explicitly"));
                boolean parallel = (axis == CAxis.NORMAL && d == Direction.Z)
                        || (axis == CAxis.IN_PLANE_X && d == Direction.X)
                        || (axis == CAxis.IN_PLANE_Y && d == Direction.Y);
                MaterialQuantity q = parallel ? MaterialQuantity.K_PARALLEL_C : MaterialQuantity.K_PERPENDICULAR_C;
                return fromLibrary(key, q, q.key() + " (c axis " + axis.caseName + ")");
            }
            default:
                throw InputException.at(l.pathOf(key), "material '" + m.id() + "' (" + m.label() + ") states no"
                        + " thermal conductivity; give " + key + " in the layer");
        }
    }

    /** c_axis only means something for a uniaxial entry; said of another, it is a mistake, not a no-op. */
    private void checkOrientation(Material m) throws InputException {
        if (cAxis.isPresent() && m.conductivityForm() != Material.ConductivityForm.UNIAXIAL) {
            throw InputException.at(l.pathOf(C_AXIS), "material '" + m.id() + "' (" + m.label() + ") is not stated"
                    + " as a uniaxial crystal, so c_axis has no meaning; leave it out");
        }
    }

    private double fromLibrary(String key, MaterialQuantity q, String how) throws InputException {
        PropertyValue v;
        try {
            v = material.orElseThrow().value(q, temperature);
        } catch (OutOfRangeException e) {
            throw InputException.at(temperaturePath, e.problem());
        } catch (InputException e) {
            throw InputException.at(l.pathOf(key), e.problem() + "; give " + key + " in the layer");
        }
        if (!(v.value() > 0)) {
            throw InputException.at(l.pathOf(MATERIAL), "material '" + v.material().id() + "' (" + v.material().label()
                    + ") gives " + q.key() + " = " + v.value() + " at " + temperature + " K; a positive value is needed");
        }
        origins.add(new ValueOrigin(l.pathOf(key), name, key, v.value(), ValueOrigin.Kind.LIBRARY, line(MATERIAL),
                how, Optional.of(v)));
        double low = 0;
        double high = Double.POSITIVE_INFINITY;
        for (MaterialProperty p : v.from()) {
            low = Math.max(low, p.curve().lowK());
            high = Math.min(high, p.curve().highK());
        }
        bindings.add(new SelfHeating.LibraryBinding(name, key, v.material(), q, temperature, v.value(), low, high));
        source = LIBRARY_SOURCE + q.key();
        return v.value();
    }

    private double explicit(String key, String what) throws InputException {
        double v = CaseFileReader.positive(l, key, what);
        record(key, v, ValueOrigin.Kind.EXPLICIT, line(key), "");
        source = "case " + key;
        return v;
    }

    private void fallback(String key, double v, String rule) {
        record(key, v, ValueOrigin.Kind.DEFAULT, -1, rule);
        source = DEFAULT_SOURCE;
    }

    private void record(String key, double v, ValueOrigin.Kind kind, int line, String how) {
        origins.add(new ValueOrigin(l.pathOf(key), name, key, v, kind, line, how, Optional.empty()));
    }

    private int line(String key) {
        Integer n = lines.get(l.pathOf(key));
        return n == null ? -1 : n;
    }
}
