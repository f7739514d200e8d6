package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.qfleet.app.TruthChecks.assertMatchesTruth;
import static org.qfleet.app.TruthChecks.assertValidResult;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.codec.ErrorCodes;
import org.qfleet.sim.SimulatedSweep;
import org.qfleet.sweep.FrequencyUnit;
import org.qfleet.sweep.TouchstoneFormat;

/**
 * {@code qfleet fit} end to end, in process: simulated sweeps with known truth written to files,
 * the command run on them, its JSON lines checked against the truth and the schemas.
 */
class FitCommandTest {

    @TempDir
    Path dir;

    @Test
    void transmissionAndReflectionFilesAreFittedToTheTruth() {
        SimulatedSweep transmission = SimulatedFiles.transmission(11);
        SimulatedSweep reflection = SimulatedFiles.reflection(12, 0.6);
        Path s2p = SimulatedFiles.touchstone(dir, "cavity.s2p", transmission.sweep(), FrequencyUnit.GHZ, TouchstoneFormat.RI);
        Path s1p = SimulatedFiles.touchstone(dir, "coax.s1p", reflection.sweep(), FrequencyUnit.MHZ, TouchstoneFormat.MA);

        CommandRun run = CommandRun.of("fit", s2p, s1p);

        assertThat(run.exitCode()).as(run.stderr()).isZero();
        List<JsonNode> lines = run.json();
        assertThat(lines).hasSize(2);
        lines.forEach(TruthChecks::assertValidResult);
        assertThat(lines.get(0).get("source").asText()).isEqualTo(s2p.toString());
        assertThat(lines.get(0).get("route").asText()).isEqualTo("transmission-ports");
        assertMatchesTruth(lines.get(0), transmission);
        assertThat(lines.get(1).get("topology").asText()).isEqualTo("reflection");
        assertMatchesTruth(lines.get(1), reflection);
        assertThat(run.stderr()).isEmpty();
    }

    @Test
    void notchFileIsFittedToTheTruthWithTheTopologyOption() {
        SimulatedSweep notch = SimulatedFiles.notch(13);
        Path s2p = SimulatedFiles.touchstone(dir, "ring.s2p", notch.sweep(), FrequencyUnit.HZ, TouchstoneFormat.DB);

        CommandRun run = CommandRun.of("fit", "--topology", "notch", s2p);

        assertThat(run.exitCode()).as(run.stdout()).isZero();
        JsonNode line = run.only();
        assertValidResult(line);
        assertThat(line.get("topology").asText()).isEqualTo("notch");
        assertThat(line.get("route").asText()).isEqualTo("notch");
        assertMatchesTruth(line, notch);
    }

    @Test
    void anS11OnlyFileIsFittedAsAReflectionByDefault() {
        SimulatedSweep overCoupled = SimulatedFiles.reflection(14, 2.5);
        Path s1p = SimulatedFiles.touchstone(dir, "probe.s1p", overCoupled.sweep(), FrequencyUnit.GHZ, TouchstoneFormat.DB);

        JsonNode line = CommandRun.of("fit", s1p).only();

        assertThat(line.get("topology").asText()).isEqualTo("reflection");
        assertThat(line.get("route").asText()).isEqualTo("reflection");
        assertThat(line.get("coupling2").isNull()).as("one port has no second coupling").isTrue();
        // beta = 2.5 > 1: over-coupled, the circle encloses the origin (product brief, section 4).
        assertThat(line.get("coupling1").asDouble()).isGreaterThan(1);
        assertMatchesTruth(line, overCoupled);
    }

    @Test
    void aSweepMessageKeepsItsIdsAndItsTopology() {
        SimulatedSweep notch = SimulatedFiles.notch(15);
        Path json = SimulatedFiles.write(dir.resolve("ring.json"),
                SimulatedFiles.message(notch.sweep(), SimulatedFiles.INFO, "notch"));

        CommandRun run = CommandRun.of("fit", json);

        assertThat(run.exitCode()).as(run.stdout()).isZero();
        JsonNode line = run.only();
        assertValidResult(line);
        assertThat(line.get("sweepId").asText()).isEqualTo(SimulatedFiles.INFO.sweepId());
        assertThat(line.get("stationId").asText()).isEqualTo(SimulatedFiles.INFO.stationId());
        assertThat(line.get("product").asText()).isEqualTo(SimulatedFiles.INFO.product());
        assertThat(line.get("lot").asText()).isEqualTo(SimulatedFiles.INFO.lot());
        assertThat(line.get("unit").asText()).isEqualTo(SimulatedFiles.INFO.unit());
        assertThat(line.get("measuredAt").asText()).isEqualTo(SimulatedFiles.INFO.measuredAt());
        assertThat(line.get("fixtureId").asText()).isEqualTo(SimulatedFiles.INFO.fixtureId());
        assertThat(line.get("temperatureC").asDouble()).isEqualTo(SimulatedFiles.INFO.temperatureC());
        // A file without a topology would be fitted as a transmission; the message says notch.
        assertThat(line.get("topology").asText()).isEqualTo("notch");
        assertThat(line.get("route").asText()).isEqualTo("notch");
        assertMatchesTruth(line, notch);
    }

