package org.shutline.cli;

import java.time.LocalDate;
import org.shutline.app.AnalysisSettings;
import org.shutline.io.InputException;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * The settings every analysing command takes: {@code --settings FILE} (docs/settings.md),
 * and the valve-doubt rule's {@code --as-of} and {@code --inspection-months}, which
 * override the file. Defaults carry no value here, so that an option left out keeps the
 * file's value; the defaults the help names are those of {@link AnalysisSettings#defaults}.
 */
final class SettingsOptions {
    @Mixin
    SettingsFileOption file = new SettingsFileOption();

    @Option(names = "--as-of", paramLabel = "DATE", description = "date for valve inspection checks (default: today)")
    LocalDate asOf;

    // the default named in the help is ValveDoubt.INTERVAL (SettingsOptionsTest checks they agree)
    @Option(names = "--inspection-months", description = "valve inspection interval in months (default: 15, 49 CFR 192.747)")
    Integer inspectionMonths;

    /** The settings file's values (the defaults without one), then the options given. */
    AnalysisSettings settings() throws InputException {
        if (inspectionMonths != null) OptionRange.INSPECTION_MONTHS.check(null, inspectionMonths.doubleValue());
        AnalysisSettings s = file.load();
        try {
            if (asOf != null) s = s.withAsOf(asOf);
            if (inspectionMonths != null) s = s.withInspectionMonths(inspectionMonths);
        } catch (IllegalArgumentException e) {
            throw new InputException("--inspection-months: " + e.getMessage());
        }
        return s;
    }
}
