package lamella.report;

/**
 * Plots are drawn off screen. AWT reads {@code java.awt.headless} once, at its first use, and a batch job or a
 * test may not have set it (the launcher does), so it is set here before any chart class is touched.
 */
final class Headless {

    private static final String PROPERTY = "java.awt.headless";

    private Headless() {
    }

    /** Sets headless mode unless someone chose a mode explicitly. */
    static void ensure() {
        if (System.getProperty(PROPERTY) == null) {
            System.setProperty(PROPERTY, "true");
        }
    }
}
