package lamella.api.fit;

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
 */
public record DatasetFit(int index, String source, String technique, String signal, String xColumn, double[] x,
                         double[] data, double[] sigma, double[] model, boolean sigmaFromData,
                         double reducedChiSquare) {
}
