package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.BitSet;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.shutline.model.ContextLayer;
import org.shutline.model.Network;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.TestNet;

/** Work lists by sheet and street, on the ring with three invented streets. */
class WorkPackagesTest {
    static final GeometryFactory GF = new GeometryFactory();

    /*
     * Services of IsolationTest.RING sit at the middle of their pipe pieces:
     *   s1 (15,0) 1 m   s2 (45,0) 2 m   s3 (105,0) 3 m clinic   s4 (60,-30) 4 m   s5 (105,-40) 5 m
     * streets: North Row y = 5 (x -10..130), West Lane x = 65 (y -50..0), South Row y = -45 (x -10..130).
     * nearest: s1, s2, s3 North Row; s4 West Lane (5 m; North Row is 35 m); s5 South Row (5 m).
     * sheets: x < 60 "W", else "E".
     */
    @Test
    void criticalFirstThenSheetsAlongStreetsSharedByLoad() {
        TestNet t = AsciiNet.parse(IsolationTest.RING);
        Network base = t.network();
        ContextLayer streets = new ContextLayer("Streets", List.of(
                street("North Row", -10, 5, 130, 5), street("West Lane", 65, -50, 65, 0), street("South Row", -10, -45, 130, -45)));
        Network net = new Network(base.sourceName(), base.crs(), base.mains(), base.valves(), base.stations(), base.taps(),
                base.services(), base.sources(), List.of(streets), base.readFindings());
        BitSet all = new BitSet();
        all.set(0, 5);
        // walking order: sheet E before W; in E by street name: North Row (s3, 3 m), South Row (s5, 5 m),
        // West Lane (s4, 4 m); in W along North Row: s1 (1 m, at 25 m), s2 (2 m, at 55 m). Total 15 meters.
        // Two crews given: the smallest largest package of consecutive pieces is 8 meters
        // ([3, 5 | 4, 1, 2]; [3 | 5, 4, 1, 2] and [3, 5, 4 | 1, 2] give 12); the cut falls at the end of a street.
        WorkPackages.Result r = WorkPackages.build(net, all, (x, y) -> x < 60 ? "W" : "E", 2);
        assertThat(r.packages()).hasSize(2);
        WorkPackages.Package one = r.packages().get(0), two = r.packages().get(1);
        assertThat(one.visits()).extracting(WorkPackages.Visit::serviceId).containsExactly("s3", "s5");
        assertThat(one.visits().get(0).critical()).isEqualTo("clinic");
        assertThat(one.crew()).isEqualTo(1);
        assertThat(one.sheets()).containsExactly("E");
        assertThat(two.visits()).extracting(WorkPackages.Visit::serviceId).containsExactly("s4", "s1", "s2");
        assertThat(two.visits()).extracting(WorkPackages.Visit::street).containsExactly("West Lane", "North Row", "North Row");
        assertThat(two.sheets()).containsExactly("E", "W");
        assertThat(two.visits().get(1).along()).isEqualTo(25.0); // along North Row from its west end
        assertThat(r.crewMeters()).containsExactly(8, 7);
        // hours: meters / (10 shut-offs per technician-hour x 2 technicians), common practice (docs/emergency.md)
        assertThat(one.hours()).isEqualTo(0.4);
        assertThat(two.hours()).isEqualTo(0.35);
    }

    /*
     * Crews computed from a 0.25 h target, hand-worked with the common-practice rates of
     * docs/emergency.md (10 shut-offs per technician-hour, 2 technicians per crew):
     *   15 meters / 10 = 1.5 technician-hours; / 0.25 h = 6 technicians = 3 crews (the arithmetic).
     *   A crew does 0.25 h x 20 = 5 meters. In walking order 3 | 5 | 4 + 1 | 2: the meters do not
     *   divide into three pieces of at most 5 (3 + 5 > 5, 5 + 4 > 5), so 4 packages, 1 more crew.
     *   Cuts at street ends nearest an equal share: [s3] 3, [s5] 5, [s4] 4, [s1, s2] 3 (North Row kept whole).
     * With a 0.5 h target: 1.5 / 0.5 = 3 technicians = 2 crews; 10 meters each fits [3, 5 | 4, 1, 2].
     */
    @Test
    void computedCrewsKeepEveryPackageWithinTheTarget() {
        Network net = ringWithStreets();
        BitSet all = new BitSet();
        all.set(0, 5);
        ResponseSettings quarter = ResponseSettings.DEFAULT.withTargetHours(0.25, 24);
        ResponseSizing.Result z = ResponseSizing.size(15, 15, 0.25, 24, 0, ResponseRates.DEFAULT);
        assertThat(z.shutoffTechs()).isEqualTo(6);
        assertThat(z.crews()).isEqualTo(3);
        assertThat(z.crewsComputed()).isTrue();
        WorkPackages.Result r = WorkPackages.build(net, all, (x, y) -> x < 60 ? "W" : "E", z.crews(), true, quarter);
        assertThat(r.packages()).hasSize(4);
        assertThat(r.extraCrews()).isEqualTo(1);
        assertThat(r.crewMeters()).containsExactly(3, 5, 4, 3);
        assertThat(r.maxHours()).isLessThanOrEqualTo(0.25);
        assertThat(r.packages().get(3).visits()).extracting(WorkPackages.Visit::serviceId).containsExactly("s1", "s2");
        assertThat(r.overTarget()).isZero();
        ResponseSettings half = ResponseSettings.DEFAULT.withTargetHours(0.5, 24);
        ResponseSizing.Result z2 = ResponseSizing.size(15, 15, 0.5, 24, 0, ResponseRates.DEFAULT);
        assertThat(z2.crews()).isEqualTo(2);
        WorkPackages.Result r2 = WorkPackages.build(net, all, (x, y) -> x < 60 ? "W" : "E", z2.crews(), true, half);
        assertThat(r2.packages()).hasSize(2);
        assertThat(r2.extraCrews()).isZero();
        assertThat(r2.crewMeters()).containsExactly(8, 7);
    }

