package org.shutline.report;

import java.util.Locale;
import java.util.Optional;

/**
 * Standard paper sizes in PostScript points (1/72 in), portrait: Letter 8.5 x 11 in,
 * Tabloid 11 x 17 in (ANSI A and B), A4 210 x 297 mm and A3 297 x 420 mm (ISO 216).
 */
public enum Paper {
    LETTER(612, 792), TABLOID(792, 1224), A4(210 / 25.4 * 72, 297 / 25.4 * 72), A3(297 / 25.4 * 72, 420 / 25.4 * 72);

    private final double widthPt;
    private final double heightPt;

    Paper(double widthPt, double heightPt) {
        this.widthPt = widthPt;
        this.heightPt = heightPt;
    }

    public double widthPt() { return widthPt; }
    public double heightPt() { return heightPt; }

    public static Optional<Paper> parse(String s) {
        if (s == null) return Optional.empty();
        try {
            return Optional.of(valueOf(s.trim().toUpperCase(Locale.ROOT)));
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
    }
}
