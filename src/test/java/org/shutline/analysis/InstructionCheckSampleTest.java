package org.shutline.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.shutline.io.FieldMapping;
import org.shutline.io.NetworkReader;
import org.shutline.io.sample.SampleTown;
import org.shutline.model.Tolerances;
import org.shutline.topology.NetworkBuilder;
import org.shutline.topology.Topology;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * Station stops and isolations on the sample town, each re-traced: a station's stop
 * valves closed, the feed trace must show it feeding nothing; every valve segment's
 * isolation, fallbacks and alternative must pass {@link InstructionCheck}.
 */
class InstructionCheckSampleTest {
    static final ValveDoubt.Settings OPTIONS = ValveDoubt.Settings.defaults(SampleTown.AS_OF);
    static ValveSegments segs;

    @BeforeAll
    static void load() throws Exception {
        Topology t = NetworkBuilder.build(NetworkReader.read(Path.of("sample-gis/tallowmere.gpkg"), FieldMapping.DEFAULT), Tolerances.DEFAULT);
        segs = ValveSegments.build(NetworkState.of(t));
    }

    @Test
    void everyStationStopLeavesTheStationFeedingNothing() {
        NetworkState s = segs.state();
        Isolation iso = new Isolation(segs, OPTIONS);
        InstructionCheck check = new InstructionCheck(segs);
        for (int st = 0; st < s.stationCount(); st++) {
            StationStop.Result stop = iso.stationStop(st);
            assertThat(stop.stoppable()).as(stop.stationId()).isTrue();
            check.stationStop(stop, "stop " + stop.stationId());
            NetworkState closed = s;
            for (Isolation.ValveStep v : stop.isolation().valves()) closed = closed.withValveClosed(v.valve(), true);
            FeedTrace.Result tr = FeedTrace.run(closed);
            assertThat(tr.servicesFedThrough(st).cardinality()).as(stop.stationId() + " with " + stop.valves() + " closed").isZero();
            // the inline station valve alone (the old nearness rule) leaves every station but ST-N2 fed:
            // SampleTown puts each inlet valve on IP-1 1 m along the main from the station's tee
            List<Integer> own = StationStop.ownValveLinks(s, segs.graph(), s.network().stations().get(st));
            assertThat(own).as(stop.stationId() + " station valves").hasSize(1);
            NetworkState ownClosed = s.withValveClosed(segs.graph().linkFeature(own.get(0)), true);
            boolean ownEnough = FeedTrace.run(ownClosed).servicesFedThrough(st).isEmpty();
            assertThat(stop.byStationValves()).as(stop.stationId()).isEqualTo(ownEnough);
            if (!ownEnough) assertThat(stop.valves()).as(stop.stationId()).hasSizeGreaterThan(1).contains(s.valveId(segs.graph().linkFeature(own.get(0))));
            // IP-1 carries no services: the stops put off only the stations' own districts
            assertThat(stop.otherOff().isEmpty()).as(stop.stationId()).isTrue();
        }
    }

    @Test
    void everyOverpressureShutOffPassesTheReTrace() {
        for (String sys : List.of("IP-1", "LP-NORTH", "LP-SOUTH", "LP-EAST")) {
            OverpressureShutoff.Result r = OverpressureShutoff.of(segs, OPTIONS, sys, ResponseSettings.DEFAULT);
            InstructionCheck.verify(segs, r, "over-pressure of " + sys);
            if (sys.equals("LP-SOUTH")) {
                // sample-gis/README.md: ST-S1 alone feeds LP-SOUTH, 513 services and 653 meters; IP-1 has none
                assertThat(r.off().cardinality()).isEqualTo(513);
                assertThat(r.metersOff()).isEqualTo(653);
            }
        }
    }

    @Test
    void everySegmentIsolationPassesTheReTrace() {
        Isolation iso = new Isolation(segs, OPTIONS);
        InstructionCheck check = new InstructionCheck(segs);
        for (int seg = 0; seg < segs.segmentCount(); seg++) {
            check.isolation(iso.isolate(new Zone.OfSegments(new int[] {seg})), "segment " + seg);
        }
    }
}
