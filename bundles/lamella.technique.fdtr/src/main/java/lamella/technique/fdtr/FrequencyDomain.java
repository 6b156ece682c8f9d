package lamella.technique.fdtr;

import lamella.api.FrequencySweep;
import lamella.api.ResponseUnit;
import lamella.api.Technique;
import org.osgi.service.component.annotations.Component;

/**
 * FDTR: the probe-averaged temperature per watt of absorbed modulated pump power at each modulation frequency,
 * as the lock-in reads it after the instrument's own phase is removed (Schmidt, Cheaito & Chiesa, Rev. Sci.
 * Instrum. 80, 094901, 2009). Phase in degrees, negative when the temperature lags.
 */
@Component(service = Technique.class)
public final class FrequencyDomain extends FrequencySweep {

    static final String FREQUENCIES = "frequencies_hz";

    public FrequencyDomain() {
        super("fdtr", "frequency-domain thermoreflectance: complex response over modulation frequency", FREQUENCIES,
                "the modulation frequencies in Hz", ResponseUnit.KELVIN_PER_WATT, 1.0);
    }
}
