package lamella.charts.plan;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlannedResult;

/**
 * The objective of a plan outcome over two of its varied keys: a slice through the plans at the best plan of single
 * values (every other key held at that plan's values; when no plan has only single values, the best with single
 * values of the two keys), on the grid of the two keys' values. A key measured several times together is on the
 * map only through its plans of one value.
 */
public final class PlanGrid {

    private final PlanOutcome outcome;
    private final int xKey;
    private final int yKey;
    private final double[] xs;
    private final double[] ys;
    private final PlannedResult[][] cells;
    private final PlannedResult reference;

    private PlanGrid(PlanOutcome outcome, int xKey, int yKey) {
        this.outcome = outcome;
        this.xKey = xKey;
        this.yKey = yKey;
        PlannedResult ref = null;
        for (PlannedResult p : outcome.plans()) {
            if (p.values().stream().allMatch(Double.class::isInstance)) {
                ref = p;
                break;
            }
        }
        for (PlannedResult p : outcome.plans()) {
            if (ref == null && single(p, xKey) && single(p, yKey)) {
                ref = p;
            }
        }
        if (ref == null) {
            throw new IllegalArgumentException("no plan has a single value of both " + outcome.varied().get(xKey)
                    + " and " + outcome.varied().get(yKey));
        }
        reference = ref;
        List<PlannedResult> slice = new ArrayList<>();
        for (PlannedResult p : outcome.plans()) {
            if (!single(p, xKey) || !single(p, yKey)) {
                continue;
            }
            boolean same = true;
            for (int k = 0; k < p.values().size(); k++) {
                same &= k == xKey || k == yKey || p.values().get(k).equals(ref.values().get(k));
            }
            if (same) {
                slice.add(p);
            }
        }
        xs = slice.stream().mapToDouble(p -> (Double) p.values().get(xKey)).distinct().sorted().toArray();
        ys = slice.stream().mapToDouble(p -> (Double) p.values().get(yKey)).distinct().sorted().toArray();
        cells = new PlannedResult[xs.length][ys.length];
        for (PlannedResult p : slice) {
            cells[Arrays.binarySearch(xs, (Double) p.values().get(xKey))]
                    [Arrays.binarySearch(ys, (Double) p.values().get(yKey))] = p;
        }
    }

    /** The objective over varied keys {@code xKey} and {@code yKey} (indices into the outcome's {@code varied}). */
    public static PlanGrid of(PlanOutcome outcome, int xKey, int yKey) {
        List<Integer> keys = mappable(outcome);
        if (xKey == yKey || !keys.contains(xKey) || !keys.contains(yKey)) {
            throw new IllegalArgumentException("a map needs two different varied keys, each with at least two single"
                    + " values; of " + outcome.varied() + " these are " + keys.stream()
                    .map(k -> outcome.varied().get(k)).toList());
        }
        return new PlanGrid(outcome, xKey, yKey);
    }

    /** The varied keys a map can show: those with at least two different single values among the plans. */
    public static List<Integer> mappable(PlanOutcome outcome) {
        List<Integer> out = new ArrayList<>();
        for (int k = 0; k < outcome.varied().size(); k++) {
            final int key = k;
            long distinct = outcome.plans().stream().filter(p -> single(p, key))
                    .map(p -> p.values().get(key)).distinct().count();
            if (distinct >= 2) {
                out.add(k);
            }
        }
        return out;
    }

    /** The varied key of a name as the outcome lists it, or −1. */
    public static int key(PlanOutcome outcome, String name) {
        return outcome.varied().indexOf(name);
    }

    private static boolean single(PlannedResult p, int k) {
        return k < p.values().size() && p.values().get(k) instanceof Double;
    }

    public PlanOutcome outcome() {
        return outcome;
    }

    public String xName() {
        return outcome.varied().get(xKey);
    }

    public String yName() {
        return outcome.varied().get(yKey);
    }

    public int xKey() {
        return xKey;
    }

    public int yKey() {
        return yKey;
    }

    /** The x key's values, SI, ascending. */
    public double[] xs() {
        return xs.clone();
    }

    public double[] ys() {
        return ys.clone();
    }

    /** The plan at grid point (i, j), or null where the slice has none. */
    public PlannedResult at(int i, int j) {
        return cells[i][j];
    }

    /** The best plan on the map (every other key is held at its values). */
    public PlannedResult best() {
        return reference;
    }

    /** The case as written at (x, y) when it has a value of both keys; NaN otherwise. */
    public double[] baseline() {
        List<Object> v = outcome.baseline().values();
        double x = xKey < v.size() && v.get(xKey) instanceof Double d ? d : Double.NaN;
        double y = yKey < v.size() && v.get(yKey) instanceof Double d ? d : Double.NaN;
        return new double[] {x, y};
    }

    /** Whether a key's values are log-spaced: all positive, and a constant ratio or a span of a decade or more. */
    public static boolean logSpaced(double[] v) {
        if (v.length < 2 || v[0] <= 0) {
            return false;
        }
        if (v[v.length - 1] / v[0] >= 10) {
            return true;
        }
        if (v.length < 3) {
            return false;
        }
        double r = Math.log(v[1] / v[0]);
        for (int i = 2; i < v.length; i++) {
            if (Math.abs(Math.log(v[i] / v[i - 1]) - r) > 0.01 * Math.abs(r)) {
                return false;
            }
        }
        double d = v[1] - v[0];
        return Math.abs((v[2] - v[1]) - d) > 0.01 * Math.abs(d);
    }

    /** The keys held fixed on this map, in words and the trade's units: {@code geometry.pump_radius_m = 10 µm}. */
    public List<String> held() {
        List<String> out = new ArrayList<>();
        for (int k = 0; k < reference.values().size(); k++) {
            if (k == xKey || k == yKey) {
                continue;
            }
            Object v = reference.values().get(k);
            String name = outcome.varied().get(k);
            List<Double> values = v instanceof List<?> l ? l.stream().map(Double.class::cast).toList()
                    : List.of((Double) v);
            TradeUnit u = TradeUnit.of(name, values.get(values.size() - 1));
            out.add(name + " = " + String.join(" + ", values.stream().map(x -> number(u.factor() * x)).toList())
                    + (u.symbol().isEmpty() ? "" : " " + u.symbol()));
        }
        return out;
    }

    /** Four significant digits without trailing zeros: 6e-08, 1.5e+06, 120. */
    public static String number(double v) {
        String s = String.format(Locale.ROOT, "%.4g", v);
        if (!s.contains(".")) {
            return s;
        }
        return s.replaceAll("(\\.\\d*?)0+(e|$)", "$1$2").replaceAll("\\.(e|$)", "$1");
    }
}
