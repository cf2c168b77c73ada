package org.shutline.trace;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.TestNet;

class StationShedsTest {
    private static final GeometryFactory GF = new GeometryFactory();

    private static Point at(double x, double y) {
        return GF.createPoint(new Coordinate(x, y));
    }

    /* The grid of FeedTraceTest: R1 and R2 both reach all LP pipe (c, d, f, g), so there is
     * one joint shed {R1, R2} and neither station has an area of its own; HP pipe (a) is in no shed. */
    @Test
    void gridIsOneJointShed() {
        TestNet t = AsciiNet.parse(FeedTraceTest.GRID);
        NetworkState s = t.state();
        StationSheds.Result r = StationSheds.of(s, FeedTrace.run(s), 5);
        assertThat(r.joint()).hasSize(1);
        assertThat(r.joint().get(0).stations()).containsExactly(t.station("R1"), t.station("R2"));
        assertThat(r.joint().get(0).area().contains(at(100, 0))).isTrue();   // d
        assertThat(r.joint().get(0).area().contains(at(100, -20))).isTrue(); // g
        assertThat(r.joint().get(0).area().contains(at(0, 0))).isFalse();    // a, HP
        assertThat(r.alone().get(0).isEmpty()).isTrue();
        assertThat(r.alone().get(1).isEmpty()).isTrue();
        assertThat(r.reach().get(0).contains(at(80, -20))).isTrue();         // between f and g
    }

    /* R2 out of service: R1 feeds all LP alone; R2 has no shed. */
    @Test
    void stationOutLeavesTheOtherAlone() {
        TestNet t = AsciiNet.parse(FeedTraceTest.GRID);
        NetworkState s = t.state().withStationInService(t.station("R2"), false);
        StationSheds.Result r = StationSheds.of(s, FeedTrace.run(s), 5);
        assertThat(r.joint()).isEmpty();
        assertThat(r.alone().get(t.station("R1")).contains(at(100, -10))).isTrue();
        assertThat(r.reach().get(t.station("R2")).isEmpty()).isTrue();
    }
}
