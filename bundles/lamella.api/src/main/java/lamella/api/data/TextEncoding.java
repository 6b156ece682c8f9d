package lamella.api.data;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.Charset;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.FileProblems;
import lamella.api.InputException;

/**
 * Finds a data file's text encoding from its bytes, for {@link TextLines}. One pass over the file checks UTF-8
 * validity by hand (no decoding), and notes the first NUL byte, the first control byte and the first byte in
 * 0x80–0x9F; from these the encoding follows without guessing from statistics:
 * <ul>
 * <li>a UTF-16 byte-order mark (FF FE or FE FF): UTF-16 in that byte order, decoded strictly and given to the line
 * reader as UTF-8;</li>
 * <li>else all of it valid UTF-8 (a UTF-8 byte-order mark is skipped): UTF-8;</li>
 * <li>else no NUL and no control byte other than tab, line feed, form feed and carriage return: Latin-1, or
 * Windows-1252 when bytes 0x80–0x9F occur and are all printable in that code page (€, curly quotes, dashes);</li>
 * <li>else binary, refused at the line of the first offending byte.</li>
 * </ul>
 */
final class TextEncoding {

    /** Windows-1252 leaves these five bytes undefined; a file that has them is not text in that code page. */
    private static final String CP1252_UNDEFINED = "\u0081\u008D\u008F\u0090\u009D";

    private static final Charset WINDOWS_1252 = Charset.forName("windows-1252");

    /**
     * What was found: the description for the user, the charset each line's bytes are decoded in, whether a UTF-8
     * byte-order mark begins the first line, and for UTF-16 the whole text already as UTF-8 bytes.
     */
    record Found(String description, Charset lineCharset, boolean skipUtf8Bom, byte[] utf8Bytes) {
    }

    private TextEncoding() {
    }

    static Found find(Path file) throws InputException {
        byte[] start = new byte[3];
        int n;
        try (InputStream in = Files.newInputStream(file)) {
            n = in.readNBytes(start, 0, 3);
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read: " + FileProblems.reason(e));
        }
        if (n >= 2 && (start[0] & 0xFF) == 0xFF && (start[1] & 0xFF) == 0xFE) {
            return utf16(file, StandardCharsets.UTF_16LE, "UTF-16 little-endian (byte-order mark)");
        }
        if (n >= 2 && (start[0] & 0xFF) == 0xFE && (start[1] & 0xFF) == 0xFF) {
            return utf16(file, StandardCharsets.UTF_16BE, "UTF-16 big-endian (byte-order mark)");
        }
        boolean bom = n == 3 && (start[0] & 0xFF) == 0xEF && (start[1] & 0xFF) == 0xBB && (start[2] & 0xFF) == 0xBF;
        Scan scan = new Scan();
        try (InputStream in = Files.newInputStream(file)) {
            byte[] chunk = new byte[1 << 16];
            int r;
            while ((r = in.read(chunk)) > 0) {
                scan.feed(chunk, r);
            }
            scan.end();
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read: " + FileProblems.reason(e));
        }
        if (scan.firstInvalidUtf8Line < 0) {
            return new Found(bom ? "UTF-8 (byte-order mark)" : "UTF-8", StandardCharsets.UTF_8, bom, null);
        }
        // Not UTF-8, and no byte-order mark: a NUL byte or another control byte says binary, since no text
        // encoding but UTF-16 has them in a data file.
        if (scan.firstNulLine > 0) {
            if (scan.firstNulLine <= scan.firstInvalidUtf8Line) {
                throw new InputException(file, null, scan.firstNulLine, "contains a NUL byte: this is a binary file,"
                        + " not text");
            }
            throw new InputException(file, null, scan.firstInvalidUtf8Line, "is not text: a byte sequence that no"
                    + " UTF-8 text contains, and a NUL byte on line " + scan.firstNulLine + "; a binary file is no"
                    + " data file");
        }
        if (scan.firstControlLine > 0) {
            throw new InputException(file, null, scan.firstControlLine, "is not text: control byte 0x"
                    + String.format("%02X", scan.firstControl) + " in a file that is not UTF-8 either (line "
                    + scan.firstInvalidUtf8Line + " has a byte sequence no UTF-8 text contains); a binary file is no"
                    + " data file");
        }
        String why = " (the file is not valid UTF-8: line " + scan.firstInvalidUtf8Line + ")";
        if (scan.firstC1Line > 0) {
            if (scan.firstCp1252UndefinedLine > 0) {
                throw new InputException(file, null, scan.firstCp1252UndefinedLine, "is not text: byte 0x"
                        + String.format("%02X", scan.firstCp1252Undefined) + " is neither UTF-8 nor a character of"
                        + " Latin-1 or Windows-1252 text; a binary file is no data file");
            }
            return new Found("Windows-1252" + why, WINDOWS_1252, false, null);
        }
        return new Found("Latin-1" + why, StandardCharsets.ISO_8859_1, false, null);
    }

