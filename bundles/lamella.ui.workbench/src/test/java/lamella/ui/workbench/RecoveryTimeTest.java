package lamella.ui.workbench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.ZoneId;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;

/** The recovery question names when its copy was kept in words a reader takes in at a glance. */
class RecoveryTimeTest {

    @Test
    void theCopysTimeIsLocalAndInWords() {
        assertEquals("17:22 on 3 Dec 2026", ProjectSession.keptAt("2026-12-03T17:22:19.231867300Z", ZoneOffset.UTC));
        assertEquals("18:22 on 3 Dec 2026",
                ProjectSession.keptAt("2026-12-03T17:22:19.231867300Z", ZoneId.of("Europe/Berlin")));
    }

    @Test
    void aTimeThatCannotBeReadIsShownAsWritten() {
        assertEquals("an unknown time", ProjectSession.keptAt("an unknown time", ZoneOffset.UTC));
    }
}
