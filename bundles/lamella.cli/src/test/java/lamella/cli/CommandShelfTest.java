package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;

import org.junit.jupiter.api.Test;

class CommandShelfTest {

    @Test
    void givesUpAfterTheQuietPeriodRatherThanTheFullPatience() throws InterruptedException {
        CommandShelf shelf = new CommandShelf();
        shelf.add(new FakeCommand("help", args -> 0));

        long start = System.nanoTime();
        boolean found = shelf.await("nothing", Duration.ofSeconds(20), Duration.ofMillis(100)).isPresent();
        long elapsedMs = (System.nanoTime() - start) / 1_000_000;

        assertTrue(!found);
        assertTrue(elapsedMs >= 100 && elapsedMs < 5_000, "waited " + elapsedMs + " ms");
    }

    @Test
    void aRemovedCommandIsNoLongerFound() throws InterruptedException {
        CommandShelf shelf = new CommandShelf();
        FakeCommand help = new FakeCommand("help", args -> 0);
        shelf.add(help);
        shelf.remove(help);

        assertTrue(shelf.await("help", Duration.ofMillis(50), Duration.ofMillis(50)).isEmpty());
    }
}