    private static Found utf16(Path file, Charset charset, String description) throws InputException {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read: " + FileProblems.reason(e));
        }
        CharsetDecoder d = charset.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        boolean half = (bytes.length - 2) % 2 == 1;
        ByteBuffer in = ByteBuffer.wrap(bytes, 2, bytes.length - 2 - (half ? 1 : 0));
        CharBuffer out = CharBuffer.allocate(bytes.length / 2 + 1);
        CoderResult result = d.decode(in, out, true);
        if (!result.isError()) {
            result = d.flush(out);
        }
        if (result.isError() || half) {
            out.flip();
            int line = 1;
            for (int i = 0; i < out.length(); i++) {
                char c = out.charAt(i);
                if (c == '\n' || (c == '\r' && (i + 1 == out.length() || out.charAt(i + 1) != '\n'))) {
                    line++;
                }
            }
            throw new InputException(file, null, line, "is not " + description.replace(" (byte-order mark)", "")
                    + " text although it begins with that byte-order mark: "
                    + (result.isError() ? "a byte sequence (an unpaired surrogate) that no such text contains"
                    : "it ends in half a character"));
        }
        out.flip();
        return new Found(description, StandardCharsets.UTF_8, false, out.toString().getBytes(StandardCharsets.UTF_8));
    }

    /**
     * A UTF-16 head (it begins with a byte-order mark) as UTF-8 bytes without the mark, malformed or cut-off tails
     * dropped and, when the head was cut, only its complete lines; null when the head is not UTF-16.
     */
    static byte[] utf16HeadAsUtf8(byte[] head, boolean cut) {
        Charset cs;
        if (head.length >= 2 && (head[0] & 0xFF) == 0xFF && (head[1] & 0xFF) == 0xFE) {
            cs = StandardCharsets.UTF_16LE;
        } else if (head.length >= 2 && (head[0] & 0xFF) == 0xFE && (head[1] & 0xFF) == 0xFF) {
            cs = StandardCharsets.UTF_16BE;
        } else {
            return null;
        }
        CharsetDecoder d = cs.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        CharBuffer out = CharBuffer.allocate(head.length / 2 + 1);
        d.decode(ByteBuffer.wrap(head, 2, head.length - 2), out, !cut);
        out.flip();
        String text = out.toString();
        if (cut) {
            int end = Math.max(text.lastIndexOf('\n'), text.lastIndexOf('\r'));
            text = end < 0 ? "" : text.substring(0, end + 1);
        }
        return text.getBytes(StandardCharsets.UTF_8);
    }

    /** The one pass over the bytes: a UTF-8 validator and the first of each kind of byte that matters. */
    private static final class Scan {
        int line = 1;
        int need;          // continuation bytes still expected in the current UTF-8 sequence
        int min;           // the smallest code point the sequence may encode (overlong check)
        int code;
        int firstInvalidUtf8Line = -1;
        int firstNulLine = -1;
        int firstControlLine = -1;
        int firstControl;
        int firstC1Line = -1;
        int firstCp1252UndefinedLine = -1;
        int firstCp1252Undefined;

        void feed(byte[] bytes, int n) {
            for (int i = 0; i < n; i++) {
                int b = bytes[i] & 0xFF;
                if (b == 0 && firstNulLine < 0) {
                    firstNulLine = line;
                } else if (b < 0x20 && b != '\t' && b != '\n' && b != '\r' && b != '\f' && firstControlLine < 0) {
                    firstControlLine = line;
                    firstControl = b;
                } else if (b == 0x7F && firstControlLine < 0) {
                    firstControlLine = line;
                    firstControl = b;
                } else if (b >= 0x80 && b <= 0x9F) {
                    if (firstC1Line < 0) {
                        firstC1Line = line;
                    }
                    if (firstCp1252UndefinedLine < 0 && CP1252_UNDEFINED.indexOf((char) b) >= 0) {
                        firstCp1252UndefinedLine = line;
                        firstCp1252Undefined = b;
                    }
                }
                if (firstInvalidUtf8Line < 0) {
                    utf8(b);
                }
                if (b == '\n') {
                    line++;
                }
            }
        }

        private void utf8(int b) {
            if (need > 0) {
                if ((b & 0xC0) != 0x80) {
                    firstInvalidUtf8Line = line;
                    return;
                }
                code = (code << 6) | (b & 0x3F);
                if (--need == 0 && (code < min || code > 0x10FFFF || (code >= 0xD800 && code <= 0xDFFF))) {
                    firstInvalidUtf8Line = line;
                }
                return;
            }
            if (b < 0x80) {
                return;
            }
            if (b >= 0xC2 && b <= 0xDF) {
                need = 1;
                min = 0x80;
                code = b & 0x1F;
            } else if (b >= 0xE0 && b <= 0xEF) {
                need = 2;
                min = 0x800;
                code = b & 0x0F;
            } else if (b >= 0xF0 && b <= 0xF4) {
                need = 3;
                min = 0x10000;
                code = b & 0x07;
            } else {
                firstInvalidUtf8Line = line;
            }
        }

        void end() {
            if (need > 0 && firstInvalidUtf8Line < 0) {
                firstInvalidUtf8Line = line;
            }
        }
    }
}
