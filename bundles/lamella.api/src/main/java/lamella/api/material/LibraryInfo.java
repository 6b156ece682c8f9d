package lamella.api.material;

/**
 * What a library is and where it lives.
 *
 * @param id          short identifier, unique among live libraries
 * @param name        the name its maintainer gave it
 * @param tier        shipped, facility or user: decides precedence
 * @param location    its folder, or the bundle and folder it came from
 * @param description the maintainer's description, empty if none
 */
public record LibraryInfo(String id, String name, LibraryTier tier, String location, String description) {

    /** "Fenwick Hall films (facility)", as explanations name a library. */
    public String label() {
        return name + " (" + tier.label() + ")";
    }
}
