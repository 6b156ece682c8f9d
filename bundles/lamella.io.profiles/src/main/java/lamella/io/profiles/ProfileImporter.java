package lamella.io.profiles;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import lamella.api.InputException;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;

/** One profile offered as an importer. */
final class ProfileImporter implements DataImporter {

    private final Profile profile;

    ProfileImporter(Profile profile) {
        this.profile = profile;
    }

    Profile profile() {
        return profile;
    }

    @Override
    public String id() {
        return profile.id();
    }

    @Override
    public String summary() {
        return profile.summary() + " [profile" + (profile.version().isEmpty() ? "" : " " + profile.version()) + ", "
                + profile.origin() + "]";
    }

    /**
     * Sure (0.9) when the file has every text the profile looks for and, if the profile names extensions, one of
     * them; 0.6 on the extension alone when the profile looks for no text; 0 otherwise — never as low as a guess.
     */
    @Override
    public double confidence(Path file, byte[] head) {
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        boolean extension = profile.extensions().isEmpty()
                || profile.extensions().stream().anyMatch(e -> name.endsWith("." + e));
        if (profile.contains().isEmpty()) {
            return extension ? 0.6 : 0.0;
        }
        String[] texts = decodings(head);
        for (String c : profile.contains()) {
            boolean found = false;
            for (String t : texts) {
                if (t.contains(c)) {
                    found = true;
                    break;
                }
            }
            if (!found) {
                return 0.0;
            }
        }
        return extension ? 0.9 : 0.7;
    }

    private static String[] decodings(byte[] head) {
        if (head.length >= 2 && head[0] == (byte) 0xFF && head[1] == (byte) 0xFE) {
            return new String[] {new String(head, 2, head.length - 2, StandardCharsets.UTF_16LE)};
        }
        if (head.length >= 2 && head[0] == (byte) 0xFE && head[1] == (byte) 0xFF) {
            return new String[] {new String(head, 2, head.length - 2, StandardCharsets.UTF_16BE)};
        }
        return new String[] {new String(head, StandardCharsets.UTF_8), new String(head, StandardCharsets.ISO_8859_1)};
    }

    @Override
    public Dataset read(Path file) throws InputException {
        return ProfileTable.read(profile, file);
    }
}
