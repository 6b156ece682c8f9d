package lamella.io.profiles;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import lamella.api.Block;
import lamella.api.Units;
import lamella.api.data.ImporterProfiles.Finding;
import lamella.api.data.Quantity;
import lamella.api.data.SignalNames;
import lamella.api.data.StatedSettings;
import lamella.api.json.JsonProblem;
import lamella.api.json.StrictJson;

/**
 * Reads and checks one profile file. Every problem is a {@link Finding} with the file, line and JSON path; all of a
 * file's findings are collected, so that an author fixes them in one pass. A profile with any finding is not used.
 */
final class ProfileReader {

    /** A profile file larger than this is not one a person wrote. */
    static final int MAX_BYTES = 1 << 20;

    private static final Set<String> TOP = Set.of("profile", "version", "summary", "recognise", "encoding",
            "delimiter", "decimal_mark", "comment_prefixes", "column_names_line", "column_names_start",
            "skip_after_names", "header", "technique", "columns", "other_columns", "repeated_x");
    private static final Set<String> TEXT_KEYS = Set.of("sample", "date", "operator", "instrument", "comment");
    private static final Map<String, Quantity> MEANINGS = new LinkedHashMap<>();

    static {
        MEANINGS.put("frequency", Quantity.FREQUENCY);
        MEANINGS.put("delay", Quantity.TIME);
        MEANINGS.put("in_phase", Quantity.VOLTAGE);
        MEANINGS.put("out_of_phase", Quantity.VOLTAGE);
        MEANINGS.put("amplitude", Quantity.VOLTAGE);
        MEANINGS.put("phase", Quantity.PHASE);
        MEANINGS.put("ratio", Quantity.RATIO);
        // SSTR: the absorbed pump power of a step of the sweep, and the temperature rise it gives (or the rise per
        // watt) as the thermoreflectance signal reads it.
        MEANINGS.put("pump_power", Quantity.POWER);
        MEANINGS.put("temperature_rise", Quantity.TEMPERATURE);
        MEANINGS.put("rise_per_power", Quantity.RISE_PER_POWER);
    }

    /** The meanings that are a dataset's x, which have no standard deviation. */
    private static final Set<String> X_MEANINGS = Set.of("frequency", "delay", "pump_power");

    private final Path file;
    private final List<Finding> findings = new ArrayList<>();
    private StrictJson.Document doc;

    private ProfileReader(Path file) {
        this.file = file;
    }

    /** The result of reading one file: the profile, or the findings that keep it from being used. */
    record Result(Profile profile, List<Finding> findings) {
    }

    static Result read(Path file, byte[] bytes, String origin, String tier) {
        ProfileReader r = new ProfileReader(file);
        Profile p = r.parse(bytes, origin, tier);
        return new Result(r.findings.isEmpty() ? p : null, List.copyOf(r.findings));
    }

    /** The meanings a column may have, as a profile writes them. */
    static List<String> meanings() {
        List<String> all = new ArrayList<>(MEANINGS.keySet());
        for (String m : MEANINGS.keySet()) {
            if (!X_MEANINGS.contains(m)) {
                all.add("sigma_" + m);
            }
        }
        all.add("ignore");
        return all;
    }

    private void finding(String path, String problem) {
        findings.add(new Finding(file, doc == null ? -1 : doc.lineOf(path), path, problem));
    }

