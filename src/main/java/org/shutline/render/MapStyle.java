package org.shutline.render;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Stroke;
import java.util.List;

/**
 * Colours, sizes and level-of-detail thresholds of a map theme. Two themes are built in:
 * {@link #LIGHT} and {@link #DARK}. Colours come from the Okabe-Ito palette
 * (Okabe and Ito, "Color Universal Design", 2008), chosen to stay apart for the common
 * forms of colour blindness; shapes and line patterns carry the meaning as well, so a
 * map also reads in greyscale.
 *
 * <p>Sizes are in pixels. {@code servicesMaxMetresPerPixel} and
 * {@code labelsMaxMetresPerPixel} are the coarsest ground resolutions (metres per pixel)
 * at which ordinary services and street names are still drawn; {@code decimatePx} is
 * the screen distance below which consecutive line vertices are merged.
 *
 * @param systemColours colours given to pressure systems in rank order (cycled)
 */
public record MapStyle(String name, Color background, Color foreground, Color halo,
                       Color street, Color streetLabel, List<Color> systemColours,
                       Color service, Color critical, Color station, Color tap,
                       Color source, Color gasOff, Color hazard, Color isolation,
                       Color grid, Font font, float mainWidthPx, float streetWidthPx,
                       double symbolPx, double servicesMaxMetresPerPixel,
                       double labelsMaxMetresPerPixel, double decimatePx) {

    /** Okabe-Ito palette (Okabe and Ito 2008). */
    public static final Color OI_ORANGE = new Color(0xE6, 0x9F, 0x00);
    public static final Color OI_SKY_BLUE = new Color(0x56, 0xB4, 0xE9);
    public static final Color OI_BLUISH_GREEN = new Color(0x00, 0x9E, 0x73);
    public static final Color OI_YELLOW = new Color(0xF0, 0xE4, 0x42);
    public static final Color OI_BLUE = new Color(0x00, 0x72, 0xB2);
    public static final Color OI_VERMILLION = new Color(0xD5, 0x5E, 0x00);
    public static final Color OI_REDDISH_PURPLE = new Color(0xCC, 0x79, 0xA7);

    public static final MapStyle LIGHT = new MapStyle("light",
            Color.WHITE, new Color(0x20, 0x20, 0x20), Color.WHITE,
            new Color(0xC8, 0xC8, 0xC8), new Color(0x60, 0x60, 0x60),
            List.of(OI_BLUE, OI_BLUISH_GREEN, OI_REDDISH_PURPLE, OI_ORANGE, OI_SKY_BLUE),
            new Color(0x50, 0x50, 0x50), OI_VERMILLION, new Color(0x20, 0x20, 0x20), OI_BLUE,
            OI_BLUISH_GREEN, OI_VERMILLION, OI_YELLOW, new Color(0x20, 0x20, 0x20),
            new Color(0x80, 0x80, 0x80), new Font(Font.SANS_SERIF, Font.PLAIN, 11),
            3f, 5f, 11, 2.0, 1.5, 0.75);

    public static final MapStyle DARK = new MapStyle("dark",
            new Color(0x1C, 0x1C, 0x1E), new Color(0xEE, 0xEE, 0xEE), new Color(0x1C, 0x1C, 0x1E),
            new Color(0x48, 0x48, 0x4C), new Color(0xB0, 0xB0, 0xB0),
            List.of(OI_SKY_BLUE, OI_BLUISH_GREEN, OI_REDDISH_PURPLE, OI_ORANGE, OI_YELLOW),
            new Color(0xC0, 0xC0, 0xC0), OI_VERMILLION, new Color(0xEE, 0xEE, 0xEE), OI_SKY_BLUE,
            OI_BLUISH_GREEN, OI_VERMILLION, OI_YELLOW, new Color(0xEE, 0xEE, 0xEE),
            new Color(0x90, 0x90, 0x90), new Font(Font.SANS_SERIF, Font.PLAIN, 11),
            3f, 5f, 11, 2.0, 1.5, 0.75);

    public MapStyle {
        systemColours = List.copyOf(systemColours);
        if (systemColours.isEmpty()) throw new IllegalArgumentException("a style needs at least one system colour");
    }

    /** The colour of the system ranked {@code rank} (0 = highest pressure), cycling the list. */
    public Color systemColour(int rank) {
        return systemColours.get(Math.floorMod(rank, systemColours.size()));
    }

    /** Active main: solid. */
    public Stroke activeStroke(float width) {
        return new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    }

    /** Proposed main: long dashes. */
    public Stroke proposedStroke(float width) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                new float[] {4 * width, 2.5f * width}, 0f);
    }

    /** Abandoned main: thin and dotted. */
    public Stroke abandonedStroke() {
        return new BasicStroke(2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 10f,
                new float[] {0.1f, 4f}, 0f);
    }

    public Stroke streetStroke() {
        return new BasicStroke(streetWidthPx, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    }

    /** Thin outline for symbols. */
    public Stroke outline() {
        return new BasicStroke(1.3f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_MITER);
    }
}
