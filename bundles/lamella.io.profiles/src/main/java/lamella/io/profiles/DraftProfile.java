package lamella.io.profiles;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import lamella.api.InputException;
import lamella.api.Units;
import lamella.api.data.Decimals;
import lamella.api.data.StatedSettings;

/**
 * A starting profile for a one-off file: the table found as the delimited reader finds it (the first rows of
 * numbers and the line of column names above them), each column's meaning from the user's mapping or from the names
 * Lamella knows, and the header's {@code key: value} lines that are case-file keys. The text is the profile a
 * facility then edits and publishes.
 */
final class DraftProfile {

    private static final Pattern WITH_UNIT = Pattern.compile("(.*?)\\s*[(\\[]\\s*([^)\\]]*?)\\s*[)\\]]\\s*");
    private static final String[] SIGMA_PREFIXES = {"sigma ", "σ ", "σ", "sd ", "std ", "stdev ", "std dev "};
    private static final Map<String, String> KNOWN = new LinkedHashMap<>();

    static {
        known("frequency", "f", "freq", "frequency", "modulation frequency", "f mod");
        known("delay", "delay", "t", "time", "delay time", "pump probe delay");
        known("in_phase", "x", "in phase", "inphase", "v in", "vin");
        known("out_of_phase", "y", "out of phase", "quadrature", "v out", "vout");
        known("amplitude", "r", "amplitude", "magnitude");
        known("phase", "phase", "theta", "θ", "phi", "φ");
        known("ratio", "ratio", "-x/y", "-vin/vout");
        // Only names that say so: a bare "power" column can be an FDTR file's laser monitor, "Δt" a TDTR delay.
        known("pump_power", "pump power", "absorbed power", "p pump", "absorbed pump power");
        known("temperature_rise", "temperature rise", "delta t", "t rise", "rise");
        known("rise_per_power", "rise per power", "temperature rise per power", "dt/p", "δt/p");
    }

    private static void known(String meaning, String... spellings) {
        for (String s : spellings) {
            KNOWN.put(s, meaning);
        }
    }

    private DraftProfile() {
    }

    static String make(Path file, List<String> mappings) throws InputException {
        Map<String, String[]> mapped = new LinkedHashMap<>();
        for (String m : mappings) {
            int eq = m.lastIndexOf('=');
            if (eq <= 0 || eq == m.length() - 1) {
                throw InputException.at("--column " + m, "expected HEADER=MEANING or HEADER=MEANING:UNIT, such as"
                        + " 'phase sd (rad)=sigma_phase:rad'");
            }
            String header = m.substring(0, eq).strip();
            String rest = m.substring(eq + 1).strip();
            int colon = rest.indexOf(':');
            String meaning = (colon < 0 ? rest : rest.substring(0, colon)).strip().toLowerCase(Locale.ROOT);
            String unit = colon < 0 ? null : rest.substring(colon + 1).strip();
            if (!ProfileReader.meanings().contains(meaning)) {
                throw InputException.at("--column " + m, "'" + meaning + "' is not a column meaning; expected one"
                        + " of " + String.join(", ", ProfileReader.meanings()));
            }
            mapped.put(Profile.fold(header), new String[] {meaning, unit});
        }
        ProfileText text = ProfileText.read(file, Profile.Encoding.AUTO);
        List<String> lines = text.lines();
        char[] delimiters = {'\t', ';', ',', ' '};
        for (int i = 1; i < lines.size(); i++) {
            String t = lines.get(i).strip();
            if (t.isEmpty() || t.startsWith("#")) {
                continue;
            }
            for (char d : delimiters) {
                List<String> cells = split(t, d);
                if (cells.size() < 2) {
                    continue;
                }
                char decimal = d == ',' ? '.' : t.contains(",") ? ',' : '.';
                if (!cells.stream().allMatch(c -> Decimals.isNumber(c, decimal))) {
                    continue;
                }
                int namesAt = i - 1;
                while (namesAt >= 0 && lines.get(namesAt).strip().isEmpty()) {
                    namesAt--;
                }
                if (namesAt < 0) {
                    break;
                }
                List<String> names = split(lines.get(namesAt).strip(), d);
                if (names.size() != cells.size()) {
                    continue;
                }
                return profile(file, lines, namesAt, names, d, decimal, mapped);
            }
        }
        throw new InputException(file, null, -1, "no table found: expected a line of column names with rows of"
                + " numbers below it");
    }

