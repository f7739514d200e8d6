package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sweep.SweepJsonReader;

/** {@code qfleet simulate --out}: the plant's sweep messages as files, readable and fitted like any message. */
class SimulateCommandTest {

    @TempDir
    Path dir;

    @Test
    void writesOneMessageFilePerSweepInTheChosenForm() throws Exception {
        for (String form : List.of("re-im", "mag-deg", "db-deg", "db")) {
            Path out = dir.resolve(form);
            CommandRun run = CommandRun.of("simulate", "--out", out, "--count", 3, "--form", form, "--seed", 5);

            assertThat(run.exitCode()).as(run.stderr()).isZero();
            List<Path> files = files(out);
            assertThat(files).hasSize(3);
            for (Path file : files) {
                var sweep = new SweepJsonReader().read(file.toString(), Files.readAllBytes(file));
                assertThat(file.getFileName().toString()).isEqualTo(sweep.info().sweepId() + ".json");
                assertThat(DemoPlant.products()).anyMatch(p -> p.id().equals(sweep.info().product()));
            }
            CommandRun fit = CommandRun.of("fit", out);
            assertThat(fit.exitCode()).as(fit.stdout()).isZero();
            for (JsonNode line : fit.json()) {
                assertThat(line.get("method").asText()).isEqualTo(form.equals("db") ? "lorentzian" : "complex-circle");
            }
        }
    }

    @Test
    void formsOutsideTheContractAreUsageErrors() {
        CommandRun run = CommandRun.of("simulate", "--out", dir, "--form", "polar");

        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.stderr()).contains("re-im, mag-deg, db-deg, db");
    }

    private static List<Path> files(Path dir) throws Exception {
        try (Stream<Path> entries = Files.list(dir)) {
            return entries.sorted().toList();
        }
    }
}
