/** Importer profiles: declarative instrument formats read from bundles and folders. Private; offered as services. */
package lamella.io.profiles;
