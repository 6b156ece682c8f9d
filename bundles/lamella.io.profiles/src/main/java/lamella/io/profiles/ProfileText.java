package lamella.io.profiles;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lamella.api.InputException;
import lamella.api.data.ImportLimits;
import lamella.api.data.TextLines;

/**
 * The lines of an instrument file in a profile's encoding, within {@link ImportLimits}. Automatic: a byte-order mark
 * decides (UTF-8, UTF-16 little or big endian); without one the text is UTF-8 if it is valid UTF-8, else Latin-1
 * (ISO 8859-1), which every byte sequence is; which was used is said in {@link #encodingUsed()}. A NUL byte outside
 * UTF-16 marks a binary file.
 */
final class ProfileText {

    private final List<String> lines;
    private final String encodingUsed;
    private final boolean lastTerminated;

    private ProfileText(List<String> lines, String encodingUsed, boolean lastTerminated) {
        this.lines = lines;
        this.encodingUsed = encodingUsed;
        this.lastTerminated = lastTerminated;
    }

    List<String> lines() {
        return lines;
    }

    String encodingUsed() {
        return encodingUsed;
    }

    boolean lastLineTerminated() {
        return lastTerminated;
    }

    static ProfileText read(Path file, Profile.Encoding encoding) throws InputException {
        TextLines.checkReadable(file);
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read: " + reason(e));
        }
        return decode(file, bytes, encoding);
    }

    static ProfileText decode(Path file, byte[] bytes, Profile.Encoding encoding) throws InputException {
        boolean utf16le = bytes.length >= 2 && bytes[0] == (byte) 0xFF && bytes[1] == (byte) 0xFE;
        boolean utf16be = bytes.length >= 2 && bytes[0] == (byte) 0xFE && bytes[1] == (byte) 0xFF;
        boolean utf8bom = bytes.length >= 3 && bytes[0] == (byte) 0xEF && bytes[1] == (byte) 0xBB
                && bytes[2] == (byte) 0xBF;
        String text;
        String used;
        if ((utf16le || utf16be) && (encoding == Profile.Encoding.LATIN_1 || encoding == Profile.Encoding.UTF_8)) {
            throw new InputException(file, null, 1, "the profile reads "
                    + (encoding == Profile.Encoding.LATIN_1 ? "Latin-1" : "UTF-8") + ", but the file begins with a"
                    + " UTF-16 byte-order mark (" + (utf16le ? "FF FE" : "FE FF") + "): it is UTF-16 text; set the"
                    + " profile's encoding to auto or utf-16");
        }
        switch (encoding) {
            case UTF_16 -> {
                if (!utf16le && !utf16be) {
                    throw new InputException(file, null, 1, "the profile reads UTF-16, but the file has no UTF-16"
                            + " byte-order mark (FF FE or FE FF) to say which byte order it uses");
                }
                text = strict(file, bytes, 2, utf16le ? StandardCharsets.UTF_16LE : StandardCharsets.UTF_16BE);
                used = utf16le ? "UTF-16 little-endian (byte-order mark)" : "UTF-16 big-endian (byte-order mark)";
            }
            case LATIN_1 -> {
                noNul(file, bytes);
                text = new String(bytes, StandardCharsets.ISO_8859_1);
                used = "Latin-1 (as the profile says)";
            }
            case UTF_8 -> {
                noNul(file, bytes);
                text = strict(file, bytes, utf8bom ? 3 : 0, StandardCharsets.UTF_8);
                used = "UTF-8" + (utf8bom ? " (byte-order mark)" : "");
            }
            default -> {
                if (utf16le || utf16be) {
                    text = strict(file, bytes, 2, utf16le ? StandardCharsets.UTF_16LE : StandardCharsets.UTF_16BE);
                    used = utf16le ? "UTF-16 little-endian (byte-order mark)" : "UTF-16 big-endian (byte-order mark)";
                } else {
                    noNul(file, bytes);
                    String utf8 = utf8OrNull(bytes, utf8bom ? 3 : 0);
                    if (utf8 != null) {
                        text = utf8;
                        used = "UTF-8" + (utf8bom ? " (byte-order mark)" : "");
                    } else {
                        text = new String(bytes, StandardCharsets.ISO_8859_1);
                        used = "Latin-1 (the file is not valid UTF-8)";
                    }
                }
            }
        }
        if (!text.isEmpty() && text.charAt(0) == '\uFEFF') {
            text = text.substring(1);
        }
        List<String> lines = new ArrayList<>();
        int start = 0;
        int n = text.length();
        boolean terminated = true;
        while (start < n) {
            int end = start;
            while (end < n && text.charAt(end) != '\n' && text.charAt(end) != '\r') {
                end++;
            }
            if (end - start > ImportLimits.MAX_LINE_BYTES) {
                throw new InputException(file, null, lines.size() + 1, "the line is longer than "
                        + ImportLimits.MAX_LINE_BYTES + " characters; this is not a data file");
            }
            lines.add(text.substring(start, end));
            if (lines.size() > ImportLimits.MAX_LINES) {
                throw new InputException(file, null, lines.size(), "more than " + ImportLimits.MAX_LINES
                        + " lines; data files are read up to that many");
            }
            if (end == n) {
                terminated = false;
                break;
            }
            start = end + (text.charAt(end) == '\r' && end + 1 < n && text.charAt(end + 1) == '\n' ? 2 : 1);
        }
        return new ProfileText(lines, used, terminated);
    }

    private static void noNul(Path file, byte[] bytes) throws InputException {
        int line = 1;
        for (byte b : bytes) {
            if (b == '\n') {
                line++;
            } else if (b == 0) {
                throw new InputException(file, null, line, "contains a NUL byte: this is a binary file, or UTF-16"
                        + " text without a byte-order mark");
            }
        }
    }

    private static String utf8OrNull(byte[] bytes, int offset) {
        try {
            return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes, offset, bytes.length - offset)).toString();
        } catch (CharacterCodingException e) {
            return null;
        }
    }

    private static String strict(Path file, byte[] bytes, int offset, Charset cs) throws InputException {
        try {
            return cs.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes, offset, bytes.length - offset)).toString();
        } catch (CharacterCodingException e) {
            throw new InputException(file, null, -1, "is not " + cs.displayName() + " text as the profile says;"
                    + " a byte sequence that no such text contains");
        }
    }

    /** The operating system's reason in words. */
    static String reason(IOException e) {
        if (e instanceof java.nio.file.NoSuchFileException) {
            return "no such file";
        }
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied";
        }
        return e.getMessage() == null ? "an input/output error" : e.getMessage();
    }
}
