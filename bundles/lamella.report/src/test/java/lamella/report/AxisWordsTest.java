package lamella.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.junit.jupiter.api.Test;

/** Axis words and scales; labelling rules of this program, no physics. */
class AxisWordsTest {

    @Test
    void xColumnsReadAsWordsWithUnits() {
        assertEquals("modulation frequency (Hz)", ColumnWords.x("frequency_hz", "fdtr"));
        assertEquals("heater drive frequency (Hz)", ColumnWords.x("frequency_hz", "3omega"));
        assertEquals("heater drive frequency (Hz)", ColumnWords.x("frequency_hz", "3omega-voltage"));
        assertEquals("pump–probe delay (s)", ColumnWords.x("delay_s", "tdtr"));
        assertEquals("offset_m (m)", ColumnWords.x("offset_m", "sstr"));
        assertEquals("count (dimensionless)", ColumnWords.x("count", "sstr"));
    }

    @Test
    void signalsReadAsWordsWithUnits() {
        assertEquals("ratio −V_in/V_out (dimensionless)", ColumnWords.signal("ratio"));
        assertEquals("phase (°)", ColumnWords.signal("phase_deg"));
        assertEquals("in-phase (real) part (K m/W)", ColumnWords.signal("re_k_m_per_w"));
        assertEquals("amplitude (K/W)", ColumnWords.signal("amplitude_k_per_w"));
        assertEquals("in-phase third-harmonic voltage V3ω (V)", ColumnWords.signal("v3_in_phase_v"));
    }

    @Test
    void frequenciesAndPositiveDelaysGetALogAxis() {
        assertTrue(XAxes.logarithmic("frequency_hz", new double[]{1e3, 1e6}));
        assertTrue(XAxes.logarithmic("delay_s", new double[]{1e-10, 4e-9}));
        assertInstanceOf(LogAxis.class, XAxes.of("delay_s", "tdtr", new double[]{1e-10, 4e-9}));
    }

    @Test
    void delaysThatReachZeroOrBelowAndOtherColumnsGetALinearAxis() {
        assertFalse(XAxes.logarithmic("delay_s", new double[]{-2e-11, 1e-10, 4e-9}));
        assertFalse(XAxes.logarithmic("delay_s", new double[]{0, 1e-10}));
        assertFalse(XAxes.logarithmic("offset_m", new double[]{1e-6, 1e-5}));
        assertInstanceOf(NumberAxis.class, XAxes.of("delay_s", "tdtr", new double[]{0, 1e-10}));
    }
}
