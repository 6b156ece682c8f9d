package lamella.fit;

import java.nio.file.Path;
import lamella.api.Block;

/**
 * One dataset of a fit block.
 *
 * @param index       position in {@code fit.datasets}
 * @param given       the data path as written in the case
 * @param file        the data file, resolved against the case's folder
 * @param signal      the signal column to fit, or null for the technique's usual one
 * @param geometry    the dataset's own geometry block, or null to use the case's
 * @param measurement the dataset's own measurement block, or null to use the case's
 * @param path        JSON path, {@code fit.datasets[i]}
 */
record DatasetSpec(int index, String given, Path file, String signal, Block geometry, Block measurement,
                   String path) {
}
