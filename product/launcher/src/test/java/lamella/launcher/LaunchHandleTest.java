package lamella.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;

class LaunchHandleTest {

    @Test
    void waitsForTheStatusAndKeepsTheFirstOne() throws InterruptedException {
        LaunchHandle handle = new LaunchHandle();
        assertFalse(handle.await(10, TimeUnit.MILLISECONDS));

        handle.accept(2);
        handle.accept(0);

        assertTrue(handle.await(0, TimeUnit.MILLISECONDS));
        assertEquals(2, handle.status());
    }
}
