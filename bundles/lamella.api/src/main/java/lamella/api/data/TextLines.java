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
 * The lines of a UTF-8 text file, streamed one at a time within {@link ImportLimits}: the size is checked before
 * reading, each line is decoded strictly (a NUL byte or a byte sequence that is not UTF-8 is an error on that line),
 * and no line or line count grows without bound. Line ends may be LF, CRLF or CR; a leading byte-order mark is
 * skipped. Every error names the file and line.
 */
public final class TextLines implements Closeable {

    private final Path file;
    private final InputStream in;
    private final CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
            .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
    private final byte[] buffer = new byte[ImportLimits.MAX_LINE_BYTES];
    private final byte[] chunk = new byte[1 << 16];
    private int chunkLength;
    private int chunkPosition;
    private int line;
    private boolean pendingLf;
    private boolean lastTerminated = true;

    private TextLines(Path file, InputStream in) {
        this.file = file;
        this.in = in;
    }

    /** Opens a data file after checking that it exists, is a regular file, is not empty and is within the size limit. */
    public static TextLines open(Path file) throws InputException {
        checkReadable(file);
        try {
            return new TextLines(file, Files.newInputStream(file));
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read: " + FileProblems.reason(e));
        }
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
        if (line == 1 && length >= 3 && buffer[0] == (byte) 0xEF && buffer[1] == (byte) 0xBB
                && buffer[2] == (byte) 0xBF) {
            start = 3;
        }
        try {
            CharBuffer chars = decoder.reset().decode(ByteBuffer.wrap(buffer, start, length - start));
            return chars.toString();
        } catch (CharacterCodingException e) {
            throw error(line, "is not UTF-8 text (a byte sequence that no UTF-8 text contains); a binary file"
                    + " is no data file, and a text file in another encoding must be saved as UTF-8");
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
