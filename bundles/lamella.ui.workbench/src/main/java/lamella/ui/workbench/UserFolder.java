package lamella.ui.workbench;

import java.nio.file.Path;

/**
 * The user's Lamella folder ({@code ~/.lamella}, or the folder property {@code lamella.user.dir} names, which tests
 * use): the arrangement, named arrangements, recent projects and recovery copies.
 */
record UserFolder(Path root) {

    static final String PROPERTY = "lamella.user.dir";

    static UserFolder of(String configured) {
        if (configured != null && !configured.isBlank()) {
            return new UserFolder(Path.of(configured).toAbsolutePath());
        }
        return new UserFolder(Path.of(System.getProperty("user.home"), ".lamella"));
    }

    Path arrangement() {
        return root.resolve("arrangement.json");
    }

    /** Where the window was last: read before the arrangement, so that the window is placed at once. */
    Path windowPlace() {
        return root.resolve("window.properties");
    }

    Path namedArrangements() {
        return root.resolve("arrangements");
    }

    Path recent() {
        return root.resolve("recent.json");
    }

    /** Normalised CSV files of imports, held here until a save copies them beside the case. */
    Path imports() {
        return root.resolve("imported");
    }

    Path recovery() {
        return root.resolve("recovery");
    }
}
