package lamella.api.json;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import lamella.api.Block;

/**
 * Reads the JSON that Lamella reads: one object at the top level, strict UTF-8 (a leading byte-order mark is
 * skipped), the grammar of RFC 8259 and nothing more. Every object becomes a {@link Block} at its JSON path, every
 * number a finite {@link Double}; the line of every object member (its key's line) and of every list element is
 * kept. Whatever JSON does not allow, or Lamella does not accept, is a {@link JsonProblem} in words: comments,
 * NaN and Infinity, single quotes, trailing commas, a duplicate key, null, nesting deeper than {@link #MAX_DEPTH},
 * a number longer than {@link #MAX_NUMBER_CHARS} characters or beyond double precision, a file cut short.
 */
public final class StrictJson {

    /** Objects and lists nest at most this deep; a hand-written document never comes near. */
    public static final int MAX_DEPTH = 64;
    /** A number is at most this many characters; double precision needs 25. */
    public static final int MAX_NUMBER_CHARS = 100;

    private static final Pattern NUMBER = Pattern.compile("-?(0|[1-9][0-9]*)(\\.[0-9]+)?([eE][+-]?[0-9]+)?");
    private static final String FINITE = "a value must be a finite number";

    /** A document read: its top-level object and the line of every JSON path in it ("" for the object itself). */
    public record Document(Block root, Map<String, Integer> lines) {

        /** The line of a JSON path, or of its nearest enclosing path that has one; −1 when none has. */
        public int lineOf(String path) {
            String p = path;
            while (p != null) {
                Integer line = lines.get(p);
                if (line != null) {
                    return line;
                }
                if (p.isEmpty()) {
                    return -1;
                }
                int cut = Math.max(p.lastIndexOf('.'), p.lastIndexOf('['));
                p = cut > 0 ? p.substring(0, cut) : "";
            }
            return -1;
        }
    }

    private final char[] s;
    private final boolean nullsAllowed;
    private final Map<String, Integer> lines = new HashMap<>();
    private int pos;
    private int line = 1;

    private StrictJson(char[] s, boolean nullsAllowed) {
        this.s = s;
        this.nullsAllowed = nullsAllowed;
        if (s.length > 0 && s[0] == '\uFEFF') {
            pos = 1;
        }
    }

    /** Reads a document from its bytes, which must be UTF-8. Null is refused ("leave the key out instead"). */
    public static Document read(byte[] bytes) throws JsonProblem {
        return read(decode(bytes));
    }

    /** Reads a document from its text. Null is refused ("leave the key out instead"). */
    public static Document read(String text) throws JsonProblem {
        StrictJson r = new StrictJson(text.toCharArray(), false);
        Block root = r.document();
        return new Document(root, Collections.unmodifiableMap(r.lines));
    }

    /**
     * Checks that a text is one JSON object by the same rules, null allowed — for files that another library then
     * reads (the workbench's own), so that their problems too are said in these words.
     */
    public static void check(String text) throws JsonProblem {
        new StrictJson(text.toCharArray(), true).document();
    }

    /** Strict UTF-8: a byte that is not is a problem at its line. */
    public static String decode(byte[] bytes) throws JsonProblem {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult r = decoder.decode(in, out, true);
        if (!r.isError()) {
            r = decoder.flush(out);
        }
        if (r.isError()) {
            int at = in.position();
            int line = 1;
            for (int i = 0; i < at; i++) {
                if (bytes[i] == '\n') {
                    line++;
                }
            }
            throw new JsonProblem(line, "", String.format(Locale.ROOT,
                    "the file is not UTF-8 text (byte 0x%02X, byte %d of the file); save it as UTF-8",
                    bytes[at] & 0xFF, at + 1));
        }
        out.flip();
        return out.toString();
    }

