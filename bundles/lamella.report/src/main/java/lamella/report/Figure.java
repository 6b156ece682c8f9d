package lamella.report;

import org.jfree.chart.JFreeChart;

/**
 * One plot of a report, kept as PNG for the page (embedded, so the page needs no other file to show it) and
 * written beside it as {@code <name>.png} and {@code <name>.svg}.
 *
 * @param name    the files' name without extension
 * @param title   what it shows, for the page and the image's text alternative
 * @param caption how to read it
 * @param png     the PNG image
 */
record Figure(String name, String title, String caption, byte[] png) {

    /** Draws the chart, adds its two files to the report and returns the figure for the page. */
    static Figure draw(ReportFiles files, String name, JFreeChart chart, String caption) {
        byte[] png = ChartImages.png(chart);
        files.add(name + ".png", png);
        files.add(name + ".svg", ChartImages.svg(chart));
        return new Figure(name, chart.getTitle().getText(), caption, png);
    }
}
