/**
 * The one strict reader of the JSON that Lamella reads — case files, material libraries, the workbench's own files:
 * every value with its line and JSON path, and every problem (a comment, NaN, a file cut short, a duplicate key,
 * nesting too deep, a number too long) said in the trade's words at file:line:path. Plain Java.
 */
@org.osgi.annotation.bundle.Export
@org.osgi.annotation.versioning.Version("0.1.0")
package lamella.api.json;
