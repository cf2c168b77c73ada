package org.shutline.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A package of files a command writes into one folder ({@code export}, {@code plan --out},
 * {@code risk}, {@code cards}), with a manifest written last that tells whether the
 * package in the folder is whole. A folder cannot be replaced in one step and may hold
 * the user's own files, so each file is written on its own by {@link AtomicFiles}
 * (temporary name, flushed, renamed, folder flushed) and the manifest
 * {@value #MANIFEST} lists, once every file is in place, each file's name, size and
 * SHA-256 (FIPS 180-4), the command and the time. A run killed part-way leaves the
 * previous manifest, which then no longer matches the files replaced since:
 * {@link #check} says which files differ, so a reader never takes a mixed folder for a
 * whole package. Format: docs/output-package.md.
 *
 * <p>{@link #start} removes the temporary files a killed Shutline run left in the folder
 * ({@link AtomicFiles#removeStale}: our naming pattern only, never other files) and
 * checks the package found there, for the command to report. Files of the folder not
 * named in the manifest are not ours and are never touched.
 */
public final class OutputPackage {
    /** The manifest's file name in the package folder. */
    public static final String MANIFEST = "shutline-manifest.txt";
    /** The manifest's first line; a file of that name without it is not ours and is never replaced. */
    static final String HEADER = "shutline-package 1";

    /** One file of a package: its name in the folder, size in bytes and SHA-256 in lower-case hex. */
    public record Entry(String name, long size, String sha256) {}

    /** What a folder holds. */
    public enum Status {
        /** no manifest: not a package of ours (or one whose first run was stopped before its end) */
        NONE,
        /** every file the manifest lists is there with its size and checksum */
        WHOLE,
        /** some listed file is missing or differs: a later run was stopped part-way, or a file was changed */
        BROKEN,
        /** the manifest cannot be read as one */
        UNREADABLE
    }

    /** The result of {@link #check}: the status, the manifest's command and time, its files, and what is wrong (one line each). */
    public record Check(Status status, String command, String written, List<Entry> files, List<String> problems) {
        public Check {
            files = List.copyOf(files);
            problems = List.copyOf(problems);
        }

        /** One line for a person: "whole package of 12 files (export ..., 2026-12-05T19:30:00Z)" or what is wrong. */
        public String describe() {
            return switch (status) {
                case NONE -> "no " + MANIFEST + ": not a Shutline package, or its writing was stopped before the end";
                case WHOLE -> "whole package of " + files.size() + " files (" + command + ", written " + written + ")";
                case BROKEN -> "NOT a whole package: " + String.join("; ", problems) + " (manifest of " + command + ", written "
                        + written + "); run the command again";
                case UNREADABLE -> "unreadable " + MANIFEST + ": " + String.join("; ", problems);
            };
        }
    }

    private final Path dir;
    private final String command;
    private final Check previous;
    private final List<Path> removed;
    private final Map<String, Entry> entries = new LinkedHashMap<>();

    private OutputPackage(Path dir, String command, Check previous, List<Path> removed) {
        this.dir = dir;
        this.command = command;
        this.previous = previous;
        this.removed = List.copyOf(removed);
    }

    /**
     * Begins a package in {@code dir} (made when missing): removes stale temporary files of
     * ours and checks the package already there.
     *
     * @throws IOException when the folder cannot be made or read, is a file, or holds a
     *     {@value #MANIFEST} that is not ours
     */
    public static OutputPackage start(Path dir, String command) throws IOException {
        if (Files.exists(dir) && !Files.isDirectory(dir)) throw new IOException(dir + " is a file, not a folder");
        Files.createDirectories(dir);
        Check prev = check(dir);
        if (prev.status() == Status.UNREADABLE && !isOurs(dir.resolve(MANIFEST))) {
            throw new IOException(dir.resolve(MANIFEST) + " exists and is not a Shutline manifest; not replacing it");
        }
        return new OutputPackage(dir, command, prev, AtomicFiles.removeStale(dir));
    }

    /** The package found in the folder when this one began. */
    public Check previous() {
        return previous;
    }

    /** Stale temporary files removed when this package began. */
    public List<Path> removedTemporaries() {
        return removed;
    }

    /** The folder. */
    public Path dir() {
        return dir;
    }

    /** The path of file {@code name} in the folder. */
    public Path file(String name) {
        return dir.resolve(name);
    }

    /** Records a file written into the folder (by {@link AtomicFiles} or a writer that uses it): its size and checksum as on the disk. */
    public void add(Path file) throws IOException {
        Path rel = dir.toAbsolutePath().normalize().relativize(file.toAbsolutePath().normalize());
        if (rel.getNameCount() != 1 || rel.toString().equals(MANIFEST) || rel.toString().startsWith("..")) {
            throw new IllegalArgumentException(file + " is not a file of the package folder " + dir);
        }
        String name = rel.toString();
        entries.put(name, entry(name, file));
    }

    /** Writes the manifest, last, listing the files added; returns its path. */
    public Path commit() throws IOException {
        StringBuilder b = new StringBuilder();
        b.append(HEADER).append('\n');
        b.append("command: ").append(oneLine(command)).append('\n');
        b.append("written: ").append(Instant.now().truncatedTo(ChronoUnit.SECONDS)).append('\n');
        for (Entry e : entries.values()) b.append("file: ").append(e.sha256()).append(' ').append(e.size()).append(' ').append(e.name()).append('\n');
        b.append("end: ").append(entries.size()).append(" files\n");
        Path m = dir.resolve(MANIFEST);
        AtomicFiles.writeString(m, b.toString());
        return m;
    }

    /** Checks the package in {@code dir} against its manifest. Time O(bytes of the files listed). */
    public static Check check(Path dir) throws IOException {
        Path m = dir.resolve(MANIFEST);
        List<String> lines;
        try {
            lines = Files.readAllLines(m, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            return new Check(Status.NONE, "", "", List.of(), List.of());
        } catch (java.nio.charset.MalformedInputException e) {
            return unreadable("not UTF-8 text");
        }
        if (lines.isEmpty() || !lines.get(0).equals(HEADER)) return unreadable("first line is not '" + HEADER + "'");
        String command = "", written = "";
        List<Entry> files = new ArrayList<>();
        boolean ended = false;
        for (int i = 1; i < lines.size(); i++) {
            String l = lines.get(i);
            if (ended) return unreadable("line " + (i + 1) + " after the end line");
            if (l.startsWith("command: ")) command = l.substring(9);
            else if (l.startsWith("written: ")) written = l.substring(9);
            else if (l.startsWith("file: ")) {
                String[] f = l.substring(6).split(" ", 3);
                if (f.length != 3 || !f[0].matches("[0-9a-f]{64}") || !f[1].matches("\\d{1,18}") || f[2].isEmpty()
                        || f[2].contains("/") || f[2].contains("\\") || f[2].equals("..")) {
                    return unreadable("line " + (i + 1) + " is not 'file: SHA256 SIZE NAME'");
                }
                files.add(new Entry(f[2], Long.parseLong(f[1]), f[0]));
            } else if (l.equals("end: " + files.size() + " files")) ended = true;
            else return unreadable("line " + (i + 1) + " is not understood: " + l);
        }
        if (!ended) return unreadable("no end line (cut short)");
        List<String> problems = new ArrayList<>();
        for (Entry e : files) {
            Path f = dir.resolve(e.name());
            if (!Files.isRegularFile(f)) {
                problems.add(e.name() + " is missing");
                continue;
            }
            Entry now = entry(e.name(), f);
            if (now.size() != e.size()) problems.add(e.name() + " has " + now.size() + " bytes, the manifest " + e.size());
            else if (!now.sha256().equals(e.sha256())) problems.add(e.name() + " differs from its checksum");
        }
        return new Check(problems.isEmpty() ? Status.WHOLE : Status.BROKEN, command, written, files, problems);
    }

    private static Check unreadable(String why) {
        return new Check(Status.UNREADABLE, "", "", List.of(), List.of(why));
    }

    private static boolean isOurs(Path manifest) throws IOException {
        try (InputStream in = Files.newInputStream(manifest)) {
            byte[] head = in.readNBytes(HEADER.length());
            return new String(head, StandardCharsets.ISO_8859_1).equals(HEADER);
        }
    }

    private static Entry entry(String name, Path file) throws IOException {
        MessageDigest md;
        try {
            md = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java runtime", e);
        }
        long size = 0;
        try (InputStream in = Files.newInputStream(file)) {
            byte[] buf = new byte[1 << 16];
            for (int n = in.read(buf); n >= 0; n = in.read(buf)) {
                md.update(buf, 0, n);
                size += n;
            }
        }
        return new Entry(name, size, HexFormat.of().formatHex(md.digest()));
    }

    private static String oneLine(String s) {
        return s.replace('\n', ' ').replace('\r', ' ');
    }
}
