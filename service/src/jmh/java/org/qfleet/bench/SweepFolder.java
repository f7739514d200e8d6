package org.qfleet.bench;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.qfleet.sweep.FrequencyUnit;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.TouchstoneFormat;
import org.qfleet.sweep.TouchstoneWriter;

/** A folder of .s2p files, one per simulated unit, as a station leaves them for the {@code fit} command. */
final class SweepFolder {

    private SweepFolder() {
    }

    /** Writes {@code count} files of {@code points} frequencies into {@code folder}; returns them in order. */
    static List<Path> write(Path folder, int count, int points, long seed) throws IOException {
        TouchstoneWriter writer = new TouchstoneWriter(FrequencyUnit.GHZ, TouchstoneFormat.RI);
        List<Path> files = new ArrayList<>(count);
        Sweep[] units = BenchSweeps.units(count, points, seed);
        for (int i = 0; i < count; i++) {
            Path file = folder.resolve(String.format(Locale.ROOT, "unit-%04d.s2p", i + 1));
            try (Writer out = Files.newBufferedWriter(file, StandardCharsets.ISO_8859_1)) {
                writer.write(units[i], out);
            }
            files.add(file);
        }
        return files;
    }

    /** Deletes the folder and everything in it. */
    static void delete(Path folder) throws IOException {
        try (Stream<Path> paths = Files.walk(folder)) {
            for (Path path : paths.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(path);
            }
        }
    }
}
