/**
 * Measured data in: the {@link lamella.api.data.DataImporter} service that instrument-file readers offer, the
 * {@link lamella.api.data.Dataset} they produce, and the shared, bounded, line-numbered reading helpers that make every
 * importer refuse hostile input the same way. SI units inside, phase in degrees.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.4.0")
package lamella.api.data;
