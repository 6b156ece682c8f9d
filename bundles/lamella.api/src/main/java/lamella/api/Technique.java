package lamella.api;

import java.util.List;
import java.util.Optional;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * A measurement method offered as a service: turns the frequency response of a geometry into what the instrument
 * reports over its x-axis (modulation frequency, pump–probe delay, drive frequency). A case file selects it by
 * {@link #type()} in {@code measurement.type}.
 */
@ConsumerType
public interface Technique {

    /** The case-file name, such as {@code fdtr}. */
    String type();

    String summary();

    /** The keys of its case-file block (besides {@code type}). */
    List<ParameterSpec> parameters();

    /** The response unit it needs from the geometry. */
    ResponseUnit requiredUnit();

    /** The name of the x column ({@code frequency_hz}, {@code delay_s}); empty for a single steady value. */
    Optional<String> xColumn();

    /**
     * The key of the measurement block that lists the x values ({@code frequencies_hz}, {@code delays_s}); empty
     * for a steady technique. The list is optional in a case file — a fit takes x from its data — but a simulation
     * needs it.
     */
    default Optional<String> xParameter() {
        return Optional.empty();
    }

    /** The names of the signal columns, in output order. */
    List<String> signalColumns();

    /**
     * Binds validated parameters. Throws with a JSON path when values do not go together (for example a modulation
     * frequency above half the repetition rate).
     */
    TechniqueModel bind(Parameters parameters) throws InputException;
}
