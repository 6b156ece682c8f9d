package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * A field's tooltip does not name the case file's SI unit, since the field shows and reads the unit chosen beside it
 * (the ring geometry's "the ring's radius in m" beside a field in µm); words that only start like a unit stay.
 */
class FieldTipTest {

    @Test
    void theFilesUnitLeavesTheFieldsTipAndOtherWordsStay() {
        assertEquals("the ring's radius", QuantityField.shownUnitless("the ring's radius in m"));
        assertEquals("the 1/e² half-width of the ring's Gaussian radial profile about its radius",
                QuantityField.shownUnitless("the 1/e² half-width in m of the ring's Gaussian radial profile about its"
                        + " radius"));
        assertEquals("drive frequencies, rising", QuantityField.shownUnitless("drive frequencies in Hz, rising"));
        assertEquals("boundary conductance (below)",
                QuantityField.shownUnitless("boundary conductance in W/(m² K) (below)"));
        assertEquals("a delay given in seconds", QuantityField.shownUnitless("a delay given in seconds"));
        assertEquals("fitted in steps", QuantityField.shownUnitless("fitted in steps"));
    }
}
