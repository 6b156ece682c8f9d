package lamella.ui.api;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Supplier;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.Sample;
import org.osgi.annotation.versioning.ProviderType;

/** Reads and checks a case file: the live {@link lamella.api.CaseFormat}'s read method. */
@ProviderType
@FunctionalInterface
public interface CaseReader {

    CaseDocument read(Path file) throws InputException;

    /**
     * This reader, and then every geometry and measurement block — the case's, and each fit dataset's own or the
     * case's it falls back on — bound to the live geometry and technique it names, so that a missing or wrong key
     * of a block (a ring without its radius) is a problem of the case, at its JSON path, and not only of whatever
     * computes with it later; a dataset of a case of samples is bound with its sample's stack and geometry. Nothing
     * is evaluated.
     */
    static CaseReader withModels(CaseReader reader, Supplier<ModelCatalog> catalog) {
        return file -> {
            CaseDocument doc = reader.read(file);
            ModelCatalog models = catalog.get();
            try {
                if (doc.states("geometry") && doc.states("measurement")) {
                    models.simulation(doc.stack(), doc.geometry(), doc.measurement());
                }
                if (doc.root().get("fit") instanceof Block fit && fit.get("datasets") instanceof List<?> list) {
                    for (Object o : list) {
                        if (o instanceof Block d) {
                            Sample s = d.get("sample") instanceof String name
                                    ? doc.sample(name).orElse(doc.samples().get(0)) : doc.samples().get(0);
                            Block g = d.get("geometry") instanceof Block b ? b : s.geometryOr(doc.geometry());
                            Block m = d.get("measurement") instanceof Block b ? b : doc.measurement();
                            models.simulation(s.stack(), g, m);
                        }
                    }
                }
            } catch (InputException e) {
                throw doc.locate(e);
            }
            return doc;
        };
    }
}
