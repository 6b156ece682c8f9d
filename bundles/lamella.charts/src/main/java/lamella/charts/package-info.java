/** Plotting pieces of our own that every Lamella chart shares, beside the JFreeChart packages this bundle carries. */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.1.0")
package lamella.charts;
