package org.qfleet.app.plot;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;

/**
 * A folder of plots, one SVG file per input, named after the input's source. Two inputs whose
 * names clash (same file name in two folders) get {@code -2}, {@code -3}, ... suffixes; a file
 * left by an earlier run is overwritten.
 */
public final class PlotDirectory {

    private static final int MAX_NAME_LENGTH = 120;

    private final Path directory;
    private final ResonancePlot plot = new ResonancePlot();
    private final Set<String> used = new HashSet<>();

    /** Creates the folder if needed. */
    public PlotDirectory(Path directory) throws IOException {
        this.directory = Files.createDirectories(directory);
    }

    /** Draws the result and writes it; returns the file written. */
    public Path write(Sweep sweep, ResonanceResult result) throws IOException {
        Path file = directory.resolve(claim(fileStem(sweep.source())) + ".svg");
        Files.writeString(file, plot.render(sweep, result), StandardCharsets.UTF_8);
        return file;
    }

    /**
     * The last path element of a source with every character outside {@code A-Z a-z 0-9 . _ -}
     * replaced by {@code _}, e.g. {@code lot7/unit 3.s2p} becomes {@code unit_3.s2p} and
     * {@code sweeps.jsonl:17} becomes {@code sweeps.jsonl_17}.
     */
    public static String fileStem(String source) {
        String name = source == null ? "" : source;
        int slash = Math.max(name.lastIndexOf('/'), name.lastIndexOf('\\'));
        name = name.substring(slash + 1).replaceAll("[^A-Za-z0-9._-]", "_").replaceAll("^[.]+", "");
        if (name.length() > MAX_NAME_LENGTH) {
            name = name.substring(0, MAX_NAME_LENGTH);
        }
        return name.isEmpty() ? "sweep" : name;
    }

    private synchronized String claim(String stem) {
        String name = stem;
        for (int n = 2; !used.add(name.toLowerCase(Locale.ROOT)); n++) {
            name = stem + "-" + n;
        }
        return name;
    }
}
