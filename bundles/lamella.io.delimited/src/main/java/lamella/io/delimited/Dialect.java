package lamella.io.delimited;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import lamella.api.data.Decimals;

/**
 * How a table's cells are separated and how its numbers are written. Detected from the first data row and the
 * header above it: the first delimiter, in the order tab, semicolon, comma, whitespace, under which the data row
 * is two or more numbers and the header has as many cells. A decimal point is tried before a decimal comma
 * (which never goes with a comma delimiter); a file then keeps its mark throughout.
 */
record Dialect(Delimiter delimiter, char decimalMark) {

    enum Delimiter {
        TAB("tab"), SEMICOLON("semicolon"), COMMA("comma"), WHITESPACE("whitespace");

        final String wording;

        Delimiter(String wording) {
            this.wording = wording;
        }
    }

    /** The cells of a data row. */
    List<String> split(String line) {
        String t = line.strip();
        List<String> cells = new ArrayList<>();
        if (delimiter == Delimiter.WHITESPACE) {
            for (String c : t.split("\\s+")) {
                cells.add(c);
            }
            return cells;
        }
        char d = delimiter == Delimiter.TAB ? '\t' : delimiter == Delimiter.SEMICOLON ? ';' : ',';
        int start = 0;
        for (int i = 0; i <= t.length(); i++) {
            if (i == t.length() || t.charAt(i) == d) {
                cells.add(t.substring(start, i).strip());
                start = i + 1;
            }
        }
        return cells;
    }

    /**
     * The cells of a header line. With whitespace between cells, a unit in brackets belongs to the name before it,
     * so that {@code delay [ps]  X (V)} is two cells.
     */
    List<String> splitHeader(String line) {
        if (delimiter != Delimiter.WHITESPACE) {
            return split(line);
        }
        List<String> cells = new ArrayList<>();
        for (String token : line.strip().split("\\s+")) {
            boolean unit = token.startsWith("(") || token.startsWith("[");
            if (unit && !cells.isEmpty()) {
                cells.set(cells.size() - 1, cells.get(cells.size() - 1) + " " + token);
            } else {
                cells.add(token);
            }
        }
        return cells;
    }

    String describe() {
        return delimiter.wording + "-separated, decimal " + (decimalMark == ',' ? "comma" : "point");
    }

    /**
     * The dialect of a data row, checked against the header line above it when there is one.
     *
     * @param header the header line, or null to ask only whether the row is data
     */
    static Optional<Dialect> detect(String dataRow, String header) {
        for (Delimiter d : Delimiter.values()) {
            for (char mark : d == Delimiter.COMMA ? new char[] {'.'} : new char[] {'.', ','}) {
                Dialect candidate = new Dialect(d, mark);
                List<String> cells = candidate.split(dataRow);
                if (cells.size() < 2 || !allNumbers(cells, mark)) {
                    continue;
                }
                if (header == null || candidate.splitHeader(header).size() == cells.size()) {
                    return Optional.of(candidate);
                }
            }
        }
        return Optional.empty();
    }

    /**
     * The dialect under which a row that starts with a number has as many cells as the header above it, though not all
     * of them are numbers: a data row with a bad cell, which the reader then names, rather than a line of text.
     */
    static Optional<Dialect> detectDamaged(String row, String header) {
        for (Delimiter d : Delimiter.values()) {
            for (char mark : d == Delimiter.COMMA ? new char[] {'.'} : new char[] {'.', ','}) {
                Dialect candidate = new Dialect(d, mark);
                List<String> cells = candidate.split(row);
                if (cells.size() >= 2 && Decimals.isNumber(cells.get(0), mark)
                        && candidate.splitHeader(header).size() == cells.size()
                        && !Decimals.isNumber(candidate.splitHeader(header).get(0), mark)) {
                    return Optional.of(candidate);
                }
            }
        }
        return Optional.empty();
    }

    private static boolean allNumbers(List<String> cells, char mark) {
        for (String c : cells) {
            if (!Decimals.isNumber(c, mark)) {
                return false;
            }
        }
        return true;
    }
}
