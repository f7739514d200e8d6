package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.qfleet.app.TruthChecks.assertMatchesTruth;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.sim.SimulatedSweep;
import org.qfleet.sweep.FrequencyUnit;
import org.qfleet.sweep.TouchstoneFormat;
import org.qfleet.sweep.TouchstoneWriter;

/** {@code qfleet fit} on bad inputs: one error line each, exit code 1, and the run goes on. */
class FitCommandErrorsTest {

    @TempDir
    Path dir;

    @Test
    void badFilesGiveErrorLinesAndTheGoodFilesAfterThemAreStillFitted() {
        SimulatedSweep good = SimulatedFiles.transmission(31);
        // A one-port file: in a Touchstone 1.1 two-port file a falling frequency starts the noise data
        // instead (Touchstone 1.1 specification, recalled from memory), so the .s1p shows the plain error.
        List<String> lines = new ArrayList<>(new TouchstoneWriter(FrequencyUnit.GHZ, TouchstoneFormat.RI)
                .toText(SimulatedFiles.reflection(32, 0.6).sweep()).lines().toList());
        // Swap two data records in the middle: the later one now holds the lower frequency.
        int first = lines.size() / 2;
        String movedDown = lines.get(first);
        lines.set(first, lines.get(first + 1));
        lines.set(first + 1, movedDown);
        int badLine = first + 2; // 1-based number of the record that is no longer ascending
        Path descending = SimulatedFiles.write(dir.resolve("descending.s1p"), String.join("\n", lines) + "\n");
        Path nan = SimulatedFiles.write(dir.resolve("nan.json"), withBareNaN(
                SimulatedFiles.message(good.sweep(), SimulatedFiles.INFO, "transmission")));
        Path text = SimulatedFiles.write(dir.resolve("notes.txt"), "10.4 GHz cavity, bench 2\n");
        Path fine = SimulatedFiles.touchstone(dir, "fine.s2p", good.sweep(), FrequencyUnit.GHZ, TouchstoneFormat.MA);

        CommandRun run = CommandRun.of("fit", descending, nan, text, fine);

        assertThat(run.exitCode()).isEqualTo(1);
        List<JsonNode> out = run.json();
        assertThat(out).hasSize(4);
        out.subList(0, 3).forEach(TruthChecks::assertValidError);
        assertThat(out).extracting(l -> l.get("source").asText())
                .containsExactly(descending.toString(), nan.toString(), text.toString(), fine.toString());
        assertThat(out.get(0).get("code").asText()).isEqualTo("not-ascending");
        assertThat(out.get(0).get("error").asText()).contains("line " + badLine);
        assertThat(out.get(1).get("code").asText()).isEqualTo("invalid-json");
        assertThat(out.get(1).get("error").asText()).contains("NaN");
        assertThat(out.get(2).get("code").asText()).isEqualTo("unreadable");
        assertThat(out.get(2).get("error").asText()).contains(".txt");
        TruthChecks.assertValidResult(out.get(3));
        assertMatchesTruth(out.get(3), good);
        assertThat(run.stderr()).doesNotContain("\tat ");
    }

    @Test
    void aJsonLinesFileGivesOneLinePerMessageNamedByItsLineNumber() {
        SimulatedSweep cavity = SimulatedFiles.transmission(33);
        SimulatedSweep ring = SimulatedFiles.notch(34);
        String good = SimulatedFiles.message(cavity.sweep(), SimulatedFiles.INFO, "transmission");
        String withoutLot = good.replace("\"lot\":\"" + SimulatedFiles.INFO.lot() + "\",", "");
        assertThat(withoutLot).isNotEqualTo(good);
        Path jsonl = SimulatedFiles.write(dir.resolve("shift.jsonl"), String.join("\n",
                good,
                withBareNaN(good),
                "",
                withoutLot,
                SimulatedFiles.message(ring.sweep(), SimulatedFiles.INFO, "notch")) + "\n");

        CommandRun run = CommandRun.of("fit", jsonl);

        assertThat(run.exitCode()).isEqualTo(1);
        List<JsonNode> out = run.json();
        assertThat(out).extracting(l -> l.get("source").asText())
                .containsExactly(jsonl + ":1", jsonl + ":2", jsonl + ":4", jsonl + ":5");
        assertMatchesTruth(out.get(0), cavity);
        assertThat(out.get(1).get("code").asText()).isEqualTo("invalid-json");
        assertThat(out.get(2).get("code").asText()).isEqualTo("missing-field");
        assertThat(out.get(2).get("error").asText()).contains("lot");
        assertMatchesTruth(out.get(3), ring);
        TruthChecks.assertValidResult(out.get(0));
        TruthChecks.assertValidError(out.get(1));
        TruthChecks.assertValidError(out.get(2));
        TruthChecks.assertValidResult(out.get(3));
    }

    @Test
    void aTopologyOptionTheDataCannotServeIsATopologyMismatch() {
        Path s1p = SimulatedFiles.touchstone(dir, "probe.s1p", SimulatedFiles.reflection(35, 0.6).sweep(),
                FrequencyUnit.GHZ, TouchstoneFormat.RI);

        CommandRun run = CommandRun.of("fit", "--topology", "transmission", s1p);

        assertThat(run.exitCode()).isEqualTo(1);
        TruthChecks.assertValidError(run.only());
        assertThat(run.only().get("code").asText()).isEqualTo("topology-mismatch");
        assertThat(run.only().get("error").asText()).contains("S21");
    }

    /** The message with its first real part replaced by the bare token NaN, which JSON does not allow (RFC 8259, section 6). */
    private static String withBareNaN(String message) {
        String changed = message.replaceFirst("\"re\":\\[[^,\\]]+", "\"re\":[NaN");
        assertThat(changed).isNotEqualTo(message);
        return changed;
    }
}
