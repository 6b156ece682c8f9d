package lamella.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import lamella.api.ExplainedCase;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.ValueOrigin;
import lamella.api.material.Curation;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryInfo;
import lamella.api.material.LibraryTier;
import lamella.api.material.Material;
import lamella.api.material.MaterialLibrary;
import lamella.api.material.MaterialProperty;
import lamella.api.material.MaterialQuantity;
import lamella.api.material.TemperatureCurve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Layers that name a library material: explicit values win key by key, the rest comes from the entry at the layer's
 * temperature, and every gap or misuse is an error naming the layer's JSON path, the material and its library. The
 * library here is built in the test with invented values; the shipped values are checked in lamella.materials.
 */
class LayerMaterialTest {

    @TempDir
    Path dir;

    static final LibraryInfo LIBRARY = new LibraryInfo("test", "Test library", LibraryTier.FACILITY, "memory", "");

    static MaterialProperty constant(MaterialQuantity q, double v) {
        return new MaterialProperty(q, TemperatureCurve.constant(v, 300, 300), OptionalDouble.of(0.05), "invented", "");
    }

    static Material material(String id, MaterialProperty... properties) {
        Map<MaterialQuantity, MaterialProperty> map = new LinkedHashMap<>();
        for (MaterialProperty p : properties) {
            map.put(p.quantity(), p);
        }
        return new Material(id, id, List.of(), map, new Curation(4, Optional.empty(), Optional.empty()), "", LIBRARY,
                "memory:1");
    }

    static final Material GLASS = material("glass", new MaterialProperty(MaterialQuantity.K,
            TemperatureCurve.table(new double[] {200, 400}, new double[] {1.0, 2.0}), OptionalDouble.of(0.05),
            "invented", ""), new MaterialProperty(MaterialQuantity.HEAT_CAPACITY,
            TemperatureCurve.constant(1.5e6, 200, 400), OptionalDouble.of(0.05), "invented", ""));
    static final Material CRYSTAL = material("crystal", constant(MaterialQuantity.K_PARALLEL_C, 30),
            constant(MaterialQuantity.K_PERPENDICULAR_C, 10), constant(MaterialQuantity.DENSITY, 4000),
            constant(MaterialQuantity.SPECIFIC_HEAT, 750));
    static final Material FILM = material("film", constant(MaterialQuantity.K_THROUGH, 0.5),
            constant(MaterialQuantity.K_IN_PLANE, 5), constant(MaterialQuantity.HEAT_CAPACITY, 2e6));
    static final Material CONDUCTOR_ONLY = material("bare", constant(MaterialQuantity.K, 100));

    record Library(LibraryInfo info, List<Material> materials, List<LibraryFinding> findings)
            implements MaterialLibrary {
    }

    private CaseFileReader reader(boolean withLibrary) {
        CaseFileReader r = new CaseFileReader();
        if (withLibrary) {
            r.addLibrary(new Library(LIBRARY, List.of(GLASS, CRYSTAL, FILM, CONDUCTOR_ONLY), List.of()));
        }
        return r;
    }

    private Path write(String top, String layer) throws Exception {
        Path f = dir.resolve("case.json");
        Files.writeString(f, "{" + top + "\n  \"stack\": {\"layers\": [\n    " + layer + "\n  ]},\n"
                + "  \"geometry\": {\"type\": \"elliptic\"}, \"measurement\": {\"type\": \"fdtr\"}\n}\n");
        return f;
    }

    private Layer layer(String layer) throws Exception {
        return reader(true).read(write("", layer)).stack().layers().get(0);
    }

    private InputException fails(String top, String layer, boolean withLibrary) throws Exception {
        Path f = write(top, layer);
        return assertThrows(InputException.class, () -> reader(withLibrary).read(f));
    }

    private static void contains(InputException e, String... parts) {
        for (String s : parts) {
            assertTrue(e.getMessage().contains(s), "expected '" + s + "' in: " + e.getMessage());
        }
    }

    @Test
    void everyValueTheLayerDoesNotWriteComesFromTheLibraryAt300K() throws Exception {
        Layer l = layer("{\"name\": \"g\", \"material\": \"glass\"}");
        assertEquals(1.5, l.kThrough(), 1e-12, "halfway between the 200 K and 400 K rows");
        assertEquals(1.5, l.kInPlaneX(), 1e-12);
        assertEquals(1.5, l.kInPlaneY(), 1e-12);
        assertEquals(1.5e6, l.heatCapacity());
    }

