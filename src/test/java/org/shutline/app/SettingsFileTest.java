package org.shutline.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.Period;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.analysis.OverpressureLimit;
import org.shutline.analysis.ResponseRates;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.ValveDoubt;
import org.shutline.analysis.ValveRoute;
import org.shutline.analysis.hazard.StepContext;
import org.shutline.io.InputException;
import org.shutline.model.Pressure;
import org.shutline.model.PressureUnit;
import org.shutline.model.Tolerances;

/** The settings file (docs/settings.md): every key read, defaults kept, and bad files refused naming file, line and key. */
class SettingsFileTest {
    @TempDir Path dir;

    private Path write(String name, String text) throws Exception {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        return f;
    }

    @Test
    void everyKeySetsItsValueAndTheRestKeepTheirDefaults() throws Exception {
        Path f = write("site.yaml", """
                as_of: 2026-03-31
                inspection_months: 12
                pressure_unit: psi
                low_pressure_limit: 14in_wc
                sensing_line_m: 25
                tolerances: { snap_m: 0.2, point_m: 3, service_m: 45, near_miss_factor: 4 }
                response:
                  crews: 5
                  target_hours: 3
                  relight_hours: 36
                  valve_minutes: 15
                  speed_kmh: 30
                  detour: 1.5
                  shutoffs_per_tech_hour: 12
                  relights_per_tech_hour: 1.5
                  second_visit_fraction: 0.2
                  techs_per_crew: 3
                  shift_hours: 10
                """);
        AnalysisSettings s = AnalysisSettings.load(f);
        assertThat(s.source()).isEqualTo(f);
        assertThat(s.asOf()).isEqualTo(LocalDate.of(2026, 3, 31));
        assertThat(s.inspectionInterval()).isEqualTo(Period.ofMonths(12));
        assertThat(s.pressureUnit()).isEqualTo(PressureUnit.PSI);
        assertThat(s.lowPressureLimit().pascals()).isEqualTo(Pressure.inchesWaterColumn(14).pascals());
        assertThat(s.sensingLineM()).isEqualTo(25.0);
        assertThat(s.tolerances()).isEqualTo(new Tolerances(0.2, 3, 45, 4));
        ResponseSettings r = s.response();
        assertThat(r.crews()).isEqualTo(5);
        assertThat(r.crewsGiven()).isTrue();
        assertThat(r.targetHours()).isEqualTo(3.0);
        assertThat(r.relightTargetHours()).isEqualTo(36.0);
        assertThat(r.valves()).isEqualTo(new ValveRoute.Settings(15, 30, 1.5));
        assertThat(r.rates()).isEqualTo(new ResponseRates(12, 1.5, 0.2, 3, 10));
        // the engine sees the same values
        assertThat(s.isolation().asOf()).isEqualTo(s.asOf());
        assertThat(s.isolation().interval()).isEqualTo(Period.ofMonths(12));
        StepContext.Settings step = s.stepSettings(PressureUnit.KPA);
        assertThat(step.pressureUnit()).isEqualTo(PressureUnit.PSI);
        assertThat(step.sensingLineM()).isEqualTo(25.0);
        assertThat(step.lowPressureLimit()).isEqualTo(s.lowPressureLimit());
    }

    @Test
    void aFileWithFewKeysOrNoneKeepsTheDefaults() throws Exception {
        AnalysisSettings empty = AnalysisSettings.load(write("empty.yaml", ""));
        assertThat(empty.withSource(null).withAsOf(LocalDate.of(2026, 1, 1))).isEqualTo(AnalysisSettings.defaults(LocalDate.of(2026, 1, 1)));
        AnalysisSettings crewsOnly = AnalysisSettings.load(write("crews.yaml", "response:\n  crews: 2\n"));
        assertThat(crewsOnly.response()).isEqualTo(ResponseSettings.DEFAULT.withCrews(2));
        assertThat(crewsOnly.tolerances()).isNull();
        assertThat(crewsOnly.pressureUnit()).isNull();
        // without pressure_unit the plan's own unit is used
        assertThat(crewsOnly.stepSettings(PressureUnit.MBAR).pressureUnit()).isEqualTo(PressureUnit.MBAR);
    }

