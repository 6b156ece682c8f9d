package lamella.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.ParameterRef;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A conductivity stated once is one quantity: the directions that take its value move with it wherever a path
 * changes it (fit, uncertainty, sensitivity), and every output says which quantity a path stood for. The library
 * entries are LayerMaterialTest's invented ones.
 */
class ConductivityTieTest {

    @TempDir
    Path dir;

    private CaseFileReader reader() {
        CaseFileReader r = new CaseFileReader();
        r.addLibrary(new LayerMaterialTest.Library(LayerMaterialTest.LIBRARY, List.of(LayerMaterialTest.GLASS,
                LayerMaterialTest.CRYSTAL, LayerMaterialTest.FILM), List.of()));
        return r;
    }

    private CaseModel model(String layer) throws Exception {
        Path f = Files.writeString(dir.resolve("case.json"), "{\"stack\": {\"layers\": [" + layer + "]},"
                + " \"geometry\": {\"type\": \"elliptic\"}, \"measurement\": {\"type\": \"fdtr\"}}");
        CaseDocument doc = reader().read(f);
        return new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
    }

    private Layer.Tie tie(String layer) throws Exception {
        return model(layer).stack().layers().get(0).tie();
    }

    private static final String C = ", \"heat_capacity_j_m3k\": 1e6";

    @Test
    void whatOneStatementGaveFollowsThroughPlane() throws Exception {
        assertEquals(Layer.Tie.ISOTROPIC, tie("{\"name\": \"a\", \"k_through_w_mk\": 35" + C + "}"),
                "one conductivity written");
        assertEquals(Layer.Tie.APART, tie("{\"name\": \"a\", \"k_through_w_mk\": 1.4, \"k_in_plane_w_mk\": 1.4" + C
                + "}"), "Λz and Λr written apart, though equal");
        assertEquals(Layer.Tie.Y_FOLLOWS, tie("{\"name\": \"a\", \"k_through_w_mk\": 2, \"k_in_plane_x_w_mk\": 3" + C
                + "}"), "Λy defaults to Λz");
        assertEquals(Layer.Tie.ISOTROPIC, tie("{\"name\": \"a\", \"material\": \"glass\"}"),
                "one isotropic library value");
        assertEquals(Layer.Tie.APART, tie("{\"name\": \"a\", \"material\": \"glass\", \"k_through_w_mk\": 3}"),
                "Λz from the case, Λr from the library");
        assertEquals(Layer.Tie.APART, tie("{\"name\": \"a\", \"material\": \"film\"}"), "a film entry states both");
        assertEquals(Layer.Tie.APART, tie("{\"name\": \"a\", \"material\": \"crystal\", \"c_axis\": \"normal\"}"));
        assertEquals(Layer.Tie.Y_FOLLOWS, tie("{\"name\": \"a\", \"material\": \"crystal\", \"c_axis\": \"in-plane-x\"}"),
                "Λz and Λy are both the value perpendicular to c");
    }

    @Test
    void throughPlaneMovesTheDirectionsThatFollowIt() throws Exception {
        ParameterRef kz = ParameterRef.layer("a", "k_through_w_mk");
        Layer iso = model("{\"name\": \"a\", \"k_through_w_mk\": 35" + C + "}").with(kz, 20).stack().layers().get(0);
        assertEquals(List.of(20.0, 20.0, 20.0), List.of(iso.kThrough(), iso.kInPlaneX(), iso.kInPlaneY()));
        Layer apart = model("{\"name\": \"a\", \"k_through_w_mk\": 35, \"k_in_plane_w_mk\": 35" + C + "}").with(kz, 20)
                .stack().layers().get(0);
        assertEquals(List.of(20.0, 35.0, 35.0), List.of(apart.kThrough(), apart.kInPlaneX(), apart.kInPlaneY()));
        Layer half = model("{\"name\": \"a\", \"k_through_w_mk\": 2, \"k_in_plane_x_w_mk\": 3" + C + "}").with(kz, 5)
                .stack().layers().get(0);
        assertEquals(List.of(5.0, 3.0, 5.0), List.of(half.kThrough(), half.kInPlaneX(), half.kInPlaneY()));
    }

