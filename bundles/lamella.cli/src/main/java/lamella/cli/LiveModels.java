package lamella.cli;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import lamella.api.HeatingGeometry;
import lamella.api.ModelCatalog;
import lamella.api.StackKernels;
import lamella.api.Technique;

/**
 * The geometries and techniques live at this moment, kept up to date by a command's dynamic references, so a
 * bundle dropped into plugins/ (or removed) changes what the next run can use.
 */
final class LiveModels {

    private final List<HeatingGeometry> geometries = new CopyOnWriteArrayList<>();
    private final List<Technique> techniques = new CopyOnWriteArrayList<>();

    void add(HeatingGeometry g) {
        geometries.add(g);
    }

    void remove(HeatingGeometry g) {
        geometries.remove(g);
    }

    void add(Technique t) {
        techniques.add(t);
    }

    void remove(Technique t) {
        techniques.remove(t);
    }

    ModelCatalog catalog(StackKernels kernels) {
        return new ModelCatalog(geometries, techniques, kernels);
    }
}
