package lamella.api.data;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lamella.api.InputException;

/**
 * Collects the rows of one scan as an importer reads them and checks what every dataset must satisfy: finite
 * values, non-negative standard deviations, and x strictly monotonic (a sweep may run up or down; a scan that
 * reverses, or repeats an x value, is an error at the line where it does). The finished scan is ascending.
 */
public final class ScanBuilder {

    private final Path file;
    private final String xColumn;
    private final List<String> signals;
    private final List<String> sigmas;
    private double[] x = new double[64];
    private int[] lines = new int[64];
    private double[][] values;
    private double[][] deviations;
    private int rows;
    private int direction;

    /**
     * @param signals the signal columns, in the order {@link #add} receives them
     * @param sigmas  the signals that have standard deviations, in the order {@link #add} receives them
     */
    public ScanBuilder(Path file, String xColumn, List<String> signals, List<String> sigmas) {
        if (!signals.containsAll(sigmas)) {
            throw new IllegalArgumentException("standard deviations " + sigmas + " for signals " + signals);
        }
        this.file = file;
        this.xColumn = xColumn;
        this.signals = List.copyOf(signals);
        this.sigmas = List.copyOf(sigmas);
        this.values = new double[signals.size()][64];
        this.deviations = new double[sigmas.size()][64];
    }

    public int rows() {
        return rows;
    }

    /** Adds the row read at a line; the arrays are copied. */
    public void add(int line, double xValue, double[] signalValues, double[] sigmaValues) throws InputException {
        if (signalValues.length != signals.size() || sigmaValues.length != sigmas.size()) {
            throw new IllegalArgumentException("row with " + signalValues.length + " signals and "
                    + sigmaValues.length + " standard deviations");
        }
        finite(line, xColumn, xValue);
        for (int i = 0; i < signalValues.length; i++) {
            finite(line, signals.get(i), signalValues[i]);
        }
        for (int i = 0; i < sigmaValues.length; i++) {
            String name = SignalNames.sigma(sigmas.get(i));
            finite(line, name, sigmaValues[i]);
            if (sigmaValues[i] < 0) {
                throw new InputException(file, null, line, name + " is " + Decimals.show(sigmaValues[i])
                        + "; a standard deviation cannot be negative");
            }
        }
        if (rows > 0) {
            checkOrder(line, xValue);
        }
        if (rows == x.length) {
            grow();
        }
        x[rows] = xValue;
        lines[rows] = line;
        for (int i = 0; i < signalValues.length; i++) {
            values[i][rows] = signalValues[i];
        }
        for (int i = 0; i < sigmaValues.length; i++) {
            deviations[i][rows] = sigmaValues[i];
        }
        rows++;
    }

    private void checkOrder(int line, double xValue) throws InputException {
        double previous = x[rows - 1];
        if (xValue == previous) {
            throw new InputException(file, null, line, xColumn + " " + Decimals.show(xValue)
                    + " repeats the value of line " + lines[rows - 1] + "; each x appears once per scan (put a"
                    + " repeated sweep in a scan of its own)");
        }
        int step = xValue > previous ? 1 : -1;
        if (direction == 0) {
            direction = step;
        } else if (step != direction) {
            throw new InputException(file, null, line, xColumn + " " + Decimals.show(xValue) + " after "
                    + Decimals.show(previous) + " on line " + lines[rows - 1] + ": the scan "
                    + (direction > 0 ? "increases" : "decreases") + " from line " + lines[0]
                    + " and must keep doing so; x values out of order are not sorted silently");
        }
    }

    private void finite(int line, String column, double v) throws InputException {
        if (!Double.isFinite(v)) {
            throw new InputException(file, null, line, column + " is " + v + "; expected a finite number");
        }
    }

    private void grow() {
        int n = x.length * 2;
        x = Arrays.copyOf(x, n);
        lines = Arrays.copyOf(lines, n);
        for (int i = 0; i < values.length; i++) {
            values[i] = Arrays.copyOf(values[i], n);
        }
        for (int i = 0; i < deviations.length; i++) {
            deviations[i] = Arrays.copyOf(deviations[i], n);
        }
    }

    /**
     * The scan, ascending in x.
     *
     * @param endLine the line where the scan ended, for the message when it has no rows
     */
    public Scan build(int endLine) throws InputException {
        if (rows == 0) {
            throw new InputException(file, null, endLine, "a scan without data rows");
        }
        boolean reverse = direction < 0;
        Map<String, double[]> s = new LinkedHashMap<>();
        for (int i = 0; i < signals.size(); i++) {
            s.put(signals.get(i), ordered(values[i], reverse));
        }
        Map<String, double[]> d = new LinkedHashMap<>();
        for (int i = 0; i < sigmas.size(); i++) {
            d.put(sigmas.get(i), ordered(deviations[i], reverse));
        }
        int[] l = Arrays.copyOf(lines, rows);
        if (reverse) {
            for (int i = 0, j = rows - 1; i < j; i++, j--) {
                int t = l[i];
                l[i] = l[j];
                l[j] = t;
            }
        }
        return new Scan(ordered(x, reverse), l, s, d);
    }

    private double[] ordered(double[] a, boolean reverse) {
        double[] out = Arrays.copyOf(a, rows);
        if (reverse) {
            for (int i = 0, j = rows - 1; i < j; i++, j--) {
                double t = out[i];
                out[i] = out[j];
                out[j] = t;
            }
        }
        return out;
    }
}
