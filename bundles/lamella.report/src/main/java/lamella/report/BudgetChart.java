package lamella.report;

import java.awt.Color;
import java.util.List;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.data.category.DefaultCategoryDataset;

/**
 * The uncertainty budget as grouped bars: for each fitted parameter, each source's 1σ contribution and the total,
 * relative to the parameter's value so that parameters of different units share one axis.
 */
final class BudgetChart {

    static final String TITLE = "uncertainty budget";
    private static final Color TOTAL = new Color(0x44, 0x44, 0x44);

    private BudgetChart() {
    }

    static JFreeChart of(FitOutcome o) {
        DefaultCategoryDataset bars = new DefaultCategoryDataset();
        List<FittedParameter> ps = o.parameters();
        for (BudgetLine line : o.budget()) {
            for (int p = 0; p < ps.size(); p++) {
                bars.addValue(percentOfValue(o, line.contributions()[p], p), line.label(), ps.get(p).label());
            }
        }
        for (int p = 0; p < ps.size(); p++) {
            bars.addValue(percentOfValue(o, ps.get(p).sigma(), p), Budget.TOTAL, ps.get(p).label());
        }
        BarRenderer renderer = new BarRenderer();
        renderer.setBarPainter(new StandardBarPainter());
        renderer.setShadowVisible(false);
        renderer.setDrawBarOutline(false);
        renderer.setItemMargin(0.04);
        for (int s = 0; s < o.budget().size(); s++) {
            renderer.setSeriesPaint(s, ChartStyle.seriesPaint(s));
        }
        renderer.setSeriesPaint(o.budget().size(), TOTAL);

        CategoryAxis parameters = new CategoryAxis("fitted parameter");
        parameters.setMaximumCategoryLabelLines(2);
        parameters.setMaximumCategoryLabelWidthRatio(0.3f);
        NumberAxis share = new NumberAxis("1σ contribution relative to the fitted value (%)");
        CategoryPlot plot = new CategoryPlot(bars, parameters, share, renderer);
        // Bars run sideways so that long parameter names stay on one or two lines.
        plot.setOrientation(PlotOrientation.HORIZONTAL);
        plot.setRangeAxisLocation(AxisLocation.BOTTOM_OR_LEFT);
        return ChartStyle.chart(TITLE, plot, true);
    }

    /** No bar (null) for a parameter whose value is zero, where a relative σ has no meaning. */
    private static Double percentOfValue(FitOutcome o, double sigma, int parameter) {
        double r = Budget.relativeToValue(o, sigma, parameter);
        return Double.isFinite(r) ? 100 * r : null;
    }
}