    private Profile parse(byte[] bytes, String origin, String tier) {
        if (bytes.length > MAX_BYTES) {
            findings.add(new Finding(file, -1, "", "the file is larger than " + MAX_BYTES / 1024
                    + " KiB; a profile is a small file a person writes"));
            return null;
        }
        try {
            doc = StrictJson.read(bytes);
        } catch (JsonProblem e) {
            findings.add(new Finding(file, e.line(), e.path(), e.problem()));
            return null;
        }
        Block root = doc.root();
        for (String key : root.values().keySet()) {
            if (!TOP.contains(key)) {
                finding(key, "unknown key; a profile has " + String.join(", ", sorted(TOP)));
            }
        }
        String id = text(root, "profile", true);
        if (id != null && !id.matches("[a-z0-9][a-z0-9.-]{0,63}")) {
            finding("profile", "'" + id + "' is not a profile name: lower-case letters, digits, '.' and '-',"
                    + " starting with a letter or digit, at most 64 characters");
        }
        String version = text(root, "version", false);
        String summary = text(root, "summary", true);
        List<String> extensions = List.of();
        List<String> contains = List.of();
        Object rec = root.get("recognise");
        if (rec == null) {
            finding("recognise", "missing; say how the files are recognised: \"recognise\": {\"extensions\":"
                    + " [\"txt\"], \"contains\": [\"a text every file has near its top\"]}");
        } else if (!(rec instanceof Block r)) {
            finding("recognise", "expected an object with extensions and/or contains, got " + Block.describe(rec));
        } else {
            for (String key : r.values().keySet()) {
                if (!key.equals("extensions") && !key.equals("contains")) {
                    finding(r.pathOf(key), "unknown key; recognise has extensions and contains");
                }
            }
            extensions = texts(r, "extensions").stream().map(e -> e.startsWith(".") ? e.substring(1) : e)
                    .map(e -> e.toLowerCase(Locale.ROOT)).toList();
            contains = texts(r, "contains");
            if (extensions.isEmpty() && contains.isEmpty()) {
                finding("recognise", "names neither extensions nor contains: the profile would recognise no file");
            }
            for (int i = 0; i < contains.size(); i++) {
                if (contains.get(i).isBlank()) {
                    finding(r.pathOf("contains") + "[" + i + "]", "an empty text recognises every file");
                }
            }
        }
        Profile.Encoding encoding = Profile.Encoding.AUTO;
        String enc = text(root, "encoding", false);
        if (enc != null) {
            encoding = null;
            for (Profile.Encoding e : Profile.Encoding.values()) {
                if (e.word.equalsIgnoreCase(enc.strip())) {
                    encoding = e;
                }
            }
            if (encoding == null) {
                finding("encoding", "'" + enc + "' is not an encoding Lamella reads; expected auto, utf-8, utf-16"
                        + " or latin-1");
                encoding = Profile.Encoding.AUTO;
            }
        }
        char delimiter = ',';
        String del = text(root, "delimiter", true);
        if (del != null) {
            switch (del.strip().toLowerCase(Locale.ROOT)) {
                case "comma", "," -> delimiter = ',';
                case "tab", "\t" -> delimiter = '\t';
                case "semicolon", ";" -> delimiter = ';';
                case "whitespace", "spaces" -> delimiter = ' ';
                default -> finding("delimiter", "'" + del + "' is not a delimiter Lamella reads; expected comma,"
                        + " tab, semicolon or whitespace");
            }
        }
        char decimal = '.';
        String dec = text(root, "decimal_mark", false);
        if (dec != null) {
            if (dec.equals(".") || dec.equals(",")) {
                decimal = dec.charAt(0);
            } else {
                finding("decimal_mark", "'" + dec + "'; expected \".\" or \",\"");
            }
        }
        if (decimal == ',' && delimiter == ',') {
            finding("decimal_mark", "a decimal comma with comma-separated cells cannot be read; the delimiter of"
                    + " such files is usually a semicolon or a tab");
        }
        List<String> comments = root.has("comment_prefixes") ? texts(root, "comment_prefixes") : List.of("#");
        int namesLine = 0;
        if (root.has("column_names_line")) {
            namesLine = count(root, "column_names_line", 1, 10_000);
        }
        String namesStart = text(root, "column_names_start", false);
        if (root.has("column_names_line") == (namesStart != null)) {
            finding("column_names_line", "give exactly one of column_names_line (the line number of the column"
                    + " names) and column_names_start (the text that line starts with)");
        }
        int skip = root.has("skip_after_names") ? count(root, "skip_after_names", 0, 100) : 0;
        String separator = ":";
        Map<String, Profile.HeaderValue> headerValues = new LinkedHashMap<>();
        Object h = root.get("header");
        if (h != null) {
            if (!(h instanceof Block hb)) {
                finding("header", "expected an object with separator and values, got " + Block.describe(h));
            } else {
                for (String key : hb.values().keySet()) {
                    if (!key.equals("separator") && !key.equals("values")) {
                        finding(hb.pathOf(key), "unknown key; header has separator and values");
                    }
                }
                String sep = text(hb, "separator", false);
                if (sep != null) {
                    if (sep.isEmpty()) {
                        finding(hb.pathOf("separator"), "empty; a header line's name and value need a separator");
                    } else {
                        separator = sep;
                    }
                }
                Object values = hb.get("values");
                if (values != null && !(values instanceof Block)) {
                    finding(hb.pathOf("values"), "expected an object of header names, got "
                            + Block.describe(values));
                } else if (values instanceof Block vb) {
                    for (Map.Entry<String, Object> e : vb.values().entrySet()) {
                        Profile.HeaderValue hv = headerValue(vb.pathOf(e.getKey()), e.getValue());
                        if (hv != null && headerValues.put(Profile.fold(e.getKey()), hv) != null) {
                            finding(vb.pathOf(e.getKey()), "names the same header line as another entry (names"
                                    + " are matched ignoring case, spaces and underscores)");
                        }
                    }
                }
            }
        }
        String technique = text(root, "technique", false);
        if (technique != null) {
            technique = technique.strip().toLowerCase(Locale.ROOT);
            if (!technique.matches("[a-z0-9-]+")) {
                finding("technique", "'" + technique + "' is not a technique name, such as fdtr or tdtr");
            }
        }
        Map<String, Profile.ColumnRule> columns = new LinkedHashMap<>();
        Object c = root.get("columns");
        if (c == null) {
            finding("columns", "missing; name the file's columns and what each holds, such as \"columns\": {\"Freq"
                    + " (kHz)\": {\"meaning\": \"frequency\", \"unit\": \"kHz\"}, …}");
        } else if (!(c instanceof Block cb)) {
            finding("columns", "expected an object of column names, got " + Block.describe(c));
        } else {
            for (Map.Entry<String, Object> e : cb.values().entrySet()) {
                Profile.ColumnRule rule = column(cb.pathOf(e.getKey()), e.getValue());
                if (rule != null && columns.put(Profile.fold(e.getKey()), rule) != null) {
                    finding(cb.pathOf(e.getKey()), "names the same column as another entry (names are matched"
                            + " ignoring case, spaces and underscores)");
                }
            }
            checkColumns(columns);
        }
        boolean ignoreOthers = choice(root, "other_columns", "error", "ignore").equals("ignore");
        boolean average = choice(root, "repeated_x", "error", "average").equals("average");
        if (!findings.isEmpty()) {
            return null;
        }
        return new Profile(id, version == null ? "" : version, summary, extensions, contains, encoding, delimiter,
                decimal, comments, namesLine, namesStart, skip, separator, headerValues, technique, columns,
                ignoreOthers, average, origin, tier);
    }

