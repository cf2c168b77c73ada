package org.shutline.app;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.Period;
import java.util.Objects;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.shutline.analysis.OverpressureLimit;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.ValveDoubt;
import org.shutline.analysis.hazard.StepContext;
import org.shutline.io.InputException;
import org.shutline.model.Pressure;
import org.shutline.model.PressureUnit;
import org.shutline.model.Tolerances;

/**
 * Every setting an analysis depends on, in one immutable value shared by the window and
 * the command line: the valve-doubt rule ({@link ValveDoubt.Settings}: the as-of date
 * and the inspection interval, 15 months by 49 CFR 192.747), the pressure unit for
 * messages (null: the plan's), the connectivity tolerances (null: the mapping file's,
 * else {@link Tolerances#DEFAULT}), the emergency response settings
 * ({@link ResponseSettings}: rates, valve operating and driving, crews, targets), the
 * low-pressure limit of 49 CFR 192.201(a)(1) (0.5 psig, common practice) and the
 * distance from a sensing tap or line at which a cut or tie-in warns (10 m, common
 * practice). {@link #source} names the settings file the values came from (null: none).
 *
 * <p>Read from an optional YAML file ({@link SettingsFile}, docs/settings.md); a
 * command's options override the file, value by value, through the {@code with}
 * methods.
 */
public record AnalysisSettings(ValveDoubt.Settings doubt, PressureUnit pressureUnit, Tolerances tolerances,
                               ResponseSettings response, Pressure lowPressureLimit, double sensingLineM, Path source) {
    public AnalysisSettings {
        Objects.requireNonNull(doubt, "doubt");
        Objects.requireNonNull(response, "response");
        Objects.requireNonNull(lowPressureLimit, "lowPressureLimit");
        if (!(lowPressureLimit.pascals() > 0)) throw new IllegalArgumentException("the low-pressure limit must be positive");
        if (!(sensingLineM >= 0) || Double.isInfinite(sensingLineM)) {
            throw new IllegalArgumentException("the sensing-line distance must be 0 m or more, not " + sensingLineM);
        }
    }

    /** The defaults, with valve checks measured at {@code asOf}. */
    public static AnalysisSettings defaults(LocalDate asOf) {
        return new AnalysisSettings(ValveDoubt.Settings.defaults(asOf), null, null, ResponseSettings.DEFAULT,
                OverpressureLimit.DEFAULT_LOW_PRESSURE_LIMIT, StepContext.DEFAULT_SENSING_LINE_M, null);
    }

    /** The defaults, valve checks measured today. */
    public static AnalysisSettings defaults() {
        return defaults(LocalDate.now());
    }

    /** Reads a settings file over the defaults (valve checks measured today unless the file gives {@code as_of}). */
    public static AnalysisSettings load(Path file) throws InputException {
        return SettingsFile.read(file, defaults());
    }

    public LocalDate asOf() {
        return doubt.asOf();
    }

    public Period inspectionInterval() {
        return doubt.interval();
    }

    /** The settings of the isolation engine: the valve-doubt rule. */
    public ValveDoubt.Settings isolation() {
        return doubt;
    }

    /** The settings of the plan checks; the pressure unit is this one, else {@code planUnit} (the plan's own). */
    public StepContext.Settings stepSettings(PressureUnit planUnit) {
        return new StepContext.Settings(doubt, pressureUnit != null ? pressureUnit : planUnit, lowPressureLimit, sensingLineM);
    }

    /** The unit for pressures in messages: this one, else {@code planUnit}. */
    public PressureUnit unitOr(PressureUnit planUnit) {
        return pressureUnit != null ? pressureUnit : planUnit;
    }

    public AnalysisSettings withAsOf(LocalDate d) {
        return withDoubt(new ValveDoubt.Settings(d, doubt.interval()));
    }

    public AnalysisSettings withInspectionMonths(int months) {
        if (months < 1) throw new IllegalArgumentException("the inspection interval must be at least 1 month, not " + months);
        return withDoubt(new ValveDoubt.Settings(doubt.asOf(), Period.ofMonths(months)));
    }

    public AnalysisSettings withDoubt(ValveDoubt.Settings d) {
        return new AnalysisSettings(d, pressureUnit, tolerances, response, lowPressureLimit, sensingLineM, source);
    }

    public AnalysisSettings withPressureUnit(PressureUnit u) {
        return new AnalysisSettings(doubt, u, tolerances, response, lowPressureLimit, sensingLineM, source);
    }

    public AnalysisSettings withTolerances(Tolerances t) {
        return new AnalysisSettings(doubt, pressureUnit, t, response, lowPressureLimit, sensingLineM, source);
    }

    public AnalysisSettings withResponse(ResponseSettings r) {
        return new AnalysisSettings(doubt, pressureUnit, tolerances, r, lowPressureLimit, sensingLineM, source);
    }

    public AnalysisSettings withLowPressureLimit(Pressure p) {
        return new AnalysisSettings(doubt, pressureUnit, tolerances, response, p, sensingLineM, source);
    }

    public AnalysisSettings withSensingLineM(double m) {
        return new AnalysisSettings(doubt, pressureUnit, tolerances, response, lowPressureLimit, m, source);
    }

    public AnalysisSettings withSource(Path file) {
        return new AnalysisSettings(doubt, pressureUnit, tolerances, response, lowPressureLimit, sensingLineM, file);
    }

    private static final Pattern PRESSURE = Pattern.compile("\\s*([0-9]+(?:\\.[0-9]+)?)\\s*([A-Za-z_ .]+?)\\s*");

    /** A pressure written as a number and a unit ("0.5psi", "14 in_wc", "3.45kPa"); empty when it is not one. */
    public static Optional<Pressure> parsePressure(String text) {
        Matcher m = PRESSURE.matcher(text == null ? "" : text);
        if (!m.matches()) return Optional.empty();
        double v = Double.parseDouble(m.group(1));
        return PressureUnit.parse(m.group(2)).map(u -> Pressure.of(v, u));
    }
}