    @Test
    void theTopologyOptionOverridesTheMessage() {
        SimulatedSweep transmission = SimulatedFiles.transmission(22);
        Path json = SimulatedFiles.write(dir.resolve("cavity.json"),
                SimulatedFiles.message(transmission.sweep(), SimulatedFiles.INFO, "transmission"));

        JsonNode own = CommandRun.of("fit", json).only();
        JsonNode overridden = CommandRun.of("fit", "--topology", "reflection", json).only();

        assertThat(own.get("topology").asText()).isEqualTo("transmission");
        assertThat(own.get("route").asText()).isEqualTo("transmission-ports");
        assertMatchesTruth(own, transmission);
        assertValidResult(overridden);
        assertThat(overridden.get("sweepId").asText()).isEqualTo(SimulatedFiles.INFO.sweepId());
        assertThat(overridden.get("topology").asText()).isEqualTo("reflection");
        assertThat(overridden.get("route").asText()).isEqualTo("reflection");
    }

    @Test
    void theMethodOptionChoosesTheEstimator() {
        SimulatedSweep transmission = SimulatedFiles.transmission(16);
        Path s2p = SimulatedFiles.touchstone(dir, "cavity.s2p", transmission.sweep(), FrequencyUnit.GHZ, TouchstoneFormat.RI);

        JsonNode auto = CommandRun.of("fit", "--method", "auto", s2p).only();
        JsonNode circle = CommandRun.of("fit", "--method", "complex-circle", s2p).only();
        JsonNode lorentzian = CommandRun.of("fit", "--method", "lorentzian", s2p).only();
        JsonNode halfPower = CommandRun.of("fit", "--method", "half-power", s2p).only();

        assertThat(auto.get("method").asText()).isEqualTo("complex-circle");
        assertThat(circle.get("method").asText()).isEqualTo("complex-circle");
        assertThat(lorentzian.get("method").asText()).isEqualTo("lorentzian");
        assertThat(halfPower.get("method").asText()).isEqualTo("half-power");
        List.of(auto, circle, lorentzian, halfPower).forEach(TruthChecks::assertValidResult);
        assertMatchesTruth(lorentzian, transmission);
        // The weakest estimator (Petersan & Anlage, J. Appl. Phys. 84, 3392, 1998, compared them) reads
        // the width off noisy points; on a 40 dB sweep it still lands within a few per cent of Qu.
        assertThat(halfPower.get("qUnloaded").asDouble() / transmission.truth().qUnloaded()).isBetween(0.95, 1.05);
    }

    @Test
    void theComplexFitOnMagnitudeOnlyDataIsAFitErrorAndAnUnknownMethodAUsageError() {
        SimulatedSweep transmission = SimulatedFiles.transmission(17);
        Path json = SimulatedFiles.write(dir.resolve("scalar.json"),
                SimulatedFiles.magnitudeOnlyMessage(transmission.sweep(), SimulatedFiles.INFO));

        CommandRun forced = CommandRun.of("fit", "--method", "complex-circle", json);
        CommandRun automatic = CommandRun.of("fit", json);
        CommandRun unknown = CommandRun.of("fit", "--method", "guess", json);

        assertThat(forced.exitCode()).isEqualTo(1);
        assertThat(forced.only().get("code").asText()).isEqualTo(ErrorCodes.FIT_FAILED);
        assertThat(forced.only().get("error").asText()).contains("phase");
        assertThat(automatic.only().get("method").asText()).isEqualTo("lorentzian");
        assertThat(unknown.exitCode()).isEqualTo(2);
        assertThat(unknown.stderr()).contains("auto, complex-circle, lorentzian, half-power");
        assertThat(unknown.stdout()).isEmpty();
    }

    @Test
    void maxPointsBelowTheSweepSizeGivesTooManyPoints() {
        SimulatedSweep transmission = SimulatedFiles.transmission(18);
        Path s2p = SimulatedFiles.touchstone(dir, "long.s2p", transmission.sweep(), FrequencyUnit.GHZ, TouchstoneFormat.RI);
        Path json = SimulatedFiles.write(dir.resolve("long.json"),
                SimulatedFiles.message(transmission.sweep(), SimulatedFiles.INFO, "transmission"));

        CommandRun run = CommandRun.of("fit", "--max-points", "400", s2p, json);

        assertThat(run.exitCode()).isEqualTo(1);
        assertThat(run.json()).hasSize(2).allSatisfy(line -> {
            TruthChecks.assertValidError(line);
            assertThat(line.get("code").asText()).isEqualTo("too-many-points");
            assertThat(line.get("error").asText()).contains("400");
        });
        assertThat(CommandRun.of("fit", "--max-points", "401", s2p).exitCode()).isZero();
    }

    @Test
    void aFolderIsFittedInNameOrderSkippingOtherFiles() {
        SimulatedFiles.touchstone(dir, "unit-2.s1p", SimulatedFiles.reflection(19, 0.6).sweep(), FrequencyUnit.GHZ, TouchstoneFormat.MA);
        SimulatedFiles.touchstone(dir, "unit-10.s2p", SimulatedFiles.transmission(20).sweep(), FrequencyUnit.GHZ, TouchstoneFormat.RI);
        SimulatedFiles.write(dir.resolve("unit-a.json"),
                SimulatedFiles.message(SimulatedFiles.notch(21).sweep(), SimulatedFiles.INFO, "notch"));
        SimulatedFiles.write(dir.resolve("readme.txt"), "bench notes, not a sweep");

        CommandRun run = CommandRun.of("fit", dir);

        assertThat(run.exitCode()).as(run.stdout()).isZero();
        // Plain name order, character by character: "unit-10" sorts before "unit-2".
        assertThat(run.json()).extracting(l -> Path.of(l.get("source").asText()).getFileName().toString())
                .containsExactly("unit-10.s2p", "unit-2.s1p", "unit-a.json");
        assertThat(run.json()).extracting(l -> l.get("topology").asText())
                .containsExactly("transmission", "reflection", "notch");
    }
}
