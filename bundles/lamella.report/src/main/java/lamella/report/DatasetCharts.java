package lamella.report;

import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import lamella.api.fit.DatasetFit;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/** The two plots of one fitted dataset: data with the model over x, and the normalised residuals. */
final class DatasetCharts {

    /** Residual axes reach at least this far either way, so that scatter within ±2σ looks as small as it is. */
    private static final double LEAST_RESIDUAL_RANGE = 3;
    private static final Shape POINT = new Ellipse2D.Double(-3.5, -3.5, 7, 7);
    private static final Shape SMALL_POINT = new Rectangle2D.Double(-3, -3, 6, 6);

    private DatasetCharts() {
    }

    static String title(DatasetFit d) {
        return "dataset " + d.index() + " · " + d.technique() + " · " + d.source();
    }

    /** Data as points (with 1σ bars when the σ came from the data file), the best-fit model as a line. */
    static JFreeChart fit(DatasetFit d) {
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(XAxes.of(d.xColumn(), d.technique(), d.x()));
        NumberAxis y = new NumberAxis(ColumnWords.signal(d.signal()));
        y.setAutoRangeIncludesZero(false);
        y.setAutoRangeMinimumSize(XAxes.leastSpan(d.data(), d.model()));
        plot.setRangeAxis(y);

        String dataName = d.sigmaFromData() ? "data, bars ±1σ from the data file" : "data";
        if (d.sigmaFromData()) {
            YIntervalSeries data = new YIntervalSeries(dataName);
            for (int i = 0; i < d.x().length; i++) {
                data.add(d.x()[i], d.data()[i], d.data()[i] - d.sigma()[i], d.data()[i] + d.sigma()[i]);
            }
            XYErrorRenderer bars = new XYErrorRenderer();
            bars.setDrawXError(false);
            bars.setDefaultLinesVisible(false);
            bars.setCapLength(5);
            bars.setErrorPaint(ChartStyle.DATA);
            dataRenderer(bars);
            YIntervalSeriesCollection collection = new YIntervalSeriesCollection();
            collection.addSeries(data);
            plot.setDataset(0, collection);
            plot.setRenderer(0, bars);
        } else {
            XYSeries data = new XYSeries(dataName, false, true);
            for (int i = 0; i < d.x().length; i++) {
                data.add(d.x()[i], d.data()[i]);
            }
            XYLineAndShapeRenderer points = new XYLineAndShapeRenderer(false, true);
            dataRenderer(points);
            plot.setDataset(0, new XYSeriesCollection(data));
            plot.setRenderer(0, points);
        }

        XYSeries model = new XYSeries("model at the best fit", false, true);
        for (int i = 0; i < d.x().length; i++) {
            model.add(d.x()[i], d.model()[i]);
        }
        XYLineAndShapeRenderer line = new XYLineAndShapeRenderer(true, false);
        line.setSeriesPaint(0, ChartStyle.MODEL);
        line.setSeriesStroke(0, ChartStyle.seriesStroke(0));
        plot.setDataset(1, new XYSeriesCollection(model));
        plot.setRenderer(1, line);
        // The line over the points, so that it stays visible where points crowd.
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        return ChartStyle.chart(title(d), plot, true);
    }

    static double[] normalisedResiduals(DatasetFit d) {
        double[] r = new double[d.x().length];
        for (int i = 0; i < r.length; i++) {
            r[i] = (d.data()[i] - d.model()[i]) / d.sigma()[i];
        }
        return r;
    }

    /** (data − model)/σ over x, with the zero line and ±2σ marked. */
    static JFreeChart residuals(DatasetFit d) {
        double[] r = normalisedResiduals(d);
        XYSeries points = new XYSeries("normalised residual", false, true);
        double reach = LEAST_RESIDUAL_RANGE;
        for (int i = 0; i < r.length; i++) {
            points.add(d.x()[i], r[i]);
            if (Double.isFinite(r[i])) {
                reach = Math.max(reach, 1.1 * Math.abs(r[i]));
            }
        }
        NumberAxis y = new NumberAxis("normalised residual (data − model)/σ (" + ColumnWords.DIMENSIONLESS + ")");
        y.setRange(-reach, reach);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(false, true);
        renderer.setSeriesShape(0, SMALL_POINT);
        renderer.setSeriesPaint(0, ChartStyle.DATA);
        XYPlot plot = new XYPlot(new XYSeriesCollection(points), XAxes.of(d.xColumn(), d.technique(), d.x()), y,
                renderer);
        plot.addRangeMarker(marker(0, false));
        plot.addRangeMarker(marker(2, true));
        plot.addRangeMarker(marker(-2, true));
        return ChartStyle.chart("residuals of " + title(d), plot, false);
    }

    private static void dataRenderer(XYLineAndShapeRenderer r) {
        r.setSeriesShape(0, POINT);
        r.setSeriesPaint(0, ChartStyle.DATA);
        r.setSeriesShapesFilled(0, false);
        r.setUseOutlinePaint(false);
    }

    private static ValueMarker marker(double at, boolean dashed) {
        return new ValueMarker(at, ChartStyle.REFERENCE, ChartStyle.referenceStroke(dashed));
    }
}
