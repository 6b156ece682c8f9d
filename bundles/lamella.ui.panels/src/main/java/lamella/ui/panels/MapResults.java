package lamella.ui.panels;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import lamella.api.InputException;
import lamella.api.Units;
import lamella.api.data.Decimals;
import lamella.api.data.TextLines;
import lamella.api.fit.CurveFit;
import lamella.map.MapData;
import lamella.map.MapEngine;

/**
 * A fitted map as the Map panel shows it: per position its stage coordinates (m), each free input's value and 1σ,
 * the reduced χ², the status word and message — from a fit made here, or read back from the {@code map.csv} the
 * {@code map} command writes (columns {@code x_m,y_m}, per input its value and {@code sigma_} column,
 * {@code reduced_chi_square,status,message}; an empty cell is no value).
 */
record MapResults(double[] xM, double[] yM, List<String> names, List<String> units, double[][] values,
                  double[][] sigmas, double[] chi, String[] status, String[] message, String origin,
                  boolean fromCase, double spacing) {

    static final List<String> STATUS = List.of("ok", "warning", "failed");

    int size() {
        return xM.length;
    }

    static MapResults of(MapData data, MapEngine.Result[] r, CurveFit fit, String origin) {
        int n = r.length;
        double[] x = new double[n];
        double[] y = new double[n];
        double[][] v = new double[n][];
        double[][] s = new double[n][];
        double[] chi = new double[n];
        String[] st = new String[n];
        String[] msg = new String[n];
        for (int i = 0; i < n; i++) {
            x[i] = data.positions.get(i).xM();
            y[i] = data.positions.get(i).yM();
            v[i] = r[i].values().clone();
            s[i] = r[i].sigmas().clone();
            chi[i] = r[i].reducedChiSquare();
            st[i] = r[i].status().word();
            msg[i] = r[i].message();
        }
        List<String> names = MapView.names(fit);
        return new MapResults(x, y, names, units(names), v, s, chi, st, msg, origin, true, spacing(x, y));
    }

    private static List<String> units(List<String> names) {
        List<String> units = new ArrayList<>();
        for (String n : names) {
            String unit = Units.ofKey(n.substring(n.lastIndexOf('.') + 1));
            units.add(unit == null || unit.isEmpty() ? "1" : unit);
        }
        return units;
    }

    /** Reads a map.csv; every problem names the file and line. */
    static MapResults read(Path file) throws InputException {
        try (TextLines in = TextLines.open(file)) {
            String header = in.next();
            while (header != null && (header.isBlank() || header.startsWith("#"))) {
                header = in.next();
            }
            if (header == null) {
                throw in.error(Math.max(1, in.line()), "no header line: a map's results begin with"
                        + " x_m,y_m,… as `lamella map` writes them");
            }
            List<String> cols = split(header);
            int headerLine = in.line();
            int last = cols.size() - 1;
            if (cols.size() < 6 || !cols.get(0).equals("x_m") || !cols.get(1).equals("y_m")
                    || !cols.get(last).equals("message") || !cols.get(last - 1).equals("status")
                    || !cols.get(last - 2).equals("reduced_chi_square") || (cols.size() - 5) % 2 != 0) {
                throw in.error(headerLine, "not the results of a map: expected the columns x_m, y_m, each free input"
                        + " and its sigma_ column, reduced_chi_square, status, message (as `lamella map` writes"
                        + " map.csv)");
            }
            int parameters = (cols.size() - 5) / 2;
            List<String> names = new ArrayList<>();
            for (int a = 0; a < parameters; a++) {
                String name = cols.get(2 + 2 * a);
                if (!cols.get(3 + 2 * a).equals("sigma_" + name)) {
                    throw in.error(headerLine, "column " + (4 + 2 * a) + " is '" + cols.get(3 + 2 * a)
                            + "'; expected 'sigma_" + name + "' after '" + name + "'");
                }
                names.add(name);
            }
            List<double[]> rows = new ArrayList<>();
            List<String> st = new ArrayList<>();
            List<String> msg = new ArrayList<>();
            String line;
            while ((line = in.next()) != null) {
                if (line.isBlank()) {
                    continue;
                }
                List<String> cells = split(line);
                if (cells.size() != cols.size()) {
                    throw in.error("has " + cells.size() + " cells, but the header names " + cols.size());
                }
                double[] row = new double[2 + 2 * parameters + 1];
                for (int c = 0; c < row.length; c++) {
                    String cell = cells.get(c).strip();
                    if (cell.isEmpty() && c >= 2) {
                        row[c] = Double.NaN;
                        continue;
                    }
                    try {
                        row[c] = Decimals.parse(cell, '.');
                    } catch (NumberFormatException e) {
                        throw in.error("column " + (c + 1) + " (" + cols.get(c) + "): " + e.getMessage());
                    }
                }
                String status = cells.get(last - 1).strip();
                if (!STATUS.contains(status)) {
                    throw in.error("status '" + status + "'; expected one of " + String.join(", ", STATUS));
                }
                rows.add(row);
                st.add(status);
                msg.add(cells.get(last));
            }
            if (rows.isEmpty()) {
                throw in.error(headerLine, "the header but no positions below it");
            }
            int n = rows.size();
            double[] x = new double[n];
            double[] y = new double[n];
            double[][] v = new double[n][parameters];
            double[][] s = new double[n][parameters];
            double[] chi = new double[n];
            for (int i = 0; i < n; i++) {
                double[] r = rows.get(i);
                x[i] = r[0];
                y[i] = r[1];
                for (int a = 0; a < parameters; a++) {
                    v[i][a] = r[2 + 2 * a];
                    s[i][a] = r[3 + 2 * a];
                }
                chi[i] = r[2 + 2 * parameters];
            }
            return new MapResults(x, y, names, units(names), v, s, chi, st.toArray(String[]::new),
                    msg.toArray(String[]::new), "read from " + file.getFileName(), false, spacing(x, y));
        }
    }

    /** RFC 4180 cells: quoted cells may hold commas and doubled quotes. */
    static List<String> split(String line) {
        List<String> cells = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
                    cell.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    cell.append(c);
                }
            } else if (c == '"' && cell.length() == 0) {
                quoted = true;
            } else if (c == ',') {
                cells.add(cell.toString());
                cell.setLength(0);
            } else {
                cell.append(c);
            }
        }
        cells.add(cell.toString());
        return cells;
    }

    /** The median distance from a position to its nearest neighbour, m (from up to 400 positions). */
    static double spacing(double[] x, double[] y) {
        int n = x.length;
        if (n < 2) {
            return 1e-6;
        }
        int step = Math.max(1, n / 400);
        List<Double> d = new ArrayList<>();
        for (int i = 0; i < n; i += step) {
            double best = Double.POSITIVE_INFINITY;
            for (int j = 0; j < n; j++) {
                if (j != i) {
                    best = Math.min(best, Math.hypot(x[i] - x[j], y[i] - y[j]));
                }
            }
            if (best > 0 && Double.isFinite(best)) {
                d.add(best);
            }
        }
        if (d.isEmpty()) {
            return 1e-6;
        }
        double[] a = d.stream().mapToDouble(Double::doubleValue).toArray();
        Arrays.sort(a);
        return a[a.length / 2];
    }

    /** The position nearest (x, y) in m, if within 0.75 spacings of it; else −1. */
    int nearest(double x, double y) {
        int best = -1;
        double bestD = Double.POSITIVE_INFINITY;
        for (int i = 0; i < xM.length; i++) {
            double d = Math.hypot(xM[i] - x, yM[i] - y);
            if (d < bestD) {
                bestD = d;
                best = i;
            }
        }
        return bestD <= 0.75 * spacing ? best : -1;
    }

    /** "9 980 ok, 12 with warnings, 8 failed". */
    String counts() {
        int ok = 0;
        int warning = 0;
        int failed = 0;
        for (String s : status) {
            switch (s) {
                case "ok" -> ok++;
                case "warning" -> warning++;
                default -> failed++;
            }
        }
        return ok + " ok, " + warning + " with warnings, " + failed + " failed";
    }
}
