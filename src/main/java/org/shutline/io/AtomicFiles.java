package org.shutline.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Writes files so that a crash or a kill at any moment leaves either the complete old
 * file or the complete new one: the content goes to a temporary file in the target's
 * folder, which is flushed to the disk ({@code fsync}), renamed over the target in one
 * step (an atomic rename where the file system allows it, else a plain replacing move),
 * and then the folder itself is flushed so that the rename is on the disk too (skipped on
 * Windows, where a folder cannot be opened for that). A failure leaves the old file, if
 * any, untouched and removes the temporary file.
 *
 * <p>Temporary files are named {@code .NAME.shutline-tmp-PID-N[.EXT]} (a hidden file
 * beside NAME; PID is the writing process; EXT may carry a suffix SQLite adds, such as
 * {@code .gpkg-journal}). A process killed part-way leaves its temporary files behind;
 * {@link #removeStale} removes those, and only those: names of exactly this pattern whose
 * process is no longer running.
 */
public final class AtomicFiles {
    /** The pattern of our temporary files' names; group 1 is the target's name, group 2 the process id. */
    static final Pattern TEMP = Pattern.compile("\\.(.+)\\.shutline-tmp-(\\d+)-(\\d+)(\\.[A-Za-z0-9_-]+)?");
    private static final AtomicLong SEQ = new AtomicLong();
    private static final boolean WINDOWS = System.getProperty("os.name", "").toLowerCase(Locale.ROOT).startsWith("windows");

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
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
                OutputStream os = Channels.newOutputStream(ch);
                content.writeTo(os);
                os.flush();
                ch.force(true);
            }
            rename(tmp, abs);
            moved = true;
        } finally {
            if (!moved) Files.deleteIfExists(tmp);
        }
    }

    /** Write text as UTF-8. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, os -> os.write(text.getBytes(StandardCharsets.UTF_8)));
    }

    /**
     * Move a finished temporary file over its target: the temporary file is flushed to the
     * disk first, and the folder after the rename.
     */
    public static void moveIntoPlace(Path tmp, Path target) throws IOException {
        sync(tmp);
        rename(tmp, target);
    }

    private static void rename(Path tmp, Path target) throws IOException {
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
        syncFolder(target.toAbsolutePath().getParent());
    }

    /** Flushes a written file's content to the disk. */
    public static void sync(Path file) throws IOException {
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.WRITE)) {
            ch.force(true);
        }
    }

    /** Flushes a folder's entries (renames, new files) to the disk; nothing on Windows. */
    public static void syncFolder(Path dir) throws IOException {
        if (WINDOWS) return;
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        }
    }

    /** A temporary path beside {@code target} that does not exist yet. */
    public static Path tempBeside(Path target, String suffix) {
        Path dir = target.toAbsolutePath().getParent();
        return dir.resolve("." + target.getFileName() + ".shutline-tmp-" + ProcessHandle.current().pid()
            + "-" + SEQ.incrementAndGet() + Long.toUnsignedString(System.nanoTime()) + suffix);
    }

    /**
     * Removes from {@code dir} (not its sub-folders) the temporary files that a killed
     * Shutline process left: regular files named by our pattern whose process id is not a
     * running process. Files of a process still running (this one included) and every
     * other file are left alone. Returns the files removed.
     */
    public static List<Path> removeStale(Path dir) throws IOException {
        List<Path> removed = new ArrayList<>();
        if (!Files.isDirectory(dir)) return removed;
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, ".*.shutline-tmp-*")) {
            for (Path p : ds) {
                Matcher m = TEMP.matcher(p.getFileName().toString());
                if (!m.matches() || !Files.isRegularFile(p, java.nio.file.LinkOption.NOFOLLOW_LINKS)) continue;
                long pid;
                try {
                    pid = Long.parseLong(m.group(2));
                } catch (NumberFormatException e) {
                    continue; // digits beyond a long: not a process id of ours
                }
                if (ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false)) continue;
                if (Files.deleteIfExists(p)) removed.add(p);
            }
        }
        if (!removed.isEmpty()) syncFolder(dir);
        return removed;
    }
}
