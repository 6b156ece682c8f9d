/** The delimited-text importer; private to its bundle (it offers a {@code DataImporter} service). */
package lamella.io.delimited;
