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
    static final Isolation.Options OPTIONS = Isolation.Options.defaults(SampleTown.AS_OF);
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
            System.out.println(stop.stationId() + ": " + stop.summary() + " | fallbacks " + stop.isolation().fallbacks());
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
