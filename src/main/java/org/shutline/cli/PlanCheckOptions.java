package org.shutline.cli;

import org.shutline.app.AnalysisSettings;
import org.shutline.io.InputException;
import org.shutline.model.Pressure;
import org.shutline.model.PressureUnit;
import picocli.CommandLine.Option;

/**
 * The settings of the plan checks a utility sets for itself ({@code plan}, {@code export --plan}):
 * pressure unit for messages, the low-pressure limit of 49 CFR 192.201(a)(1) and the
 * sensing-line distance; each overrides the settings file.
 */
final class PlanCheckOptions {
    @Option(names = "--unit", paramLabel = "UNIT", description = "pressure unit for messages: kPa, psi, in_wc, mbar (default: the plan's)")
    String unit;

    @Option(names = "--low-pressure-limit", paramLabel = "P",
        description = "limit for a low-pressure district under 49 CFR 192.201(a)(1), a value and unit: 0.5psi, 14in_wc, 3.45kPa, 34.5mbar (default: 0.5psi, common practice; set your own)")
    String lowPressureLimit;

    @Option(names = "--sensing-line-m", paramLabel = "M",
        description = "a cut or tie-in this close to a sensing tap or its control line warns, in metres (default: 10, common practice)")
    Double sensingLineM;

    /** {@code s} with the options given; a bad value is an {@link InputException} naming the option. */
    AnalysisSettings apply(String command, AnalysisSettings s) throws InputException {
        if (unit != null) {
            s = s.withPressureUnit(PressureUnit.parse(unit).orElseThrow(() -> new InputException(
                    command + ": unknown pressure unit '" + unit + "' (kPa, psi, in_wc, mbar)")));
        }
        if (lowPressureLimit != null) {
            Pressure p = AnalysisSettings.parsePressure(lowPressureLimit).filter(x -> x.pascals() > 0).orElseThrow(() -> new InputException(
                    command + ": --low-pressure-limit takes a positive value and a unit (0.5psi, 14in_wc, 3.45kPa, 34.5mbar), not '"
                            + lowPressureLimit + "'"));
            s = s.withLowPressureLimit(p);
        }
        if (sensingLineM != null) {
            OptionRange.SENSING_LINE_M.check(command, sensingLineM);
            s = s.withSensingLineM(sensingLineM);
        }
        return s;
    }
}
