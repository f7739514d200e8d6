package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.qfleet.app.ResonanceFixtures.CAVITY;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.app.plot.PlotDirectory;
import org.qfleet.codec.ErrorCodes;
import org.qfleet.fit.FitException;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.InvalidSweepException;
import org.qfleet.sweep.ReadOutcome;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepError;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

class FitRunnerTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();
    private final List<Path> filesRead = new ArrayList<>();
    private final List<Sweep> sweepsFitted = new ArrayList<>();
    private final ObjectMapper mapper = new ObjectMapper();

    /** Reads every file as one good sweep named after it. */
    private final SweepSource oneSweepPerFile = file -> {
        filesRead.add(file);
        return List.of(ReadOutcome.of(ResonanceFixtures.fileSweep(file.getFileName().toString(), CAVITY)));
    };

    /** Fits every sweep to the fixture's result, remembering what it was given. */
    private final SweepFitter fixedResult = sweep -> {
        sweepsFitted.add(sweep);
        return ResonanceFixtures.result(CAVITY, List.of());
    };

    @Test
    void everyInputFittedMeansSuccessAndOneResultLineEach() throws Exception {
        List<Path> files = touch("a.s2p", "b.s2p");

        boolean ok = runner(oneSweepPerFile, fixedResult, settings(null)).run(files);

        assertThat(ok).isTrue();
        List<JsonNode> lines = stdoutLines();
        assertThat(lines).extracting(l -> l.get("source").asText()).containsExactly("a.s2p", "b.s2p");
        assertThat(lines).allSatisfy(l -> assertThat(l.get("qLoaded").asDouble()).isEqualTo(CAVITY.qLoaded()));
        assertThat(err.toString()).isEmpty();
    }

    @Test
    void aReaderRejectionBecomesAnErrorLineWithItsCodeAndTheRunGoesOn() throws Exception {
        List<Path> files = touch("bad.s2p", "good.s2p");
        SweepSource source = file -> file.endsWith("bad.s2p")
                ? List.of(ReadOutcome.failed("bad.s2p", new InvalidSweepException(SweepError.NOT_ASCENDING,
                        "line 12: frequency 2.0e9 Hz is not above the previous 2.1e9 Hz")))
                : oneSweepPerFile.read(file);

        boolean ok = runner(source, fixedResult, settings(null)).run(files);

        assertThat(ok).isFalse();
        List<JsonNode> lines = stdoutLines();
        assertThat(lines).hasSize(2);
        assertThat(lines.get(0).get("source").asText()).isEqualTo("bad.s2p");
        assertThat(lines.get(0).get("code").asText()).isEqualTo("not-ascending");
        assertThat(lines.get(0).get("error").asText()).contains("line 12");
        assertThat(lines.get(1).has("qUnloaded")).isTrue();
    }

    @Test
    void aFitFailureBecomesAnErrorLineWithTheFittersReason() throws Exception {
        List<Path> files = touch("flat.s2p");
        SweepFitter fitter = sweep -> {
            throw new FitException("no resonance: the trace is flat within the noise");
        };

        boolean ok = runner(oneSweepPerFile, fitter, settings(null)).run(files);

        assertThat(ok).isFalse();
        JsonNode line = stdoutLines().get(0);
        assertThat(line.get("code").asText()).isEqualTo(ErrorCodes.FIT_FAILED);
        assertThat(line.get("error").asText()).isEqualTo("no resonance: the trace is flat within the noise");
    }

    @Test
    void anUnexpectedFailureIsAnErrorLineWithoutStackTrace() throws Exception {
        List<Path> files = touch("odd.s2p", "next.s2p");
        SweepFitter fitter = sweep -> {
            if (sweep.source().equals("odd.s2p")) {
                throw new IllegalStateException("matrix not positive definite");
            }
            return ResonanceFixtures.result(CAVITY, List.of());
        };

        boolean ok = runner(oneSweepPerFile, fitter, settings(null)).run(files);

        assertThat(ok).isFalse();
        List<JsonNode> lines = stdoutLines();
        assertThat(lines.get(0).get("code").asText()).isEqualTo(ErrorCodes.INTERNAL_ERROR);
        assertThat(lines.get(0).get("error").asText())
                .contains("IllegalStateException", "matrix not positive definite", "--debug");
        assertThat(lines.get(1).has("f0Hz")).isTrue();
        assertThat(err.toString()).doesNotContain("\tat ");
    }

    @Test
    void debugPrintsTheStackTraceOnStderrOnly() throws Exception {
        List<Path> files = touch("odd.s2p");
        SweepSource broken = file -> {
            throw new UnsupportedOperationException("reader missing");
        };

        boolean ok = runner(broken, fixedResult, new FitRunner.Settings(null, null, true)).run(files);

        assertThat(ok).isFalse();
        assertThat(stdoutLines().get(0).get("code").asText()).isEqualTo(ErrorCodes.INTERNAL_ERROR);
        assertThat(out.toString()).doesNotContain("\tat ");
        assertThat(err.toString()).contains("UnsupportedOperationException", "\tat ");
    }

    @Test
    void missingFilesAndEmptyInputsAreErrorLines() throws Exception {
        Path empty = Files.createDirectory(dir.resolve("empty"));
        List<Path> files = new ArrayList<>(touch("nothing.jsonl"));
        files.add(dir.resolve("absent.s2p"));
        files.add(empty);
        SweepSource noSweeps = file -> List.of();

        boolean ok = runner(noSweeps, fixedResult, settings(null)).run(files);

        assertThat(ok).isFalse();
        assertThat(stdoutLines()).extracting(l -> l.get("code").asText())
                .containsExactly(ErrorCodes.NO_SWEEPS, ErrorCodes.UNREADABLE, ErrorCodes.NO_SWEEPS);
    }

    @Test
    void aFolderStandsForItsSweepFilesInNameOrder() throws Exception {
        touch("b.s2p", "a.s1p", "notes.txt", "c.JSONL", "d.json", ".hidden.s2p");
        Files.createDirectory(dir.resolve("sub.s2p"));

        runner(oneSweepPerFile, fixedResult, settings(null)).run(List.of(dir));

        assertThat(filesRead).extracting(p -> p.getFileName().toString())
                .containsExactly("a.s1p", "b.s2p", "c.JSONL", "d.json");
    }

    @Test
    void topologyOptionWinsThenTheSweepsOwnThenTheTraces() throws Exception {
        List<Path> files = touch("given.json", "plain.s2p", "oneport.s1p");
        SweepSource source = file -> {
            String name = file.getFileName().toString();
            Sweep sweep = ResonanceFixtures.fileSweep(name, CAVITY);
            Trace trace = sweep.traces().get(SParameter.S21);
            Map<SParameter, Trace> traces = name.equals("oneport.s1p") ? Map.of(SParameter.S11, trace)
                    : Map.of(SParameter.S21, trace, SParameter.S11, trace);
            Topology own = name.equals("given.json") ? Topology.NOTCH : null;
            return List.of(ReadOutcome.of(new Sweep(name, SweepInfo.NONE, own, sweep.frequencyHz(), traces, 50)));
        };

        runner(source, fixedResult, settings(null)).run(files);
        List<Topology> withoutOption = sweepsFitted.stream().map(Sweep::topology).toList();
        sweepsFitted.clear();
        runner(source, fixedResult, settings(Topology.REFLECTION)).run(files);

        assertThat(withoutOption).containsExactly(Topology.NOTCH, Topology.TRANSMISSION, Topology.REFLECTION);
        assertThat(sweepsFitted).extracting(Sweep::topology).containsOnly(Topology.REFLECTION);
        assertThat(stdoutLines()).extracting(l -> l.get("topology").asText())
                .containsExactly("notch", "transmission", "reflection", "reflection", "reflection", "reflection");
    }

    @Test
    void aTopologyTheSweepCannotServeIsAnErrorLineAndNotFitted() throws Exception {
        List<Path> files = touch("oneport.s1p");
        SweepSource s11Only = file -> {
            Sweep sweep = ResonanceFixtures.fileSweep("oneport.s1p", CAVITY);
            Map<SParameter, Trace> traces = Map.of(SParameter.S11, sweep.traces().get(SParameter.S21));
            return List.of(ReadOutcome.of(new Sweep("oneport.s1p", SweepInfo.NONE, null, sweep.frequencyHz(), traces, 50)));
        };

        boolean ok = runner(s11Only, fixedResult, settings(Topology.NOTCH)).run(files);

        assertThat(ok).isFalse();
        assertThat(sweepsFitted).isEmpty();
        assertThat(stdoutLines().get(0).get("code").asText()).isEqualTo(SweepError.TOPOLOGY_MISMATCH.code());
    }

    @Test
    void plotsAreWrittenOnePerSweep() throws Exception {
        List<Path> files = touch("u1.s2p", "u2.s2p");
        Path plots = dir.resolve("plots");
        FitRunner.Settings settings = new FitRunner.Settings(null, new PlotDirectory(plots), false);

        boolean ok = runner(oneSweepPerFile, fixedResult, settings).run(files);

        assertThat(ok).isTrue();
        assertThat(plots.resolve("u1.s2p.svg")).isNotEmptyFile();
        assertThat(plots.resolve("u2.s2p.svg")).isNotEmptyFile();
    }

    @Test
    void longRunsReportProgressOnStderrAndNeverOnStdout() throws Exception {
        List<Path> files = new ArrayList<>();
        for (int i = 0; i < ProgressMeter.THRESHOLD + 10; i++) {
            files.addAll(touch(String.format("unit-%03d.s2p", i)));
        }
        AtomicLong clock = new AtomicLong();
        long step = TimeUnit.SECONDS.toNanos(1);

        new FitRunner(oneSweepPerFile, fixedResult, settings(null), new PrintWriter(out), new PrintWriter(err),
                () -> clock.addAndGet(step)).run(files);

        assertThat(stdoutLines()).hasSize(files.size()).allSatisfy(l -> assertThat(l.has("f0Hz")).isTrue());
        assertThat(err.toString()).contains("of 60 files", "files/s").contains("60 files in");
    }

    private FitRunner runner(SweepSource source, SweepFitter fitter, FitRunner.Settings settings) {
        return new FitRunner(source, fitter, settings, new PrintWriter(out), new PrintWriter(err), () -> 0L);
    }

    private static FitRunner.Settings settings(Topology topology) {
        return new FitRunner.Settings(topology, null, false);
    }

    private List<Path> touch(String... names) throws IOException {
        List<Path> paths = new ArrayList<>();
        for (String name : names) {
            paths.add(Files.writeString(dir.resolve(name), "placeholder"));
        }
        return paths;
    }

    private List<JsonNode> stdoutLines() throws IOException {
        List<JsonNode> lines = new ArrayList<>();
        for (String line : out.toString().split("\n")) {
            if (!line.isEmpty()) {
                lines.add(mapper.readTree(line));
            }
        }
        return lines;
    }
}
