/**
 * JFreeChart plots in SWT: {@link lamella.ui.charts.ChartCanvas} draws a chart into a canvas and handles zoom, pan,
 * the read-out under the cursor and export; {@link lamella.ui.charts.PlotLook} and
 * {@link lamella.charts.DecadeAxis} give every workbench plot the same look.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.2.0")
package lamella.ui.charts;
