package org.shutline.model;

import java.util.Locale;
import java.util.Optional;

/**
 * Units of gauge pressure used in gas distribution, each with its size in pascals
 * (NIST SP 811, Appendix B.8/B.9). Inch of water column is the conventional one
 * (25.4 mm x 9.80665 m/s^2 x 1000 kg/m^3 = 249.0889 Pa).
 */
public enum PressureUnit {
    KPA(1000.0, "kPa", 2),
    PSI(6894.757293168, "psi", 2),
    IN_WC(249.08891, "in w.c.", 1),
    MBAR(100.0, "mbar", 0);

    private final double pascals;
    private final String symbol;
    private final int decimals;

    PressureUnit(double pascals, String symbol, int decimals) {
        this.pascals = pascals;
        this.symbol = symbol;
        this.decimals = decimals;
    }

    /** Pascals in one of this unit. */
    public double pascals() {
        return pascals;
    }

    public String symbol() {
        return symbol;
    }

    /** Decimals shown when formatting. */
    public int decimals() {
        return decimals;
    }

    /** Parse "kpa", "psi", "inwc", "in w.c.", "wc", "mbar" (case-insensitive). */
    public static Optional<PressureUnit> parse(String s) {
        if (s == null) return Optional.empty();
        String w = s.trim().toLowerCase(Locale.ROOT).replace(".", "").replace(" ", "").replace("_", "");
        return switch (w) {
            case "kpa" -> Optional.of(KPA);
            case "psi", "psig" -> Optional.of(PSI);
            case "inwc", "wc", "inh2o", "iwc" -> Optional.of(IN_WC);
            case "mbar" -> Optional.of(MBAR);
            default -> Optional.empty();
        };
    }
}
