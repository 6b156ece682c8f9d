/** An example importer plug-in: an invented instrument's key = value sweep log. Implementation only: nothing exported. */
package lab.example.sweeplog;
