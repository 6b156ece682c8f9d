package lamella.report;

import lamella.api.fit.SensitivityTable;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/** One curve per input over x: how strongly the signal responds to each, named by the input's address. */
final class SensitivityChart {

    private SensitivityChart() {
    }

    static String title(SensitivityTable t) {
        return "sensitivity of the " + ColumnWords.signalName(t.signal()) + " to each input";
    }

    /** @param technique the technique the table's x belongs to, for the words of the x axis */
    static JFreeChart of(SensitivityTable t, String technique) {
        XYSeriesCollection curves = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        for (int p = 0; p < t.parameters().size(); p++) {
            XYSeries s = new XYSeries(t.label(p), false, true);
            for (int i = 0; i < t.x().length; i++) {
                s.add(t.x()[i], t.values()[p][i]);
            }
            curves.addSeries(s);
            renderer.setSeriesPaint(p, ChartStyle.seriesPaint(p));
            renderer.setSeriesStroke(p, ChartStyle.seriesStroke(p));
        }
        NumberAxis y = new NumberAxis(ColumnWords.sensitivity(t.phaseLike()));
        y.setAutoRangeMinimumSize(XAxes.leastSpan(t.values()));
        XYPlot plot = new XYPlot(curves, XAxes.of(t.xColumn(), technique, t.x()), y, renderer);
        plot.addRangeMarker(new ValueMarker(0, ChartStyle.REFERENCE, ChartStyle.referenceStroke(false)));
        return ChartStyle.chart(title(t), plot, true);
    }
}
