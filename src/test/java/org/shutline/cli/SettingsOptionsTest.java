package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.analysis.OverpressureLimit;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.ValveDoubt;
import org.shutline.analysis.hazard.StepContext;

/**
 * The shared options (picocli mixins): a settings file (docs/settings.md) gives the same
 * answer as the same values given as options, an option given overrides the file, a bad
 * file stops the command before the network is read, and the defaults the help names are
 * the engine's.
 */
class SettingsOptionsTest {
    static final String NET = "sample-gis/tallowmere.gpkg";
    @TempDir Path dir;

    @Test
    void aSettingsFileActsAsItsOptionsAndOptionsOverrideIt() throws Exception {
        Path f = dir.resolve("site.yaml");
        Files.writeString(f, "as_of: 2026-12-01\ninspection_months: 1\nresponse:\n  crews: 2\n  valve_minutes: 12\n");
        CommandsTest.Run byFile = CommandsTest.run("incident", NET, "--main", "M-CI-01", "--settings", f.toString(), "--format", "json");
        CommandsTest.Run byOptions = CommandsTest.run("incident", NET, "--main", "M-CI-01", "--as-of", "2026-12-01",
                "--inspection-months", "1", "--crews", "2", "--valve-minutes", "12", "--format", "json");
        CommandsTest.assertSampleRunDone(byFile);
        assertThat(byFile.out()).isEqualTo(byOptions.out()).contains("\"crews\" : 2,").contains("\"minutes_per_valve\" : 12.0");
        CommandsTest.Run overridden = CommandsTest.run("incident", NET, "--main", "M-CI-01", "--settings", f.toString(), "--crews", "3",
                "--format", "json");
        assertThat(overridden.out()).contains("\"crews\" : 3,").contains("\"minutes_per_valve\" : 12.0");
    }

    @Test
    void theInspectionIntervalReachesIsolate() {
        // with a 1-month interval every valve of the sample checked before November 2026 is past it (49 CFR 192.747 sets 15)
        CommandsTest.Run usual = CommandsTest.run("isolate", NET, "--main", "M-CI-01", "--as-of", "2026-12-01");
        CommandsTest.Run strict = CommandsTest.run("isolate", NET, "--main", "M-CI-01", "--as-of", "2026-12-01", "--inspection-months", "1");
        assertThat(count(usual.out(), "past inspection interval")).isLessThan(count(strict.out(), "past inspection interval"));
        assertThat(CommandsTest.run("isolate", NET, "--main", "M-CI-01", "--inspection-months", "0").code()).isEqualTo(2);
    }

    @Test
    void aBadSettingsFileStopsTheCommandBeforeTheNetworkIsRead() throws Exception {
        Path f = dir.resolve("bad.yaml");
        Files.writeString(f, "response:\n  crew: 2\n");
        for (String[] args : new String[][] {
            {"incident", NET, "--main", "M-CI-01"}, {"isolate", NET, "--main", "M-CI-01"}, {"plan", NET, "sample-gis/tallowmere-plan.yaml"},
            {"check", NET}, {"trace", NET}}) {
            String[] all = java.util.Arrays.copyOf(args, args.length + 2);
            all[args.length] = "--settings";
            all[args.length + 1] = f.toString();
            CommandsTest.Run r = CommandsTest.run(all);
            assertThat(r.code()).as(args[0]).isEqualTo(2);
            assertThat(r.err()).as(args[0]).contains(f + ":2: unknown key 'response.crew'").doesNotContain("data errors");
            assertThat(r.out()).as(args[0]).isEmpty();
        }
    }

    @Test
    void theDefaultsTheHelpNamesAreTheEngines() {
        String incident = CommandsTest.run("incident", "--help").out().replaceAll("\\s+", " ");
        ResponseSettings d = ResponseSettings.DEFAULT;
        assertThat(incident).contains("hours to finish the shut-off in (default: " + plain(d.targetHours()) + ")")
                .contains("hours to finish the relight in (default: " + plain(d.relightTargetHours()) + ")")
                .contains("minutes to operate one valve (default: " + plain(d.valves().minutesPerValve()) + ", common practice)")
                .contains("crew driving speed in km/h (default: " + plain(d.valves().speedKmh()) + ", common practice)")
                .contains("road distance / straight-line distance (default: " + plain(d.valves().detourFactor()) + ", common practice)")
                .contains("valve inspection interval in months (default: " + ValveDoubt.INTERVAL.toTotalMonths() + ", 49 CFR 192.747)");
        String plan = CommandsTest.run("plan", "--help").out().replaceAll("\\s+", " ");
        assertThat(plan).contains("(default: " + plain(OverpressureLimit.DEFAULT_LOW_PRESSURE_LIMIT.psi()) + "psi, common practice")
                .contains("in metres (default: " + plain(StepContext.DEFAULT_SENSING_LINE_M) + ", common practice)");
    }

    private static String plain(double d) {
        return d == Math.rint(d) ? Long.toString((long) d) : String.format(Locale.ROOT, "%s", d);
    }

    private static int count(String text, String part) {
        int n = 0;
        for (int i = text.indexOf(part); i >= 0; i = text.indexOf(part, i + 1)) n++;
        return n;
    }
}
