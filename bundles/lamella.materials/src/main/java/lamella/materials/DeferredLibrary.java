package lamella.materials;

import java.util.List;
import java.util.function.Supplier;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryInfo;
import lamella.api.material.Material;
import lamella.api.material.MaterialLibrary;

/**
 * A library offered at once and read when first asked for: a command that names no material never pays for reading
 * and checking every entry. It is read once; every later call sees the same entries and findings.
 */
final class DeferredLibrary implements MaterialLibrary {

    private final Supplier<ReadLibrary> reader;
    private volatile ReadLibrary read;

    DeferredLibrary(Supplier<ReadLibrary> reader) {
        this.reader = reader;
    }

    private ReadLibrary library() {
        ReadLibrary r = read;
        if (r == null) {
            synchronized (this) {
                r = read;
                if (r == null) {
                    r = reader.get();
                    read = r;
                }
            }
        }
        return r;
    }

    @Override
    public LibraryInfo info() {
        return library().info();
    }

    @Override
    public List<Material> materials() {
        return library().materials();
    }

    @Override
    public List<LibraryFinding> findings() {
        return library().findings();
    }
}
