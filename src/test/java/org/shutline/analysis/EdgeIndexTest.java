package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.BitSet;
import java.util.Random;
import java.util.stream.LongStream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.shutline.testnet.RandomNet;
import org.shutline.testnet.TestNet;
import org.shutline.trace.ValveSegments;

/** The indexed zone lookup gives the same segments as the plain scan of every edge, on seeded random networks. */
class EdgeIndexTest {
    static LongStream seeds() {
        return LongStream.range(500, 540);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void indexedPointAndPolygonZonesEqualThePlainScan(long seed) {
        TestNet t = RandomNet.build(seed);
        ValveSegments vs = ValveSegments.build(t.state());
        EdgeIndex idx = new EdgeIndex(vs);
        Envelope env = new Envelope();
        for (int v = 0; v < t.graph().nodeCount(); v++) env.expandToInclude(t.graph().nodeX(v), t.graph().nodeY(v));
        env.expandBy(20);
        Random rnd = new Random(seed);
        GeometryFactory gf = new GeometryFactory();
        for (int i = 0; i < 40; i++) {
            double x = env.getMinX() + rnd.nextDouble() * env.getWidth();
            double y = env.getMinY() + rnd.nextDouble() * env.getHeight();
            Zone.AtPoint z = new Zone.AtPoint(x, y, null);
            BitSet plain = ZoneSegments.of(z, vs, null);
            assertThat(ZoneSegments.of(z, vs, idx)).as("seed %d point %d (%.2f, %.2f)", seed, i, x, y).isEqualTo(plain);
            double w = 5 + rnd.nextDouble() * 40;
            Polygon p = gf.createPolygon(new Coordinate[] {new Coordinate(x, y), new Coordinate(x + w, y),
                new Coordinate(x + w, y + w), new Coordinate(x, y + w), new Coordinate(x, y)});
            Zone.InPolygon zp = new Zone.InPolygon(p);
            assertThat(ZoneSegments.of(zp, vs, idx)).as("seed %d polygon %d", seed, i).isEqualTo(ZoneSegments.of(zp, vs, null));
        }
    }
}