    @Test
    void explicitValuesWinKeyByKey() throws Exception {
        Layer l = layer("{\"name\": \"g\", \"material\": \"glass\", \"k_through_w_mk\": 3, \"heat_capacity_j_m3k\": 2e6}");
        assertEquals(3.0, l.kThrough());
        assertEquals(1.5, l.kInPlaneX(), 1e-12, "in-plane is not written, so the library gives it");
        assertEquals(2e6, l.heatCapacity());
        Layer inPlane = layer("{\"name\": \"g\", \"material\": \"glass\", \"k_in_plane_w_mk\": 7,"
                + " \"k_in_plane_y_w_mk\": 8}");
        assertEquals(1.5, inPlane.kThrough(), 1e-12);
        assertEquals(7.0, inPlane.kInPlaneX());
        assertEquals(8.0, inPlane.kInPlaneY());
    }

    @Test
    void theLayersTemperatureWinsOverTheCasesWhichWinsOver300K() throws Exception {
        Path f = write("\"temperature_k\": 250,", "{\"name\": \"g\", \"material\": \"glass\"}");
        assertEquals(1.25, reader(true).read(f).stack().layers().get(0).kThrough(), 1e-12);
        Path g = write("\"temperature_k\": 250,", "{\"name\": \"g\", \"material\": \"glass\", \"temperature_k\": 350}");
        assertEquals(1.75, reader(true).read(g).stack().layers().get(0).kThrough(), 1e-12);
    }

    @Test
    void aTemperatureOutsideTheEntrysRangeIsAnErrorAtTheKeyThatSetIt() throws Exception {
        InputException layerT = fails("", "{\"name\": \"g\", \"material\": \"glass\", \"temperature_k\": 450}", true);
        assertEquals("stack.layers[0].temperature_k", layerT.path());
        contains(layerT, "case.json:3:", "material 'glass'", "Test library (facility), entry glass v4", "200–400 K",
                "450 K", "never extrapolated");
        InputException caseT = fails("\n  \"temperature_k\": 150,", "{\"name\": \"g\", \"material\": \"glass\"}", true);
        assertEquals("temperature_k", caseT.path());
        assertEquals(2, caseT.line());
        InputException byDefault = fails("", "{\"name\": \"c\", \"material\": \"crystal\", \"c_axis\": \"normal\","
                + " \"temperature_k\": 77}", true);
        contains(byDefault, "300 K only", "77 K");
    }

    @Test
    void aUniaxialCrystalFollowsItsCAxis() throws Exception {
        Layer normal = layer("{\"name\": \"c\", \"material\": \"crystal\", \"c_axis\": \"normal\"}");
        assertEquals(List.of(30.0, 10.0, 10.0), List.of(normal.kThrough(), normal.kInPlaneX(), normal.kInPlaneY()));
        Layer x = layer("{\"name\": \"c\", \"material\": \"crystal\", \"c_axis\": \"in-plane-x\"}");
        assertEquals(List.of(10.0, 30.0, 10.0), List.of(x.kThrough(), x.kInPlaneX(), x.kInPlaneY()));
        Layer y = layer("{\"name\": \"c\", \"material\": \"crystal\", \"c_axis\": \"in-plane-y\"}");
        assertEquals(List.of(10.0, 10.0, 30.0), List.of(y.kThrough(), y.kInPlaneX(), y.kInPlaneY()));
        assertEquals(4000 * 750, normal.heatCapacity(), 1e-6, "C = ρ c_p");
        Layer explicit = layer("{\"name\": \"c\", \"material\": \"crystal\", \"k_through_w_mk\": 1,"
                + " \"k_in_plane_w_mk\": 2}");
        assertEquals(List.of(1.0, 2.0, 2.0), List.of(explicit.kThrough(), explicit.kInPlaneX(), explicit.kInPlaneY()),
                "with every conductivity written, no orientation is needed");
    }

    @Test
    void aFilmEntryGivesThroughAndInPlaneValues() throws Exception {
        Layer f = layer("{\"name\": \"f\", \"thickness_m\": 1e-7, \"material\": \"film\"}, "
                + "{\"name\": \"s\", \"k_through_w_mk\": 1, \"heat_capacity_j_m3k\": 1e6}");
        assertEquals(List.of(0.5, 5.0, 5.0), List.of(f.kThrough(), f.kInPlaneX(), f.kInPlaneY()));
    }

