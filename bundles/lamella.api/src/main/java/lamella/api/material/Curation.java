package lamella.api.material;

import java.time.LocalDate;
import java.util.Optional;

/**
 * Who vouches for an entry and which revision it is, so a report can say exactly what was used.
 *
 * @param version    the entry's revision, raised by the curator at every change of a value
 * @param reviewedBy who last reviewed the entry, if anyone did
 * @param reviewedOn when
 */
public record Curation(int version, Optional<String> reviewedBy, Optional<LocalDate> reviewedOn) {

    public Curation {
        if (version < 1) {
            throw new IllegalArgumentException("an entry's version starts at 1, got " + version);
        }
    }
}
