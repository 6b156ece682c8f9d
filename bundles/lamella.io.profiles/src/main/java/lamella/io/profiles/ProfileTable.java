package lamella.io.profiles;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import lamella.api.InputException;
import lamella.api.data.TextLines;
import lamella.api.data.Dataset;
import lamella.api.data.Decimals;
import lamella.api.data.Scan;
import lamella.api.data.ScanBuilder;
import lamella.api.data.SignalNames;
import lamella.api.data.StatedSettings;

/** Reads one file by a profile into a {@link Dataset}; every problem names the file and line. */
final class ProfileTable {

    private final Profile profile;
    private final Path file;
    private final List<String> lines;
    private final ProfileText text;
    private final Map<String, String> metadata = new LinkedHashMap<>();
    private final List<Scan> scans = new ArrayList<>();
    private List<String> names;
    private int namesIndex;
    /** Per file column: its rule, or null for a column left out. */
    private Profile.ColumnRule[] rules;
    private int xIndex;
    private String xColumn;
    /** Scan number → signal and sigma column indices, in file order. */
    private final TreeMap<Integer, List<Integer>> signalColumns = new TreeMap<>();
    private final TreeMap<Integer, List<Integer>> sigmaColumns = new TreeMap<>();
    private List<String> signals;
    private List<String> sigmas;
    private final List<double[]> blockRows = new ArrayList<>();
    private final List<Integer> blockLines = new ArrayList<>();

    private ProfileTable(Profile profile, Path file, ProfileText text) {
        this.profile = profile;
        this.file = file;
        this.text = text;
        this.lines = text.lines();
    }

    static Dataset read(Profile profile, Path file) throws InputException {
        ProfileText text = ProfileText.read(file, profile.encoding());
        return new ProfileTable(profile, file, text).read();
    }

    private InputException error(int lineIndex, String problem) {
        return new InputException(file, null, lineIndex + 1, problem);
    }

    private boolean comment(String stripped) {
        for (String p : profile.commentPrefixes()) {
            if (!p.isEmpty() && stripped.startsWith(p)) {
                return true;
            }
        }
        return false;
    }

    private Dataset read() throws InputException {
        findNames();
        header();
        columns();
        int i = namesIndex + 1 + profile.skipAfterNames();
        for (; i < lines.size(); i++) {
            String t = lines.get(i).strip();
            if (t.isEmpty()) {
                endBlock(i);
                continue;
            }
            if (comment(t)) {
                continue;
            }
            List<String> cells = split(t);
            if (cells.equals(names)) {
                endBlock(i);
                continue;
            }
            row(i, cells);
        }
        endBlock(lines.size() - 1);
        if (scans.isEmpty()) {
            throw error(namesIndex, "the column names but no data rows below them");
        }
        metadata.put("import_profile", profile.id() + (profile.version().isEmpty() ? "" : " " + profile.version())
                + " (" + profile.tier() + ")");
        metadata.put(TextLines.ENCODING_KEY, text.encodingUsed());
        return new Dataset(file, profile.id(), xColumn, scans, metadata);
    }

    private void findNames() throws InputException {
        if (profile.namesLine() > 0) {
            namesIndex = profile.namesLine() - 1;
            if (namesIndex >= lines.size()) {
                throw error(Math.max(lines.size() - 1, 0), "the file has " + lines.size() + " lines, but the"
                        + " profile '" + profile.id() + "' expects its column names on line " + profile.namesLine());
            }
        } else {
            String start = profile.namesStart().strip().toLowerCase(Locale.ROOT);
            namesIndex = -1;
            for (int i = 0; i < lines.size(); i++) {
                if (lines.get(i).strip().toLowerCase(Locale.ROOT).startsWith(start)) {
                    namesIndex = i;
                    break;
                }
            }
            if (namesIndex < 0) {
                throw new InputException(file, null, -1, "no line starts with '" + profile.namesStart()
                        + "', where the profile '" + profile.id() + "' expects the column names");
            }
        }
        names = split(lines.get(namesIndex).strip());
    }

