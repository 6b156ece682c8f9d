/** The report folder of a fit: HTML, plots, CSV and JSON. Implementation only: used through ReportWriter. */
package lamella.report;
