package lamella.api;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Predicate;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Guards an output file against being one of the command's own inputs: the case file, and every existing file a case
 * names (its data files, libraries), resolved against the case's folder. Files are compared as files, not as names
 * ({@link Files#isSameFile}: symbolic links, {@code ./} and {@code ..}, hard links), so no spelling of an input
 * lets a command replace it.
 */
public final class OwnInputs {

    private static final Pattern QUOTED = Pattern.compile("\"((?:[^\"\\\\]|\\\\.)*)\"");

    private OwnInputs() {
    }

    /**
     * The files a case reads: the case itself and every string in it that names an existing regular file, relative to
     * the case's folder or absolute.
     */
    public static List<Path> ofCase(Path caseFile) {
        Set<Path> inputs = new LinkedHashSet<>();
        inputs.add(caseFile);
        try {
            String text = Files.readString(caseFile, StandardCharsets.UTF_8);
            Path folder = caseFile.toAbsolutePath().getParent();
            Matcher m = QUOTED.matcher(text);
            while (m.find()) {
                String s = m.group(1).replace("\\\\", "\\").replace("\\/", "/");
                if (s.isEmpty() || s.length() > 4096) {
                    continue;
                }
                try {
                    Path p = folder == null ? Path.of(s) : folder.resolve(s);
                    if (Files.isRegularFile(p)) {
                        inputs.add(p);
                    }
                } catch (InvalidPathException ignored) {
                    // not a file name
                }
            }
        } catch (IOException | RuntimeException ignored) {
            // the case cannot be read: its reader reports why; the case file itself is still guarded
        }
        return new ArrayList<>(inputs);
    }

    /**
     * The input that {@code out} would overwrite, or null when it is none of them (or does not exist yet).
     */
    public static Path clash(Path out, List<Path> inputs) {
        if (out == null || !Files.exists(out)) {
            return null;
        }
        for (Path in : inputs) {
            try {
                if (Files.exists(in) && Files.isSameFile(out, in)) {
                    return in;
                }
            } catch (IOException ignored) {
                // unreadable: cannot be the same file as one we could open
            }
        }
        return null;
    }

    /**
     * The refusal to print when a command's output {@code out} (null: none) is the case file or a file the case names,
     * or null when the output is safe.
     */
    public static String refusal(String command, Path out, Path caseFile) {
        return refusal(command, out, caseFile, List.of());
    }

    /**
     * As {@link #refusal(String, Path, Path)}, with more inputs: the runtime's own ({@code CommandIO.runtimeInputs},
     * the configured material libraries' files).
     */
    public static String refusal(String command, Path out, Path caseFile, List<Path> more) {
        if (out == null) {
            return null;
        }
        List<Path> inputs = new ArrayList<>(ofCase(caseFile));
        inputs.addAll(more);
        Path clash = clash(out, inputs);
        return clash == null ? null : message(command, out, clash);
    }

    /**
     * The refusal to print when writing files into {@code folder} would replace an input: the folder is itself one of
     * the inputs, or an input lies in it under a name the writer uses ({@code writes}). Null when the folder is safe.
     */
    public static String folderRefusal(String command, Path folder, List<Path> inputs, Predicate<String> writes) {
        if (folder == null) {
            return null;
        }
        Path itself = clash(folder, inputs);
        if (itself != null) {
            return message(command, folder, itself);
        }
        if (!Files.isDirectory(folder)) {
            return null;
        }
        for (Path in : inputs) {
            Path name = in.getFileName();
            if (name != null && writes.test(name.toString())) {
                Path clash = clash(folder.resolve(name.toString()), List.of(in));
                if (clash != null) {
                    return message(command, folder, clash);
                }
            }
        }
        return null;
    }

    /** The files of a library folder: its library.json and entry files. Empty when it is not a folder. */
    public static List<Path> ofLibraryFolder(Path folder) {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(folder)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".json") && Files.isRegularFile(p)).sorted()
                    .toList();
        } catch (IOException | RuntimeException e) {
            return List.of();
        }
    }

    /** The message for a refused output, in one wording for every command. */
    public static String message(String command, Path out, Path input) {
        return "lamella " + command + ": --out " + out + " would overwrite its own input " + input
                + "; nothing was written (choose another output " + (Files.isDirectory(out) ? "folder" : "file") + ")";
    }
}
