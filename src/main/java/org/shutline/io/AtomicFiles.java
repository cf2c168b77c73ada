package org.shutline.io;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Moving a finished temporary file over its target: an atomic rename when the file
 * system allows it, else a plain replacing move (the temporary file is always in the
 * target's folder, so the fallback is only taken on unusual file systems).
 */
final class AtomicFiles {
    private AtomicFiles() {}

    static void moveIntoPlace(Path tmp, Path target) throws IOException {
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /** A temporary path beside {@code target} that does not exist yet. */
    static Path tempBeside(Path target, String suffix) {
        Path dir = target.toAbsolutePath().getParent();
        return dir.resolve("." + target.getFileName() + ".tmp-" + ProcessHandle.current().pid()
            + "-" + System.nanoTime() + suffix);
    }
}
