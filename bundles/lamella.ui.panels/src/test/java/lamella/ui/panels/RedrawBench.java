package lamella.ui.panels;

import java.util.Arrays;
import java.util.Locale;
import lamella.api.ParameterRef;

/**
 * A benchmark, not a test: the Signal panel's live redraw after an edit, from the edit of the film's conductivity to
 * the new model curve drawn, for the demo's 3-layer FDTR dataset (60 model points). Prints the median and the 95th
 * percentile of repeated edits (target: p95 ≤ 100 ms). Needs a display; run
 * with bench/workbench-redraw, or with the module's test class path: {@code java … lamella.ui.panels.RedrawBench
 * [EDITS]}.
 */
public final class RedrawBench {

    private static final ParameterRef FILM_K = ParameterRef.layer("film", "k_through_w_mk");

    private RedrawBench() {
    }

    public static void main(String[] args) throws Exception {
        int edits = args.length > 0 ? Integer.parseInt(args[0]) : 60;
        try (PanelHarness h = new PanelHarness(1100, 720)) {
            SignalView v = (SignalView) h.open(new SignalPanel());
            if (!h.pumpUntil(() -> v.modelValues().length > 0, 60_000)) {
                throw new IllegalStateException("no model drawn: " + v.statusText());
            }
            for (int dataset : new int[] {2}) {
                v.picker().select(dataset);
                String technique = "FDTR";
                if (!h.pumpUntil(() -> v.statusText().startsWith(technique), 60_000)) {
                    throw new IllegalStateException("dataset " + dataset + " not drawn: " + v.statusText());
                }
                long[] ms = new long[edits];
                for (int i = 0; i < edits + 5; i++) {
                    double[] before = v.modelValues();
                    long t0 = System.nanoTime();
                    h.workbench.project().set(FILM_K, 1.0 + 0.01 * (i + 1));
                    h.pumpUntil(() -> !Arrays.equals(before, v.modelValues()), 30_000);
                    v.canvas().update();
                    long took = (System.nanoTime() - t0) / 1_000_000;
                    if (i >= 5) {
                        ms[i - 5] = took; // the first few warm the JIT and the data cache
                    }
                }
                long[] sorted = ms.clone();
                Arrays.sort(sorted);
                System.out.printf(Locale.ROOT, "live redraw after an edit, 3-layer %s dataset %d (%d model points):"
                        + " median %d ms, p95 %d ms, fastest %d, slowest %d (%d edits)%n", technique, dataset,
                        SignalCurve.MODEL_POINTS, sorted[edits / 2], sorted[(int) Math.ceil(0.95 * edits) - 1],
                        sorted[0], sorted[edits - 1], edits);
            }
        }
    }
}
