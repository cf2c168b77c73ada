package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.time.LocalDate;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.shutline.io.FieldMapping;
import org.shutline.io.NetworkReader;
import org.shutline.model.Tolerances;
import org.shutline.testnet.AsciiNet;
import org.shutline.testnet.TestNet;
import org.shutline.topology.NetworkBuilder;
import org.shutline.topology.Topology;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/** The all-cases tables: by hand on the ring, then against per-case isolation and brute force. */
class RiskTablesTest {
    static final ValveDoubt.Settings OPTIONS = ValveDoubt.Settings.defaults(LocalDate.of(2026, 12, 1));

    /*
     * IsolationTest.RING (X0 source s1, X1 s2, X2 s3 clinic 3 m, X3 s4 4 m, X4 s5 5 m):
     * isolating X0 puts all 5 off (the source's own segment), X1 4 (X2..X4 hang on it), X2..X4 one each.
     * valves: X1 takes V1 only (V2 and V3 lead to segments it dominates); X2 takes V2, V4.
     * valve failure growth = max(off(A+B) - off(A), off(A+B) - off(B)):
     *   V2: X1+X2 -> 4; off(X2) = 1 -> 3.   V3: X1+X3 -> 4; off(X3) = 1 -> 3.
     *   V1: X0+X1 -> 5; off(X1) = 4 -> 1.   V4: X2+X4 -> 2 -> 1.   V5: X3+X4 -> 2 -> 1.
     * ranked by growth, then services off when it fails, then id: V2, V3, V1, V4, V5.
     */
    @Test
    void ringTablesWorkedByHand() {
        TestNet t = AsciiNet.parse(IsolationTest.RING);
        ValveSegments vs = ValveSegments.build(t.state());
        RiskTables rt = RiskTables.build(vs);
        assertThat(rt.segments()).extracting(RiskTables.SegmentRow::servicesOff).containsExactly(5L, 4L, 1L, 1L, 1L);
        // ties of one service off ranked by meters: X4 (5), X3 (4), X2 (3)
        assertThat(rt.segments().subList(2, 5)).extracting(RiskTables.SegmentRow::metersOff).containsExactly(5L, 4L, 3L);
        RiskTables.SegmentRow x0 = rt.segments().get(0), x1 = rt.segments().get(1), x2 = rt.segments().get(4);
        assertThat(x0.isolable()).isFalse();
        assertThat(x1.isolable()).isTrue();
        assertThat(x1.valves()).isEqualTo(1);
        assertThat(x1.criticalOff()).isEqualTo(1);
        assertThat(x2.valves()).isEqualTo(2);
        assertThat(x2.mains()).containsExactlyInAnyOrder("bc", "ce");
        assertThat(rt.valvesToFix()).extracting(RiskTables.ValveRow::valveId).containsExactly("V2", "V3", "V1", "V4", "V5");
        assertThat(rt.valvesToFix()).extracting(RiskTables.ValveRow::growth).containsExactly(3L, 3L, 1L, 1L, 1L);
        assertThat(rt.valvesToFix().get(2).servicesOffWhenFails()).isEqualTo(5);
        // X2's pipe: bc from V2 (90,0) to c (120,0), 30 m, and ce from c to V4 (120,-20), 20 m
        assertThat(rt.segmentGeometry(x2.segment()).getLength()).isCloseTo(50.0, org.assertj.core.api.Assertions.within(1e-9));
        assertThat(rt.segmentGeometry(x2.segment()).getNumGeometries()).isEqualTo(2);
    }

    @Test
    void matchesPerCaseIsolationAndBruteForceOnRandomNetworks() {
        long[] seen = new long[3];
        for (long seed = 1; seed <= 300; seed++) {
            long[] c = crossCheck(RandomNets.generate(seed, Set.of()), "seed " + seed);
            for (int i = 0; i < 3; i++) seen[i] += c[i];
        }
        // the generator must exercise the interesting cases: several valves, station-fed regions, valve growth
        assertThat(seen[0]).as("segments needing two or more valves").isGreaterThan(50);
        assertThat(seen[1]).as("segments not isolable by valves").isGreaterThan(50);
        assertThat(seen[2]).as("valves whose failure enlarges an outage").isGreaterThan(50);
    }

