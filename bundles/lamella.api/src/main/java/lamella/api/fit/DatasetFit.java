package lamella.api.fit;

import java.util.Optional;
import lamella.api.SelfHeating;

/**
 * One dataset after the fit.
 *
 * @param index        its position in the fit block
 * @param source       its data file as given in the case
 * @param technique    the technique's type
 * @param signal       the fitted signal column
 * @param xColumn      the x column's name
 * @param x            x values
 * @param data         measured signal
 * @param sigma        the 1σ per point used as weight (from the data, or estimated from the residuals)
 * @param model        the model at the best fit
 * @param sigmaFromData whether sigma came from the data file rather than from the residuals
 * @param reducedChiSquare Σ((data − model)/σ)² / (points − share of the free parameters)
 * @param heating      the self-heating state at the best fit (the steady rise and the temperatures of the library
 *                     values), when the case asks for self-heating
 */
public record DatasetFit(int index, String source, String technique, String signal, String xColumn, double[] x,
                         double[] data, double[] sigma, double[] model, boolean sigmaFromData,
                         double reducedChiSquare, Optional<SelfHeating.Outcome> heating) {

    /** A dataset fitted without self-heating. */
    public DatasetFit(int index, String source, String technique, String signal, String xColumn, double[] x,
                      double[] data, double[] sigma, double[] model, boolean sigmaFromData, double reducedChiSquare) {
        this(index, source, technique, signal, xColumn, x, data, sigma, model, sigmaFromData, reducedChiSquare,
                Optional.empty());
    }
}
