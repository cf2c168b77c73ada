package org.shutline.model;

import java.util.Locale;

/** A gauge pressure, held in pascals. Immutable; compare with {@link #compareTo}. */
public record Pressure(double pascals) implements Comparable<Pressure> {
    public Pressure {
        if (Double.isNaN(pascals)) throw new IllegalArgumentException("pressure is NaN");
    }

    public static Pressure of(double value, PressureUnit unit) {
        return new Pressure(value * unit.pascals());
    }

    public static Pressure kpa(double v) {
        return of(v, PressureUnit.KPA);
    }

    public static Pressure psi(double v) {
        return of(v, PressureUnit.PSI);
    }

    public static Pressure inchesWaterColumn(double v) {
        return of(v, PressureUnit.IN_WC);
    }

    public static Pressure mbar(double v) {
        return of(v, PressureUnit.MBAR);
    }

    public double in(PressureUnit unit) {
        return pascals / unit.pascals();
    }

    public double kpa() {
        return in(PressureUnit.KPA);
    }

    public double psi() {
        return in(PressureUnit.PSI);
    }

    public double inchesWaterColumn() {
        return in(PressureUnit.IN_WC);
    }

    public double mbar() {
        return in(PressureUnit.MBAR);
    }

    /** For example "1.74 kPa", "7.0 in w.c.". */
    public String format(PressureUnit unit) {
        return String.format(Locale.ROOT, "%." + unit.decimals() + "f %s", in(unit), unit.symbol());
    }

    @Override
    public int compareTo(Pressure o) {
        return Double.compare(pascals, o.pascals);
    }
}