    private Block document() throws JsonProblem {
        skipSpace();
        if (pos >= s.length) {
            throw new JsonProblem(1, "", "the file is empty; expected a JSON object");
        }
        char c = s[pos];
        if (c != '{') {
            if (c == '[' || c == '"' || c == '-' || (c >= '0' && c <= '9') || word().matches("true|false|null")) {
                throw problem("", "expected a JSON object at the top level, found " + kindAt());
            }
            throw notAValue("");
        }
        lines.put("", line);
        Block root = (Block) value("", 0);
        skipSpace();
        if (pos < s.length) {
            if (startsComment()) {
                throw problem("", "comments are not part of JSON; remove the comment after the end of the object");
            }
            throw problem("", "unexpected content after the end of the JSON object");
        }
        return root;
    }

    private Object value(String path, int depth) throws JsonProblem {
        skipSpace();
        if (pos >= s.length) {
            throw problem(path, "the file is cut short: it ends where a value was expected");
        }
        char c = s[pos];
        switch (c) {
            case '{':
                return object(path, depth + 1);
            case '[':
                return list(path, depth + 1);
            case '"':
                return text(path);
            default:
                break;
        }
        if (c == '-' || (c >= '0' && c <= '9')) {
            return number(path);
        }
        String w = word();
        switch (w) {
            case "true":
                pos += 4;
                return Boolean.TRUE;
            case "false":
                pos += 5;
                return Boolean.FALSE;
            case "null":
                if (!nullsAllowed) {
                    throw new JsonProblem(valueLine(path), path, "null is not a value; leave the key out instead");
                }
                pos += 4;
                return null;
            default:
                throw notAValue(path);
        }
    }

    private Block object(String path, int depth) throws JsonProblem {
        tooDeep(path, depth);
        int opened = line;
        pos++;
        Map<String, Object> values = new LinkedHashMap<>();
        Map<String, Integer> keyLines = new HashMap<>();
        skipSpace();
        if (pos < s.length && s[pos] == '}') {
            pos++;
            return new Block(path, values);
        }
        while (true) {
            skipSpace();
            if (pos >= s.length) {
                throw cutShort(path, "object", opened);
            }
            char c = s[pos];
            if (c == '}') {
                throw problem(path, "a comma before '}'; remove the comma after the last member");
            }
            if (c != '"') {
                if (startsComment()) {
                    throw comment(path);
                }
                if (c == '\'') {
                    throw problem(path, "a key must be written in double quotes (\"key\"), not single quotes");
                }
                String w = word();
                throw problem(path, w.isEmpty()
                        ? "expected a key in double quotes, found " + shown(c)
                        : "the key " + w + " must be written in double quotes (\"" + w + "\")");
            }
            int keyLine = line;
            String key = text(path);
            String at = path.isEmpty() ? key : path + "." + key;
            Integer first = keyLines.putIfAbsent(key, keyLine);
            if (first != null) {
                throw new JsonProblem(keyLine, at, "the key '" + key + "' appears twice in the same object (first"
                        + " at line " + first + "); keep one");
            }
            skipSpace();
            if (pos >= s.length) {
                throw cutShort(path, "object", opened);
            }
            if (s[pos] != ':') {
                throw problem(at, "expected ':' after the key '" + key + "', found " + shown(s[pos]));
            }
            pos++;
            lines.put(at, keyLine);
            values.put(key, value(at, depth));
            skipSpace();
            if (pos >= s.length) {
                throw cutShort(path, "object", opened);
            }
            c = s[pos];
            if (c == ',') {
                pos++;
            } else if (c == '}') {
                pos++;
                return new Block(path, values);
            } else if (startsComment()) {
                throw comment(path);
            } else {
                throw problem(at, "expected ',' or '}' after the value of '" + key + "', found " + shown(c));
            }
        }
    }

    private List<Object> list(String path, int depth) throws JsonProblem {
        tooDeep(path, depth);
        int opened = line;
        pos++;
        List<Object> values = new ArrayList<>();
        skipSpace();
        if (pos < s.length && s[pos] == ']') {
            pos++;
            return values;
        }
        while (true) {
            skipSpace();
            if (pos >= s.length) {
                throw cutShort(path, "list", opened);
            }
            if (s[pos] == ']') {
                throw problem(path, "a comma before ']'; remove the comma after the last element");
            }
            String at = path + "[" + values.size() + "]";
            lines.put(at, line);
            values.add(value(at, depth));
            skipSpace();
            if (pos >= s.length) {
                throw cutShort(path, "list", opened);
            }
            char c = s[pos];
            if (c == ',') {
                pos++;
            } else if (c == ']') {
                pos++;
                return values;
            } else if (startsComment()) {
                throw comment(path);
            } else {
                throw problem(at, "expected ',' or ']' after this element, found " + shown(c));
            }
        }
    }

