package lamella.ui.panels;

import java.util.List;
import java.util.Optional;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.Sample;

/**
 * The model inputs of one fit dataset as the fitting service reads them: the stack of the sample it names (the
 * case's stack where it names none), and the dataset's own geometry or measurement block where it gives one, else
 * the sample's own geometry, else the case's; and the named gain that multiplies its signal.
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
        Optional<Sample> sample = d.get("sample") instanceof String name ? doc.sample(name) : Optional.empty();
        Block caseGeometry = sample.map(s -> s.geometryOr(doc.geometry())).orElse(doc.geometry());
        Block g = d.get("geometry") instanceof Block b ? b : caseGeometry;
        Block m = d.get("measurement") instanceof Block b ? b : doc.measurement();
        return new CaseModel(sample.map(Sample::stack).orElse(doc.stack()), g, m);
    }

    /** The value of the named gain a dataset's signal is multiplied by (1 where it names none). */
    static double gain(CaseDocument doc, int dataset) {
        if (dataset < 0 || !(datasets(doc).get(dataset).get("gain") instanceof String name)) {
            return 1.0;
        }
        if (doc.root().get("fit") instanceof Block fit && fit.get("gains") instanceof Block gains
                && gains.get(name) instanceof Number value) {
            return value.doubleValue();
        }
        return 1.0;
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
