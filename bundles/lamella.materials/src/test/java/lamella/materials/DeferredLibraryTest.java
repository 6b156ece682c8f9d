package lamella.materials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import lamella.api.material.LibraryTier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A library is offered before it is read, read at its first use, and read only once however many threads ask. */
class DeferredLibraryTest {

    @TempDir
    Path dir;

    @Test
    void aLibraryIsReadAtItsFirstUseAndOnlyOnce() throws Exception {
        Folders.library(dir, "lab", "Lab films");
        Folders.file(dir, "films.json", Folders.entries(Folders.entry("film-a", 1.5)));
        AtomicInteger reads = new AtomicInteger();
        DeferredLibrary library = new DeferredLibrary(() -> {
            reads.incrementAndGet();
            return LibraryFolder.read(dir, LibraryTier.FACILITY);
        });
        assertEquals(0, reads.get(), "offering the library must not read it");

        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<Object>> asked = new ArrayList<>();
            for (int i = 0; i < 16; i++) {
                asked.add(pool.submit(library::materials));
            }
            Object first = asked.get(0).get();
            for (Future<Object> f : asked) {
                assertSame(first, f.get());
            }
        } finally {
            pool.shutdownNow();
        }
        assertEquals(1, reads.get());
        assertEquals("lab", library.info().id());
        assertEquals(List.of("film-a"), library.materials().stream().map(m -> m.id()).toList());
        assertEquals(List.of(), library.findings());
        assertEquals(1, reads.get());
    }
}
