package lamella.casefile;

import java.util.List;
import java.util.Set;
import lamella.api.Block;
import lamella.api.InputException;
import lamella.api.PhysicalRange;
import lamella.api.SelfHeating;

/**
 * The case's {@code self_heating} block: {@code absorbed_power_w}, the pump power the sample absorbs (W, 0 allowed:
 * no rise). With it, every library value of the stack is taken at its layer's temperature plus the steady rise that
 * power causes (see {@link SelfHeating}).
 */
final class SelfHeatingReading {

    static final String BLOCK = "self_heating";
    static final String POWER = "absorbed_power_w";

    private SelfHeatingReading() {
    }

    static SelfHeating read(Block b, List<SelfHeating.LibraryBinding> bindings) throws InputException {
        CaseFileReader.onlyKnownKeys(b, Set.of(POWER), "the self_heating block");
        Object v = b.get(POWER);
        if (v == null) {
            throw InputException.at(b.pathOf(POWER), "missing; expected the pump power the sample absorbs, in W"
                    + " (the power reaching the sample times its absorptance)");
        }
        if (!(v instanceof Double p)) {
            throw InputException.at(b.pathOf(POWER), "expected the absorbed power in W as a number, got "
                    + Block.describe(v));
        }
        if (!(p >= 0)) {
            throw InputException.at(b.pathOf(POWER), "expected an absorbed power of 0 W or more, got " + p);
        }
        if (p > 0) {
            PhysicalRange.checkKey(POWER, p, b.pathOf(POWER));
        }
        return new SelfHeating(p, b.pathOf(POWER), bindings);
    }
}
