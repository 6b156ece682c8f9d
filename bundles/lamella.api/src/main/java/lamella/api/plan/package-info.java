/** Experiment design: the plan service and the ranked plans it returns. */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.1.1")
package lamella.api.plan;
