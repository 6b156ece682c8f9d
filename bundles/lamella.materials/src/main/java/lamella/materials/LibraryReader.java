package lamella.materials;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import lamella.api.Block;
import lamella.api.FileProblems;
import lamella.api.Names;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryInfo;
import lamella.api.material.LibraryTier;
import lamella.api.material.Material;

/**
 * Reads a library: {@code library.json} names it, every other {@code *.json} file holds entries. Each file and each
 * entry stands alone — a broken file or entry becomes a finding and the rest is read — except library.json, without
 * which no entry could say which library it came from.
 */
final class LibraryReader {

    static final String LIBRARY_FILE = "library.json";
    static final int FORMAT = 1;
    static final Set<String> LIBRARY_KEYS = Set.of("library_format", "id", "name", "maintainer", "description");
    static final Set<String> FILE_KEYS = Set.of("materials");

    private LibraryReader() {
    }

    /**
     * @param location where the library lives, for listings
     * @param files    every JSON file of the library folder
     */
    static ReadLibrary read(LibraryTier tier, String location, List<SourceFile> files) {
        List<LibraryFinding> findings = new ArrayList<>();
        SourceFile head = files.stream().filter(f -> f.name().equals(LIBRARY_FILE)).findFirst().orElse(null);
        LibraryInfo info;
        if (head == null) {
            findings.add(new LibraryFinding(LibraryFinding.Severity.ERROR, location, -1, "", "no " + LIBRARY_FILE
                    + " here; a library folder needs one naming the library (library_format, id, name), so its"
                    + " entries were not read"));
            return new ReadLibrary(new LibraryInfo(tier.label() + "?", "(unnamed " + tier.label() + " library)",
                    tier, location, ""), List.of(), findings);
        }
        try {
            info = info(head, tier, location);
        } catch (FindingException e) {
            findings.add(e.finding());
            return new ReadLibrary(new LibraryInfo(tier.label() + "?", "(unreadable " + tier.label() + " library)",
                    tier, location, ""), List.of(), findings);
        }
        List<Material> materials = new ArrayList<>();
        Map<String, Material> names = new HashMap<>();
        List<SourceFile> entryFiles = new ArrayList<>(files);
        entryFiles.remove(head);
        entryFiles.sort(Comparator.comparing(SourceFile::name));
        for (SourceFile f : entryFiles) {
            readEntries(f, info, materials, names, findings);
        }
        return new ReadLibrary(info, materials, findings);
    }

    private static LibraryInfo info(SourceFile f, LibraryTier tier, String location) throws FindingException {
        LibraryJson json = new LibraryJson(f.label());
        Block root = parse(f, json);
        for (String key : root.values().keySet()) {
            if (!LIBRARY_KEYS.contains(key)) {
                throw new FindingException(f.label(), json.lineOf(key), key, "unknown key in " + LIBRARY_FILE
                        + hint(key, LIBRARY_KEYS) + "; expected one of: " + String.join(", ", new TreeSet<>(LIBRARY_KEYS)));
            }
        }
        Object format = root.get("library_format");
        if (!(format instanceof Double d) || d != FORMAT) {
            throw new FindingException(f.label(), json.lineOf("library_format"), "library_format",
                    format == null ? "missing; expected library_format " + FORMAT
                            : "this Lamella reads library_format " + FORMAT + ", got " + Block.describe(format));
        }
        String id = text(root, "id", f, json);
        if (!EntryReader.ID.matcher(id).matches()) {
            throw new FindingException(f.label(), json.lineOf("id"), "id", "the library id '" + id + "' must be"
                    + " lower case letters, digits and . _ + -");
        }
        String name = text(root, "name", f, json);
        String description = root.has("description") ? text(root, "description", f, json) : "";
        if (root.has("maintainer")) {
            description = (description.isEmpty() ? "" : description + " ") + "Maintained by "
                    + text(root, "maintainer", f, json) + ".";
        }
        return new LibraryInfo(id, name, tier, location, description);
    }

    private static void readEntries(SourceFile f, LibraryInfo info, List<Material> materials,
                                    Map<String, Material> names, List<LibraryFinding> findings) {
        LibraryJson json = new LibraryJson(f.label());
        Block root;
        try {
            root = parse(f, json);
        } catch (FindingException e) {
            findings.add(e.finding());
            return;
        }
        for (String key : root.values().keySet()) {
            if (!FILE_KEYS.contains(key)) {
                findings.add(new LibraryFinding(LibraryFinding.Severity.ERROR, f.label(), json.lineOf(key), key,
                        "unknown key in a library file" + hint(key, FILE_KEYS) + "; expected: materials"
                                + " (the library itself is named in " + LIBRARY_FILE + ")"));
            }
        }
        Object list = root.get("materials");
        if (!(list instanceof List<?> entries)) {
            findings.add(new LibraryFinding(LibraryFinding.Severity.ERROR, f.label(), json.lineOf("materials"),
                    "materials", list == null ? "missing; expected a list of entries"
                            : "expected a list of entries, got " + Block.describe(list)));
            return;
        }
        for (int i = 0; i < entries.size(); i++) {
            String at = "materials[" + i + "]";
            if (!(entries.get(i) instanceof Block e)) {
                findings.add(new LibraryFinding(LibraryFinding.Severity.ERROR, f.label(), json.lineOf(at), at,
                        "expected an entry object, got " + Block.describe(entries.get(i))));
                continue;
            }
            List<LibraryFinding> warnings = new ArrayList<>();
            try {
                Material m = new EntryReader(f.label(), json, info, warnings).read(e);
                claimNames(m, e, f, json, names);
                materials.add(m);
                findings.addAll(warnings);
            } catch (FindingException ex) {
                findings.add(ex.finding());
            }
        }
    }

    /** Within one library every id and alias means one entry; a later claim is refused. */
    private static void claimNames(Material m, Block e, SourceFile f, LibraryJson json, Map<String, Material> names)
            throws FindingException {
        for (String n : m.names()) {
            Material earlier = names.get(n.toLowerCase(Locale.ROOT));
            if (earlier != null) {
                String path = n.equals(m.id()) ? e.pathOf("id") : e.pathOf("aliases");
                throw new FindingException(f.label(), json.lineOf(path), path, "the name '" + n + "' is already used"
                        + " by entry " + earlier.id() + " (" + earlier.location() + "); this entry was not read");
            }
        }
        m.names().forEach(n -> names.put(n.toLowerCase(Locale.ROOT), m));
    }

    private static Block parse(SourceFile f, LibraryJson json) throws FindingException {
        try (InputStream in = f.opener().open()) {
            return json.read(in);
        } catch (IOException e) {
            throw new FindingException(f.label(), -1, "", FileProblems.cannotRead(e));
        }
    }

    private static String text(Block b, String key, SourceFile f, LibraryJson json) throws FindingException {
        Object v = b.get(key);
        if (!(v instanceof String s) || s.isBlank()) {
            throw new FindingException(f.label(), json.lineOf(key), key, v == null ? "missing; expected a text value"
                    : "expected a non-blank text value, got " + Block.describe(v));
        }
        return s;
    }

    private static String hint(String key, Set<String> known) {
        return Names.closest(key, known).map(k -> " (did you mean '" + k + "'?)").orElse("");
    }
}
