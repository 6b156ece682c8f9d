package lamella.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/** Headless mode is set when nobody chose, and a choice already made is kept. */
class HeadlessTest {

    private static final String PROPERTY = "java.awt.headless";
    private String before;

    @BeforeEach
    void remember() {
        before = System.getProperty(PROPERTY);
    }

    @AfterEach
    void restore() {
        if (before == null) {
            System.clearProperty(PROPERTY);
        } else {
            System.setProperty(PROPERTY, before);
        }
    }

    @Test
    void unsetBecomesHeadless() {
        System.clearProperty(PROPERTY);
        Headless.ensure();
        assertEquals("true", System.getProperty(PROPERTY));
    }

    @Test
    void anExplicitChoiceIsKept() {
        System.setProperty(PROPERTY, "false");
        Headless.ensure();
        assertEquals("false", System.getProperty(PROPERTY));
    }
}
