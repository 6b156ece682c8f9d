/**
 * The workbench's panels: stack, set-up, signal, sensitivity, fit and materials, each a
 * {@link lamella.ui.api.WorkbenchPanel} service. Every edit goes through the {@link lamella.ui.api.Project}; model
 * and fit work runs through {@link lamella.ui.api.Workbench#background}.
 */
package lamella.ui.panels;
