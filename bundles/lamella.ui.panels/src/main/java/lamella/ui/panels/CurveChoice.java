package lamella.ui.panels;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lamella.ui.api.Project;

/** A curve a plot can show: a dataset of the fit block (its data and its model), or the case's own measurement. */
record CurveChoice(int dataset, String label) {

    static List<CurveChoice> of(Project project) {
        List<CurveChoice> out = new ArrayList<>();
        List<ObjectNode> ds = project.datasets();
        for (int i = 0; i < ds.size(); i++) {
            ObjectNode d = ds.get(i);
            String file = Path.of(d.path("data").asText("?")).getFileName().toString();
            String technique = d.path("measurement").path("type").asText(
                    project.tree().path("measurement").path("type").asText("?"));
            String signal = d.path("signal").asText("");
            out.add(new CurveChoice(i, "dataset " + i + ": " + file + " (" + technique
                    + (signal.isEmpty() ? "" : ", " + signal) + ")"));
        }
        out.add(new CurveChoice(-1, "case measurement (model only)"));
        return out;
    }
}
