package lamella.report;

import java.util.List;

/**
 * The plots of a report by the section of the page that shows them.
 *
 * @param datasets      data with model, then residuals, for each dataset in turn
 * @param budget        the uncertainty budget, when the fit has one
 * @param sensitivities one per sensitivity table
 */
record PageFigures(List<Figure> datasets, List<Figure> budget, List<Figure> sensitivities) {

    PageFigures {
        datasets = List.copyOf(datasets);
        budget = List.copyOf(budget);
        sensitivities = List.copyOf(sensitivities);
    }
}
