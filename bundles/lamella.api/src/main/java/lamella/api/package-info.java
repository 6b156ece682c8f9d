/**
 * Lamella's shared vocabulary: the layered sample, heating geometries, techniques and the parameter model that
 * case files, fitters and user interfaces address in one way. SI units throughout.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.5.0")
package lamella.api;
