package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Valve visiting order and field time, worked by hand. Default times and speed are common practice (docs/emergency.md). */
class ValveRouteTest {
    /*
     *   C (0,1000) ------------- D (3000,1000)
     *   |
     *   A (0,0)                  B (3000,0)
     *
     * operating order A, B, C, D. Nearest neighbour from A: C (1000 m; B is 3000), from C:
     * D (3000; B is 3162), then B (1000). Tour A C D B, 5000 m straight, x 1.3 = 6500 m road.
     */
    static final List<ValveRoute.Stop> FOUR = List.of(new ValveRoute.Stop("A", 0, 0), new ValveRoute.Stop("B", 3000, 0),
            new ValveRoute.Stop("C", 0, 1000), new ValveRoute.Stop("D", 3000, 1000));

    @Test
    void oneCrewDrivesTheWholeNearestNeighbourTour() {
        ValveRoute.Result r = ValveRoute.plan(FOUR, 1, ValveRoute.Settings.DEFAULT);
        assertThat(r.tour()).containsExactly("A", "C", "D", "B");
        // 6.5 km at 25 km/h = 0.26 h = 15.6 min driving, plus 4 valves x 10 min = 55.6 min
        assertThat(r.elapsedMinutes()).isCloseTo(55.6, within(1e-9));
        assertThat(r.driveMetres()).isCloseTo(6500, within(1e-9));
        ValveRoute.CrewRun c = r.crews().get(0);
        // first valve done at 10 min; C after 1300 m (3.12 min) + 10 -> 23.12; D after 3900 m (9.36 min) + 10 -> 42.48
        assertThat(c.visits().get(0).doneMinute()).isCloseTo(10, within(1e-9));
        assertThat(c.visits().get(1).doneMinute()).isCloseTo(23.12, within(1e-9));
        assertThat(c.visits().get(2).doneMinute()).isCloseTo(42.48, within(1e-9));
        assertThat(c.visits().get(3).driveMetres()).isCloseTo(1300, within(1e-9));
    }

    @Test
    void crewsSplitTheTourIntoConsecutiveRuns() {
        // 2 crews: [A C] and [D B], each 1300 m (3.12 min) + 20 min = 23.12 min
        ValveRoute.Result two = ValveRoute.plan(FOUR, 2, ValveRoute.Settings.DEFAULT);
        assertThat(two.crews()).hasSize(2);
        assertThat(two.crews().get(0).visits()).extracting(ValveRoute.Visit::valveId).containsExactly("A", "C");
        assertThat(two.crews().get(1).visits()).extracting(ValveRoute.Visit::valveId).containsExactly("D", "B");
        assertThat(two.elapsedMinutes()).isCloseTo(23.12, within(1e-9));
        assertThat(two.driveMetres()).isCloseTo(2600, within(1e-9));
        // 3 crews: runs of 2, 1, 1 (the first takes the extra valve): [A C] 23.12, [D] 10, [B] 10
        ValveRoute.Result three = ValveRoute.plan(FOUR, 3, ValveRoute.Settings.DEFAULT);
        assertThat(three.crews()).extracting(c -> c.visits().size()).containsExactly(2, 1, 1);
        assertThat(three.crews().get(2).minutes()).isCloseTo(10, within(1e-9));
        assertThat(three.elapsedMinutes()).isCloseTo(23.12, within(1e-9));
        // more crews than valves: one valve each, 10 min
        ValveRoute.Result many = ValveRoute.plan(FOUR, 9, ValveRoute.Settings.DEFAULT);
        assertThat(many.crews()).hasSize(4);
        assertThat(many.elapsedMinutes()).isCloseTo(10, within(1e-9));
    }

