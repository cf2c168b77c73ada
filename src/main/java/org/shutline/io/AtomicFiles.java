package org.shutline.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes files the safe way: into a temporary file in the target's folder, flushed and
 * closed, then moved over the target in one step (an atomic rename where the file
 * system allows it, else a plain replacing move). A failure leaves the old file, if
 * any, untouched and removes the temporary file.
 */
public final class AtomicFiles {
    private AtomicFiles() {}

    /** What writes the content. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    public static void write(Path target, Content content) throws IOException {
        Path abs = target.toAbsolutePath();
        Files.createDirectories(abs.getParent());
        Path tmp = tempBeside(abs, ".tmp");
        boolean moved = false;
        try {
            try (OutputStream os = Files.newOutputStream(tmp)) {
                content.writeTo(os);
            }
            moveIntoPlace(tmp, abs);
            moved = true;
        } finally {
            if (!moved) Files.deleteIfExists(tmp);
        }
    }

    /** Write text as UTF-8. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, os -> os.write(text.getBytes(StandardCharsets.UTF_8)));
    }

    /** Move a finished temporary file over its target. */
    public static void moveIntoPlace(Path tmp, Path target) throws IOException {
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /** A temporary path beside {@code target} that does not exist yet. */
    public static Path tempBeside(Path target, String suffix) {
        Path dir = target.toAbsolutePath().getParent();
        return dir.resolve("." + target.getFileName() + ".tmp-" + ProcessHandle.current().pid()
            + "-" + System.nanoTime() + suffix);
    }
}
