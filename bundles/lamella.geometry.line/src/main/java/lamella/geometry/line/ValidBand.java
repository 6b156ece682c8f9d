package lamella.geometry.line;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lamella.api.Layer;
import lamella.api.Stack;

/**
 * The usual check of a 3ω frequency range (Cahill, Rev. Sci. Instrum. 61, 802, 1990): the thermal penetration depth
 * λ = √(D/(2π·2f)) at the heating frequency 2f should stay between about five heater half-widths and a fifth of the
 * substrate's thickness. The model itself keeps the finite width and the finite layers, so only the ends where its
 * assumptions bite are told, as lying outside the usual slope-method band:
 * <ul>
 * <li>the lowest frequency's λ in the bottom layer beyond a fifth of its thickness — the heat then reaches the bottom,
 * and the result rests on the bottom condition; for a semi-infinite bottom, beyond a fifth of
 * {@link #USUAL_SUBSTRATE_M} (a common slide or wafer), where a real substrate stops being semi-infinite;</li>
 * <li>the highest frequency's λ across the strip in the layer under it (Λx/C) below the half-width b — the reading is
 * then mostly the one-dimensional flow under the strip, where the uniform heat flux across its width, its own heat
 * capacity and its boundary resistance decide the response;</li>
 * <li>with a {@code length_m}, the lowest frequency's λ in the bottom layer beyond a fifth of the length, where the
 * flow stops being two-dimensional.</li>
 * </ul>
 * The factors are the trade's (common practice, no source, besides Cahill's band).
 */
final class ValidBand {

    /** A substrate thickness assumed for a semi-infinite bottom: a common glass slide or wafer, m. */
    static final double USUAL_SUBSTRATE_M = 5e-4;
    static final double FIFTH = 0.2;

    private final Layer top;
    private final Layer bottom;
    private final double halfWidth;
    private final double length;

    ValidBand(Stack stack, double halfWidth, double length) {
        List<Layer> layers = stack.layers();
        this.top = layers.get(0);
        this.bottom = layers.get(layers.size() - 1);
        this.halfWidth = halfWidth;
        this.length = length;
    }

    /** λ = √(D/(2π f)) at heating frequency f for the diffusivity Λ/C. */
    static double penetrationDepth(double conductivity, double heatCapacity, double heatingHz) {
        return Math.sqrt(conductivity / heatCapacity / (2 * Math.PI * heatingHz));
    }

    List<String> cautions(double[] heatingHz) {
        List<String> out = new ArrayList<>();
        if (heatingHz.length == 0) {
            return out;
        }
        double low = Double.POSITIVE_INFINITY;
        double high = 0;
        for (double f : heatingHz) {
            if (f > 0) {
                low = Math.min(low, f);
                high = Math.max(high, f);
            }
        }
        if (high == 0) {
            return out;
        }
        double deep = penetrationDepth(bottom.kThrough(), bottom.heatCapacity(), low);
        if (bottom.isSemiInfinite()) {
            if (deep > FIFTH * USUAL_SUBSTRATE_M) {
                out.add(String.format(Locale.ROOT, "at the lowest drive frequency, %s Hz, the thermal penetration"
                        + " depth λ = √(D/(2π·2f)) in the semi-infinite bottom layer '%s' is %s m, more than a fifth"
                        + " of a %s m substrate: outside the usual slope-method band (Cahill 1990); a real substrate"
                        + " that thin is no longer semi-infinite — give the layer its thickness and bottom condition",
                        number(low / 2), bottom.name(), number(deep), number(USUAL_SUBSTRATE_M)));
            }
        } else if (deep > FIFTH * bottom.thickness()) {
            out.add(String.format(Locale.ROOT, "at the lowest drive frequency, %s Hz, the thermal penetration depth"
                    + " λ = √(D/(2π·2f)) in the bottom layer '%s' is %s m, more than a fifth of its thickness %s m:"
                    + " outside the usual slope-method band (Cahill 1990); the heat reaches the bottom and the result"
                    + " rests on its condition", number(low / 2), bottom.name(), number(deep),
                    number(bottom.thickness())));
        }
        double across = penetrationDepth(top.kInPlaneX(), top.heatCapacity(), high);
        if (across < halfWidth) {
            out.add(String.format(Locale.ROOT, "at the highest drive frequency, %s Hz, the thermal penetration depth"
                    + " λ = √(D/(2π·2f)) across the heater in layer '%s' is %s m, below the heater's half-width %s"
                    + " m: outside the usual slope-method band (λ ≥ 5 half-widths, Cahill 1990); the model keeps the"
                    + " finite width, but the response there is mostly the flow straight under the heater, where its"
                    + " uniform heat flux, its heat capacity and its boundary resistance decide it", number(high / 2),
                    top.name(), number(across), number(halfWidth)));
        }
        if (Double.isFinite(length) && deep > FIFTH * length) {
            out.add(String.format(Locale.ROOT, "at the lowest drive frequency, %s Hz, the thermal penetration depth"
                    + " λ = √(D/(2π·2f)) in layer '%s' is %s m, more than a fifth of the heater's length %s m: the"
                    + " heat flow is no longer two-dimensional, as the line-heater model assumes", number(low / 2),
                    bottom.name(), number(deep), number(length)));
        }
        return out;
    }

    private static String number(double v) {
        return String.format(Locale.ROOT, "%.3g", v).replaceAll("e([+-])0*(\\d)", "e$1$2").replace("e+", "e");
    }
}