    @Test
    void orientationMistakesAreErrors() throws Exception {
        InputException missing = fails("", "{\"name\": \"c\", \"material\": \"crystal\"}", true);
        assertEquals("stack.layers[0].c_axis", missing.path());
        contains(missing, "uniaxial", "normal", "in-plane-x", "in-plane-y");
        InputException pointless = fails("", "{\"name\": \"g\", \"material\": \"glass\", \"c_axis\": \"normal\"}", true);
        assertEquals("stack.layers[0].c_axis", pointless.path());
        contains(pointless, "not stated as a uniaxial crystal");
        InputException unknown = fails("", "{\"name\": \"c\", \"material\": \"crystal\", \"c_axis\": \"z\"}", true);
        contains(unknown, "unknown c_axis 'z'");
        for (String key : List.of("\"c_axis\": \"normal\"", "\"temperature_k\": 300")) {
            InputException alone = fails("", "{\"name\": \"a\", \"k_through_w_mk\": 1, \"heat_capacity_j_m3k\": 1e6, "
                    + key + "}", true);
            contains(alone, "names no material");
        }
    }

    @Test
    void aMissingPropertyNamesTheLayerTheMaterialAndTheLibrary() throws Exception {
        InputException e = fails("", "{\"name\": \"b\", \"material\": \"bare\"}", true);
        assertEquals("stack.layers[0].heat_capacity_j_m3k", e.path());
        contains(e, "case.json:3:", "material 'bare'", "library Test library (facility), entry bare v4",
                "states no heat capacity", "give heat_capacity_j_m3k in the layer");
        Layer given = layer("{\"name\": \"b\", \"material\": \"bare\", \"heat_capacity_j_m3k\": 3e6}");
        assertEquals(100.0, given.kThrough());
    }

    @Test
    void withoutLibrariesAMaterialIsAClearError() throws Exception {
        InputException e = fails("", "{\"name\": \"g\", \"material\": \"glass\"}", false);
        assertEquals("stack.layers[0].material", e.path());
        assertEquals(3, e.line());
        contains(e, "no material libraries are live");
        assertEquals(1.0, reader(false).read(write("", "{\"name\": \"a\", \"k_through_w_mk\": 1,"
                + " \"heat_capacity_j_m3k\": 1e6}")).stack().layers().get(0).kThrough(), "explicit layers need none");
    }

    @Test
    void anUnknownMaterialSuggestsTheClosest() throws Exception {
        InputException e = fails("", "{\"name\": \"g\", \"material\": \"glas\"}", true);
        contains(e, "stack.layers[0].material", "no material 'glas'", "did you mean 'glass'");
        contains(fails("", "{\"name\": \"g\", \"material\": 3}", true), "expected a text value");
    }

    @Test
    void theOriginOfEveryValueIsRecorded() throws Exception {
        Path f = write("", "{\"name\": \"c\", \"thickness_m\": 1e-6, \"material\": \"crystal\", \"c_axis\": \"normal\",\n"
                + "     \"k_in_plane_w_mk\": 12, \"conductance_below_w_m2k\": 1e8},\n"
                + "    {\"name\": \"s\", \"k_through_w_mk\": 1, \"heat_capacity_j_m3k\": 1e6}");
        ExplainedCase c = reader(true).readExplained(f);
        Map<String, ValueOrigin> byPath = new LinkedHashMap<>();
        c.origins().forEach(o -> byPath.put(o.path(), o));
        assertEquals(List.of("stack.layers[0].thickness_m", "stack.layers[0].k_through_w_mk",
                "stack.layers[0].k_in_plane_x_w_mk", "stack.layers[0].k_in_plane_y_w_mk",
                "stack.layers[0].heat_capacity_j_m3k", "stack.layers[0].conductance_below_w_m2k",
                "stack.layers[1].thickness_m", "stack.layers[1].k_through_w_mk", "stack.layers[1].k_in_plane_x_w_mk",
                "stack.layers[1].k_in_plane_y_w_mk", "stack.layers[1].heat_capacity_j_m3k"),
                List.copyOf(byPath.keySet()));
        assertEquals("explicit in case file (line 3)", byPath.get("stack.layers[0].thickness_m").describe());
        assertEquals("explicit in case file (line 4), from k_in_plane_w_mk",
                byPath.get("stack.layers[0].k_in_plane_x_w_mk").describe());
        assertEquals("library Test library (facility), entry crystal v4, k_parallel_c_w_mk (c axis normal), invented,"
                + " at 300 K, ±5 %", byPath.get("stack.layers[0].k_through_w_mk").describe());
        assertEquals("library Test library (facility), entry crystal v4, density × specific heat, invented, at 300 K,"
                + " ±7.1 %", byPath.get("stack.layers[0].heat_capacity_j_m3k").describe());
        assertEquals(ValueOrigin.Kind.DEFAULT, byPath.get("stack.layers[1].thickness_m").kind());
        assertEquals("default: equal to k_through_w_mk", byPath.get("stack.layers[1].k_in_plane_x_w_mk").describe());
        assertEquals(1.0, byPath.get("stack.layers[1].k_in_plane_y_w_mk").value());
    }
}
