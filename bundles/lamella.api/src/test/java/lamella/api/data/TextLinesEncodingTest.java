package lamella.api.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import lamella.api.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The line reader's encodings. The UTF-8 validity rules (no overlong forms, no surrogates, nothing above U+10FFFF)
 * are those of RFC 3629, section 3; the byte-order marks those of the Unicode Standard, section 23.8; Windows-1252's
 * five undefined bytes (0x81, 0x8D, 0x8F, 0x90, 0x9D) from Microsoft's published code page table, from memory.
 */
class TextLinesEncodingTest {

    @TempDir
    Path dir;

    private Path write(byte[] bytes) throws IOException {
        Path f = dir.resolve("f.txt");
        Files.write(f, bytes);
        return f;
    }

    private static List<String> lines(TextLines in) throws InputException {
        List<String> out = new ArrayList<>();
        String l;
        while ((l = in.next()) != null) {
            out.add(l);
        }
        return out;
    }

    @Test
    void aMultiByteCharacterAcrossTheReadChunkBoundaryIsStillUtf8() throws Exception {
        // The scan reads 64 KiB at a time: put µ's two bytes on either side of that boundary.
        StringBuilder sb = new StringBuilder();
        while (sb.length() < (1 << 16) - 1) {
            sb.append(sb.length() % 80 == 79 ? '\n' : 'a');
        }
        sb.setLength((1 << 16) - 1);
        sb.append("\u00b5\n");
        Path f = write(sb.toString().getBytes(StandardCharsets.UTF_8));
        try (TextLines in = TextLines.open(f)) {
            List<String> l = lines(in);
            assertEquals("UTF-8", in.encoding());
            assertTrue(l.get(l.size() - 1).endsWith("\u00b5"), l.get(l.size() - 1));
        }
    }

    @Test
    void formsRfc3629ForbidsAreNotUtf8SoTheFileIsLatin1() throws Exception {
        byte[][] forbidden = {
            {(byte) 0xC0, (byte) 0x80},                          // overlong NUL
            {(byte) 0xE0, (byte) 0x80, (byte) 0xAF},             // overlong '/'
            {(byte) 0xED, (byte) 0xA0, (byte) 0x80},             // a surrogate, U+D800
            {(byte) 0xF5, (byte) 0xBF, (byte) 0xBF, (byte) 0xBF}, // a lead byte of nothing below U+10FFFF
            {(byte) 0xC3},                                        // cut short at the end
        };
        for (byte[] bad : forbidden) {
            byte[] content = concat("x: 1\n".getBytes(StandardCharsets.US_ASCII), bad);
            Path f = write(content);
            try (TextLines in = TextLines.open(f)) {
                List<String> l = lines(in);
                assertTrue(in.encoding().startsWith("Latin-1") || in.encoding().startsWith("Windows-1252"),
                        Arrays.toString(bad) + ": " + in.encoding());
                assertTrue(in.encoding().endsWith("line 2)"), in.encoding());
                assertEquals(2, l.size());
                assertEquals(new String(bad, in.encoding().startsWith("Latin-1") ? StandardCharsets.ISO_8859_1
                        : java.nio.charset.Charset.forName("windows-1252")), l.get(1));
            }
        }
    }

    @Test
    void validUtf8OfEveryLengthStaysUtf8() throws Exception {
        String text = "A \u00b5 \u00b0 \u20ac \ud83d\ude00\n";
        Path f = write(text.getBytes(StandardCharsets.UTF_8));
        try (TextLines in = TextLines.open(f)) {
            assertEquals(List.of("A \u00b5 \u00b0 \u20ac \ud83d\ude00"), lines(in));
            assertEquals("UTF-8", in.encoding());
        }
    }

    @Test
    void utf16LinesAndLineNumbersAreAsInUtf8() throws Exception {
        String text = "a: \u00b5m\r\nb\rc\n\ud83d\ude00";
        byte[] be = text.getBytes(StandardCharsets.UTF_16BE);
        Path f = write(concat(new byte[] {(byte) 0xFE, (byte) 0xFF}, be));
        try (TextLines in = TextLines.open(f)) {
            assertEquals(List.of("a: \u00b5m", "b", "c", "\ud83d\ude00"), lines(in));
            assertEquals(4, in.line());
            assertEquals("UTF-16 big-endian (byte-order mark)", in.encoding());
        }
    }

    @Test
    void aUtf16HeadIsGivenAsUtf8CutAfterItsLastCompleteLine() throws Exception {
        StringBuilder sb = new StringBuilder("f (Hz),phase (deg)\n");
        for (int i = 1; sb.length() < 6000; i++) {
            sb.append(i).append(",-").append(i % 90).append('\n');
        }
        byte[] le = sb.toString().getBytes(StandardCharsets.UTF_16LE);
        Path f = write(concat(new byte[] {(byte) 0xFF, (byte) 0xFE}, le));
        byte[] head = TextLines.head(f);
        String h = new String(head, StandardCharsets.UTF_8);
        assertTrue(h.startsWith("f (Hz),phase (deg)\n1,-1\n"), h.substring(0, 40));
        assertTrue(h.endsWith("\n"), "the head ends after a complete line");
        assertTrue(sb.toString().startsWith(h));
    }

    @Test
    void aNulByteInTheHeadIsRefusedWithItsLineAndOffset() throws Exception {
        Path f = write("a\nb\u0000\n".getBytes(StandardCharsets.US_ASCII));
        InputException e = assertThrows(InputException.class, () -> TextLines.head(f));
        assertTrue(e.getMessage().endsWith(":2: contains a NUL byte (offset 3): this is a binary file, not text"),
                e.getMessage());
    }

    /** Common practice, no source: random bytes are refused or read as text, never anything else. */
    @Test
    void randomBytesAreEitherTextOrRefusedAtALine() throws Exception {
        Random random = new Random(20261202);
        int refused = 0;
        int read = 0;
        for (int k = 0; k < 400; k++) {
            byte[] b = new byte[1 + random.nextInt(300)];
            random.nextBytes(b);
            if (k % 2 == 0) {
                for (int i = 0; i < b.length; i++) {
                    // printable text with lines, and now and then a Latin-1 letter
                    int r = random.nextInt(40);
                    b[i] = (byte) (r == 0 ? '\n' : r == 1 ? 0xA0 + random.nextInt(96) : 32 + random.nextInt(95));
                }
            }
            if (k % 5 == 0 && b.length >= 2) {
                b[0] = (byte) 0xFF;
                b[1] = (byte) 0xFE;
            }
            Path f = write(b);
            try (TextLines in = TextLines.open(f)) {
                assertNotNull(in.encoding());
                lines(in);
                read++;
            } catch (InputException e) {
                assertTrue(e.getMessage().startsWith(f.toString()), e.getMessage());
                refused++;
            }
        }
        assertTrue(refused > 50 && read > 50, "both kinds occur: read " + read + ", refused " + refused);
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] c = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }
}