    private Profile.HeaderValue headerValue(String path, Object v) {
        if (!(v instanceof Block b)) {
            finding(path, "expected an object such as {\"key\": \"modulation_hz\", \"unit\": \"kHz\"}, got "
                    + Block.describe(v));
            return null;
        }
        for (String key : b.values().keySet()) {
            if (!Set.of("key", "unit", "map").contains(key)) {
                finding(b.pathOf(key), "unknown key; a header value has key, unit and map");
            }
        }
        String key = text(b, "key", true);
        if (key == null) {
            return null;
        }
        String si = Units.ofKey(key);
        String unit = text(b, "unit", false);
        Map<String, String> map = new LinkedHashMap<>();
        Object m = b.get("map");
        if (m != null) {
            if (m instanceof Block mb) {
                for (Map.Entry<String, Object> e : mb.values().entrySet()) {
                    if (e.getValue() instanceof String s) {
                        map.put(e.getKey().strip().toLowerCase(Locale.ROOT), s);
                    } else {
                        finding(mb.pathOf(e.getKey()), "expected the text the file's word stands for, got "
                                + Block.describe(e.getValue()));
                    }
                }
            } else {
                finding(b.pathOf("map"), "expected an object of the file's words and their meanings, got "
                        + Block.describe(m));
            }
        }
        if (key.equals(StatedSettings.TECHNIQUE) || TEXT_KEYS.contains(key) || key.startsWith("lab.")) {
            if (unit != null) {
                finding(b.pathOf("unit"), "'" + key + "' is text and takes no unit");
            }
            return new Profile.HeaderValue(key, null, 1.0, map);
        }
        if (si.isEmpty()) {
            finding(b.pathOf("key"), "'" + key + "' is not a setting Lamella takes from a header: expected"
                    + " technique, a case-file key that ends in its SI unit (modulation_hz, repetition_hz,"
                    + " pump_radius_m, probe_radius_m, pump_power_w, …), one of " + String.join(", ",
                    sorted(TEXT_KEYS)) + ", or a lab's own lab.NAME");
            return null;
        }
        if (!map.isEmpty()) {
            finding(b.pathOf("map"), "'" + key + "' is a number; map is for text values such as the technique");
        }
        if (unit == null) {
            finding(b.pathOf("unit"), "missing; say the unit the file writes " + key + " in (" + si
                    + " or a multiple such as " + example(si) + ")");
            return null;
        }
        try {
            return new Profile.HeaderValue(key, unit, ProfileUnits.toSi(si, unit), map);
        } catch (IllegalArgumentException e) {
            finding(b.pathOf("unit"), e.getMessage());
            return null;
        }
    }

