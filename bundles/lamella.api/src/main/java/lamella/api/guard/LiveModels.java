package lamella.api.guard;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import lamella.api.HeatingGeometry;
import lamella.api.ModelCatalog;
import lamella.api.StackKernels;
import lamella.api.Technique;

/**
 * The geometries and techniques live at this moment, kept up to date by a command's dynamic references, so a
 * bundle dropped into plugins/ (or removed) changes what the next run can use. Each is held behind a guard that
 * names its bundle when it fails; removal finds the guard by the plug-in it wraps.
 */
public final class LiveModels {

    private final List<GuardedGeometry> geometries = new CopyOnWriteArrayList<>();
    private final List<GuardedTechnique> techniques = new CopyOnWriteArrayList<>();

    public void add(HeatingGeometry g, PluginOrigin origin) {
        geometries.add(new GuardedGeometry(g, origin));
    }

    public void remove(HeatingGeometry g) {
        geometries.removeIf(guard -> guard.guards(g));
    }

    public void add(Technique t, PluginOrigin origin) {
        techniques.add(new GuardedTechnique(t, origin));
    }

    public void remove(Technique t) {
        techniques.removeIf(guard -> guard.guards(t));
    }

    public ModelCatalog catalog(StackKernels kernels) {
        return new ModelCatalog(List.<HeatingGeometry>copyOf(geometries), List.<Technique>copyOf(techniques), kernels);
    }
}
