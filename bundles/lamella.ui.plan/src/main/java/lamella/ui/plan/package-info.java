/** The workbench's Plan panel (implementation; nothing exported). */
package lamella.ui.plan;
