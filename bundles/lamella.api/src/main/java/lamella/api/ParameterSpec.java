package lamella.api;

/**
 * One parameter that a geometry or technique reads from its case-file block.
 *
 * @param key          the case-file key, carrying its unit: {@code pump_radius_m}, {@code modulation_hz}
 * @param kind         a single number or a list of numbers
 * @param constraint   which values make sense
 * @param required     whether the key must be present
 * @param defaultValue the value used when an optional number is absent (NaN: none)
 * @param description  one line for help texts and the workbench
 */
public record ParameterSpec(String key, Kind kind, Constraint constraint, boolean required, double defaultValue,
                            String description) {

    public enum Kind { NUMBER, NUMBER_LIST }

    public enum Constraint {
        POSITIVE("a positive number"),
        NON_NEGATIVE("a number ≥ 0"),
        FINITE("a finite number");

        private final String wording;

        Constraint(String wording) {
            this.wording = wording;
        }

        public String wording() {
            return wording;
        }

        public boolean admits(double v) {
            return switch (this) {
                case POSITIVE -> Double.isFinite(v) && v > 0;
                case NON_NEGATIVE -> Double.isFinite(v) && v >= 0;
                case FINITE -> Double.isFinite(v);
            };
        }
    }

    public static ParameterSpec required(String key, Constraint c, String description) {
        return new ParameterSpec(key, Kind.NUMBER, c, true, Double.NaN, description);
    }

    public static ParameterSpec optional(String key, Constraint c, double defaultValue, String description) {
        return new ParameterSpec(key, Kind.NUMBER, c, false, defaultValue, description);
    }

    public static ParameterSpec requiredList(String key, Constraint c, String description) {
        return new ParameterSpec(key, Kind.NUMBER_LIST, c, true, Double.NaN, description);
    }

    public static ParameterSpec optionalList(String key, Constraint c, String description) {
        return new ParameterSpec(key, Kind.NUMBER_LIST, c, false, Double.NaN, description);
    }
}