    @Test
    void theIsotropicNameSetsEveryDirectionAndNamingTheInPlaneOneSeparatesIt() throws Exception {
        CaseModel m = model("{\"name\": \"a\", \"k_through_w_mk\": 2, \"k_in_plane_w_mk\": 4" + C + "}");
        ParameterRef k = ParameterRef.layer("a", "k_w_mk");
        InputException none = assertThrows(InputException.class, () -> m.value(k, "fit.free[0]"));
        assertTrue(none.getMessage().contains("no one isotropic Λ"), none.getMessage());
        Layer made = m.with(k, 3).stack().layers().get(0);
        assertEquals(Layer.Tie.ISOTROPIC, made.tie());
        assertEquals(3.0, made.kInPlaneY());
        CaseModel iso = model("{\"name\": \"a\", \"k_through_w_mk\": 35" + C + "}");
        assertEquals(35.0, iso.value(k, "x"));
        CaseModel separated = iso.apartFor(List.of(ParameterRef.layer("a", "k_in_plane_w_mk")));
        assertEquals(Layer.Tie.APART, separated.stack().layers().get(0).tie());
        assertEquals("through-plane Λz", separated.quantity(ParameterRef.layer("a", "k_through_w_mk")));
        assertEquals(35.0, separated.with(ParameterRef.layer("a", "k_through_w_mk"), 9).stack().layers().get(0)
                .kInPlaneX(), "with Λr named, Λz moves alone");
    }

    @Test
    void everyPathSaysWhatItMoves() throws Exception {
        CaseModel iso = model("{\"name\": \"a\", \"k_through_w_mk\": 35" + C + "}");
        assertEquals("a.k_through_w_mk (isotropic Λ)", iso.label(ParameterRef.layer("a", "k_through_w_mk")));
        assertEquals("a.k_w_mk (isotropic Λ)", iso.label(ParameterRef.layer("a", "k_w_mk")));
        assertEquals("a.heat_capacity_j_m3k", iso.label(ParameterRef.layer("a", "heat_capacity_j_m3k")));
        CaseModel apart = model("{\"name\": \"a\", \"k_through_w_mk\": 1, \"k_in_plane_w_mk\": 2" + C + "}");
        assertEquals("a.k_through_w_mk (through-plane Λz)", apart.label(ParameterRef.layer("a", "k_through_w_mk")));
        assertEquals("a.k_in_plane_w_mk (in-plane Λr)", apart.label(ParameterRef.layer("a", "k_in_plane_w_mk")));
    }

    @Test
    void aStudyListsOneInputPerStatedQuantity() throws Exception {
        List<ParameterRef> iso = model("{\"name\": \"a\", \"k_through_w_mk\": 35" + C + "}").numericInputs();
        assertEquals(List.of(ParameterRef.layer("a", "k_w_mk"), ParameterRef.layer("a", "heat_capacity_j_m3k")), iso);
        List<ParameterRef> apart = model("{\"name\": \"a\", \"k_through_w_mk\": 1, \"k_in_plane_w_mk\": 2" + C + "}")
                .numericInputs();
        assertEquals(List.of(ParameterRef.layer("a", "k_through_w_mk"), ParameterRef.layer("a", "k_in_plane_w_mk"),
                ParameterRef.layer("a", "heat_capacity_j_m3k")), apart);
        List<ParameterRef> half = model("{\"name\": \"a\", \"k_through_w_mk\": 2, \"k_in_plane_x_w_mk\": 3" + C + "}")
                .numericInputs();
        assertEquals(List.of(ParameterRef.layer("a", "k_through_w_mk"), ParameterRef.layer("a", "k_in_plane_x_w_mk"),
                ParameterRef.layer("a", "heat_capacity_j_m3k")), half);
    }
}