    /*
     * FOUR with D doubtful and ranks A 0, B 1, C 2, D 2 (hop distance, feeding side first).
     * Two crews: the tour A C D B splits into [A C] and [D B]. Crew 1: nothing doubtful, A (rank 0) then C.
     * Crew 2: D (doubtful) first, then B. Order numbers: A 1, C 2, D 3, B 4.
     * One crew: D first, then A (0), B (1), C (2): D-A 3162.28 m, A-B 3000, B-C 3162.28 = 9324.56 m straight.
     */
    @Test
    void doubtfulValvesFirstThenFeedingSideFirstAndNumbersAlongTheRuns() {
        List<ValveRoute.Stop> s = List.of(new ValveRoute.Stop("A", 0, 0, false, 0), new ValveRoute.Stop("B", 3000, 0, false, 1),
                new ValveRoute.Stop("C", 0, 1000, false, 2), new ValveRoute.Stop("D", 3000, 1000, true, 2));
        ValveRoute.Result two = ValveRoute.plan(s, 2, ValveRoute.Settings.DEFAULT);
        assertThat(two.fieldOrder()).containsExactly("A", "C", "D", "B");
        assertThat(two.orderOf("D")).isEqualTo(3);
        assertThat(two.crewOf("B")).isEqualTo(2);
        ValveRoute.Result one = ValveRoute.plan(s, 1, ValveRoute.Settings.DEFAULT);
        assertThat(one.fieldOrder()).containsExactly("D", "A", "B", "C");
        double straight = 2 * Math.hypot(3000, 1000) + 3000;
        assertThat(one.driveMetres()).isCloseTo(straight * 1.3, within(1e-6));
        // D fails: crew 1 drives D -> E (3000,2000) 1000 m -> F (0,2000) 3000 m, then on to A (0,0) 2000 m
        // instead of D -> A (3162.28 m): extra straight 1000 + 3000 + 2000 - 3162.28 = 2837.72 m;
        // x 1.3 / 25 km/h = 8.854 min, plus 2 valves x 10 min
        ValveRoute.Detour d = ValveRoute.detour(one, s.get(3), List.of(new ValveRoute.Stop("F", 0, 2000),
                new ValveRoute.Stop("E", 3000, 2000)), ValveRoute.Settings.DEFAULT);
        assertThat(d.crew()).isEqualTo(1);
        assertThat(d.valves()).containsExactly("E", "F");
        double extra = 1000 + 3000 + 2000 - Math.hypot(3000, 1000);
        assertThat(d.extraMetres()).isCloseTo(extra * 1.3, within(1e-6));
        assertThat(d.extraMinutes()).isCloseTo(20 + extra * 1.3 / 1000 / 25 * 60, within(1e-9));
    }

    @Test
    void settingsChangeTheArithmetic() {
        // 5 min a valve, 50 km/h, no detour: A C D B = 5 km -> 6 min + 20 min = 26 min
        ValveRoute.Result r = ValveRoute.plan(FOUR, 1, new ValveRoute.Settings(5, 50, 1.0));
        assertThat(r.elapsedMinutes()).isCloseTo(26, within(1e-9));
        assertThat(new ValveRoute.Settings(10, 25, 1.3).travelMinutes(1000)).isCloseTo(3.12, within(1e-12));
    }

    @Test
    void tiesGoToTheEarlierValveAndEmptyIsZero() {
        // from X at 0, Y and Z both 100 m away: Y comes first in operating order
        List<ValveRoute.Stop> s = List.of(new ValveRoute.Stop("X", 0, 0), new ValveRoute.Stop("Z", -100, 0), new ValveRoute.Stop("Y", 100, 0));
        assertThat(ValveRoute.plan(s, 1, ValveRoute.Settings.DEFAULT).tour()).containsExactly("X", "Z", "Y");
        assertThat(ValveRoute.plan(List.of(), 3, ValveRoute.Settings.DEFAULT).elapsedMinutes()).isZero();
        assertThatThrownBy(() -> ValveRoute.plan(s, 0, ValveRoute.Settings.DEFAULT)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new ValveRoute.Settings(10, 0, 1.3)).isInstanceOf(IllegalArgumentException.class);
    }
}