    /* Random sets of premises, seeded: packages = crews (computed from the target), each within it, critical first. */
    @Test
    void randomSetsAreBalancedWithinTheTarget() {
        for (long seed = 1; seed <= 200; seed++) {
            java.util.Random rnd = new java.util.Random(seed);
            int n = 1 + rnd.nextInt(60);
            long[] m = new long[n];
            long total = 0;
            for (int i = 0; i < n; i++) total += m[i] = 1 + rnd.nextInt(rnd.nextBoolean() ? 3 : 12);
            long cap = 12 + rnd.nextInt(40);
            int k = WorkPackages.count(m, cap);
            // the greedy count is the fewest: no k - 1 pieces fit (the largest piece of the best k - 1 exceeds cap)
            if (k > 1) assertThat(WorkPackages.smallestCap(m, k - 1, 1, total)).as("seed %d", seed).isGreaterThan(cap);
            int[] need = WorkPackages.need(m, cap);
            assertThat(need[0]).as("seed %d", seed).isEqualTo(k);
        }
    }

    private static Network ringWithStreets() {
        TestNet t = AsciiNet.parse(IsolationTest.RING);
        Network base = t.network();
        ContextLayer streets = new ContextLayer("Streets", List.of(
                street("North Row", -10, 5, 130, 5), street("West Lane", 65, -50, 65, 0), street("South Row", -10, -45, 130, -45)));
        return new Network(base.sourceName(), base.crs(), base.mains(), base.valves(), base.stations(), base.taps(),
                base.services(), base.sources(), List.of(streets), base.readFindings());
    }

    /* s4 at (60,-30) is nearest West Lane, but its address names North Row: it is listed there. */
    @Test
    void theStreetOfTheAddressWinsOverTheNearestStreet() {
        TestNet t = AsciiNet.parse(IsolationTest.RING);
        Network base = t.network();
        List<org.shutline.model.Service> svcs = new java.util.ArrayList<>(base.services());
        org.shutline.model.Service s4 = svcs.get(t.service("s4"));
        svcs.set(t.service("s4"), new org.shutline.model.Service(s4.id(), s4.systemId(), s4.serviceClass(), s4.meters(), s4.critical(),
                s4.mainId(), "7 NORTH ROW", s4.geometry()));
        ContextLayer streets = new ContextLayer("streets", List.of(street("North Row", -10, 5, 130, 5), street("West Lane", 65, -50, 65, 0)));
        Network net = new Network(base.sourceName(), base.crs(), base.mains(), base.valves(), base.stations(), base.taps(),
                svcs, base.sources(), List.of(streets), base.readFindings());
        BitSet one = new BitSet();
        one.set(t.service("s4"));
        one.set(t.service("s2"));
        WorkPackages.Visit v = WorkPackages.build(net, one, WorkPackages.SheetKey.NONE, 1).packages().get(0).visits().get(1);
        assertThat(v.serviceId()).isEqualTo("s4");
        assertThat(v.street()).isEqualTo("North Row");
        assertThat(v.along()).isEqualTo(70.0); // projected at x = 60, 70 m from the west end at -10
    }

    @Test
    void withoutStreetsOrSheetsEveryoneIsOnOneListInIdOrder() {
        TestNet t = AsciiNet.parse(IsolationTest.RING);
        BitSet some = new BitSet();
        some.set(t.service("s4"));
        some.set(t.service("s1"));
        WorkPackages.Result r = WorkPackages.build(t.network(), some, WorkPackages.SheetKey.NONE, 1);
        assertThat(r.packages()).singleElement().satisfies(p -> {
            assertThat(p.sheet()).isEqualTo("all");
            assertThat(p.visits()).extracting(WorkPackages.Visit::serviceId).containsExactly("s1", "s4");
            assertThat(p.crew()).isEqualTo(1);
        });
        // three crews given for two premises: one package each, no empty package
        assertThat(WorkPackages.build(t.network(), some, WorkPackages.SheetKey.NONE, 3).packages()).hasSize(2);
        assertThat(WorkPackages.build(t.network(), new BitSet(), WorkPackages.SheetKey.NONE, 1).packages()).isEmpty();
    }

    private static ContextLayer.Item street(String name, double x0, double y0, double x1, double y1) {
        return new ContextLayer.Item(GF.createLineString(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y1)}),
                Map.of("NAME", name));
    }
}
