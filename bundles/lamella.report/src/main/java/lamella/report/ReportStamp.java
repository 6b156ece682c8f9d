package lamella.report;

import java.time.Instant;

/**
 * Which Lamella wrote a report, and when.
 *
 * @param version the version of the report bundle
 * @param written the moment of writing
 */
record ReportStamp(String version, Instant written) {
}
