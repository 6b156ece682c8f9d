package lamella.api.material;

import java.util.OptionalDouble;

/**
 * One stated property of a library entry.
 *
 * @param quantity       what is stated, in SI units
 * @param curve          the value, or table, over temperature
 * @param uncertaintyRel the relative standard uncertainty (1σ) as a fraction, when the curator states one
 * @param source         the publication or handbook table the value comes from, as the curator wrote it
 * @param notes          the curator's remarks, empty if none
 */
public record MaterialProperty(MaterialQuantity quantity, TemperatureCurve curve, OptionalDouble uncertaintyRel,
                               String source, String notes) {

    public MaterialProperty {
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("every property value names its source");
        }
        notes = notes == null ? "" : notes;
    }
}
