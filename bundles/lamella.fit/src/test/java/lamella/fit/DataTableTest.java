package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import lamella.api.InputException;
import lamella.api.data.ScanBuilder;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A fit's data file is read by the rules {@code import} reads by: a byte-order mark and CRLF line ends are read as
 * they are there, and a repeated or out-of-order x gets the message an imported scan gets, at its line.
 */
class DataTableTest {

    @TempDir
    Path dir;

    private Path write(String text) throws Exception {
        return Files.writeString(dir.resolve("data.csv"), text, StandardCharsets.UTF_8);
    }

    @Test
    void aByteOrderMarkAndCrlfLineEndsAreRead() throws Exception {
        DataTable t = DataTable.read(write("\uFEFF# made by hand\r\nfrequency_hz,phase_deg\r\n1e4,-10\r\n1e5,-20\r\n"));
        assertEquals(List.of("frequency_hz", "phase_deg"), t.names());
        assertArrayEquals(new double[] {1e4, 1e5}, t.column("frequency_hz"));
        assertEquals(4, t.lineOf(1));
        t.checkX("frequency_hz");
    }

    @Test
    void crlfLinesAreCountedAsLfLines() throws Exception {
        InputException crlf = assertThrows(InputException.class,
                () -> DataTable.read(write("frequency_hz,phase_deg\r\n1e4,-10\r\n1e5,x\r\n")));
        InputException lf = assertThrows(InputException.class,
                () -> DataTable.read(write("frequency_hz,phase_deg\n1e4,-10\n1e5,x\n")));
        assertEquals(3, crlf.line());
        assertEquals(lf.getMessage(), crlf.getMessage());
    }

    @Test
    void aRepeatedXGetsTheImportersMessageAtItsLine() throws Exception {
        Path f = write("frequency_hz,phase_deg\n1e4,-10\n1e5,-20\n1e5,-21\n");
        DataTable t = DataTable.read(f);
        InputException e = assertThrows(InputException.class, () -> t.checkX("frequency_hz"));
        assertEquals(4, e.line());
        assertEquals(scanMessage(f, "frequency_hz", new double[] {1e4, 1e5, 1e5}, new int[] {2, 3, 4}), e.getMessage());
        assertTrue(e.getMessage().contains("repeats the value of line 3"), e.getMessage());
    }

    @Test
    void anUnsortedXGetsTheImportersMessageAtItsLine() throws Exception {
        Path f = write("delay_s,ratio\n1e-10,3\n2e-10,2\n1.5e-10,2.5\n");
        DataTable t = DataTable.read(f);
        InputException e = assertThrows(InputException.class, () -> t.checkX("delay_s"));
        assertEquals(4, e.line());
        assertEquals(scanMessage(f, "delay_s", new double[] {1e-10, 2e-10, 1.5e-10}, new int[] {2, 3, 4}), e.getMessage());
    }

    @Test
    void aDescendingSweepIsOneDirectionAndAccepted() throws Exception {
        DataTable.read(write("frequency_hz,phase_deg\n1e6,-30\n1e5,-20\n1e4,-10\n")).checkX("frequency_hz");
    }

    @Test
    void cellsAreReadAsImportReadsThem() throws Exception {
        for (String cell : new String[] {"NaN", "0x10", "1.5f", "1e999", "1e3x", ""}) {
            InputException e = assertThrows(InputException.class,
                    () -> DataTable.read(write("frequency_hz,phase_deg\n1e4," + cell + "\n")), cell);
            assertEquals(2, e.line(), e.getMessage());
            assertTrue(e.getMessage().contains("column 'phase_deg': "), e.getMessage());
        }
    }

    @Test
    void fileProblemsAreTheSameAsImports() throws Exception {
        InputException missing = assertThrows(InputException.class, () -> DataTable.read(dir.resolve("none.csv")));
        assertTrue(missing.getMessage().endsWith("none.csv: no such file"), missing.getMessage());
        InputException folder = assertThrows(InputException.class,
                () -> DataTable.read(Files.createDirectory(dir.resolve("folder.csv"))));
        assertTrue(folder.getMessage().endsWith("folder.csv: is a directory; expected a data file"),
                folder.getMessage());
    }

    /** The message the importers' scan rules give for these x values. */
    private static String scanMessage(Path f, String column, double[] x, int[] lines) {
        ScanBuilder b = new ScanBuilder(f, column, List.of(), List.of());
        try {
            for (int i = 0; i < x.length; i++) {
                b.add(lines[i], x[i], new double[0], new double[0]);
            }
        } catch (InputException e) {
            return e.getMessage();
        }
        throw new AssertionError("the scan rules accepted the x values");
    }
}
