package org.qfleet.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.qfleet.codec.ErrorCodes;

/**
 * Turns command-line arguments into the files to read. A directory stands for the supported
 * files directly inside it, sorted by name; a path that cannot be used becomes an input that
 * carries the reason.
 */
final class InputFiles {

    /** Extensions the readers understand, lower case. */
    static final List<String> SUPPORTED = List.of(".s1p", ".s2p", ".json", ".jsonl");

    /**
     * One file to read, or a path that failed before reading.
     *
     * @param path    the file (or the argument that failed)
     * @param problem why it cannot be read, or null
     * @param code    the error line's code when {@code problem} is set
     */
    record Input(Path path, String problem, String code) {

        boolean usable() {
            return problem == null;
        }
    }

    private InputFiles() {
    }

    static List<Input> expand(List<Path> arguments) {
        List<Input> inputs = new ArrayList<>();
        for (Path argument : arguments) {
            if (Files.isDirectory(argument)) {
                inputs.addAll(listDirectory(argument));
            } else if (Files.exists(argument)) {
                inputs.add(new Input(argument, null, null));
            } else {
                inputs.add(new Input(argument, "no such file or directory", ErrorCodes.UNREADABLE));
            }
        }
        return inputs;
    }

    static boolean supported(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return !name.startsWith(".") && SUPPORTED.stream().anyMatch(name::endsWith);
    }

    private static List<Input> listDirectory(Path directory) {
        List<Path> files;
        try (Stream<Path> entries = Files.list(directory)) {
            files = entries.filter(Files::isRegularFile).filter(InputFiles::supported).sorted().toList();
        } catch (IOException | SecurityException e) {
            return List.of(new Input(directory, "cannot list the directory: " + e.getMessage(), ErrorCodes.UNREADABLE));
        }
        if (files.isEmpty()) {
            return List.of(new Input(directory,
                    "the directory holds no sweep files (" + String.join(", ", SUPPORTED) + ")", ErrorCodes.NO_SWEEPS));
        }
        return files.stream().map(f -> new Input(f, null, null)).toList();
    }
}
