package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.sim.DemoPlant;

/** {@code qfleet demo}: invented plant sweeps written as Touchstone files, fitted and plotted. */
class DemoCommandTest {

    @TempDir
    Path dir;

    @Test
    void writesFitsAndPlotsTheRequestedNumberOfSweeps() throws IOException {
        Path out = dir.resolve("demo");

        CommandRun run = CommandRun.of("demo", "--offline", "--count", 6, "--seed", 3, "--out", out);

        assertThat(run.exitCode()).as(run.stderr()).isZero();
        List<JsonNode> lines = run.json();
        assertThat(lines).hasSize(6);
        lines.forEach(TruthChecks::assertValidResult);
        assertThat(files(out, ".s2p")).hasSize(6).allMatch(DemoSweepFiles::isDemoName);
        assertThat(files(out.resolve("plots"), ".svg")).hasSize(6);
        // Sources are the files in the folder, in name order, as 'fit DIR' gives them.
        List<String> sources = lines.stream().map(l -> l.get("source").asText()).toList();
        assertThat(sources).isSorted().allMatch(s -> s.startsWith(out.toString()));
        assertThat(run.stderr()).contains("6 fitted, 0 failed", "median Qu", out.resolve("plots").toString());
    }

    @Test
    void fitsTheDemoPlantsProductsNearTheirNominalQu() {
        CommandRun run = CommandRun.of("demo", "--offline", "--count", 16, "--out", dir);

        assertThat(run.exitCode()).isZero();
        for (JsonNode line : run.json()) {
            String file = Path.of(line.get("source").asText()).getFileName().toString();
            // The plant's units spread 1.5 % around the nominal Qu (DemoProduct, invented for the demo).
            double nominal = DemoPlant.products().stream().filter(p -> file.startsWith(p.id() + "_")).findFirst()
                    .orElseThrow().qUnloaded();
            assertThat(line.get("qUnloaded").asDouble() / nominal).as(file).isBetween(0.94, 1.06);
            assertThat(line.get("flags")).as(file).isEmpty();
        }
    }

    @Test
    void aSecondRunReplacesTheFirstRunsFilesAndLeavesOthersAlone() throws IOException {
        Path own = Files.writeString(dir.resolve("bench-notes.txt"), "not ours");
        assertThat(CommandRun.of("demo", "--offline", "--count", 5, "--out", dir).exitCode()).isZero();

        CommandRun second = CommandRun.of("demo", "--offline", "--count", 2, "--seed", 9, "--out", dir);

        assertThat(second.exitCode()).isZero();
        assertThat(second.json()).hasSize(2);
        assertThat(files(dir, ".s2p")).hasSize(2);
        assertThat(files(dir.resolve("plots"), ".svg")).hasSize(2);
        assertThat(own).hasContent("not ours");
    }

    @Test
    void aCountOutsideTheRangeIsAUsageError() {
        CommandRun run = CommandRun.of("demo", "--offline", "--count", 0, "--out", dir);

        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.stderr()).contains("--count");
        assertThat(run.stdout()).isEmpty();
    }

    private static List<String> files(Path folder, String suffix) throws IOException {
        try (Stream<Path> entries = Files.list(folder)) {
            return entries.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(suffix)).toList();
        }
    }
}
