/**
 * Signal conditioning of measured datasets before fitting. Plain Java with no OSGi at run time, exported so that
 * commands, the workbench and batch jobs share one implementation.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.1.0")
package lamella.conditioning;
