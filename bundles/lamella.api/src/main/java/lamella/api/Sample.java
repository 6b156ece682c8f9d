package lamella.api;

/**
 * One sample of a case: its own stack and, optionally, its own geometry block. A case file with one top-level
 * {@code stack} has one sample without a name; a case with {@code samples} has one per entry, each named.
 *
 * @param name     the sample's unique name, empty for the one sample of a case with a top-level {@code stack}
 * @param stack    its layers
 * @param geometry its own geometry block, or null where the case's applies
 * @param path     JSON path of its entry ({@code samples[1]}), or {@code stack} for a case's one stack
 */
public record Sample(String name, Stack stack, Block geometry, String path) {

    /** Whether this is a named sample of a {@code samples} list. */
    public boolean named() {
        return !name.isEmpty();
    }

    /** The geometry block its measurements use unless a dataset has its own: its own, else the case's. */
    public Block geometryOr(Block caseGeometry) {
        return geometry != null ? geometry : caseGeometry;
    }
}
