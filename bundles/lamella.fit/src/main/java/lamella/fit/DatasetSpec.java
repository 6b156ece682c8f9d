package lamella.fit;

import java.nio.file.Path;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.Sample;

/**
 * One dataset of a fit block.
 *
 * @param index       position in {@code fit.datasets}
 * @param given       the data path as written in the case
 * @param file        the data file, resolved against the case's folder
 * @param signal      the signal column to fit, or null for the technique's usual one
 * @param geometry    the dataset's own geometry block, or null to use the case's
 * @param measurement the dataset's own measurement block, or null to use the case's
 * @param rows        which of its rows are fitted ({@code x_range}, {@code exclude})
 * @param weighting   its own {@code weights}, or null for the fit block's
 * @param path        JSON path, {@code fit.datasets[i]}
 * @param sample      the sample it was measured on, or null for the case's only one
 * @param gain        the name of the fit's gain its signal is multiplied by, or null for none
 */
record DatasetSpec(int index, String given, Path file, String signal, Block geometry, Block measurement,
                   RowSelection rows, FitSpec.Weighting weighting, String path, Sample sample, String gain) {

    /** A dataset of the case's only sample, without a gain. */
    DatasetSpec(int index, String given, Path file, String signal, Block geometry, Block measurement,
                RowSelection rows, FitSpec.Weighting weighting, String path) {
        this(index, given, file, signal, geometry, measurement, rows, weighting, path, null, null);
    }

    /** Its sample: its own, or the case's only one. */
    Sample sampleIn(CaseDocument doc) {
        return sample != null ? sample : doc.samples().get(0);
    }
}
