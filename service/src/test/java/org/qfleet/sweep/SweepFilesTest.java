package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SweepFilesTest {

    @TempDir
    Path dir;

    private final SweepFiles files = new SweepFiles(SweepLimits.DEFAULT);

    @Test
    void readsTouchstoneFilesByExtensionInAnyCase() throws IOException {
        Sweep twoPort = TouchstoneWriterTest.randomSweep(new Random(1), 21, SParameter.S11, SParameter.S21);
        Sweep onePort = TouchstoneWriterTest.randomSweep(new Random(2), 21, SParameter.S11);
        TouchstoneWriter writer = new TouchstoneWriter(FrequencyUnit.GHZ, TouchstoneFormat.DB);
        Path s2p = write("unit-7.S2P", writer.toText(twoPort));
        Path s1p = write("unit-8.s1p", writer.toText(onePort));

        ReadOutcome two = single(files.read(s2p));
        ReadOutcome one = single(files.read(s1p));

        assertThat(two.ok()).isTrue();
        assertThat(two.source()).isEqualTo(s2p.toString());
        assertThat(two.sweep().topology()).isNull();
        // A two-port file is a transmission or a notch, decided by the shape of |S21| (TopologyGuessTest).
        assertThat(SweepFiles.defaultTopology(two.sweep())).isNotEqualTo(Topology.REFLECTION);
        assertThat(one.sweep().traces()).containsOnlyKeys(SParameter.S11);
        assertThat(SweepFiles.defaultTopology(one.sweep())).isEqualTo(Topology.REFLECTION);
    }

    @Test
    void reportsTouchstoneErrorsWithTheLine() throws IOException {
        ReadOutcome outcome = single(files.read(write("bad.s1p", "# GHz S RI\n1 0 0\n2 0\n")));
        assertThat(outcome.ok()).isFalse();
        assertThat(outcome.error().error()).isEqualTo(SweepError.TOUCHSTONE_SYNTAX);
        assertThat(outcome.error()).hasMessage("line 3: expected 3 numbers per frequency, found 2");
    }

    @Test
    void readsOneMessageFromAJsonFile() throws IOException {
        Path json = write("sweep.json", "\n  " + SweepMessage.valid().json() + "\n");
        ReadOutcome outcome = single(files.read(json));
        assertThat(outcome.ok()).isTrue();
        assertThat(outcome.sweep().info().sweepId()).isEqualTo("sw-0001");
        assertThat(outcome.source()).isEqualTo(json.toString());
    }

    @Test
    void readsJsonLinesOneOutcomePerNonBlankLine() throws IOException {
        String good = SweepMessage.valid().json();
        String bad = SweepMessage.valid().with("topology", "\"thru\"").json();
        Path jsonl = write("batch.jsonl", good + "\n\n" + bad + "\r\n  \t \n{\"sweepId\":\n" + good + "\n   ");

        List<ReadOutcome> outcomes = files.read(jsonl);

        assertThat(outcomes).extracting(ReadOutcome::source).containsExactly(
                jsonl + ":1", jsonl + ":3", jsonl + ":5", jsonl + ":6");
        assertThat(outcomes).extracting(ReadOutcome::ok).containsExactly(true, false, false, true);
        assertThat(outcomes.get(1).error().error()).isEqualTo(SweepError.UNKNOWN_TOPOLOGY);
        assertThat(outcomes.get(1).error().sweepId()).contains("sw-0001");
        assertThat(outcomes.get(2).error().error()).isEqualTo(SweepError.INVALID_JSON);
        assertThat(outcomes.get(3).sweep().source()).isEqualTo(jsonl + ":6");
    }

    @Test
    void jsonLinesMayEndWithoutALineBreak() throws IOException {
        Path jsonl = write("tail.jsonl", SweepMessage.valid().json() + "\n" + SweepMessage.valid().json());
        assertThat(files.read(jsonl)).extracting(ReadOutcome::ok).containsExactly(true, true);
    }

    @Test
    void rejectsUnsupportedExtensionsListingTheSupportedOnes() throws IOException {
        ReadOutcome outcome = single(files.read(write("sweep.csv", "1,2,3\n")));
        assertThat(outcome.error().error()).isEqualTo(SweepError.UNREADABLE);
        assertThat(outcome.error().getMessage()).contains("unsupported file type .csv")
                .contains(".s1p").contains(".s2p").contains(".json").contains(".jsonl");
        assertThat(single(files.read(write("README", "x"))).error().error()).isEqualTo(SweepError.UNREADABLE);
    }

    @Test
    void rejectsTouchstoneFilesWithMoreThanTwoPorts() throws IOException {
        ReadOutcome outcome = single(files.read(write("coupler.s4p", "# GHz S RI\n")));
        assertThat(outcome.error().error()).isEqualTo(SweepError.UNSUPPORTED_PARAMETER);
        assertThat(outcome.error().getMessage()).contains("4-port");
    }

    @Test
    void reportsMissingFilesAndDirectoriesAsUnreadable() throws IOException {
        Path missing = dir.resolve("gone.s2p");
        ReadOutcome outcome = single(files.read(missing));
        assertThat(outcome.error().error()).isEqualTo(SweepError.UNREADABLE);
        assertThat(outcome.error()).hasMessage("cannot read " + missing + ": no such file");
        assertThat(single(files.read(dir.resolve("gone.jsonl"))).error().getMessage()).endsWith("no such file");

        Path folder = Files.createDirectory(dir.resolve("folder.json"));
        assertThat(single(files.read(folder)).error().error()).isEqualTo(SweepError.UNREADABLE);
    }

    private Path write(String name, String text) throws IOException {
        return Files.write(dir.resolve(name), text.getBytes(StandardCharsets.UTF_8));
    }

    private static ReadOutcome single(List<ReadOutcome> outcomes) {
        assertThat(outcomes).hasSize(1);
        return outcomes.get(0);
    }
}
