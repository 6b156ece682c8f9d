package lamella.technique.threeomega;

import lamella.api.FrequencySweep;
import lamella.api.ResponseUnit;
import lamella.api.Technique;
import org.osgi.service.component.annotations.Component;

/**
 * 3ω: a heater driven at frequency f dissipates power oscillating at 2f; its width-averaged temperature oscillation
 * at 2f, per unit average power per unit length, is read from the third-harmonic voltage (Cahill, Rev. Sci.
 * Instrum. 61, 802, 1990). x is the drive frequency f; the response is evaluated at 2f.
 */
@Component(service = Technique.class)
public final class ThreeOmega extends FrequencySweep {

    static final String FREQUENCIES = "drive_frequencies_hz";

    public ThreeOmega() {
        super("3omega", "electrical line heater: 2f temperature oscillation over drive frequency f", FREQUENCIES,
                "the heater's drive frequencies f in Hz", ResponseUnit.KELVIN_METRE_PER_WATT, 2.0);
    }
}
