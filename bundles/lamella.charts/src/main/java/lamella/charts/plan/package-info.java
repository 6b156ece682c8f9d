/**
 * Pictures of an experiment plan, shared by the plan command, the report and the workbench: the objective over two
 * varied keys as a colour map with contours, and the sensitivity curves of a plan's measurements.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.1.0")
package lamella.charts.plan;
