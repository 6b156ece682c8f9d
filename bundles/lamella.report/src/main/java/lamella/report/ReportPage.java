package lamella.report;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import lamella.api.CaseDocument;
import lamella.api.fit.FitOutcome;

/**
 * The report's HTML page. It needs nothing beside itself to be read: the style sheet is inline, the plots are
 * embedded as PNG, and no script runs. The plot files beside it are linked for those who want SVG.
 */
final class ReportPage {

    static final String SAFETY = "Thermoreflectance set-ups use Class 3B or Class 4 lasers, and 3ω measurements"
            + " drive current through heaters on the sample. Wear eye protection rated for every wavelength in use,"
            + " keep beam enclosures and interlocks in place, limit heater currents and watch for heating of"
            + " fragile samples. This note does not replace your facility's laser safety programme, its laser"
            + " safety officer or local rules: follow them.";

    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
            .withZone(ZoneOffset.UTC);

    private static final String STYLE = """
            body { font: 15px/1.5 "DejaVu Sans", "Helvetica Neue", Arial, sans-serif; color: #1d1d1d;
                   max-width: 1040px; margin: 2em auto; padding: 0 1.5em; background: #fff; }
            h1 { font-size: 1.7em; margin-bottom: .2em; border-bottom: 3px solid #1f5fa8; padding-bottom: .2em; }
            h2 { font-size: 1.3em; margin-top: 2em; border-bottom: 1px solid #bbb; padding-bottom: .1em; }
            h3 { font-size: 1.05em; margin: 1.4em 0 .3em; }
            .lead { font-size: 1.1em; margin: .4em 0; }
            .meta, .note, figcaption { color: #444; font-size: .92em; }
            table { border-collapse: collapse; margin: .5em 0 1.2em; font-variant-numeric: tabular-nums; }
            th, td { padding: .28em .75em; text-align: right; border-bottom: 1px solid #e3e3e3; vertical-align: top; }
            thead th { border-bottom: 2px solid #444; font-weight: 600; background: #f6f6f6; }
            th[scope=row], thead th:first-child, table.keys td { text-align: left; }
            tr.total th, tr.total td { border-top: 2px solid #444; font-weight: 600; }
            td.value { font-weight: 600; white-space: nowrap; }
            td.free, .free-key { background: #e4eef9; }
            .flag { display: inline-block; background: #b03a2e; color: #fff; border-radius: 3px;
                    padding: 0 .45em; margin: 0 .2em .2em 0; font-size: .85em; }
            .warnings { border-left: 6px solid #b03a2e; background: #fbeeec; padding: .5em 1.2em .7em;
                        margin: 1.2em 0; }
            .warnings h2 { margin-top: .3em; border: none; color: #8a2a20; }
            figure { margin: 1em 0 2em; }
            figure img { max-width: 100%; height: auto; border: 1px solid #ddd; }
            .safety { margin-top: 3em; border-top: 2px solid #999; padding-top: .6em; font-size: .92em; }
            footer { margin: 1.5em 0 3em; color: #555; font-size: .88em; }
            """;

    private ReportPage() {
    }

    /**
     * @param plan  the plan section of a case with a plan block, or null
     * @param files every file of the report folder beside the page, with what it holds, for its last section
     */
    static String of(CaseDocument doc, FitOutcome o, PageFigures figures, PlanSection plan,
                     Map<String, String> files, ReportStamp stamp) {
        Html h = new Html();
        h.raw("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        h.element("title", "Lamella fit report" + (CaseText.description(doc).isEmpty() ? ""
                : " — " + CaseText.description(doc)));
        h.raw("<style>\n" + STYLE + "</style>\n</head>\n<body>\n");
        h.element("h1", "Fit report");
        if (!CaseText.description(doc).isEmpty()) {
            h.element("p", "lead", CaseText.description(doc));
        }
        h.element("p", "meta", "Case file: " + (doc.file() == null ? "(not from a file)" : doc.file().toString())
                + " · written " + WHEN.format(stamp.written()) + " by Lamella " + stamp.version());
        h.element("p", summary(o));
        warnings(h, o);