    private Profile.ColumnRule column(String path, Object v) {
        if (!(v instanceof Block b)) {
            finding(path, "expected an object such as {\"meaning\": \"phase\", \"unit\": \"deg\"}, got "
                    + Block.describe(v));
            return null;
        }
        for (String key : b.values().keySet()) {
            if (!Set.of("meaning", "unit", "sign", "scan").contains(key)) {
                finding(b.pathOf(key), "unknown key; a column has meaning, unit, sign and scan");
            }
        }
        String meaning = text(b, "meaning", true);
        if (meaning == null) {
            return null;
        }
        meaning = meaning.strip().toLowerCase(Locale.ROOT);
        if (meaning.equals("ignore")) {
            return new Profile.ColumnRule(null, 1.0, 1);
        }
        boolean sigma = meaning.startsWith("sigma_");
        String base = sigma ? meaning.substring("sigma_".length()) : meaning;
        Quantity q = MEANINGS.get(base);
        if (q == null || (sigma && X_MEANINGS.contains(base))) {
            finding(b.pathOf("meaning"), "'" + meaning + "' is not a column meaning; expected one of "
                    + String.join(", ", meanings()));
            return null;
        }
        String unit = text(b, "unit", false);
        double factor = 1.0;
        if (unit == null) {
            if (q != Quantity.VOLTAGE && q != Quantity.RATIO) {
                finding(b.pathOf("unit"), "missing; " + q.wording() + " needs its unit, such as "
                        + switch (q) {
                            case FREQUENCY -> "kHz";
                            case TIME -> "ps";
                            case POWER -> "mW";
                            case TEMPERATURE -> "mK";
                            case RISE_PER_POWER -> "K/W";
                            default -> "deg or rad";
                        });
                return null;
            }
        } else {
            try {
                factor = ProfileUnits.of(q, unit);
            } catch (IllegalArgumentException e) {
                finding(b.pathOf("unit"), e.getMessage());
                return null;
            }
        }
        if (b.has("sign")) {
            Object s = b.get("sign");
            if (s instanceof Double d && (d == 1 || d == -1)) {
                factor *= d;
                if (sigma && d == -1) {
                    finding(b.pathOf("sign"), "a standard deviation has no sign; leave sign out");
                }
            } else {
                finding(b.pathOf("sign"), "expected 1 or -1 (−1 where the file's sign convention is the opposite"
                        + " of Lamella's: phase negative when lagging, Y as the lock-in's quadrature), got "
                        + Block.describe(s));
            }
        }
        int scan = b.has("scan") ? count(b, "scan", 1, 1000) : 1;
        String name = switch (base) {
            case "frequency" -> SignalNames.FREQUENCY_HZ;
            case "delay" -> SignalNames.DELAY_S;
            case "phase" -> SignalNames.PHASE_DEG;
            case "pump_power" -> SignalNames.PUMP_POWER_W;
            case "temperature_rise" -> SignalNames.TEMPERATURE_RISE_K;
            case "rise_per_power" -> SignalNames.K_PER_W;
            default -> base;
        };
        return new Profile.ColumnRule(sigma ? SignalNames.sigma(name) : name, factor, scan);
    }

