package lamella.api.plan;

import lamella.api.fit.SensitivityTable;

/**
 * The sensitivities of one measurement of a plan.
 *
 * @param measurement which measurement, in words ({@code dataset 0}, {@code dataset 0 at measurement.modulation_hz
 *                    = 1e+07})
 * @param table       its signal's sensitivity to every numeric input over its x values
 */
public record PlannedSensitivity(String measurement, SensitivityTable table) {
}
