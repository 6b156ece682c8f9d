/**
 * The layered-stack point response and the spectral quadrature that geometries integrate it with. Plain Java: no
 * OSGi at run time, so batch jobs and tests use it directly.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.2.0")
package lamella.engine;
