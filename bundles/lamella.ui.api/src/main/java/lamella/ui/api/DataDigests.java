package lamella.ui.api;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.Map;

/**
 * The content of data files as SHA-256 digests, so that a fit belongs to what its data files hold and not to their
 * names: an edited file makes it out of date, a copy of the same bytes under another name does not. A file is read
 * again only when its size or modification time changed since it was last read.
 */
final class DataDigests {

    private record Seen(long size, long modified, String digest) {
    }

    private final Map<Path, Seen> seen = new HashMap<>();

    /** The digest of the file's content; a file that cannot be read is "unreadable" with its name, never an error. */
    synchronized String of(Path file) {
        Path p = file.toAbsolutePath().normalize();
        BasicFileAttributes a;
        try {
            a = Files.readAttributes(p, BasicFileAttributes.class);
        } catch (IOException e) {
            seen.remove(p);
            return "unreadable " + p.getFileName();
        }
        Seen s = seen.get(p);
        long modified = a.lastModifiedTime().toMillis();
        if (s != null && s.size() == a.size() && s.modified() == modified) {
            return s.digest();
        }
        try {
            String d = digest(p);
            seen.put(p, new Seen(a.size(), modified, d));
            return d;
        } catch (IOException e) {
            seen.remove(p);
            return "unreadable " + p.getFileName();
        }
    }

    private static String digest(Path p) throws IOException {
        MessageDigest md = sha256();
        try (InputStream in = new DigestInputStream(Files.newInputStream(p), md)) {
            in.transferTo(OutputStream.nullOutputStream());
        }
        return HexFormat.of().formatHex(md.digest());
    }

    static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is always available", e);
        }
    }
}
