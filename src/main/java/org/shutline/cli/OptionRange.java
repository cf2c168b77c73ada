package org.shutline.cli;

import java.util.Locale;
import org.shutline.io.InputException;

/**
 * The range a numeric command-line option must fall in, named with the option in the
 * refusal, so that a negative, non-finite or absurd value ({@code --pit-radius -5},
 * {@code --radius-m 1e9}) is refused (exit 2) instead of giving an answer from it. The
 * bounds are generous sense limits for a distribution utility, not rules: the lower
 * ones follow from what the value means, the upper ones are common practice (what no
 * real response or work site needs); docs/input-data.md lists them.
 */
record OptionRange(String option, double min, boolean minOpen, double max, String unit) {
    static final OptionRange INSPECTION_MONTHS = new OptionRange("--inspection-months", 1, false, 120, "months");
    static final OptionRange PIT_RADIUS = new OptionRange("--pit-radius", 0, true, 50, "m");
    static final OptionRange RADIUS_M = new OptionRange("--radius-m", 0, true, 5000, "m");
    static final OptionRange MAX_DISTANCE_M = new OptionRange("--max-distance-m", 0, true, 100_000, "m");
    static final OptionRange SENSING_LINE_M = new OptionRange("--sensing-line-m", 0, false, 1000, "m");
    static final OptionRange CREWS = new OptionRange("--crews", 1, false, 1000, "crews");
    static final OptionRange TARGET_HOURS = new OptionRange("--target-hours", 0, true, 720, "h");
    static final OptionRange RELIGHT_HOURS = new OptionRange("--relight-hours", 0, true, 720, "h");
    static final OptionRange VALVE_MINUTES = new OptionRange("--valve-minutes", 0, false, 1440, "min");
    static final OptionRange SPEED = new OptionRange("--speed", 0, true, 200, "km/h");
    static final OptionRange DETOUR = new OptionRange("--detour", 1, false, 10, "");

    /** {@code value} when it is in range; else an {@link InputException} naming the option, the range and the value. */
    double check(String command, double value) throws InputException {
        boolean low = minOpen ? value > min : value >= min;
        if (!(low && value <= max)) {
            throw new InputException((command == null ? "" : command + ": ") + option + " takes " + (minOpen ? "more than " + num(min) : num(min) + " or more")
                    + " and at most " + num(max) + (unit.isEmpty() ? "" : " " + unit) + ", not " + num(value));
        }
        return value;
    }

    /** {@link #check} for an optional value: null stays null. */
    Double check(String command, Double value) throws InputException {
        return value == null ? null : check(command, value.doubleValue());
    }

    static String num(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) return Double.toString(v);
        if (v == Math.rint(v) && Math.abs(v) < 1e15) return Long.toString((long) v);
        return Math.abs(v) >= 1e7 || Math.abs(v) < 1e-3 ? String.format(Locale.ROOT, "%.3g", v) : String.format(Locale.ROOT, "%s", v);
    }
}
