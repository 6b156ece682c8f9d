/** Experiment design: the plan service and the ranked plans it returns. */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.2.0")
package lamella.api.plan;
