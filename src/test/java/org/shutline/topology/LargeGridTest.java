package org.shutline.topology;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
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
 * A generated grid of 100,800 mains (225 x 225 junctions, 10 m apart, every junction
 * drawn with a 0.1 m gap so all ends must snap) builds correctly. Guards against
 * quadratic behaviour: an all-pairs build would not finish within the test run.
 * Only correctness is asserted, never time.
 */
class LargeGridTest {
    @Test
    void hundredThousandMainsBuild() {
        int n = 225;
        List<Main> mains = new ArrayList<>();
        List<Valve> valves = new ArrayList<>();
        List<Service> services = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            for (int i = 0; i + 1 < n; i++) {
                mains.add(main("H" + i + "_" + j, i * 10 + 0.05, j * 10, (i + 1) * 10 - 0.05, j * 10));
                mains.add(main("V" + j + "_" + i, j * 10, i * 10 + 0.05, j * 10, (i + 1) * 10 - 0.05));
                if ((i + j) % 50 == 0) {
                    valves.add(new Valve("VA" + i + "_" + j, "LP", ValveKind.MAIN, NormalPosition.OPEN,
                            Operability.YES, null, TestNet.pt(i * 10 + 5, j * 10 + 0.5)));
                }
                if ((i * 7 + j) % 10 == 0) {
                    services.add(new Service("S" + i + "_" + j, "LP", ServiceClass.RESIDENTIAL, 1, "", null,
                            "Grid", TestNet.pt(i * 10 + 3, j * 10 + 2.5)));
                }
            }
        }
        Network net = new Network("grid", CrsInfo.UNKNOWN_METRES, mains, valves, List.of(), List.of(), services,
                List.of(), List.of(), List.of());
        Topology t = NetworkBuilder.build(net, Tolerances.DEFAULT);
        Graph g = t.graph();
        assertThat(mains).hasSize(100_800);
        assertThat(g.nodeCount()).isEqualTo(n * n + 2 * valves.size());
        assertThat(g.edgeCount()).isEqualTo(mains.size() + 2 * valves.size());
        assertThat(t.findings()).isEmpty();
        int interior = 0;
        for (int v = 0; v < g.nodeCount(); v++) if (g.degree(v) == 4) interior++;
        assertThat(interior).isEqualTo((n - 2) * (n - 2));
        for (int s = 0; s < services.size(); s++) {
            int e = g.serviceEdge(s);
            assertThat(e).isNotNegative();
            assertThat(mains.get(g.edgeFeature(e)).id()).startsWith("H");
        }
        for (int v = 0; v < valves.size(); v++) assertThat(g.valveEdge(v)).isNotNegative();
    }

    private static Main main(String id, double x0, double y0, double x1, double y1) {
        return new Main(id, "LP", MainStatus.ACTIVE, "PE", 63.0, 100.0, 1990,
                TestNet.GF.createLineString(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y1)}));
    }
}
