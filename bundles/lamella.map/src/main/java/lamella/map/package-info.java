/**
 * Property maps: the {@code map} command reads a map's long table of curves, fits every position on this machine's
 * cores through the fitting service's {@link lamella.api.fit.CurveFit}, and writes the table, the images and a
 * summary. Implementation only.
 */
package lamella.map;
