package org.shutline.report;

import java.awt.Font;
import java.awt.FontFormatException;
import java.awt.GraphicsEnvironment;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The fonts of exported documents: DejaVu Sans regular and bold, bundled (licence in
 * the fonts folder), so a PDF embeds real, selectable text and looks the same on
 * every machine. {@link #family()} is the AWT family name to use in sheets.
 */
public final class ReportFonts {
    static final String REGULAR = "fonts/DejaVuSans.ttf";
    static final String BOLD = "fonts/DejaVuSans-Bold.ttf";
    private static volatile boolean registered;

    private ReportFonts() {}

    /** Registers the bundled fonts with the local graphics environment (once) and returns their family. */
    public static String family() {
        if (!registered) {
            synchronized (ReportFonts.class) {
                if (!registered) {
                    GraphicsEnvironment ge = GraphicsEnvironment.getLocalGraphicsEnvironment();
                    ge.registerFont(load(REGULAR));
                    ge.registerFont(load(BOLD));
                    registered = true;
                }
            }
        }
        return "DejaVu Sans";
    }

    static Font load(String resource) {
        try (InputStream in = open(resource)) {
            return Font.createFont(Font.TRUETYPE_FONT, in);
        } catch (IOException e) {
            throw new UncheckedIOException("bundled font " + resource + " unreadable", e);
        } catch (FontFormatException e) {
            throw new IllegalStateException("bundled font " + resource + " is not a TrueType font", e);
        }
    }

    static InputStream open(String resource) {
        InputStream in = ReportFonts.class.getResourceAsStream(resource);
        if (in == null) throw new IllegalStateException("bundled font " + resource + " missing from the build");
        return in;
    }
}
