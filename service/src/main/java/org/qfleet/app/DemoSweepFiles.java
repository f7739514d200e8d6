package org.qfleet.app;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sim.DemoProduct;
import org.qfleet.sim.SimulatedSweep;
import org.qfleet.sweep.FrequencyUnit;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.TouchstoneFormat;
import org.qfleet.sweep.TouchstoneWriter;

/**
 * Writes sweeps of the invented demo plant into a folder as Touchstone files named
 * {@code <product>_<lot>_<unit>.s2p}, each opened by comment lines saying who measured what, the
 * way analyzers annotate their files. Files of an earlier demo run are recognised by those names.
 */
final class DemoSweepFiles {

    private final TouchstoneWriter writer = new TouchstoneWriter(FrequencyUnit.GHZ, TouchstoneFormat.DB);

    /**
     * Writes the plant's next {@code count} sweeps into {@code folder}, which must exist.
     *
     * @return the product of each file written, by file name, in the order written
     */
    Map<String, DemoProduct> write(DemoPlant plant, int count, Path folder) throws IOException {
        Map<String, DemoProduct> written = new LinkedHashMap<>();
        for (int i = 0; i < count; i++) {
            Sweep sweep = plant.next().sweep();
            String name = fileName(sweep);
            try (Writer out = Files.newBufferedWriter(folder.resolve(name), StandardCharsets.UTF_8)) {
                out.write(header(sweep.info()));
                writer.write(sweep, out);
            }
            written.put(name, product(sweep.info().product()));
        }
        return written;
    }

    /**
     * Deletes what an earlier demo run left in {@code folder} and {@code plots}: sweep files named
     * like those this class writes, and their plots. Nothing else is touched.
     *
     * @return how many files were deleted
     */
    static int removeEarlierRun(Path folder, Path plots) throws IOException {
        return removeMatching(folder, ".s2p") + removeMatching(plots, ".svg");
    }

    /** {@code <product>_<lot>_<unit>.s2p}, with any character unsafe in a file name replaced by {@code _}. */
    static String fileName(Sweep sweep) {
        SweepInfo info = sweep.info();
        String stem = String.join("_", info.product(), info.lot(), info.unit()).replaceAll("[^A-Za-z0-9._-]", "_");
        return stem + TouchstoneWriter.extension(sweep);
    }

    /** Whether a file name starts like those of the demo's files: a demo product id and {@code _}. */
    static boolean isDemoName(String name) {
        return DemoPlant.products().stream().anyMatch(p -> name.startsWith(p.id() + "_"));
    }

    private static int removeMatching(Path folder, String suffix) throws IOException {
        if (!Files.isDirectory(folder)) {
            return 0;
        }
        List<Path> stale;
        try (Stream<Path> entries = Files.list(folder)) {
            stale = entries.filter(Files::isRegularFile)
                    .filter(p -> isDemoName(p.getFileName().toString()))
                    .filter(p -> p.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(suffix))
                    .toList();
        }
        for (Path file : stale) {
            Files.deleteIfExists(file);
        }
        return stale.size();
    }

    private static String header(SweepInfo info) {
        DemoProduct product = product(info.product());
        return "! Invented demo plant: every name and number here is made up.\n"
                + "! product " + product.id() + " (" + product.description() + "), lot " + info.lot()
                + ", unit " + info.unit() + "\n"
                + "! station " + info.stationId() + ", fixture " + info.fixtureId() + ", measured "
                + info.measuredAt() + (info.temperatureC() == null ? "" : ", " + info.temperatureC() + " degC") + "\n";
    }

    private static DemoProduct product(String id) {
        return DemoPlant.products().stream().filter(p -> p.id().equals(id)).findFirst()
                .orElseThrow(() -> new IllegalStateException("the demo plant made a sweep of unknown product " + id));
    }
}
