package lamella.api.material;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import lamella.api.InputException;

/**
 * One library entry: a material's stated properties with their sources, and the curation that vouches for them.
 *
 * @param id         identifier, unique within its library
 * @param name       display name
 * @param aliases    other names a case file may use
 * @param replaces   the names (ids or aliases) of lower tiers' entries that this entry takes the place of, whole; a
 *                   name of this entry that a lower tier also uses is refused unless this list covers that entry
 * @param properties the stated properties in file order
 * @param curation   revision and review
 * @param notes      the curator's remarks on the entry, empty if none
 * @param library    the library it belongs to
 * @param location   the file and line it was read from
 */
public record Material(String id, String name, List<String> aliases, List<String> replaces,
                       Map<MaterialQuantity, MaterialProperty> properties, Curation curation, String notes,
                       LibraryInfo library, String location) {

    /** How an entry states its conductivity, which decides what a layer must say about orientation. */
    public enum ConductivityForm {
        /** {@code k_w_mk}: the same in every direction. */
        ISOTROPIC,
        /** {@code k_through_w_mk} and {@code k_in_plane_w_mk}: a film, oriented by its growth. */
        FILM,
        /** {@code k_parallel_c_w_mk} and {@code k_perpendicular_c_w_mk}: the layer says where its c axis points. */
        UNIAXIAL,
        /** No conductivity stated (an entry of heat capacity only). */
        NONE
    }

    public Material {
        aliases = List.copyOf(aliases);
        replaces = List.copyOf(replaces);
        properties = Collections.unmodifiableMap(new LinkedHashMap<>(properties));
        notes = notes == null ? "" : notes;
    }

    /** An entry that replaces nothing. */
    public Material(String id, String name, List<String> aliases, Map<MaterialQuantity, MaterialProperty> properties,
                    Curation curation, String notes, LibraryInfo library, String location) {
        this(id, name, aliases, List.of(), properties, curation, notes, library, location);
    }

    public Optional<MaterialProperty> property(MaterialQuantity q) {
        return Optional.ofNullable(properties.get(q));
    }

    public ConductivityForm conductivityForm() {
        if (properties.containsKey(MaterialQuantity.K)) {
            return ConductivityForm.ISOTROPIC;
        }
        if (properties.containsKey(MaterialQuantity.K_PARALLEL_C)
                || properties.containsKey(MaterialQuantity.K_PERPENDICULAR_C)) {
            return ConductivityForm.UNIAXIAL;
        }
        if (properties.containsKey(MaterialQuantity.K_THROUGH) || properties.containsKey(MaterialQuantity.K_IN_PLANE)) {
            return ConductivityForm.FILM;
        }
        return ConductivityForm.NONE;
    }

    /** "library Fenwick Hall films (facility), entry al-film v2", as explanations and errors name an entry. */
    public String label() {
        return "library " + library.label() + ", entry " + id + " v" + curation.version();
    }

    /**
     * "library Fenwick Hall films (facility), entry al-film v2, films.json:14": the label with the file and line it
     * was read from, as messages about two entries name each.
     */
    public String placedLabel() {
        return label() + ", " + location;
    }

    /** Every name the entry itself gives: its id and its aliases (a replaced entry's names come on top). */
    public List<String> names() {
        List<String> all = new java.util.ArrayList<>();
        all.add(id);
        all.addAll(aliases);
        return all;
    }

    /**
     * A stated property at a temperature. Heat capacity, when not stated itself, is density × specific heat at that
     * temperature, with the two relative uncertainties added in quadrature.
     *
     * @throws OutOfRangeException when the temperature is outside the property's range
     * @throws InputException      (without a path: the caller knows where the material was named) when the entry does
     *                             not state the property
     */
    public PropertyValue value(MaterialQuantity q, double temperatureK) throws InputException {
        MaterialProperty stated = properties.get(q);
        if (stated != null) {
            return new PropertyValue(q, at(stated, temperatureK), temperatureK, this, List.of(stated),
                    stated.uncertaintyRel());
        }
        if (q == MaterialQuantity.HEAT_CAPACITY) {
            MaterialProperty rho = properties.get(MaterialQuantity.DENSITY);
            MaterialProperty cp = properties.get(MaterialQuantity.SPECIFIC_HEAT);
            if (rho != null && cp != null) {
                double v = at(rho, temperatureK) * at(cp, temperatureK);
                OptionalDouble u = rho.uncertaintyRel().isPresent() && cp.uncertaintyRel().isPresent()
                        ? OptionalDouble.of(Math.hypot(rho.uncertaintyRel().getAsDouble(),
                                cp.uncertaintyRel().getAsDouble()))
                        : OptionalDouble.empty();
                return new PropertyValue(q, v, temperatureK, this, List.of(rho, cp), u);
            }
            throw InputException.at(null, "material '" + id + "' (" + label() + ") states no heat capacity: neither "
                    + MaterialQuantity.HEAT_CAPACITY.key() + " nor both " + MaterialQuantity.DENSITY.key() + " and "
                    + MaterialQuantity.SPECIFIC_HEAT.key());
        }
        throw InputException.at(null, "material '" + id + "' (" + label() + ") states no " + q.description()
                + " (" + q.key() + ")");
    }

    private double at(MaterialProperty p, double temperatureK) throws InputException {
        if (!p.curve().covers(temperatureK)) {
            throw new OutOfRangeException("material '" + id + "' (" + label() + ") states " + p.quantity().key()
                    + " for " + p.curve().range() + " only; " + TemperatureCurve.kelvin(temperatureK)
                    + " is outside it (values are never extrapolated)");
        }
        return p.curve().valueAt(temperatureK);
    }
}
