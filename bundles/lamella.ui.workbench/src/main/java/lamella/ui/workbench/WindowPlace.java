package lamella.ui.workbench;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.Properties;

/**
 * Where the window was when it was last closed: its bounds and whether it was maximised. Kept in a small file of its
 * own ({@code window.properties}: {@code x}, {@code y}, {@code width}, {@code height}, {@code maximised}) beside the
 * arrangement, so that the window can be placed before the arrangement's JSON is read — reading JSON the first time
 * in a run costs some 150 ms of the first window, while this costs none.
 */
record WindowPlace(int x, int y, int width, int height, boolean maximised) {

    /** Reads a place; a file that is not one is an IOException naming the file and the key at fault. */
    static WindowPlace read(Path file) throws IOException {
        Properties p = new Properties();
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            p.load(in);
        } catch (IllegalArgumentException e) {
            // The only way a properties file is unreadable as text: a backslash-u escape without four hex digits.
            throw new IOException(file + ": not a window place: a line holds a broken \\u escape", e);
        }
        String maximised = p.getProperty("maximised", "").trim();
        if (!maximised.equals("true") && !maximised.equals("false")) {
            throw new IOException(file + ": maximised must be true or false, not '" + maximised + "'");
        }
        return new WindowPlace(number(p, "x", file, false), number(p, "y", file, false),
                number(p, "width", file, true), number(p, "height", file, true), maximised.equals("true"));
    }

    private static int number(Properties p, String key, Path file, boolean positive) throws IOException {
        String text = p.getProperty(key);
        if (text == null) {
            throw new IOException(file + ": " + key + " is missing");
        }
        try {
            int n = Integer.parseInt(text.trim());
            if (positive && n <= 0) {
                throw new IOException(file + ": " + key + " must be a positive number of pixels, not " + n);
            }
            return n;
        } catch (NumberFormatException e) {
            throw new IOException(file + ": " + key + " must be a whole number of pixels, not '" + text.trim() + "'");
        }
    }

    /** The file's text: the five keys, in this order. */
    String text() {
        return "# The Lamella workbench's window when it was last closed (pixels)\n" + "x=" + x + "\n" + "y=" + y
                + "\n" + "width=" + width + "\n" + "height=" + height + "\n" + "maximised=" + maximised + "\n";
    }

    void save(Path file) throws IOException {
        AtomicFile.write(file, text());
    }

    /** The place an arrangement recorded, if it recorded one. */
    static Optional<WindowPlace> of(Arrangement a) {
        return a.width > 0 && a.height > 0
                ? Optional.of(new WindowPlace(a.x, a.y, a.width, a.height, a.windowMaximised))
                : Optional.empty();
    }
}
