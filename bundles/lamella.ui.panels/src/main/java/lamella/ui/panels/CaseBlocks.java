package lamella.ui.panels;

import java.util.List;
import java.util.Optional;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;

/**
 * The model inputs of one fit dataset as the fitting service reads them: the case's stack, and the dataset's own
 * geometry or measurement block where it gives one, the case's otherwise.
 */
final class CaseBlocks {

    private CaseBlocks() {
    }

    static List<Block> datasets(CaseDocument doc) {
        if (doc.root().get("fit") instanceof Block fit && fit.get("datasets") instanceof List<?> list) {
            return list.stream().filter(Block.class::isInstance).map(Block.class::cast).toList();
        }
        return List.of();
    }

    /** Index −1: the case's own blocks. */
    static CaseModel model(CaseDocument doc, int dataset) {
        if (dataset < 0) {
            return new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
        }
        Block d = datasets(doc).get(dataset);
        Block g = d.get("geometry") instanceof Block b ? b : doc.geometry();
        Block m = d.get("measurement") instanceof Block b ? b : doc.measurement();
        return new CaseModel(doc.stack(), g, m);
    }

    /** The data file a dataset names (absolute in the project's checked document), if it is one. */
    static Optional<String> data(CaseDocument doc, int dataset) {
        if (dataset < 0) {
            return Optional.empty();
        }
        return datasets(doc).get(dataset).get("data") instanceof String s ? Optional.of(s) : Optional.empty();
    }

    /** The signal a dataset fits, if it names one. */
    static Optional<String> signal(CaseDocument doc, int dataset) {
        if (dataset < 0) {
            return Optional.empty();
        }
        return datasets(doc).get(dataset).get("signal") instanceof String s ? Optional.of(s) : Optional.empty();
    }
}
