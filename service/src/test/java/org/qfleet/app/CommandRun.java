package org.qfleet.app;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * One in-process run of the command line, through the same picocli {@code CommandLine} the jar
 * uses, with stdout and stderr captured.
 *
 * @param exitCode what the process would exit with
 * @param stdout   everything written to stdout
 * @param stderr   everything written to stderr
 */
record CommandRun(int exitCode, String stdout, String stderr) {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    static CommandRun of(Object... args) {
        String[] arguments = Arrays.stream(args).map(String::valueOf).toArray(String[]::new);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        PrintWriter outWriter = new PrintWriter(out);
        PrintWriter errWriter = new PrintWriter(err);
        int code = Main.commandLine(outWriter, errWriter).execute(arguments);
        outWriter.flush();
        errWriter.flush();
        return new CommandRun(code, out.toString(), err.toString());
    }

    /** The stdout lines as they were printed. */
    List<String> lines() {
        return stdout.lines().toList();
    }

    /** The stdout lines parsed as JSON objects. */
    List<JsonNode> json() {
        List<JsonNode> nodes = new ArrayList<>();
        for (String line : lines()) {
            try {
                nodes.add(MAPPER.readTree(line));
            } catch (IOException e) {
                throw new UncheckedIOException("stdout line is not JSON: " + line, e);
            }
        }
        return nodes;
    }

    /** The one line of a run over a single input. */
    JsonNode only() {
        List<JsonNode> nodes = json();
        if (nodes.size() != 1) {
            throw new AssertionError("expected one line, got " + nodes.size() + ":\n" + stdout + "\nstderr:\n" + stderr);
        }
        return nodes.get(0);
    }
}
