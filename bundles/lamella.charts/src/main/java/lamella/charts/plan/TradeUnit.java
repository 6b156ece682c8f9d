package lamella.charts.plan;

/**
 * The unit a plot shows a case-file key in, chosen by the SI suffix of its name and the size of its values (a
 * frequency in MHz, a radius in µm, a thickness in nm, a delay in ns).
 *
 * @param symbol the unit's symbol
 * @param factor what an SI value is multiplied by to be shown in it
 */
public record TradeUnit(String symbol, double factor) {

    /** @param key a case-file key ending in its unit, such as {@code modulation_hz}; {@code typical} an SI value */
    public static TradeUnit of(String key, double typical) {
        double a = Math.abs(typical);
        String k = key.replaceAll("\\[(first|last)]$", "");
        if (k.endsWith("_hz")) {
            return a >= 1e6 ? new TradeUnit("MHz", 1e-6) : a >= 1e3 ? new TradeUnit("kHz", 1e-3)
                    : new TradeUnit("Hz", 1);
        }
        if (k.endsWith("_w_m2k")) {
            return new TradeUnit("MW m⁻² K⁻¹", 1e-6);
        }
        if (k.endsWith("_w_mk")) {
            return new TradeUnit("W m⁻¹ K⁻¹", 1);
        }
        if (k.endsWith("_j_m3k")) {
            return new TradeUnit("MJ m⁻³ K⁻¹", 1e-6);
        }
        if (k.endsWith("_m")) {
            return a < 1e-6 ? new TradeUnit("nm", 1e9) : a < 1e-3 ? new TradeUnit("µm", 1e6)
                    : new TradeUnit("mm", 1e3);
        }
        if (k.endsWith("_s")) {
            return a < 1e-9 ? new TradeUnit("ps", 1e12) : a < 1e-6 ? new TradeUnit("ns", 1e9)
                    : new TradeUnit("µs", 1e6);
        }
        if (k.endsWith("_w")) {
            return new TradeUnit("mW", 1e3);
        }
        if (k.endsWith("_k")) {
            return new TradeUnit("K", 1);
        }
        return new TradeUnit("", 1);
    }

    /** A label with its unit in brackets: {@code measurement.modulation_hz (MHz)}. */
    public String label(String name) {
        return symbol.isEmpty() ? name : name + " (" + symbol + ")";
    }
}
