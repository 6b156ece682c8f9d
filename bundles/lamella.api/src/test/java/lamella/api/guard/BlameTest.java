package lamella.api.guard;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import lamella.api.ModelEvaluationException;
import org.junit.jupiter.api.Test;

/** A shipped bundle's failure is Lamella's, in words; a plug-in's names the plug-in and what it threw. */
class BlameTest {

    private static final PluginOrigin SHIPPED = PluginOrigin.of("lamella.geometry.gaussian", "0.1.0",
            "reference:file:/opt/lamella/bundle/lamella.geometry.gaussian.jar");
    private static final PluginOrigin PLUGIN = PluginOrigin.of("lab.linepair", "1.0.0",
            "file:/opt/lamella/plugins/linepair.jar");

    @Test
    void theRuntimesOwnBundlesAreKnownByTheirLocation() {
        assertTrue(SHIPPED.shipped());
        assertFalse(PLUGIN.shipped());
        assertFalse(new PluginOrigin("x", "1").shipped());
        assertFalse(PluginOrigin.of("x", "1", null).shipped());
    }

    @Test
    void aShippedBundlesFailureIsLamellasInWordsWithoutJavaNames() {
        String m = new Blame("geometry 'gaussian'", SHIPPED).fault(new ArithmeticException("overflow")).getMessage();
        assertTrue(m.startsWith("Lamella's own geometry 'gaussian' (bundle lamella.geometry.gaussian 0.1.0) could not"
                + " evaluate this case: an arithmetic error (overflow); this is a fault in Lamella"), m);
        assertFalse(m.contains("java."), m);
        assertFalse(m.contains("Exception"), m);
        String npe = new Blame("a technique", SHIPPED).fault(new NullPointerException(
                "Cannot invoke \"java.util.List.size()\"")).getMessage();
        assertTrue(npe.contains("Lamella's own technique (bundle"), npe);
        assertTrue(npe.contains("could not evaluate this case: an unexpected error;"), npe);
        assertFalse(npe.contains("java."), npe);
    }

    @Test
    void aPluginsFailureNamesThePluginAndWhatItThrew() {
        String m = new Blame("geometry 'line-pair'", PLUGIN).fault(new IllegalStateException("broke")).getMessage();
        assertEquals("geometry 'line-pair' from bundle lab.linepair 1.0.0 failed: java.lang.IllegalStateException:"
                + " broke", m);
    }

    @Test
    void aModelsOwnWordsAreKept() {
        String m = new Blame("geometry 'gaussian'", SHIPPED).fault(new ModelEvaluationException("too many panels"))
                .getMessage();
        assertEquals("too many panels (geometry 'gaussian' from bundle lamella.geometry.gaussian 0.1.0)", m);
    }
}
