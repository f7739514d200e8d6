package org.qfleet.app.status;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;

/**
 * The Chromium browser run headless from a test: a screenshot of a page, or the page's DOM after
 * loading. The binary is {@code $QFLEET_CHROMIUM} when set, else the first of {@code chromium},
 * {@code chromium-browser}, {@code google-chrome} found on the PATH.
 */
final class HeadlessChromium {

    private static final long TIMEOUT_SECONDS = 120;

    private final Path binary;
    private final Path workDir;

    private HeadlessChromium(Path binary, Path workDir) {
        this.binary = binary;
        this.workDir = workDir;
    }

    static Optional<Path> find() {
        String configured = System.getenv("QFLEET_CHROMIUM");
        if (configured != null && !configured.isBlank()) {
            return Optional.of(Path.of(configured)).filter(Files::isExecutable);
        }
        String path = System.getenv("PATH");
        for (String name : List.of("chromium", "chromium-browser", "google-chrome")) {
            for (String dir : path == null ? new String[0] : path.split(File.pathSeparator)) {
                Path candidate = Path.of(dir, name);
                if (Files.isExecutable(candidate)) {
                    return Optional.of(candidate);
                }
            }
        }
        return Optional.empty();
    }

    /** @param workDir where profiles and logs go */
    static HeadlessChromium at(Path binary, Path workDir) {
        return new HeadlessChromium(binary, workDir);
    }

    void screenshot(String url, Path png, int width, int height) throws IOException, InterruptedException {
        run("screenshot", List.of("--hide-scrollbars", "--screenshot=" + png.toAbsolutePath(),
                "--window-size=" + width + "," + height, url));
    }

    String dumpDom(String url) throws IOException, InterruptedException {
        return Files.readString(run("dom", List.of("--dump-dom", url)), StandardCharsets.UTF_8);
    }

    /** Runs the browser; returns the file holding its standard output. */
    private Path run(String name, List<String> arguments) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of(binary.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-dev-shm-usage", "--no-first-run", "--user-data-dir=" + workDir.resolve(name + "-profile")));
        command.addAll(arguments);
        Path out = workDir.resolve(name + ".out");
        Path err = workDir.resolve(name + ".err");
        Process process = new ProcessBuilder(command).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!process.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            throw new IOException("chromium (" + name + ") did not finish within " + TIMEOUT_SECONDS + " s: "
                    + Files.readString(err));
        }
        if (process.exitValue() != 0) {
            throw new IOException("chromium (" + name + ") exited with " + process.exitValue() + ": " + Files.readString(err));
        }
        return out;
    }
}
