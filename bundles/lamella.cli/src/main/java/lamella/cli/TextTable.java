package lamella.cli;

import java.util.ArrayList;
import java.util.List;

/** Plain-text columns, each as wide as its widest cell; the last column is left ragged. */
final class TextTable {

    private static final String GAP = "  ";

    private final List<String[]> rows = new ArrayList<>();
    private final int columns;

    TextTable(String... header) {
        columns = header.length;
        rows.add(header);
    }

    void add(String... cells) {
        if (cells.length != columns) {
            throw new IllegalArgumentException("expected " + columns + " cells, got " + cells.length);
        }
        rows.add(cells);
    }

    String render(String indent) {
        int[] widths = new int[columns];
        for (String[] row : rows) {
            for (int c = 0; c < columns; c++) {
                widths[c] = Math.max(widths[c], row[c].length());
            }
        }
        StringBuilder text = new StringBuilder();
        for (String[] row : rows) {
            StringBuilder line = new StringBuilder(indent);
            for (int c = 0; c < columns; c++) {
                line.append(row[c]);
                if (c < columns - 1) {
                    line.append(" ".repeat(widths[c] - row[c].length())).append(GAP);
                }
            }
            text.append(line.toString().stripTrailing()).append('\n');
        }
        return text.toString();
    }
}
