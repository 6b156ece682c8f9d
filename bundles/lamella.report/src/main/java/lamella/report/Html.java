package lamella.report;

import java.util.List;

/** A page under construction: text is escaped on the way in, so that a case's words cannot become markup. */
final class Html {

    private final StringBuilder out = new StringBuilder();

    static String escape(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (char c : s.toCharArray()) {
            switch (c) {
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '&' -> sb.append("&amp;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> sb.append(c);
            }
        }
        return sb.toString();
    }

    /** Markup written as given: only for the page's own fixed tags. */
    Html raw(String markup) {
        out.append(markup);
        return this;
    }

    Html text(String s) {
        out.append(escape(s));
        return this;
    }

    /** An element with escaped text content, such as {@code <h2>…</h2>}. */
    Html element(String tag, String text) {
        return raw("<" + tag + ">").text(text).raw("</" + tag + ">\n");
    }

    Html element(String tag, String cssClass, String text) {
        return raw("<" + tag + " class=\"" + cssClass + "\">").text(text).raw("</" + tag + ">\n");
    }

    /** A table row of header cells. */
    Html headRow(List<String> cells) {
        raw("<tr>");
        cells.forEach(c -> raw("<th>").text(c).raw("</th>"));
        return raw("</tr>\n");
    }

    /** A table row; the first cell names the row. */
    Html row(List<String> cells) {
        raw("<tr>");
        for (int i = 0; i < cells.size(); i++) {
            raw(i == 0 ? "<th scope=\"row\">" : "<td>").text(cells.get(i)).raw(i == 0 ? "</th>" : "</td>");
        }
        return raw("</tr>\n");
    }

    @Override
    public String toString() {
        return out.toString();
    }
}