        h.element("h2", "Fitted parameters");
        ResultTables.parameters(h, o);

        h.element("h2", "Datasets: fit quality, data with model, residuals");
        ResultTables.datasets(h, o);
        figures.datasets().forEach(f -> figure(h, f));

        h.element("h2", "Correlation of the fitted parameters");
        ResultTables.correlation(h, o);

        h.element("h2", "Uncertainty budget");
        h.element("p", "note", "Each row is the 1σ that one source contributes to each fitted parameter;"
                + " independent contributions add in quadrature to the total (Yang, Ziade & Schmidt,"
                + " Rev. Sci. Instrum. 87, 014901, 2016).");
        ResultTables.budget(h, o);
        figures.budget().forEach(f -> figure(h, f));

        o.monteCarlo().ifPresent(mc -> {
            h.element("h2", "Monte Carlo check of the uncertainties");
            ResultTables.monteCarlo(h, o, mc);
        });

        if (!figures.sensitivities().isEmpty()) {
            h.element("h2", "Sensitivities");
            figures.sensitivities().forEach(f -> figure(h, f));
        }

        if (plan != null) {
            plan.write(h, f -> figure(h, f));
        }

        h.element("h2", "Inputs");
        InputTables.write(h, doc, o);

        h.element("h2", "Files of this report");
        h.raw("<table class=\"keys\"><thead>");
        h.headRow(List.of("file", "contents"));
        h.raw("</thead><tbody>\n");
        files.forEach((name, what) -> h.raw("<tr><td><a href=\"").text(name).raw("\">").text(name)
                .raw("</a></td><td>").text(what).raw("</td></tr>\n"));
        h.raw("</tbody></table>\n");

        h.raw("<section class=\"safety\">");
        h.raw("<strong>Safety.</strong> ").text(SAFETY);
        h.raw("</section>\n<footer>");
        h.text("Written by Lamella " + stamp.version() + " on " + WHEN.format(stamp.written()) + ".");
        h.raw("</footer>\n</body>\n</html>\n");
        return h.toString();
    }

    private static String summary(FitOutcome o) {
        return o.parameters().size() + " free parameters fitted to " + o.datasets().size() + " datasets"
                + (o.converged() ? "; converged" : "; did not converge") + " after " + o.evaluations()
                + " model evaluations; reduced χ² of all data " + Numbers.plain(o.reducedChiSquare())
                + " (" + ColumnWords.DIMENSIONLESS + ").";
    }

    private static void warnings(Html h, FitOutcome o) {
        if (o.warnings().isEmpty() && o.converged()) {
            return;
        }
        h.raw("<section class=\"warnings\">\n");
        h.element("h2", "Warnings — read these before using the results");
        h.raw("<ul>\n");
        if (!o.converged()) {
            h.element("li", "The fit did not converge: the values below are where it stopped, not a best fit.");
        }
        o.warnings().forEach(w -> h.element("li", w));
        h.raw("</ul>\n</section>\n");
    }

    private static void figure(Html h, Figure f) {
        h.raw("<figure>\n<img width=\"" + ChartImages.WIDTH + "\" height=\"" + ChartImages.HEIGHT + "\" alt=\"")
                .text(f.title()).raw("\" src=\"data:image/png;base64,")
                .raw(Base64.getEncoder().encodeToString(f.png())).raw("\">\n<figcaption>").text(f.caption())
                .raw(" Files: <a href=\"").text(f.name() + ".svg").raw("\">").text(f.name() + ".svg")
                .raw("</a>, <a href=\"").text(f.name() + ".png").raw("\">").text(f.name() + ".png")
                .raw("</a>.</figcaption>\n</figure>\n");
    }
}
