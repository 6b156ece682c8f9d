package lamella.api;

import java.util.List;
import java.util.Optional;

/**
 * Model signals over x: what {@code simulate} writes and what fits compare with data.
 *
 * @param xColumn the x column's name, empty for a single steady value
 * @param x       the x values
 * @param columns the signal columns' names
 * @param values  one array per signal column
 */
public record SignalTable(Optional<String> xColumn, double[] x, List<String> columns, double[][] values) {

    public SignalTable {
        columns = List.copyOf(columns);
        if (values.length != columns.size()) {
            throw new IllegalArgumentException(columns.size() + " columns but " + values.length + " value arrays");
        }
        for (double[] v : values) {
            if (v.length != x.length) {
                throw new IllegalArgumentException("a signal column has " + v.length + " rows, x has " + x.length);
            }
        }
    }

    public int rows() {
        return x.length;
    }

    public double[] column(String name) {
        int i = columns.indexOf(name);
        if (i < 0) {
            throw new IllegalArgumentException("no column " + name);
        }
        return values[i];
    }
}
