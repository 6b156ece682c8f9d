/**
 * The workbench's contract with its panels: panels are {@link lamella.ui.api.WorkbenchPanel} services; each gets the
 * {@link lamella.ui.api.Workbench} — the {@link lamella.ui.api.Project} being edited, the live services, messages and
 * background work. All panel and project calls happen on the SWT UI thread; work that takes time goes through
 * {@link lamella.ui.api.Workbench#background}.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.4.0")
package lamella.ui.api;
