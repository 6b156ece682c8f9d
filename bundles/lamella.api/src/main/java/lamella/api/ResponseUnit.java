package lamella.api;

/** The unit of a geometry's frequency response. */
public enum ResponseUnit {
    /** Probe-averaged temperature per watt of absorbed power. */
    KELVIN_PER_WATT("K/W", "k_per_w"),
    /** Heater-averaged temperature per watt per metre of heater length. */
    KELVIN_METRE_PER_WATT("K m/W", "k_m_per_w");

    private final String symbol;
    private final String columnSuffix;

    ResponseUnit(String symbol, String columnSuffix) {
        this.symbol = symbol;
        this.columnSuffix = columnSuffix;
    }

    public String symbol() {
        return symbol;
    }

    /** The suffix of CSV column names in this unit, such as {@code k_per_w}. */
    public String columnSuffix() {
        return columnSuffix;
    }
}
