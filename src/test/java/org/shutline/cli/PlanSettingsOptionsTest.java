package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * The two plan settings a utility sets for itself: the low-pressure limit of 49 CFR
 * 192.201(a)(1) (default 0.5 psig, common practice) and the distance within which a cut or
 * tie-in may damage a sensing line (default 10 m, common practice).
 */
class PlanSettingsOptionsTest {
    static final String NET = "sample-gis/tallowmere.gpkg";

    @Test
    void theLowPressureLimitIsTheOperatorsAndSaysSo() {
        CommandsTest.Run def = CommandsTest.run("plan", NET, "sample-gis/tallowmere-plan.yaml", "--as-of", "2026-12-01", "--unit", "psi");
        // below 1 psig the limit is given in inches of water column: 0.5 psi = 3447.4 Pa / 249.089 Pa per in w.c. = 13.8
        // (1 psi = 6894.76 Pa, 1 in w.c. (60 F) = 249.089 Pa; NIST SP 811 conversion factors, from memory)
        assertThat(def.out()).contains("taken as 13.8 in w.c. (common practice default; the operator sets its own)");
        CommandsTest.Run set = CommandsTest.run("plan", NET, "sample-gis/tallowmere-plan.yaml", "--as-of", "2026-12-01", "--unit", "psi",
                "--low-pressure-limit", "14in_wc");
        assertThat(set.out()).contains("taken as 14.0 in w.c. (as set for this run)").contains("the limit is exceeded");
        CommandsTest.Run bad = CommandsTest.run("plan", NET, "sample-gis/tallowmere-plan.yaml", "--low-pressure-limit", "half");
        assertThat(bad.code()).isEqualTo(2);
        assertThat(bad.err()).contains("--low-pressure-limit").contains("'half'");
    }

    @Test
    void theSensingLineDistanceWidensOrNarrowsTheWarning() {
        // the corrected plan's tie-ins lie more than 10 m from every sensing tap and line: no warning; within 1 km, some
        CommandsTest.Run near = CommandsTest.run("plan", NET, "sample-gis/tallowmere-plan-corrected.yaml", "--as-of", "2026-12-01");
        assertThat(near.out()).doesNotContain("work-near-sensing-line");
        CommandsTest.Run wide = CommandsTest.run("plan", NET, "sample-gis/tallowmere-plan-corrected.yaml", "--as-of", "2026-12-01",
                "--sensing-line-m", "1000");
        assertThat(wide.out()).contains("work-near-sensing-line");
        assertThat(CommandsTest.run("plan", NET, "sample-gis/tallowmere-plan-corrected.yaml", "--sensing-line-m", "-1").code()).isEqualTo(2);
    }
}
