package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * Places the commands cannot put on the sample town (sample-gis/README.md) are refused
 * with exit 2 and the reason; accepted places say which main they were put on and how
 * far they moved.
 *
 * <p>Extent by hand: the streets form a 100 m grid from Quarry Lane (x 512 000) to
 * Tinsmith Street (x 513 500), Alder Row (y 4 890 000) to Nettle Row (y 4 891 100);
 * low-pressure mains lie 3 m north/east of the centre lines, so the east-most main runs
 * north-south at x 513 503 through y 4 890 000.
 */
class LocationRefusalTest {
    static final String NET = "sample-gis/tallowmere.gpkg";

    static CommandsTest.Run run(String... args) {
        return CommandsTest.run(args);
    }

    @Test
    void aPointFarFromEveryMainIsRefusedWithTheDistanceAndTheExtent() {
        // 600 000 - 513 503 = 86 497 m to the main under Tinsmith Street: "86.5 km"
        CommandsTest.Run r = run("incident", NET, "--at", "600000,4890000");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.out()).isEmpty();
        assertThat(r.err()).contains("86.5 km from the nearest active main").contains("limit of 100 m")
                .contains("the network's active mains span x").contains("513503");
        CommandsTest.Run iso = run("isolate", NET, "--at", "600000,4890000");
        assertThat(iso.code()).isEqualTo(2);
        assertThat(iso.err()).contains("86.5 km from the nearest active main");
    }

    @Test
    void theLimitIsAnOption() {
        // 513 503 + 150 = 513 653: 150 m east of the east-most main, inside 200 m, outside 100 m
        assertThat(run("isolate", NET, "--at", "513653,4890500").err()).contains("150 m from the nearest active main");
        CommandsTest.Run ok = run("isolate", NET, "--at", "513653,4890500", "--max-distance-m", "200", "--as-of", "2026-12-01");
        CommandsTest.assertSampleRunDone(ok);
        assertThat(ok.out()).contains("Placed on main").contains("moved 150 m to 513503.0, 4890500.0");
        assertThat(run("isolate", NET, "--at", "513653,4890500", "--max-distance-m", "0").code()).isEqualTo(2);
        assertThat(run("isolate", NET, "--at", "513653,4890500", "--max-distance-m", "NaN").code()).isEqualTo(2);
    }

    @Test
    @Timeout(60)
    void nonFiniteAndNonNumbersAreRefusedWhenRead() {
        for (String at : new String[] {"NaN,NaN", "Infinity,0", "0,-Infinity", "abc,1", "1e400,0"}) {
            CommandsTest.Run r = run("incident", NET, "--at", at);
            assertThat(r.code()).as(at).isEqualTo(2);
            assertThat(r.err()).as(at).contains("--at");
            assertThat(run("isolate", NET, "--at", at).code()).as(at).isEqualTo(2);
        }
        // huge but finite: refused by distance, and the nearest-main search ends
        CommandsTest.Run huge = run("incident", NET, "--at", "1e300,-1e300");
        assertThat(huge.code()).isEqualTo(2);
        assertThat(huge.err()).contains("from the nearest active main");
    }

    @Test
    void gridReferencesTooCoarseOrOutsideTheNetworkAreRefused() {
        CommandsTest.Run zone = run("incident", NET, "--usng", "15T");
        assertThat(zone.code()).isEqualTo(2);
        assertThat(zone.err()).contains("whole grid zone");
        // a 1 km cell (2 digits each way) is larger than the 100 m limit
        CommandsTest.Run km = run("incident", NET, "--usng", "15T WJ 12 90");
        assertThat(km.code()).isEqualTo(2);
        assertThat(km.err()).contains("cell of 1000 m");
        assertThat(run("incident", NET, "--usng", "15T WJ").code()).isEqualTo(2);
        // 15T WJ 900 900: 100 m cell with centre E 590 050, N 4 890 050; 590 050 - 513 503 = 76 547 m -> "76.5 km"
        CommandsTest.Run out = run("incident", NET, "--usng", "15T WJ 900 900");
        assertThat(out.code()).isEqualTo(2);
        assertThat(out.err()).contains("76.5 km from the nearest active main");
        // with a 2 km limit the 1 km cell is accepted, its centre 512 500, 4 890 500 placed
        CommandsTest.Run ok = run("incident", NET, "--usng", "15T WJ 12 90", "--max-distance-m", "2000", "--as-of", "2026-12-01");
        CommandsTest.assertSampleRunDone(ok);
        assertThat(ok.out()).contains("centre of its 1000 m cell").contains("Placed on main");
    }

    @Test
    void anAcceptedPointPrintsTheMainAndTheDistanceMoved() throws Exception {
        // 2 m south of the intermediate-pressure main under Gorse Avenue (y 4 890 597)
        CommandsTest.Run r = run("incident", NET, "--at", "512547,4890595", "--system", "IP-1", "--as-of", "2026-12-01");
        CommandsTest.assertSampleRunDone(r);
        assertThat(r.out()).contains("Placed on main M-IP-007 (IP-1), moved 2.0 m to 512547.0, 4890597.0");
        CommandsTest.Run j = run("incident", NET, "--at", "512547,4890595", "--system", "IP-1", "--as-of", "2026-12-01",
                "--format", "json");
        JsonNode loc = EmergencyCommandsTest.JSON.readTree(j.out()).get("location");
        assertThat(loc.get("main").asText()).isEqualTo("M-IP-007");
        assertThat(loc.get("moved_m").asDouble()).isEqualTo(2.0);
        assertThat(loc.get("placed_y").asDouble()).isEqualTo(4890597.0);
        CommandsTest.Run iso = run("isolate", NET, "--at", "512547,4890595", "--system", "IP-1", "--as-of", "2026-12-01");
        assertThat(iso.out()).contains("Placed on main M-IP-007 (IP-1), moved 2.0 m");
    }

    @Test
    void unknownOrInactiveMainsAndUnattachedAddressesAreRefused() {
        CommandsTest.Run r = run("incident", NET, "--main", "M-NONE");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("no main with id 'M-NONE'");
        assertThat(run("isolate", NET, "--main", "M-NONE").code()).isEqualTo(2);
        CommandsTest.Run ok = run("incident", NET, "--main", "M-IP-007", "--as-of", "2026-12-01");
        assertThat(ok.out()).contains("Placed on main M-IP-007 (IP-1)");
    }

    @Test
    void oneIsSingularInTheIncidentText() {
        // M-CI-01 (Elder Street, LP-SOUTH): 7 services, 10 meters; 10 meters / 10 per technician-hour = 1.0
        // technician-hour, one technician in one crew (common-practice rates, ResponseRates.DEFAULT)
        CommandsTest.Run r = run("incident", NET, "--main", "M-CI-01", "--crews", "1", "--as-of", "2026-12-01");
        CommandsTest.assertSampleRunDone(r);
        assertThat(r.out()).contains("with 1 crew,").contains("1 technician needed to finish in 4.0 h (1 crew of 2)").contains("1 technician (1 relight crew, sized separately)")
                .contains("h with 1 crew\n").doesNotContainPattern("\\b1 (services|meters|valves)\\b").doesNotContain("1 crews").doesNotContain("1 technicians")
                .doesNotContain("crew(s)");
    }
}
