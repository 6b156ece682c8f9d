package lamella.api.material;

/**
 * Where a library comes from, which decides precedence: a user's own values win over the facility's, the facility's
 * over a dropped-in data bundle's, and those over the ones shipped with Lamella. A higher tier's entry takes the
 * place of a lower one's only where it says so ({@link Material#replaces()}).
 */
public enum LibraryTier {
    /** The library shipped with Lamella (bundle {@code lamella.materials.shipped}). */
    SHIPPED("shipped"),
    /** A data bundle a lab drops into {@code plugins/}: any other bundle with a library manifest header. */
    BUNDLE("bundle"),
    /** The folder a facility shares among its users, named by {@code lamella.materials.facility}. */
    FACILITY("facility"),
    /** A user's own folder, named by {@code lamella.materials.user}. */
    USER("user");

    private final String label;

    LibraryTier(String label) {
        this.label = label;
    }

    /** How listings and explanations name the tier. */
    public String label() {
        return label;
    }

    /** True when values of this tier win over those of {@code other}. */
    public boolean outranks(LibraryTier other) {
        return ordinal() > other.ordinal();
    }
}
