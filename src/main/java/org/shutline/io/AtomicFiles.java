package org.shutline.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes a file the safe way: into a temporary file in the same folder, flushed and
 * closed, then moved over the target in one step. A failure leaves the old file (if
 * any) untouched and removes the temporary file.
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
        Path dir = abs.getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".tmp");
        boolean moved = false;
        try {
            try (OutputStream os = Files.newOutputStream(tmp)) {
                content.writeTo(os);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
        } finally {
            if (!moved) Files.deleteIfExists(tmp);
        }
    }

    /** Write text as UTF-8. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, os -> os.write(text.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
    }
}
