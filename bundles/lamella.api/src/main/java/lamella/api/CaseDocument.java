package lamella.api;

import java.nio.file.Path;

/**
 * A case file as read and checked by a {@link CaseFormat}: the stack fully validated, the geometry and measurement
 * blocks kept raw until the services they name interpret them.
 *
 * @param file        where it was read from (relative data paths resolve against its folder)
 * @param stack       the layered sample
 * @param geometry    the {@code geometry} block, with its {@code type}
 * @param measurement the {@code measurement} block, with its {@code type}
 * @param root        the whole document, for blocks other bundles define (such as {@code fit})
 */
public record CaseDocument(Path file, Stack stack, Block geometry, Block measurement, Block root) {
}
