/**
 * Plug-ins held behind guards: whatever a geometry or technique from another bundle throws or returns that is not
 * a usable answer becomes a {@link lamella.api.ModelEvaluationException} naming it and its bundle. Every consumer of
 * live geometries and techniques (commands, the fitter, the workbench) holds them this way.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.1.0")
package lamella.api.guard;
