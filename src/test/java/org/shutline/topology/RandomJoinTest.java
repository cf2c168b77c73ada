package org.shutline.topology;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.shutline.model.CrsInfo;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.Tolerances;

/**
 * Seeded random networks against a plain all-pairs reference of the end-join rule,
 * using JTS's own point-line distance: node count (one per junction cluster) and the
 * number of connected pieces must agree. Lines run with x strictly increasing in
 * steps of at least 1 m, so no line can meet itself; up to 90 vertices, so the index
 * chunking (32 segments) is crossed.
 */
class RandomJoinTest {
    private static final double SNAP = 0.5;

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12})
    void joinsAgreeWithAllPairsReference(long seed) {
        Random r = new Random(seed);
        List<Main> mains = new ArrayList<>();
        int count = 30 + r.nextInt(30);
        for (int i = 0; i < count; i++) {
            int vs = 2 + (r.nextInt(4) == 0 ? r.nextInt(90) : r.nextInt(4));
            Coordinate[] cs = new Coordinate[vs];
            double x = r.nextInt(20) * 3 + r.nextDouble() * 0.8 - 0.4;
            double y = r.nextInt(20) * 3 + r.nextDouble() * 0.8 - 0.4;
            for (int k = 0; k < vs; k++) {
                cs[k] = new Coordinate(x, y);
                x += 1 + r.nextDouble() * 2;
                y += r.nextDouble() * 6 - 3;
            }
            String sys = r.nextInt(5) == 0 ? "IP" : "LP";
            mains.add(new Main("M" + i, sys, MainStatus.ACTIVE, null, null, null, null,
                    TestNet.GF.createLineString(cs)));
        }
        Network net = new Network("random", CrsInfo.UNKNOWN_METRES, mains, List.of(), List.of(), List.of(),
                List.of(), List.of(), List.of(), List.of());
        Graph g = NetworkBuilder.build(net, Tolerances.DEFAULT).graph();

        int n = mains.size();
        UnionFind uf = new UnionFind(2 * n);
        for (int a = 0; a < n; a++) {
            LineString la = (LineString) mains.get(a).geometry();
            for (int end = 0; end < 2; end++) {
                Point p = end == 0 ? la.getStartPoint() : la.getEndPoint();
                for (int b = 0; b < n; b++) {
                    if (b == a || !mains.get(b).systemId().equals(mains.get(a).systemId())) continue;
                    LineString lb = (LineString) mains.get(b).geometry();
                    boolean atEnd = false;
                    if (p.distance(lb.getStartPoint()) <= SNAP) { uf.union(2 * a + end, 2 * b); atEnd = true; }
                    if (p.distance(lb.getEndPoint()) <= SNAP) { uf.union(2 * a + end, 2 * b + 1); atEnd = true; }
                    if (!atEnd && p.distance(lb) <= SNAP) {
                        int tee = uf.add();
                        uf.union(2 * a + end, tee);
                        uf.union(2 * b, tee); // a tee lies on b: same connected piece
                    }
                }
            }
        }
        // clusters: recount without the along-line links used for pieces
        UnionFind clusters = new UnionFind(2 * n);
        int tees = 0;
        for (int a = 0; a < n; a++) {
            LineString la = (LineString) mains.get(a).geometry();
            for (int end = 0; end < 2; end++) {
                Point p = end == 0 ? la.getStartPoint() : la.getEndPoint();
                for (int b = 0; b < n; b++) {
                    if (b == a || !mains.get(b).systemId().equals(mains.get(a).systemId())) continue;
                    LineString lb = (LineString) mains.get(b).geometry();
                    boolean atEnd = false;
                    if (p.distance(lb.getStartPoint()) <= SNAP) { clusters.union(2 * a + end, 2 * b); atEnd = true; }
                    if (p.distance(lb.getEndPoint()) <= SNAP) { clusters.union(2 * a + end, 2 * b + 1); atEnd = true; }
                    if (!atEnd && p.distance(lb) <= SNAP) {
                        clusters.union(2 * a + end, clusters.add());
                        tees++;
                    }
                }
            }
        }
        int roots = 0;
        for (int e = 0; e < clusters.size(); e++) if (clusters.find(e) == e) roots++;
        for (int a = 0; a < n; a++) uf.union(2 * a, 2 * a + 1);
        int pieces = 0;
        for (int e = 0; e < 2 * n; e++) if (uf.find(e) == e) pieces++;

        int[] comp = TestNet.components(g);
        int graphPieces = 0;
        for (int v = 0; v < g.nodeCount(); v++) if (comp[v] == v) graphPieces++;
        assertThat(roots).as("the random network has joins, seed " + seed).isLessThan(2 * n + tees);
        assertThat(g.nodeCount()).as("nodes, seed " + seed).isEqualTo(roots);
        assertThat(graphPieces).as("connected pieces, seed " + seed).isEqualTo(pieces);
        assertThat(g.edgeCount()).as("pipe edges, seed " + seed).isEqualTo(n + tees);
    }
}
