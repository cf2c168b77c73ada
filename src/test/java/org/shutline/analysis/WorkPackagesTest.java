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
        WorkPackages.Result r = WorkPackages.build(net, all, (x, y) -> x < 60 ? "W" : "E", 2);
        assertThat(r.packages()).extracting(WorkPackages.Package::sheet).containsExactly(WorkPackages.CRITICAL, "E", "W");
        WorkPackages.Package crit = r.packages().get(0), east = r.packages().get(1), west = r.packages().get(2);
        assertThat(crit.visits()).extracting(WorkPackages.Visit::serviceId).containsExactly("s3");
        assertThat(crit.visits().get(0).critical()).isEqualTo("clinic");
        assertThat(crit.crew()).isEqualTo(1);
        // E: South Row before West Lane (street name order)
        assertThat(east.visits()).extracting(WorkPackages.Visit::serviceId).containsExactly("s5", "s4");
        assertThat(east.visits()).extracting(WorkPackages.Visit::street).containsExactly("South Row", "West Lane");
        assertThat(east.meters()).isEqualTo(9);
        // W: along North Row from its west end: s1 at 25 m, s2 at 55 m
        assertThat(west.visits()).extracting(WorkPackages.Visit::serviceId).containsExactly("s1", "s2");
        assertThat(west.visits().get(0).along()).isEqualTo(25.0);
        // crew 1 has the clinic (3 m); E (9 m, the largest) goes to crew 2 (0 m), W (3 m) to crew 1 (3 m < 9 m)
        assertThat(east.crew()).isEqualTo(2);
        assertThat(west.crew()).isEqualTo(1);
        assertThat(r.crewMeters()).containsExactly(6, 9);
        assertThat(r.ofCrew(1)).extracting(WorkPackages.Package::sheet).containsExactly(WorkPackages.CRITICAL, "W");
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
        WorkPackages.Result r = WorkPackages.build(t.network(), some, WorkPackages.SheetKey.NONE, 3);
        assertThat(r.packages()).singleElement().satisfies(p -> {
            assertThat(p.sheet()).isEqualTo("all");
            assertThat(p.visits()).extracting(WorkPackages.Visit::serviceId).containsExactly("s1", "s4");
            assertThat(p.crew()).isEqualTo(1);
        });
        assertThat(WorkPackages.build(t.network(), new BitSet(), WorkPackages.SheetKey.NONE, 1).packages()).isEmpty();
    }

    private static ContextLayer.Item street(String name, double x0, double y0, double x1, double y1) {
        return new ContextLayer.Item(GF.createLineString(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y1)}),
                Map.of("NAME", name));
    }
}
