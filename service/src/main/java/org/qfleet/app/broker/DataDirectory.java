package org.qfleet.app.broker;

import java.io.IOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;

/** The broker's data directory: wiped on request for a clean start, or when a demo ends. */
public final class DataDirectory {

    private DataDirectory() {
    }

    /**
     * Deletes {@code dir} and everything in it. Refuses a directory that does not look like a
     * broker's (no {@code meta.properties}) unless it is empty, so a mistyped path cannot wipe a
     * home folder.
     */
    public static void wipe(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return;
        }
        boolean empty;
        try (var entries = Files.list(dir)) {
            empty = entries.findAny().isEmpty();
        }
        boolean brokerData = Files.exists(dir.resolve(EmbeddedBroker.LOG_FOLDER).resolve("meta.properties"))
                || Files.exists(dir.resolve("meta.properties"));
        if (!empty && !brokerData) {
            throw new IOException("refusing to wipe " + dir + ": it holds files but no broker data (no meta.properties)");
        }
        Files.walkFileTree(dir, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path d, IOException e) throws IOException {
                if (e != null) {
                    throw e;
                }
                Files.delete(d);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
