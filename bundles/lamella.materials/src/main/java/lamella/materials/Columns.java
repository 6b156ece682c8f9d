package lamella.materials;

import java.util.ArrayList;
import java.util.List;

/** Plain-text columns as wide as their widest cell; the last column is left ragged. */
final class Columns {

    private final List<String[]> rows = new ArrayList<>();
    private final int width;

    Columns(String... header) {
        width = header.length;
        rows.add(header);
    }

    void add(String... cells) {
        if (cells.length != width) {
            throw new IllegalArgumentException("expected " + width + " cells, got " + cells.length);
        }
        rows.add(cells);
    }

    String render() {
        int[] w = new int[width];
        for (String[] r : rows) {
            for (int c = 0; c < width; c++) {
                w[c] = Math.max(w[c], r[c].length());
            }
        }
        StringBuilder sb = new StringBuilder();
        for (String[] r : rows) {
            StringBuilder line = new StringBuilder();
            for (int c = 0; c < width; c++) {
                line.append(r[c]);
                if (c < width - 1) {
                    line.append(" ".repeat(w[c] - r[c].length() + 2));
                }
            }
            sb.append(line.toString().stripTrailing()).append('\n');
        }
        return sb.toString();
    }
}