    private void header() throws InputException {
        int notes = 0;
        Map<String, Integer> seen = new LinkedHashMap<>();
        for (int i = 0; i < namesIndex; i++) {
            String t = lines.get(i).strip();
            if (t.isEmpty()) {
                continue;
            }
            boolean commented = comment(t);
            String body = commented ? stripPrefix(t) : t;
            int cut = body.indexOf(profile.headerSeparator());
            Profile.HeaderValue hv = cut > 0 ? profile.headerValues().get(Profile.fold(body.substring(0, cut))) : null;
            if (hv == null) {
                if (!commented) {
                    metadata.put("note." + (++notes), t);
                }
                continue;
            }
            String value = body.substring(cut + profile.headerSeparator().length()).strip();
            Integer before = seen.put(hv.key(), i);
            if (before != null) {
                throw error(i, "'" + hv.key() + "' is stated twice (also on line " + (before + 1) + ")");
            }
            if (hv.unit() == null) {
                String mapped = hv.map().isEmpty() ? value : hv.map().get(value.toLowerCase(Locale.ROOT));
                if (mapped == null) {
                    throw error(i, "'" + Decimals.abbreviate(value) + "' is not one of the words the profile '"
                            + profile.id() + "' knows for " + hv.key() + " (" + String.join(", ",
                            hv.map().keySet()) + ")");
                }
                metadata.put(hv.key(), mapped);
            } else {
                String number = value;
                String unit = hv.unit().strip();
                if (number.endsWith(unit)) {
                    number = number.substring(0, number.length() - unit.length()).strip();
                }
                double v;
                try {
                    v = Decimals.parse(number, profile.decimalMark());
                } catch (NumberFormatException e) {
                    throw error(i, "header '" + body.substring(0, cut).strip() + "': " + e.getMessage()
                            + "; the profile '" + profile.id() + "' reads it as a number in " + hv.unit());
                }
                metadata.put(hv.key(), Double.toString(v * hv.factor()));
            }
        }
        if (profile.technique() != null && !metadata.containsKey(StatedSettings.TECHNIQUE)) {
            metadata.put(StatedSettings.TECHNIQUE, profile.technique());
        }
    }

    private String stripPrefix(String t) {
        for (String p : profile.commentPrefixes()) {
            if (!p.isEmpty() && t.startsWith(p)) {
                return t.substring(p.length()).strip();
            }
        }
        return t;
    }