    @Test
    void matchesPerCaseIsolationAndBruteForceOnTheSampleTown() throws Exception {
        Path gpkg = Path.of("sample-gis/tallowmere.gpkg");
        Topology t = NetworkBuilder.build(NetworkReader.read(gpkg, FieldMapping.DEFAULT), Tolerances.DEFAULT);
        crossCheck(t, "sample town");
        RiskTables rt = RiskTables.build(ValveSegments.build(NetworkState.of(t)));
        // sample-gis/README.md: ST-S1 alone feeds LP-SOUTH (513 services, 653 meters)
        assertThat(rt.stations()).filteredOn(r -> r.stationId().equals("ST-S1")).singleElement().satisfies(r -> {
            assertThat(r.servicesOff()).isEqualTo(513);
            assertThat(r.metersOff()).isEqualTo(653);
            // V-013 (kind station) sits inline on IP-1 1 m from the station's tee (SampleTown), so IP-1 feeds the
            // tee from both sides: V-013 alone leaves ST-S1 fed; its stop must also close the next valve the other way
            assertThat(r.inletValves()).contains("V-013").hasSize(2);
        });
        NetworkState s0 = NetworkState.of(t);
        int st = stationIndex(s0, "ST-S1");
        assertThat(FeedTrace.run(close(s0, List.of("V-013"))).servicesFedThrough(st).cardinality()).as("V-013 alone").isEqualTo(513);
        List<String> stop = rt.stations().stream().filter(r -> r.stationId().equals("ST-S1")).findFirst().orElseThrow().inletValves();
        assertThat(FeedTrace.run(close(s0, stop)).servicesFedThrough(st).cardinality()).as("re-trace with " + stop).isZero();
    }

    /** Every segment row against Isolation and BruteForceOutages; every station and valve row against brute force. */
    static long[] crossCheck(Topology t, String label) {
        long[] seen = new long[3];
        ValveSegments vs = ValveSegments.build(NetworkState.of(t));
        RiskTables rt = RiskTables.build(vs);
        BruteForceOutages bf = new BruteForceOutages(vs);
        Isolation iso = new Isolation(vs, OPTIONS);
        for (RiskTables.SegmentRow r : rt.segments()) {
            String at = label + ", segment " + r.segment();
            Isolation.Result one = iso.isolate(new Zone.OfSegments(new int[] {r.segment()}));
            assertThat(r.servicesOff()).as(at).isEqualTo(bf.servicesOffWhenIsolated(r.segment())).isEqualTo(one.serviceIdsOff().size());
            assertThat(r.metersOff()).as(at).isEqualTo(bf.metersOffWhenIsolated(r.segment())).isEqualTo(one.metersOff());
            assertThat(r.valves()).as(at + " valves").isEqualTo(one.valves().size());
            assertThat(r.isolable()).as(at + " isolable").isEqualTo(one.isolable());
            assertThat(r.criticalOff()).as(at + " critical").isEqualTo(one.criticalOff().size());
            if (r.valves() >= 2) seen[0]++;
            if (!r.isolable()) seen[1]++;
        }
        for (int st = 0; st < vs.state().stationCount(); st++) {
            String id = vs.state().stationId(st);
            long want = bf.servicesOffWhenStationOut(st);
            assertThat(rt.stations()).as(label + ", station " + id).filteredOn(r -> r.stationId().equals(id))
                    .singleElement().extracting(RiskTables.StationRow::servicesOff).isEqualTo(want);
        }
        for (RiskTables.ValveRow r : rt.valvesToFix()) {
            int v = indexOf(vs, r.valveId());
            int l = vs.graph().valveLink(v);
            long both = bf.servicesOffWhenFails(v);
            long growth = Math.max(both - bf.servicesOffWhenIsolated(vs.graph().linkA(l)), both - bf.servicesOffWhenIsolated(vs.graph().linkB(l)));
            assertThat(r.servicesOffWhenFails()).as(label + ", valve " + r.valveId()).isEqualTo(both);
            assertThat(r.growth()).as(label + ", valve " + r.valveId() + " growth").isEqualTo(growth);
            if (growth > 0) seen[2]++;
        }
        for (int i = 1; i < rt.valvesToFix().size(); i++) {
            assertThat(rt.valvesToFix().get(i).growth()).as(label + " ranking").isLessThanOrEqualTo(rt.valvesToFix().get(i - 1).growth());
        }
        return seen;
    }

    private static int indexOf(ValveSegments vs, String id) {
        for (int v = 0; v < vs.state().valveCount(); v++) if (vs.state().valveId(v).equals(id)) return v;
        throw new AssertionError("no valve " + id);
    }

    private static NetworkState close(NetworkState s, List<String> ids) {
        for (int v = 0; v < s.valveCount(); v++) if (ids.contains(s.valveId(v))) s = s.withValveClosed(v, true);
        return s;
    }

    private static int stationIndex(NetworkState s, String id) {
        for (int st = 0; st < s.stationCount(); st++) if (s.stationId(st).equals(id)) return st;
        throw new AssertionError(id);
    }
}
