package lamella.materials;

import java.nio.file.Path;
import lamella.api.material.LibraryTier;
import lamella.api.material.MaterialLibrary;

/**
 * The library shipped with Lamella, read from its source folder for the workbench's tests. In a running workbench
 * the materials bundle offers it as a service; a test without OSGi reaches the package's reader from here.
 */
public final class ShippedLibraryForTests {

    private ShippedLibraryForTests() {
    }

    public static MaterialLibrary read(Path folder) {
        return LibraryFolder.read(folder, LibraryTier.SHIPPED);
    }
}
