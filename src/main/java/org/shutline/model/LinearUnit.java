package org.shutline.model;

/** Linear unit of a projected CRS, with its exact length in metres. */
public enum LinearUnit {
    METRE(1.0, "m"),
    /** US survey foot: 1200/3937 m exactly (NIST SP 811, B.6 footnote). */
    US_SURVEY_FOOT(1200.0 / 3937.0, "US ft"),
    /** International foot: 0.3048 m exactly (NIST SP 811, Appendix B). */
    INTERNATIONAL_FOOT(0.3048, "ft");

    private final double metres;
    private final String symbol;

    LinearUnit(double metres, String symbol) {
        this.metres = metres;
        this.symbol = symbol;
    }

    public double metres() {
        return metres;
    }

    public String symbol() {
        return symbol;
    }

    /** A length in metres expressed in this unit. */
    public double fromMetres(double m) {
        return m / metres;
    }

    /** A length in this unit expressed in metres. */
    public double toMetres(double v) {
        return v * metres;
    }
}
