/** Material libraries from bundles and folders, and the materials command. Implementation only: used as services. */
package lamella.materials;
