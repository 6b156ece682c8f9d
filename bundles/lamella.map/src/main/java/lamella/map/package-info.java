/**
 * Property maps: the {@code map} command reads a map's long table of curves, fits every position on this machine's
 * cores through the fitting service's {@link lamella.api.fit.CurveFit}, and writes the table, the images and a
 * summary. Exported for the workbench's Map panel, which reads a map's data with {@link lamella.map.MapData}, fits it
 * with {@link lamella.map.MapEngine} and draws it with {@link lamella.map.MapImages}; not an API for plug-ins: it
 * may change with any release.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.1.0")
package lamella.map;