    private static String profile(Path file, List<String> lines, int namesAt, List<String> names, char d,
                                  char decimal, Map<String, String[]> mapped) throws InputException {
        Map<String, String> columns = new LinkedHashMap<>();
        List<String> unknown = new ArrayList<>();
        for (String name : names) {
            String[] m = mapped.get(Profile.fold(name));
            String meaning;
            String unit;
            if (m != null) {
                meaning = m[0];
                unit = m[1];
                if (unit == null) {
                    Matcher u = WITH_UNIT.matcher(name);
                    unit = u.matches() ? u.group(2) : null;
                }
            } else {
                String base = name.strip();
                unit = null;
                Matcher u = WITH_UNIT.matcher(base);
                if (u.matches()) {
                    base = u.group(1);
                    unit = u.group(2);
                }
                String folded = base.toLowerCase(Locale.ROOT).replaceAll("[\\s_]+", " ")
                        .replaceAll("(?<=\\w)-(?=\\w)", " ").strip();
                boolean sigma = false;
                for (String p : SIGMA_PREFIXES) {
                    if (folded.startsWith(p) && folded.length() > p.length()) {
                        sigma = true;
                        folded = folded.substring(p.length()).strip();
                        break;
                    }
                }
                meaning = KNOWN.get(folded);
                if (meaning == null) {
                    unknown.add(name);
                    continue;
                }
                if (sigma) {
                    meaning = "sigma_" + meaning;
                }
            }
            StringBuilder c = new StringBuilder("{\"meaning\": ").append(quote(meaning));
            if (unit != null && !unit.isEmpty() && !meaning.equals("ignore")) {
                c.append(", \"unit\": ").append(quote(unit));
            }
            columns.put(name, c.append('}').toString());
        }
        if (!unknown.isEmpty()) {
            throw new InputException(file, null, namesAt + 1, "Lamella does not know the column"
                    + (unknown.size() == 1 ? " " : "s ") + String.join(", ", unknown.stream().map(n -> "'" + n + "'")
                    .toList()) + "; say what each holds with --column 'NAME=MEANING[:UNIT]', MEANING one of "
                    + String.join(", ", ProfileReader.meanings()));
        }
        Map<String, String> header = new LinkedHashMap<>();
        String banner = null;
        for (int i = 0; i < namesAt; i++) {
            String t = lines.get(i).strip();
            if (t.isEmpty()) {
                continue;
            }
            if (banner == null) {
                banner = t.length() > 60 ? t.substring(0, 60) : t;
            }
            int cut = t.indexOf(':');
            if (cut <= 0) {
                continue;
            }
            String key = t.substring(0, cut).strip();
            String si = Units.ofKey(key);
            if (key.equals(StatedSettings.TECHNIQUE)) {
                header.put(key, "{\"key\": \"technique\"}");
            } else if (!si.isEmpty() && key.matches("[a-z0-9_]+")) {
                header.put(key, "{\"key\": " + quote(key) + ", \"unit\": " + quote(si) + "}");
            } else if (key.equalsIgnoreCase("sample") || key.equalsIgnoreCase("date")) {
                header.put(key, "{\"key\": " + quote(key.toLowerCase(Locale.ROOT)) + "}");
            }
        }
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String ext = dot > 0 ? name.substring(dot + 1).toLowerCase(Locale.ROOT) : "";
        String id = "draft-" + (dot > 0 ? name.substring(0, dot) : name).toLowerCase(Locale.ROOT)
                .replaceAll("[^a-z0-9.-]+", "-").replaceAll("^-+|-+$", "");
        if (id.length() > 64) {
            id = id.substring(0, 64);
        }
        StringBuilder sb = new StringBuilder("{\n");
        sb.append("  \"profile\": ").append(quote(id)).append(",\n");
        sb.append("  \"version\": \"1\",\n");
        sb.append("  \"summary\": ").append(quote("files like " + name + " (a starting profile: check and edit)"))
                .append(",\n");
        sb.append("  \"recognise\": {");
        List<String> rec = new ArrayList<>();
        if (!ext.isEmpty() && ext.matches("[a-z0-9]+")) {
            rec.add("\"extensions\": [" + quote(ext) + "]");
        }
        rec.add("\"contains\": [" + quote(banner != null ? banner : lines.get(namesAt).strip()) + "]");
        sb.append(String.join(", ", rec)).append("},\n");
        sb.append("  \"delimiter\": ").append(quote(switch (d) {
            case '\t' -> "tab";
            case ';' -> "semicolon";
            case ',' -> "comma";
            default -> "whitespace";
        })).append(",\n");
        sb.append("  \"decimal_mark\": ").append(quote(String.valueOf(decimal))).append(",\n");
        sb.append("  \"column_names_line\": ").append(namesAt + 1).append(",\n");
        if (!header.isEmpty()) {
            sb.append("  \"header\": {\"separator\": \":\", \"values\": {\n");
            List<String> hv = new ArrayList<>();
            header.forEach((k, v) -> hv.add("    " + quote(k) + ": " + v));
            sb.append(String.join(",\n", hv)).append("\n  }},\n");
        }
        sb.append("  \"columns\": {\n");
        List<String> cs = new ArrayList<>();
        columns.forEach((k, v) -> cs.add("    " + quote(k) + ": " + v));
        sb.append(String.join(",\n", cs)).append("\n  }\n}\n");
        return sb.toString();
    }

    private static List<String> split(String t, char d) {
        List<String> cells = new ArrayList<>();
        if (d == ' ') {
            for (String c : t.split("\\s+")) {
                cells.add(c);
            }
            return cells;
        }
        for (String c : t.split(Pattern.quote(String.valueOf(d)), -1)) {
            cells.add(c.strip());
        }
        return cells;
    }

    static String quote(String s) {
        StringBuilder sb = new StringBuilder("\"");
        for (char c : s.toCharArray()) {
            switch (c) {
                case '"' -> sb.append("\\\"");
                case '\\' -> sb.append("\\\\");
                case '\t' -> sb.append("\\t");
                case '\n' -> sb.append("\\n");
                case '\r' -> sb.append("\\r");
                default -> {
                    if (c < 0x20) {
                        sb.append(String.format("\\u%04x", (int) c));
                    } else {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.append('"').toString();
    }
}
