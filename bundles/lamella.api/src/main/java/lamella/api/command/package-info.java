/** Headless commands contributed as services and dispatched by name. */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.3.0")
package lamella.api.command;
