package lamella.api.data;

import java.io.Closeable;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.FileProblems;
import lamella.api.InputException;

/**
 * The lines of a text file, streamed one at a time within {@link ImportLimits}: the size is checked before reading,
 * no line or line count grows without bound, and line ends may be LF, CRLF or CR. Every error names the file and line.
 *
 * <p>The encoding is found from the bytes, and {@link #encoding()} says which was used: a byte-order mark decides
 * UTF-8 or UTF-16 (little or big endian); without one, the file is UTF-8 when all of it is valid UTF-8, else Latin-1
 * (ISO 8859-1), or Windows-1252 when it uses that code page's printable characters in 0x80–0x9F. A file that is
 * none of these — a NUL byte outside UTF-16, or control bytes in a file that is not UTF-8 — is refused as binary at
 * the line of the first such byte, never read as text.
 */
public final class TextLines implements Closeable {

    /**
     * The {@link Dataset#metadata()} key under which importers record {@link #encoding()}, the encoding the text was
     * read in (not a value the file states).
     */
    public static final String ENCODING_KEY = "lamella.text_encoding";

    private final Path file;
    private final InputStream in;
    private final String encoding;
    private final boolean skipBom;
    private final CharsetDecoder decoder;
    private final byte[] buffer = new byte[ImportLimits.MAX_LINE_BYTES];
    private final byte[] chunk = new byte[1 << 16];
    private int chunkLength;
    private int chunkPosition;
    private int line;
    private boolean pendingLf;
    private boolean lastTerminated = true;

    private TextLines(Path file, InputStream in, TextEncoding.Found found) {
        this.file = file;
        this.in = in;
        this.encoding = found.description();
        this.skipBom = found.skipUtf8Bom();
        this.decoder = found.lineCharset().newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
    }

    /**
     * Opens a data file after checking that it exists, is a regular file, is not empty and is within the size limit,
     * and finds its encoding (which reads the file once through).
     */
    public static TextLines open(Path file) throws InputException {
        checkReadable(file);
        TextEncoding.Found found = TextEncoding.find(file);
        if (found.utf8Bytes() != null) {
            return new TextLines(file, new java.io.ByteArrayInputStream(found.utf8Bytes()), found);
        }
        try {
            return new TextLines(file, Files.newInputStream(file), found);
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read: " + FileProblems.reason(e));
        }
    }

    /**
     * The first bytes of a data file for {@link DataImporter#confidence}, after the checks of {@link #open}: a NUL
     * byte outside UTF-16 text is refused at once (the file is binary); UTF-16 text, which has a byte-order mark, is
     * given as UTF-8 so that every importer sees text, cut after its last complete line when the head was cut.
     */
    public static byte[] head(Path file) throws InputException {
        checkReadable(file);
        byte[] head;
        try (InputStream in = Files.newInputStream(file)) {
            head = in.readNBytes(ImportLimits.HEAD_BYTES);
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read: " + FileProblems.reason(e));
        }
        byte[] utf8 = TextEncoding.utf16HeadAsUtf8(head, head.length == ImportLimits.HEAD_BYTES);
        if (utf8 != null) {
            return utf8;
        }
        int line = 1;
        for (int k = 0; k < head.length; k++) {
            if (head[k] == 0) {
                throw new InputException(file, null, line, "contains a NUL byte (offset " + k + "): this is a"
                        + " binary file, not text");
            }
            if (head[k] == '\n') {
                line++;
            }
        }
        return head;
    }

    /**
     * The encoding the file is read in, in words, with why where it was not plain UTF-8: "UTF-8", "UTF-8 (byte-order
     * mark)", "UTF-16 little-endian (byte-order mark)", "Latin-1 (the file is not valid UTF-8: line 3)", …
     */
    public String encoding() {
        return encoding;
    }

    /** The checks of {@link #open}, for callers that read the head of a file first. */
    public static void checkReadable(Path file) throws InputException {
        if (!Files.exists(file)) {
            throw new InputException(file, null, -1, "no such file");
        }
        if (Files.isDirectory(file)) {
            throw new InputException(file, null, -1, "is a directory; expected a data file");
        }
        if (!Files.isRegularFile(file)) {
            throw new InputException(file, null, -1, "not a regular file");
        }
        long size;
        try {
            size = Files.size(file);
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read its size: " + FileProblems.reason(e));
        }
        if (size == 0) {
            throw new InputException(file, null, -1, "the file is empty; expected a data file");
        }
        if (size > ImportLimits.MAX_FILE_BYTES) {
            throw new InputException(file, null, -1, "the file is " + ImportLimits.describeSize(size)
                    + "; data files are read up to " + ImportLimits.describeSize(ImportLimits.MAX_FILE_BYTES)
                    + " — split it into smaller files");
        }
    }

    public Path file() {
        return file;
    }

    /** The 1-based number of the line last returned by {@link #next()}. */
    public int line() {
        return line;
    }

    /** Whether the last line read ended with a line break (a file cut short usually does not). */
    public boolean lastLineTerminated() {
        return lastTerminated;
    }

    /** The next line without its line break, or null at the end of the file. */
    public String next() throws InputException {
        int length = 0;
        boolean any = false;
        try {
            while (true) {
                int b = read();
                if (b < 0) {
                    if (!any) {
                        return null;
                    }
                    lastTerminated = false;
                    break;
                }
                if (pendingLf) {
                    pendingLf = false;
                    if (b == '\n') {
                        continue;
                    }
                }
                any = true;
                if (b == '\n') {
                    break;
                }
                if (b == '\r') {
                    pendingLf = true;
                    break;
                }
                if (b == 0) {
                    throw error(line + 1, "contains a NUL byte: this is a binary file, not text");
                }
                if (length == buffer.length) {
                    throw error(line + 1, "the line is longer than " + ImportLimits.MAX_LINE_BYTES
                            + " bytes; this is not a data file");
                }
                buffer[length++] = (byte) b;
            }
        } catch (IOException e) {
            throw error(line + 1, "cannot read: " + FileProblems.reason(e));
        }
        line++;
        if (line > ImportLimits.MAX_LINES) {
            throw error(line, "more than " + ImportLimits.MAX_LINES + " lines; data files are read up to that many");
        }
        return decode(length);
    }

    private int read() throws IOException {
        if (chunkPosition == chunkLength) {
            chunkLength = in.read(chunk);
            chunkPosition = 0;
            if (chunkLength <= 0) {
                chunkLength = 0;
                return -1;
            }
        }
        return chunk[chunkPosition++] & 0xFF;
    }

    private String decode(int length) throws InputException {
        int start = 0;
        if (line == 1 && skipBom && length >= 3 && buffer[0] == (byte) 0xEF && buffer[1] == (byte) 0xBB
                && buffer[2] == (byte) 0xBF) {
            start = 3;
        }
        try {
            CharBuffer chars = decoder.reset().decode(ByteBuffer.wrap(buffer, start, length - start));
            return chars.toString();
        } catch (CharacterCodingException e) {
            // Cannot happen for a file TextEncoding accepted (it checked every byte); said as the file's fault only
            // because a file that changes while it is read is.
            throw error(line, "changed while it was read: this line is no longer " + encoding + " text");
        }
    }

    /** A problem at a line of this file. */
    public InputException error(int atLine, String problem) {
        return new InputException(file, null, atLine, problem);
    }

    /** A problem at the line last read. */
    public InputException error(String problem) {
        return error(line, problem);
    }

    @Override
    public void close() {
        try {
            in.close();
        } catch (IOException e) {
            // Nothing was written, so a failed close of a file opened for reading loses nothing.
        }
    }
}
