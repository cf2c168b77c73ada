package org.shutline.report;

/** A paper size and orientation; width and height in points. */
public record PageFormat(Paper paper, boolean landscape) {
    public static final PageFormat LETTER_LANDSCAPE = new PageFormat(Paper.LETTER, true);

    public double widthPt() {
        return landscape ? paper.heightPt() : paper.widthPt();
    }

    public double heightPt() {
        return landscape ? paper.widthPt() : paper.heightPt();
    }
}
