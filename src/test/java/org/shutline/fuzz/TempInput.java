package org.shutline.fuzz;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * One scratch file per fuzz test for readers that take a path: each input is written
 * over it before the reader runs. The folder is made once per run and removed at exit.
 */
public final class TempInput {
    private final Path file;

    public TempInput(String name) {
        try {
            Path dir = Files.createTempDirectory("shutline-fuzz-");
            dir.toFile().deleteOnExit();
            file = dir.resolve(name);
            file.toFile().deleteOnExit();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The scratch file holding {@code data}. */
    public Path with(byte[] data) {
        try {
            Files.write(file, data);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return file;
    }
}
