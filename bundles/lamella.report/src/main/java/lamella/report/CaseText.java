package lamella.report;

import lamella.api.CaseDocument;

/** What a report says about its case beyond the stack: the description and the case's own technique. */
final class CaseText {

    private CaseText() {
    }

    /** The case's {@code description}, or empty when it has none. */
    static String description(CaseDocument doc) {
        return doc.root().get("description") instanceof String s ? s : "";
    }

    /** The {@code measurement.type} of the case, or empty. */
    static String technique(CaseDocument doc) {
        return doc.measurement().get("type") instanceof String s ? s : "";
    }
}
