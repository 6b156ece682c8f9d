package lamella.api.material;

import java.util.List;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * A library of materials, offered as a service: one per library bundle (found by the materials extender) and one per
 * configured folder. What could not be read is reported in {@link #findings()}; the entries that could are there.
 */
@ConsumerType
public interface MaterialLibrary {

    LibraryInfo info();

    /** The library's id, as listings name it. */
    default String id() {
        return info().id();
    }

    /** One line: its name, tier, size and where it lives. */
    default String summary() {
        return info().name() + " (" + info().tier().label() + ", " + materials().size() + " entries, "
                + info().location() + ")";
    }

    /** The entries that were read without error, in file order. */
    List<Material> materials();

    /** Every problem found while reading it. */
    List<LibraryFinding> findings();
}
