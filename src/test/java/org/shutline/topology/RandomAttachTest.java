package org.shutline.topology;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.locationtech.jts.geom.Coordinate;
import org.shutline.model.CrsInfo;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Tolerances;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;

/**
 * Seeded random valves and services against a plain all-pairs reference using JTS's
 * own point-line distance: the main each one attaches to (or none) must agree.
 * Cases where the two nearest candidates are within 1e-9 m of each other are
 * skipped (a floating-point tie either way).
 */
class RandomAttachTest {

    @ParameterizedTest
    @ValueSource(longs = {21, 22, 23, 24, 25, 26, 27, 28})
    void attachmentAgreesWithAllPairsReference(long seed) {
        Random r = new Random(seed);
        List<Main> mains = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            int vs = 2 + r.nextInt(50);
            Coordinate[] cs = new Coordinate[vs];
            double x = r.nextDouble() * 100;
            double y = r.nextDouble() * 100;
            for (int k = 0; k < vs; k++) {
                cs[k] = new Coordinate(x, y);
                x += r.nextDouble() * 6 - 3;
                y += r.nextDouble() * 6 - 3;
            }
            MainStatus st = r.nextInt(4) == 0 ? MainStatus.ABANDONED : MainStatus.ACTIVE;
            mains.add(new Main("M" + i, r.nextInt(3) == 0 ? "IP" : "LP", st, null, null, null, null,
                    TestNet.GF.createLineString(cs)));
        }
        List<Valve> valves = new ArrayList<>();
        List<Service> services = new ArrayList<>();
        for (int i = 0; i < 200; i++) {
            String sys = r.nextInt(3) == 0 ? "IP" : "LP";
            valves.add(new Valve("V" + i, sys, ValveKind.MAIN, NormalPosition.OPEN, Operability.YES, null,
                    TestNet.pt(r.nextDouble() * 100, r.nextDouble() * 100)));
            services.add(new Service("S" + i, sys, ServiceClass.RESIDENTIAL, 1, "", null, "Random Row",
                    TestNet.pt(r.nextDouble() * 160 - 30, r.nextDouble() * 160 - 30)));
        }
        Network net = new Network("random", CrsInfo.UNKNOWN_METRES, mains, valves, List.of(), List.of(),
                services, List.of(), List.of(), List.of());
        Graph g = NetworkBuilder.build(net, Tolerances.DEFAULT).graph();

        int checked = 0;
        for (int v = 0; v < valves.size(); v++) {
            int[] ref = reference(mains, valves.get(v).systemId(), valves.get(v).geometry(), 2.0, false);
            if (ref[1] == 1) continue;
            int e = g.valveEdge(v);
            if (ref[0] < 0) {
                assertThat(e).as("valve " + v + " left out, seed " + seed).isEqualTo(-1);
            } else {
                // at a line's end one side of the valve is the junction (other mains' pipes or none)
                java.util.Set<Integer> got = new java.util.HashSet<>();
                for (int node : new int[] {g.edgeFrom(e), g.edgeTo(e)}) {
                    for (int i = g.adjStart(node); i < g.adjEnd(node); i++) {
                        int a = g.adjEdge(i);
                        if (g.edgeKind(a) == EdgeKind.PIPE) got.add(g.edgeFeature(a));
                    }
                }
                assertThat(got).as("valve " + v + ", seed " + seed).contains(ref[0]);
            }
            checked++;
        }
        for (int s = 0; s < services.size(); s++) {
            int[] ref = reference(mains, services.get(s).systemId(), services.get(s).geometry(), 60.0, true);
            if (ref[1] == 1) continue;
            int e = g.serviceEdge(s);
            assertThat(e < 0 ? -1 : g.edgeFeature(e)).as("service " + s + ", seed " + seed).isEqualTo(ref[0]);
            checked++;
        }
        assertThat(checked).as("seed " + seed).isGreaterThan(300);
    }

    /** {main index or -1, 1 when a near-tie makes the case undecidable}. */
    private static int[] reference(List<Main> mains, String sys, org.locationtech.jts.geom.Point p, double tol,
                                   boolean activeOnly) {
        int best = -1;
        double bestD = Double.POSITIVE_INFINITY;
        double second = Double.POSITIVE_INFINITY;
        for (int i = 0; i < mains.size(); i++) {
            Main m = mains.get(i);
            if (!m.systemId().equals(sys)) continue;
            if (activeOnly && m.status() != MainStatus.ACTIVE) continue;
            double d = m.geometry().distance(p);
            if (d < bestD) {
                second = bestD;
                bestD = d;
                best = i;
            } else if (d < second) {
                second = d;
            }
        }
        boolean undecided = Math.abs(bestD - tol) < 1e-9 || second - bestD < 1e-9;
        return new int[] {bestD <= tol ? best : -1, undecided ? 1 : 0};
    }
}
