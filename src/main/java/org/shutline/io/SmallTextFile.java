package org.shutline.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Reads a small text file we parse ourselves (a work plan, a field mapping, a settings
 * file) under limits generous for real files, so that a huge or binary file is refused
 * at once with the limit named instead of a parser running for minutes on it.
 *
 * <ul>
 * <li>Size: at most {@code maxBytes}, checked before anything is read.</li>
 * <li>Text: UTF-8, strictly decoded (a leading UTF-8 byte order mark is dropped); a
 *     UTF-16 byte order mark, NUL bytes or invalid UTF-8 are refused with what the file
 *     looks like.</li>
 * <li>Lines: none longer than {@link #MAX_LINE} characters (a YAML scalar on one line is
 *     a line), the line number named.</li>
 * </ul>
 * The YAML parsers add their own limits on nesting and aliases (see the callers).
 */
public final class SmallTextFile {
    /** Longest line accepted: 64 Ki characters (a plan's longest note is a few hundred). */
    public static final int MAX_LINE = 65_536;

    private SmallTextFile() {}

    /** The file's text; {@code what} names the kind of file in messages ("plan file"). */
    public static String read(Path file, String what, long maxBytes) throws InputException {
        long size;
        try {
            size = Files.size(file);
        } catch (IOException e) {
            throw new InputException(file + ": cannot read " + what + ": " + e.getMessage(), e);
        }
        if (Files.isDirectory(file)) throw new InputException(file + ": is a folder, not a " + what);
        if (size > maxBytes) {
            throw new InputException(String.format(Locale.ROOT, "%s: %s too large: %s, the limit is %s", file, what, bytes(size), bytes(maxBytes)));
        }
        byte[] b;
        try {
            b = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new InputException(file + ": cannot read " + what + ": " + e.getMessage(), e);
        }
        int start = 0;
        if (b.length >= 2 && ((b[0] == (byte) 0xFF && b[1] == (byte) 0xFE) || (b[0] == (byte) 0xFE && b[1] == (byte) 0xFF))) {
            throw new InputException(file + ": " + what + " is UTF-16 text; save it as UTF-8");
        }
        if (b.length >= 3 && b[0] == (byte) 0xEF && b[1] == (byte) 0xBB && b[2] == (byte) 0xBF) start = 3;
        for (int i = start; i < b.length; i++) {
            if (b[i] == 0) {
                throw new InputException(file + ": " + what + " is not text (a NUL byte at byte " + (i + 1)
                        + "; a binary file, or UTF-16 without a byte order mark)");
            }
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(b, start, b.length - start)).toString();
        } catch (CharacterCodingException e) {
            throw new InputException(file + ": " + what + " is not UTF-8 text (" + e.getMessage() + "); save it as UTF-8", e);
        }
        int line = 1, len = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n') {
                line++;
                len = 0;
            } else if (++len > MAX_LINE) {
                throw new InputException(String.format(Locale.ROOT, "%s: %s line %d is longer than %,d characters, the limit for one line",
                        file, what, line, MAX_LINE));
            }
        }
        return text;
    }

    private static String bytes(long n) {
        if (n >= 1 << 20) return String.format(Locale.ROOT, "%.1f MB", n / 1048576.0);
        if (n >= 1 << 10) return String.format(Locale.ROOT, "%.1f KB", n / 1024.0);
        return n + " bytes";
    }
}