    private void checkColumns(Map<String, Profile.ColumnRule> columns) {
        long xs = columns.values().stream().filter(r -> r.meaning() != null
                && SignalNames.X_COLUMNS.contains(r.meaning())).count();
        if (xs != 1) {
            finding("columns", xs == 0 ? "no column has meaning frequency, delay or pump_power: a dataset needs its x"
                    : "more than one column is x (frequency, delay or pump_power); a file has one");
        }
        Map<Integer, List<String>> scans = new LinkedHashMap<>();
        for (Profile.ColumnRule r : columns.values()) {
            if (r.meaning() != null && !SignalNames.X_COLUMNS.contains(r.meaning())) {
                scans.computeIfAbsent(r.scan(), k -> new ArrayList<>()).add(r.meaning());
            }
        }
        if (scans.isEmpty()) {
            finding("columns", "no signal column (in_phase, out_of_phase, amplitude, phase, ratio,"
                    + " temperature_rise or rise_per_power)");
            return;
        }
        List<String> first = null;
        for (Map.Entry<Integer, List<String>> e : scans.entrySet()) {
            List<String> signals = e.getValue();
            if (signals.stream().distinct().count() != signals.size()) {
                finding("columns", "scan " + e.getKey() + " has two columns of the same meaning");
            }
            for (String s : signals) {
                if (s.startsWith("sigma_") && !signals.contains(s.substring("sigma_".length()))) {
                    finding("columns", "scan " + e.getKey() + " has " + s + " but no "
                            + s.substring("sigma_".length()) + " column");
                }
            }
            List<String> sortedSignals = signals.stream().sorted().toList();
            if (first == null) {
                first = sortedSignals;
            } else if (!first.equals(sortedSignals)) {
                finding("columns", "scan " + e.getKey() + " holds " + sortedSignals + " but the first scan holds "
                        + first + "; every scan has the same columns");
            }
        }
    }

    private String text(Block b, String key, boolean required) {
        Object v = b.get(key);
        if (v == null) {
            if (required) {
                finding(b.pathOf(key), "missing; expected a text value");
            }
            return null;
        }
        if (!(v instanceof String s)) {
            finding(b.pathOf(key), "expected a text value, got " + Block.describe(v));
            return null;
        }
        if (required && s.isBlank()) {
            finding(b.pathOf(key), "empty; expected a text value");
            return null;
        }
        return s;
    }

    private List<String> texts(Block b, String key) {
        Object v = b.get(key);
        if (v == null) {
            return List.of();
        }
        if (!(v instanceof List<?> list)) {
            finding(b.pathOf(key), "expected a list of texts, got " + Block.describe(v));
            return List.of();
        }
        List<String> out = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            if (list.get(i) instanceof String s) {
                out.add(s);
            } else {
                finding(b.pathOf(key) + "[" + i + "]", "expected a text, got " + Block.describe(list.get(i)));
            }
        }
        return out;
    }

    private int count(Block b, String key, int min, int max) {
        Object v = b.get(key);
        if (v instanceof Double d && d == Math.rint(d) && d >= min && d <= max) {
            return d.intValue();
        }
        finding(b.pathOf(key), "expected a whole number from " + min + " to " + max + ", got " + Block.describe(v));
        return min;
    }

    private String choice(Block b, String key, String standard, String other) {
        String v = text(b, key, false);
        if (v == null) {
            return standard;
        }
        if (!v.equals(standard) && !v.equals(other)) {
            finding(b.pathOf(key), "'" + v + "'; expected " + standard + " (the default) or " + other);
            return standard;
        }
        return v;
    }

    private static String example(String si) {
        return switch (si) {
            case "m" -> "µm or nm";
            case "Hz" -> "kHz or MHz";
            case "s" -> "ps or ns";
            case "W" -> "mW";
            default -> si;
        };
    }

    private static List<String> sorted(Set<String> s) {
        return s.stream().sorted().toList();
    }
}
