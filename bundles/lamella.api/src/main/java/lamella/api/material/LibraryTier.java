package lamella.api.material;

/**
 * Where a library comes from, which decides precedence: a user's own values win over the facility's, and the
 * facility's over those shipped with Lamella.
 */
public enum LibraryTier {
    /** Contributed by a bundle (the library shipped with Lamella, or a data bundle a lab drops in). */
    SHIPPED("shipped"),
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
