package lamella.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.InputException;
import lamella.api.Layer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Layer keys for in-plane anisotropy: k_in_plane_x_w_mk and k_in_plane_y_w_mk default to k_in_plane_w_mk. */
class InPlaneAnisotropyTest {

    @TempDir
    Path dir;

    private Layer firstLayer(String layerKeys) throws Exception {
        Path f = dir.resolve("case.json");
        Files.writeString(f, "{\"stack\": {\"layers\": [{\"name\": \"crystal\", \"k_through_w_mk\": 2.0,"
                + " \"heat_capacity_j_m3k\": 2e6" + layerKeys + "}]},"
                + " \"geometry\": {\"type\": \"elliptic\"}, \"measurement\": {\"type\": \"fdtr\"}}");
        return new CaseFileReader().read(f).stack().layers().get(0);
    }

    @Test
    void bothDirectionsDefaultToTheInPlaneValueAndThatToTheThroughPlaneValue() throws Exception {
        Layer plain = firstLayer("");
        assertEquals(2.0, plain.kInPlaneX());
        assertEquals(2.0, plain.kInPlaneY());
        Layer inPlane = firstLayer(", \"k_in_plane_w_mk\": 9.0");
        assertEquals(9.0, inPlane.kInPlaneX());
        assertEquals(9.0, inPlane.kInPlaneY());
    }

    @Test
    void eachDirectionCanBeGiven() throws Exception {
        Layer l = firstLayer(", \"k_in_plane_w_mk\": 9.0, \"k_in_plane_x_w_mk\": 30.0");
        assertEquals(30.0, l.kInPlaneX());
        assertEquals(9.0, l.kInPlaneY());
        Layer both = firstLayer(", \"k_in_plane_x_w_mk\": 30.0, \"k_in_plane_y_w_mk\": 3.0");
        assertEquals(30.0, both.kInPlaneX());
        assertEquals(3.0, both.kInPlaneY());
    }

    @Test
    void aNonPositiveDirectionalValueNamesItsPath() {
        InputException e = assertThrows(InputException.class, () -> firstLayer(", \"k_in_plane_y_w_mk\": 0"));
        assertEquals("stack.layers[0].k_in_plane_y_w_mk", e.path());
    }
}