    private String text(String path) throws JsonProblem {
        int opened = line;
        pos++;
        StringBuilder sb = new StringBuilder();
        while (true) {
            if (pos >= s.length) {
                throw new JsonProblem(line, path, "the file is cut short: it ends inside text that starts at line "
                        + opened);
            }
            char c = s[pos++];
            if (c == '"') {
                return sb.toString();
            }
            if (c == '\n' || c == '\r') {
                throw new JsonProblem(opened, path, "the text is not closed on its line (a closing \" is missing,"
                        + " or a line break inside text must be written \\n)");
            }
            if (c < 0x20) {
                throw new JsonProblem(line, path, String.format(Locale.ROOT,
                        "a control character (U+%04X) inside text; write it as an escape such as \\t", (int) c));
            }
            if (c != '\\') {
                sb.append(c);
                continue;
            }
            if (pos >= s.length) {
                throw new JsonProblem(line, path, "the file is cut short: it ends inside text that starts at line "
                        + opened);
            }
            char e = s[pos++];
            switch (e) {
                case '"', '\\', '/' -> sb.append(e);
                case 'b' -> sb.append('\b');
                case 'f' -> sb.append('\f');
                case 'n' -> sb.append('\n');
                case 'r' -> sb.append('\r');
                case 't' -> sb.append('\t');
                case 'u' -> {
                    int code = 0;
                    for (int i = 0; i < 4; i++) {
                        int d = pos < s.length ? Character.digit(s[pos], 16) : -1;
                        if (d < 0) {
                            throw new JsonProblem(line, path, "\\u in text must be followed by four hexadecimal"
                                    + " digits");
                        }
                        code = code * 16 + d;
                        pos++;
                    }
                    sb.append((char) code);
                }
                default -> throw new JsonProblem(line, path, "unknown escape \\" + e + " in text; the escapes are"
                        + " \\\" \\\\ \\/ \\b \\f \\n \\r \\t and \\u followed by four hexadecimal digits");
            }
        }
    }

    private Double number(String path) throws JsonProblem {
        int start = pos;
        while (pos < s.length && isWordChar(s[pos])) {
            pos++;
        }
        String n = new String(s, start, pos - start);
        if (n.length() > 1 && n.charAt(0) == '-' && isNonFinite(n.substring(1))) {
            pos = start;
            throw notAValue(path);
        }
        if (n.length() > MAX_NUMBER_CHARS) {
            throw new JsonProblem(valueLine(path), path, "a number of " + n.length() + " characters (" + n.substring(0, 12)
                    + "…); a number may have at most " + MAX_NUMBER_CHARS);
        }
        if (!NUMBER.matcher(n).matches()) {
            throw new JsonProblem(valueLine(path), path, "'" + n + "' is not a number as JSON writes one (digits with an"
                    + " optional '-', '.' and exponent, such as 2.5e-9; no leading '+' or zeros, no hexadecimal)");
        }
        double d = Double.parseDouble(n);
        if (Double.isInfinite(d)) {
            throw new JsonProblem(valueLine(path), path, "the number " + n + " is outside the range of double precision"
                    + " (magnitudes up to about 1.8e308)");
        }
        if (d == 0 && mantissaIsNonZero(n)) {
            throw new JsonProblem(valueLine(path), path, "the number " + n + " is too small for double precision (the"
                    + " smallest is about 4.9e-324) and would read as 0");
        }
        return d;
    }

    private static boolean mantissaIsNonZero(String n) {
        for (int i = 0; i < n.length(); i++) {
            char c = n.charAt(i);
            if (c == 'e' || c == 'E') {
                return false;
            }
            if (c >= '1' && c <= '9') {
                return true;
            }
        }
        return false;
    }

