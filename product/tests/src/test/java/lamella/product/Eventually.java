package lamella.product;

import java.time.Duration;
import java.util.function.BooleanSupplier;

/** Waits for something the framework does on its own threads. */
final class Eventually {

    private Eventually() {
    }

    static boolean within(Duration limit, BooleanSupplier condition) throws InterruptedException {
        long deadline = System.nanoTime() + limit.toNanos();
        while (System.nanoTime() < deadline) {
            if (condition.getAsBoolean()) {
                return true;
            }
            Thread.sleep(25);
        }
        return condition.getAsBoolean();
    }
}