    @Test
    void theDocumentedDefaultsAreTheCodesDefaults() throws Exception {
        // the YAML block under "Every key with its default" in docs/settings.md, read as a settings file
        String doc = Files.readString(Path.of("docs/settings.md"));
        Matcher m = Pattern.compile("## Every key with its default.*?```yaml\\n(.*?)```", Pattern.DOTALL).matcher(doc);
        assertThat(m.find()).as("docs/settings.md has the block of defaults").isTrue();
        AnalysisSettings documented = AnalysisSettings.load(write("doc.yaml", m.group(1)));
        LocalDate day = documented.asOf();
        assertThat(documented.inspectionInterval()).isEqualTo(ValveDoubt.INTERVAL);
        assertThat(documented.lowPressureLimit()).isEqualTo(OverpressureLimit.DEFAULT_LOW_PRESSURE_LIMIT);
        assertThat(documented.sensingLineM()).isEqualTo(StepContext.DEFAULT_SENSING_LINE_M);
        assertThat(documented.tolerances()).isEqualTo(Tolerances.DEFAULT);
        assertThat(documented.response()).isEqualTo(ResponseSettings.DEFAULT);
        // and nothing else differs (the unit: kPa is what a plan without pressure_unit uses)
        assertThat(documented.withSource(null).withTolerances(null).withPressureUnit(null)).isEqualTo(AnalysisSettings.defaults(day));
        // every key the reader knows is in the table of keys
        for (String k : SettingsFile.TOP_KEYS) if (!k.equals("tolerances") && !k.equals("response")) assertThat(doc).contains("| `" + k + "` |");
        for (String k : SettingsFile.TOLERANCE_KEYS) assertThat(doc).contains("| `tolerances." + k + "` |");
        for (String k : SettingsFile.RESPONSE_KEYS) assertThat(doc).contains("| `response." + k + "` |");
    }

    @Test
    void anUnknownKeyIsRefusedNamingFileLineAndKey() throws Exception {
        Path top = write("top.yaml", "as_of: 2026-12-01\nasof: 2026-12-01\n");
        assertThatThrownBy(() -> AnalysisSettings.load(top)).isInstanceOf(InputException.class)
                .hasMessageContaining(top + ":2: unknown key 'asof'").hasMessageContaining("as_of");
        Path nested = write("nested.yaml", "response:\n  target_hours: 3\n  crew: 2\n");
        assertThatThrownBy(() -> AnalysisSettings.load(nested)).isInstanceOf(InputException.class)
                .hasMessageContaining(nested + ":3: unknown key 'response.crew'").hasMessageContaining("crews");
    }

    @Test
    void badValuesAreRefusedNamingTheKey() throws Exception {
        String[][] cases = {
            {"as_of: 1st of May\n", "key 'as_of' must be a date"},
            {"inspection_months: 0\n", "key 'inspection_months' must be from 1 to 120"},
            {"inspection_months: 1.5\n", "key 'inspection_months' must be a whole number"},
            {"pressure_unit: bar\n", "key 'pressure_unit' must be one of"},
            {"low_pressure_limit: half\n", "key 'low_pressure_limit' takes a positive value and a unit"},
            {"low_pressure_limit: 0psi\n", "key 'low_pressure_limit' takes a positive value"},
            {"sensing_line_m: -1\n", "key 'sensing_line_m' must be from 0 to"},
            {"sensing_line_m: .nan\n", "key 'sensing_line_m' must be"},
            {"tolerances: { near_miss_factor: 0.5 }\n", "key 'tolerances.near_miss_factor' must be from 1 to"},
            {"response:\n  crews: 0\n", "key 'response.crews' must be from 1 to"},
            {"response:\n  target_hours: 0\n", "key 'response.target_hours' must be more than 0"},
            {"response:\n  second_visit_fraction: 2\n", "key 'response.second_visit_fraction' must be from 0 to 1"},
            {"response: [1, 2]\n", "response must be a set of 'key: value' lines"},
            {"sensing_line_m: [1, 2]\n", "key 'sensing_line_m' must be a single value"},
            {"- a\n- b\n", "(top level) must be a set of 'key: value' lines"},
            {"as_of: 2026-12-01\nas_of: 2026-12-02\n", ":2: key 'as_of' given twice"},
            {"response:\n  crews: 2\n  crews: 3\n", ":3: key 'response.crews' given twice"},
            {"as_of: [\n", "not valid YAML"},
        };
        for (String[] c : cases) {
            Path f = write("bad.yaml", c[0]);
            assertThatThrownBy(() -> AnalysisSettings.load(f)).as(c[0]).isInstanceOf(InputException.class)
                    .hasMessageContaining(f.toString()).hasMessageContaining(c[1]);
        }
    }

    @Test
    void aLargeOrMissingFileIsRefusedBeforeParsing() throws Exception {
        Path big = write("big.yaml", "# padding\n".repeat(SettingsFile.MAX_BYTES / 10 + 1));
        assertThatThrownBy(() -> AnalysisSettings.load(big)).isInstanceOf(InputException.class)
                .hasMessageContaining(big.toString()).hasMessageContaining("at most " + SettingsFile.MAX_BYTES + " bytes");
        Path none = dir.resolve("none.yaml");
        assertThatThrownBy(() -> AnalysisSettings.load(none)).isInstanceOf(InputException.class)
                .hasMessageContaining("cannot read settings file " + none);
    }
}