    private JsonProblem notAValue(String path) {
        char c = s[pos];
        if (startsComment()) {
            return comment(path);
        }
        if (c == '\'') {
            return problem(path, "text must be written in double quotes (\"…\"), not single quotes");
        }
        String w = word();
        String bare = w.startsWith("-") || w.startsWith("+") ? w.substring(1) : w;
        if (bare.equalsIgnoreCase("nan")) {
            return new JsonProblem(valueLine(path), path, w + " is not allowed: " + FINITE);
        }
        if (isNonFinite(bare)) {
            return new JsonProblem(valueLine(path), path, w + " is not allowed: " + FINITE);
        }
        if (c == '+') {
            return problem(path, "a number may not start with '+'; leave the sign out");
        }
        if (c == '.') {
            return problem(path, "'" + w + "' is not a number as JSON writes one (a digit comes before the point,"
                    + " as in 0.5)");
        }
        if (c == '}' || c == ']' || c == ',' || c == ':') {
            return problem(path, "expected a value, found " + shown(c));
        }
        if (!w.isEmpty()) {
            return problem(path, "the word " + w + " is not a value; expected a number, text in double quotes, true,"
                    + " false, an object or a list");
        }
        return problem(path, "expected a value, found " + shown(c));
    }

    private static boolean isNonFinite(String w) {
        return w.equalsIgnoreCase("infinity") || w.equalsIgnoreCase("inf") || w.equalsIgnoreCase("nan");
    }

    private void tooDeep(String path, int depth) throws JsonProblem {
        if (depth > MAX_DEPTH) {
            throw problem(path, "objects and lists are nested more than " + MAX_DEPTH + " deep here; a Lamella file"
                    + " needs a few levels");
        }
    }

    private JsonProblem cutShort(String path, String what, int opened) {
        String where = path.isEmpty() ? "the top-level object" : "the " + what + " " + path;
        return new JsonProblem(line, path, "the file is cut short: " + where + " (opened at line " + opened
                + ") is not closed");
    }

    private JsonProblem comment(String path) {
        return problem(path, "comments are not part of JSON; remove the comment (a case file may say what it is in"
                + " its \"description\")");
    }

    private boolean startsComment() {
        return pos < s.length && (s[pos] == '#'
                || (s[pos] == '/' && pos + 1 < s.length && (s[pos + 1] == '/' || s[pos + 1] == '*')));
    }

    /** The letters, digits and signs from here on, such as NaN, -Infinity or an unquoted key; empty if none. */
    private String word() {
        int end = pos;
        while (end < s.length && end - pos < 40 && isWordChar(s[end])) {
            end++;
        }
        return new String(s, pos, end - pos);
    }

    private static boolean isWordChar(char c) {
        return Character.isLetterOrDigit(c) || c == '_' || c == '+' || c == '-' || c == '.';
    }

    private String kindAt() {
        char c = s[pos];
        if (c == '[') {
            return "a list";
        }
        if (c == '"') {
            return "text";
        }
        if (c == '-' || (c >= '0' && c <= '9')) {
            return "a number";
        }
        return "the value " + word();
    }

    private static String shown(char c) {
        if (c < 0x20 || Character.isWhitespace(c) || Character.isISOControl(c)) {
            return String.format(Locale.ROOT, "the character U+%04X", (int) c);
        }
        return "'" + c + "'";
    }

    /** A value's problem is told at its path's line: an object member's key, a list element's start. */
    private int valueLine(String path) {
        return lines.getOrDefault(path, line);
    }

    private JsonProblem problem(String path, String problem) {
        return new JsonProblem(line, path, problem);
    }

    private void skipSpace() {
        while (pos < s.length) {
            char c = s[pos];
            if (c == '\n') {
                line++;
            } else if (c == '\r') {
                if (pos + 1 >= s.length || s[pos + 1] != '\n') {
                    line++;
                }
            } else if (c != ' ' && c != '\t') {
                return;
            }
            pos++;
        }
    }
}
