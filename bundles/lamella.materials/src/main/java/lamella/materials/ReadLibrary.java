package lamella.materials;

import java.util.List;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryInfo;
import lamella.api.material.Material;
import lamella.api.material.MaterialLibrary;

/** A library as read: the entries that passed and the findings of those that did not. */
record ReadLibrary(LibraryInfo info, List<Material> materials, List<LibraryFinding> findings)
        implements MaterialLibrary {

    ReadLibrary {
        materials = List.copyOf(materials);
        findings = List.copyOf(findings);
    }
}
