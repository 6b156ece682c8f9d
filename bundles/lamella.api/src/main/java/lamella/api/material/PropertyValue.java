package lamella.api.material;

import java.util.List;
import java.util.OptionalDouble;
import java.util.stream.Collectors;

/**
 * A library value as used: the number at one temperature, the entry it came from and the stated properties it was
 * computed from (one, or density and specific heat for a derived heat capacity).
 *
 * @param quantity       what it is
 * @param value          in SI units
 * @param temperatureK   the temperature it was evaluated at
 * @param material       the entry
 * @param from           the stated properties used
 * @param uncertaintyRel relative standard uncertainty, when every property used states one
 */
public record PropertyValue(MaterialQuantity quantity, double value, double temperatureK, Material material,
                            List<MaterialProperty> from, OptionalDouble uncertaintyRel) {

    public PropertyValue {
        from = List.copyOf(from);
    }

    /** True when derived from other stated properties rather than stated itself. */
    public boolean derived() {
        return from.size() != 1 || from.get(0).quantity() != quantity;
    }

    /** The sources of every property used, each once. */
    public String sources() {
        boolean one = from.stream().map(MaterialProperty::source).distinct().count() == 1;
        return from.stream().map(p -> one ? p.source() : p.quantity().key() + ": " + p.source())
                .distinct().collect(Collectors.joining("; "));
    }
}
