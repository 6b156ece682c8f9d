package lamella.api.data;

import java.nio.file.Path;
import java.util.List;
import lamella.api.InputException;
import org.osgi.annotation.versioning.ProviderType;

/**
 * Importer profiles: instrument file formats described in a small declarative file that a facility writes, checks
 * and shares, instead of a bundle of code. Each live profile is also a {@link DataImporter} service; this service
 * checks profile folders before they are published, tries a profile on a sample file, and turns a one-off column
 * mapping into a starting profile.
 */
@ProviderType
public interface ImporterProfiles {

    /** The service property of a {@link DataImporter} that says where it comes from ({@code shipped}, …). */
    String TIER_PROPERTY = "lamella.import.tier";

    /** One finding about a profile file: where, and what is wrong, as a sentence. */
    record Finding(Path file, int line, String path, String problem) {

        @Override
        public String toString() {
            return file + (line > 0 ? ":" + line : "") + (path == null || path.isEmpty() ? "" : ": " + path) + ": "
                    + problem;
        }
    }

    /**
     * The findings about configured profiles that could not be made live (a mistyped profile is left out; the other
     * importers stay live), for commands to mention.
     */
    List<Finding> liveProblems();

    /** Every finding about the profiles in a folder (or one profile file); empty when all are sound. */
    List<Finding> check(Path folderOrFile);

    /**
     * Reads a sample file with a profile: the profile file given, or the one of a folder that recognises the file
     * best. The profiles must be sound.
     *
     * @throws InputException naming the profile or the sample file, line and path
     */
    Dataset tryOn(Path profileOrFolder, Path sample) throws InputException;

    /**
     * A profile for a one-off file: the delimited table's own reading, with the given column meanings for the
     * header cells Lamella does not know.
     *
     * @param mappings each {@code HEADER=MEANING} or {@code HEADER=MEANING:UNIT}, such as
     *                 {@code phase sd (rad)=sigma_phase:rad}; MEANING {@code ignore} leaves a column out
     */
    Draft draft(Path file, List<String> mappings) throws InputException;

    /** A profile made for one file: its text (to save and edit) and an importer that reads the file with it. */
    record Draft(String profileText, DataImporter importer) {
    }
}
