package lamella.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lamella.api.InputException;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PlannedSensitivity;
import lamella.charts.plan.PlanCharts;
import lamella.charts.plan.PlanGrid;
import org.jfree.chart.JFreeChart;

/**
 * The pictures {@code plan --out PLAN.json} writes beside the plan file: {@code PLAN-objective.png} and {@code .svg}
 * (the objective over two varied keys) and {@code PLAN-sensitivity.png} and {@code .svg} (the best plan's
 * sensitivity curves), drawn in memory before anything is written.
 */
final class PlanFigures {

    static final int WIDTH = 960;
    static final int MAP_HEIGHT = 720;
    static final int CURVES_HEIGHT = 600;

    private PlanFigures() {
    }

    /** The files beside {@code out}, in the order {@link #draw} fills them. */
    static List<Path> files(Path out) {
        String name = out.getFileName().toString();
        String stem = name.toLowerCase(java.util.Locale.ROOT).endsWith(".json")
                ? name.substring(0, name.length() - 5) : name;
        List<Path> files = new ArrayList<>();
        for (String s : List.of("-objective.png", "-objective.svg", "-sensitivity.png", "-sensitivity.svg")) {
            files.add(out.resolveSibling(stem + s));
        }
        return files;
    }

    /** The two varied keys of the map: those {@code --map A,B} names, else the first two a map can show. */
    static int[] mapKeys(PlanOutcome o, String option) throws InputException {
        List<Integer> mappable = PlanGrid.mappable(o);
        List<String> names = mappable.stream().map(k -> o.varied().get(k)).toList();
        if (option == null) {
            return mappable.size() < 2 ? null : new int[] {mappable.get(0), mappable.get(1)};
        }
        String[] parts = option.split(",", -1);
        if (parts.length != 2) {
            throw InputException.at("--map", "name two varied keys, as in --map " + String.join(",", o.varied())
                    + "; got '" + option + "'");
        }
        int[] keys = new int[2];
        for (int i = 0; i < 2; i++) {
            String p = parts[i].trim();
            int k = PlanGrid.key(o, p);
            if (k < 0 || !mappable.contains(k)) {
                throw InputException.at("--map", (k < 0 ? "the plan varies no key '" + p + "'"
                        : p + " has fewer than two single values in the plans") + "; a map can show "
                        + (names.isEmpty() ? "none of the varied keys" : String.join(", ", names)));
            }
            keys[i] = k;
        }
        if (keys[0] == keys[1]) {
            throw InputException.at("--map", "name two different varied keys; got " + parts[0] + " twice");
        }
        return keys;
    }

    /**
     * Every picture as file content (byte[] for PNG, String for SVG), keyed by its file; a picture that cannot be
     * drawn is left out and said in {@code notes}.
     */
    static Map<Path, Object> draw(Path out, PlanOutcome o, int[] keys, List<PlannedSensitivity> curves,
                                  List<String> notes) {
        List<Path> files = files(out);
        Map<Path, Object> content = new LinkedHashMap<>();
        if (keys != null) {
            JFreeChart map = PlanCharts.objectiveMap(PlanGrid.of(o, keys[0], keys[1]));
            content.put(files.get(0), PlanCharts.png(map, WIDTH, MAP_HEIGHT));
            content.put(files.get(1), PlanCharts.svg(map, WIDTH, MAP_HEIGHT));
        } else {
            notes.add("no objective map: it needs two varied keys with at least two single values each");
        }
        if (curves != null && !curves.isEmpty()) {
            PlannedResult best = o.best();
            String title = best == null ? "Sensitivities of the case as written (no plan within the limits)"
                    : "Sensitivities of the best plan: " + PlanSummary.values(o, best);
            JFreeChart chart = PlanCharts.sensitivity(title, curves);
            content.put(files.get(2), PlanCharts.png(chart, WIDTH, CURVES_HEIGHT));
            content.put(files.get(3), PlanCharts.svg(chart, WIDTH, CURVES_HEIGHT));
        }
        return content;
    }
}
