package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.codec.ErrorCodes;

/** The command line as a user meets it: exit codes, where output goes, no stack traces. */
class MainTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @Test
    void versionAndHelpSucceed() {
        assertThat(run("--version")).isZero();
        assertThat(out.toString()).startsWith("qfleet ");

        assertThat(run("--help")).isZero();
        assertThat(out.toString()).contains("fit", "demo");

        assertThat(run("fit", "--help")).isZero();
        assertThat(out.toString()).contains("--topology", "--method", "--plot", "--max-points", "--debug");

        assertThat(run("demo", "--help")).isZero();
        assertThat(out.toString()).contains("--count", "--seed", "--out");
    }

    @Test
    void usageErrorsExitWithTwoAndAShortMessage() {
        assertThat(run()).isEqualTo(2);
        assertThat(run("fit")).isEqualTo(2);
        assertThat(run("fit", "--topology", "sideways", "x.s2p")).isEqualTo(2);
        assertThat(err.toString()).contains("expected one of transmission, notch, reflection");
        assertThat(run("fit", "--max-points", "3", "x.s2p")).isEqualTo(2);
        assertThat(run("fti", "x.s2p")).isEqualTo(2);
        assertThat(out.toString()).isEmpty();
        assertThat(err.toString()).doesNotContain("\tat ");
    }

    @Test
    void topologyNamesAreAcceptedInAnyCase() {
        assertThat(run("fit", "--topology", "NOTCH", dir.resolve("absent.s2p").toString())).isEqualTo(1);
        assertThat(err.toString()).isEmpty();
    }

    @Test
    void missingFilesGiveOneErrorLineEachAndExitOne() throws Exception {
        String first = dir.resolve("gone.s2p").toString();
        String second = dir.resolve("gone.json").toString();

        int code = run("fit", first, second);

        assertThat(code).isEqualTo(1);
        List<String> lines = out.toString().lines().toList();
        assertThat(lines).hasSize(2);
        ObjectMapper mapper = new ObjectMapper();
        JsonNode line = mapper.readTree(lines.get(0));
        assertThat(line.get("source").asText()).isEqualTo(first);
        assertThat(line.get("code").asText()).isEqualTo(ErrorCodes.UNREADABLE);
        assertThat(mapper.readTree(lines.get(1)).get("source").asText()).isEqualTo(second);
        assertThat(err.toString()).isEmpty();
    }

    @Test
    void aPlotFolderThatCannotBeCreatedIsAUsageError() throws Exception {
        Path file = Files.writeString(dir.resolve("plain-file"), "x");

        int code = run("fit", "--plot", file.resolve("sub").toString(), "x.s2p");

        assertThat(code).isEqualTo(2);
        assertThat(err.toString()).contains("--plot");
        assertThat(out.toString()).isEmpty();
    }

    private int run(String... args) {
        return Main.execute(args, new PrintWriter(out), new PrintWriter(err));
    }
}
