/** The Lamella exchange-format importer; private to its bundle (it offers a {@code DataImporter} service). */
package lamella.io.exchange;
