package org.qfleet.sweep;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads sweeps from files, choosing the reader by extension: {@code .s1p}/{@code .s2p}
 * (Touchstone 1.1 and 2.0), {@code .json} (one sweep message) and {@code .jsonl} (one per line).
 * Touchstone sweeps come without a topology: see {@link #defaultTopology(Sweep)}.
 */
public final class SweepFiles {

    static final String SUPPORTED = ".s1p, .s2p (Touchstone), .json (one sweep message), .jsonl (one per line)";

    private final TouchstoneReader touchstone;
    private final SweepJsonReader json;

    public SweepFiles(SweepLimits limits) {
        this.touchstone = new TouchstoneReader(limits);
        this.json = new SweepJsonReader(limits);
    }

    /**
     * The topology to assume for a file that does not say: reflection when the sweep has S11 but
     * no S21 (a 1-port file), notch when |S21| dips rather than peaks, transmission otherwise.
     */
    public static Topology defaultTopology(Sweep sweep) {
        return TopologyGuess.of(sweep);
    }

    /** Never throws for bad content: every problem becomes a failed outcome with a clear reason. */
    public List<ReadOutcome> read(Path file) {
        String source = file.toString();
        String extension = extension(file);
        try {
            switch (extension) {
                case "s1p", "s2p" -> {
                    return List.of(readTouchstone(file, source, extension.charAt(1) - '0'));
                }
                case "json" -> {
                    return List.of(readJson(file, source));
                }
                case "jsonl" -> {
                    return readJsonLines(file, source);
                }
                default -> {
                    return List.of(unsupported(source, extension));
                }
            }
        } catch (IOException e) {
            return List.of(ReadOutcome.failed(source, cannotRead(source, e)));
        }
    }

    private ReadOutcome readTouchstone(Path file, String source, int ports) throws IOException {
        try (Reader text = new InputStreamReader(open(file), StandardCharsets.ISO_8859_1)) {
            return ReadOutcome.of(touchstone.read(source, text, ports, Files.size(file)));
        } catch (InvalidSweepException e) {
            return ReadOutcome.failed(source, e);
        }
    }

    private ReadOutcome readJson(Path file, String source) throws IOException {
        try (InputStream in = open(file)) {
            return ReadOutcome.of(json.read(source, in));
        } catch (InvalidSweepException e) {
            return ReadOutcome.failed(source, e);
        }
    }

    private List<ReadOutcome> readJsonLines(Path file, String source) throws IOException {
        List<ReadOutcome> outcomes = new ArrayList<>();
        try (InputStream in = open(file)) {
            ByteLines lines = new ByteLines(in);
            while (lines.nextNonBlank()) {
                String lineSource = source + ":" + lines.lineNumber();
                try {
                    outcomes.add(ReadOutcome.of(json.read(lineSource, lines.line())));
                } catch (InvalidSweepException e) {
                    if (e.error() == SweepError.UNREADABLE && e.getCause() instanceof IOException failure) {
                        throw failure;
                    }
                    outcomes.add(ReadOutcome.failed(lineSource, e));
                }
            }
        } catch (IOException e) {
            outcomes.add(ReadOutcome.failed(source, cannotRead(source, e)));
        }
        return outcomes;
    }

    private static InputStream open(Path file) throws IOException {
        if (Files.isDirectory(file)) {
            throw new IOException("it is a directory");
        }
        return Files.newInputStream(file);
    }

    private static ReadOutcome unsupported(String source, String extension) {
        if (extension.length() >= 3 && extension.charAt(0) == 's' && extension.endsWith("p")
                && extension.substring(1, extension.length() - 1).chars().allMatch(Character::isDigit)) {
            return ReadOutcome.failed(source, new InvalidSweepException(SweepError.UNSUPPORTED_PARAMETER,
                    "cannot read " + source + ": " + extension.substring(1, extension.length() - 1)
                            + "-port files are not supported, only .s1p and .s2p"));
        }
        return ReadOutcome.failed(source, new InvalidSweepException(SweepError.UNREADABLE, "cannot read " + source
                + ": unsupported file type" + (extension.isEmpty() ? "" : " ." + extension)
                + "; supported are " + SUPPORTED));
    }

    private static InvalidSweepException cannotRead(String source, IOException e) {
        String reason;
        if (e instanceof NoSuchFileException) {
            reason = "no such file";
        } else if (e instanceof AccessDeniedException) {
            reason = "permission denied";
        } else {
            reason = e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
        }
        return new InvalidSweepException(SweepError.UNREADABLE, "cannot read " + source + ": " + reason, e);
    }

    private static String extension(Path file) {
        Path name = file.getFileName();
        String text = name == null ? "" : name.toString();
        int dot = text.lastIndexOf('.');
        return dot < 0 ? "" : text.substring(dot + 1).toLowerCase(Locale.ROOT);
    }
}