    private void columns() throws InputException {
        rules = new Profile.ColumnRule[names.size()];
        xIndex = -1;
        List<String> unknown = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            Profile.ColumnRule r = profile.columns().get(Profile.fold(names.get(i)));
            if (r == null) {
                if (!profile.ignoreOtherColumns()) {
                    unknown.add("'" + names.get(i) + "' (column " + (i + 1) + ")");
                }
                continue;
            }
            if (r.meaning() == null) {
                continue;
            }
            rules[i] = r;
            if (SignalNames.X_COLUMNS.contains(r.meaning())) {
                xIndex = i;
                xColumn = r.meaning();
            } else if (r.meaning().startsWith("sigma_")) {
                sigmaColumns.computeIfAbsent(r.scan(), k -> new ArrayList<>()).add(i);
            } else {
                signalColumns.computeIfAbsent(r.scan(), k -> new ArrayList<>()).add(i);
            }
        }
        if (!unknown.isEmpty()) {
            throw error(namesIndex, String.join(", ", unknown) + (unknown.size() == 1 ? " is" : " are")
                    + " not among the columns of the profile '" + profile.id() + "' (" + profile.origin() + "); add"
                    + " " + (unknown.size() == 1 ? "it" : "them") + " to its columns (meaning ignore to leave one"
                    + " out) or set other_columns to ignore");
        }
        if (xIndex < 0) {
            throw error(namesIndex, "none of these columns is the x column (frequency, delay or pump power) of the profile '"
                    + profile.id() + "'");
        }
        if (signalColumns.isEmpty()) {
            throw error(namesIndex, "none of these columns is a signal of the profile '" + profile.id() + "'");
        }
        List<String> first = null;
        for (Map.Entry<Integer, List<Integer>> e : signalColumns.entrySet()) {
            List<String> s = meanings(e.getValue());
            List<String> d = meanings(sigmaColumns.getOrDefault(e.getKey(), List.of()));
            List<String> both = new ArrayList<>(s);
            both.addAll(d);
            if (first == null) {
                first = both;
                signals = s;
                sigmas = d.stream().map(x -> x.substring("sigma_".length())).toList();
                for (String sig : sigmas) {
                    if (!signals.contains(sig)) {
                        throw error(namesIndex, "a standard deviation of " + sig + " but no " + sig + " column");
                    }
                }
            } else if (!first.equals(both)) {
                throw error(namesIndex, "scan " + e.getKey() + " has the columns " + both + " but the first scan "
                        + first + "; every scan has the same");
            }
        }
    }

    private List<String> meanings(List<Integer> columns) {
        return columns.stream().map(i -> rules[i].meaning()).toList();
    }

    private List<String> split(String t) {
        List<String> cells = new ArrayList<>();
        if (profile.delimiter() == ' ') {
            for (String c : t.split("\\s+")) {
                cells.add(c);
            }
            return cells;
        }
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            if (c == '"') {
                if (quoted && i + 1 < t.length() && t.charAt(i + 1) == '"') {
                    cell.append('"');
                    i++;
                } else {
                    quoted = !quoted;
                }
            } else if (c == profile.delimiter() && !quoted) {
                cells.add(cell.toString().strip());
                cell.setLength(0);
            } else {
                cell.append(c);
            }
        }
        cells.add(cell.toString().strip());
        return cells;
    }

    private void row(int i, List<String> cells) throws InputException {
        if (cells.size() != names.size()) {
            throw error(i, "has " + cells.size() + " cells, but the column names (line " + (namesIndex + 1)
                    + ") are " + names.size() + (i == lines.size() - 1 && !text.lastLineTerminated()
                    ? "; the file ends in this line, so it may be cut short" : ""));
        }
        double[] v = new double[cells.size()];
        for (int c = 0; c < v.length; c++) {
            if (rules[c] == null) {
                continue;
            }
            try {
                v[c] = Decimals.parse(cells.get(c), profile.decimalMark()) * rules[c].factor();
            } catch (NumberFormatException e) {
                throw error(i, "column " + (c + 1) + " (" + names.get(c) + "): " + e.getMessage());
            }
        }
        blockRows.add(v);
        blockLines.add(i + 1);
    }

    private void endBlock(int atIndex) throws InputException {
        if (blockRows.isEmpty()) {
            return;
        }
        List<List<Integer>> records = new ArrayList<>();
        if (profile.averageRepeatedX()) {
            // consecutive rows at the same x are the records of one point: the k-th record of every point is scan k
            int start = 0;
            List<int[]> groups = new ArrayList<>();
            for (int r = 1; r <= blockRows.size(); r++) {
                if (r == blockRows.size() || blockRows.get(r)[xIndex] != blockRows.get(start)[xIndex]) {
                    groups.add(new int[] {start, r});
                    start = r;
                }
            }
            int n = groups.get(0)[1] - groups.get(0)[0];
            for (int[] g : groups) {
                if (g[1] - g[0] != n) {
                    throw new InputException(file, null, blockLines.get(g[0]), xColumn + " "
                            + Decimals.show(blockRows.get(g[0])[xIndex]) + " has " + (g[1] - g[0])
                            + " records, but " + Decimals.show(blockRows.get(groups.get(0)[0])[xIndex])
                            + " (line " + blockLines.get(groups.get(0)[0]) + ") has " + n
                            + "; records are averaged only where every point has the same number");
                }
            }
            for (int k = 0; k < n; k++) {
                List<Integer> rows = new ArrayList<>();
                for (int[] g : groups) {
                    rows.add(g[0] + k);
                }
                records.add(rows);
            }
        } else {
            List<Integer> all = new ArrayList<>();
            for (int r = 0; r < blockRows.size(); r++) {
                all.add(r);
            }
            records.add(all);
        }
        for (List<Integer> rows : records) {
            for (Map.Entry<Integer, List<Integer>> e : signalColumns.entrySet()) {
                List<Integer> sc = e.getValue();
                List<Integer> dc = sigmaColumns.getOrDefault(e.getKey(), List.of());
                // the sigma columns in the order of the signals they belong to
                List<Integer> dOrdered = new ArrayList<>();
                for (String s : sigmas) {
                    for (int c : dc) {
                        if (rules[c].meaning().equals(SignalNames.sigma(s))) {
                            dOrdered.add(c);
                        }
                    }
                }
                List<Integer> sOrdered = new ArrayList<>();
                for (String s : signals) {
                    for (int c : sc) {
                        if (rules[c].meaning().equals(s)) {
                            sOrdered.add(c);
                        }
                    }
                }
                ScanBuilder b = new ScanBuilder(file, xColumn, signals, sigmas);
                for (int r : rows) {
                    double[] v = blockRows.get(r);
                    double[] s = new double[sOrdered.size()];
                    for (int j = 0; j < s.length; j++) {
                        s[j] = v[sOrdered.get(j)];
                    }
                    double[] d = new double[dOrdered.size()];
                    for (int j = 0; j < d.length; j++) {
                        d[j] = v[dOrdered.get(j)];
                    }
                    b.add(blockLines.get(r), v[xIndex], s, d);
                }
                scans.add(b.build(blockLines.get(rows.get(rows.size() - 1))));
            }
        }
        blockRows.clear();
        blockLines.clear();
    }
}
