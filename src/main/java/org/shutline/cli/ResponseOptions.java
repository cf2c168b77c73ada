package org.shutline.cli;

import org.shutline.analysis.ResponseRates;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.ValveRoute;
import org.shutline.app.AnalysisSettings;
import org.shutline.io.InputException;
import picocli.CommandLine.Option;

/**
 * The emergency response options ({@code incident}, {@code isolate}, {@code cards},
 * {@code export}): crews, shut-off and relight targets, valve operating minutes, crew
 * speed and detour factor; each overrides the settings file. The defaults named in the
 * help are {@link ResponseSettings#DEFAULT}'s (SettingsOptionsTest checks they agree).
 */
final class ResponseOptions {
    @Option(names = "--crews", paramLabel = "N", description = "crews available (default: computed from --target-hours)")
    Integer crews;

    @Option(names = "--target-hours", description = "hours to finish the shut-off in (default: 4)")
    Double targetHours;

    @Option(names = "--relight-hours", description = "hours to finish the relight in (default: 24)")
    Double relightHours;

    @Option(names = "--valve-minutes", description = "minutes to operate one valve (default: 10, common practice)")
    Double valveMinutes;

    @Option(names = "--speed", description = "crew driving speed in km/h (default: 25, common practice)")
    Double speed;

    @Option(names = "--detour", description = "road distance / straight-line distance (default: 1.3, common practice)")
    Double detour;

    /** {@code s} with the options given; a value out of range is an {@link InputException}. */
    AnalysisSettings apply(AnalysisSettings s) throws InputException {
        String command = null;
        if (crews != null) OptionRange.CREWS.check(command, crews.doubleValue());
        OptionRange.TARGET_HOURS.check(command, targetHours);
        OptionRange.RELIGHT_HOURS.check(command, relightHours);
        OptionRange.VALVE_MINUTES.check(command, valveMinutes);
        OptionRange.SPEED.check(command, speed);
        OptionRange.DETOUR.check(command, detour);
        ResponseSettings r = s.response();
        ValveRoute.Settings v = r.valves();
        try {
            ValveRoute.Settings valves = new ValveRoute.Settings(or(valveMinutes, v.minutesPerValve()), or(speed, v.speedKmh()),
                    or(detour, v.detourFactor()));
            ResponseRates rates = r.rates();
            r = new ResponseSettings(rates, valves, r.crews(), r.crewsGiven(), or(targetHours, r.targetHours()),
                    or(relightHours, r.relightTargetHours()));
            if (crews != null) r = r.withCrews(crews);
        } catch (IllegalArgumentException e) {
            throw new InputException(e.getMessage());
        }
        return s.withResponse(r);
    }

    private static double or(Double given, double dflt) {
        return given == null ? dflt : given;
    }
}
