/** Fitting, sensitivity and uncertainty: the service and the results it returns. */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.3.0")
package lamella.api.fit;
