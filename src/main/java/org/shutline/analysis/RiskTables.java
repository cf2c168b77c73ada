package org.shutline.analysis;

import org.shutline.topology.Csr;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.model.Service;
import org.shutline.model.Station;
import org.shutline.trace.NetworkState;
import org.shutline.trace.SegmentGraph;
import org.shutline.trace.ValveSegments;

/**
 * All-cases emergency tables of one network state: for every valve segment and every
 * station, what an isolation or outage there puts off gas and what it takes; and the
 * valves whose failure most enlarges an outage (the valves to fix first).
 *
 * <p>Services and meters off come from {@link OutageTables} (one dominator tree). This
 * class builds the same isolation-unit graph (segments merged across open inoperable
 * valves; super-source 0; units 1..U; one node per in-service station between its
 * inlet and outlet units; relied-on open valves as arcs both ways) and its dominator
 * tree ({@link Dominators}, Cooper, Harvey and Kennedy 2001) to add, in O(1) per valve
 * end:
 * <ul>
 * <li>the valves an isolation of a segment takes: the open relied-on valves on its
 *     unit's boundary whose far unit is still fed after (reachable and not dominated by
 *     the unit), the count {@link Isolation} lists;</li>
 * <li>whether valves alone can do it: not when the unit holds a source or an
 *     in-service station with a fed inlet feeds straight into it;</li>
 * <li>critical customers off: dominator-subtree sums of the critical count.</li>
 * </ul>
 * Stations carry their verified stop ({@link StationStop}).
 * Valves to fix: every relied-on valve v, with growth = max(off(A+B) - off(A),
 * off(A+B) - off(B)) for its two sides' units A and B ({@link OutageTables#growthFromSideA}),
 * ranked by growth, then services off when it fails, then id.
 *
 * <p>Cost O(segments + links + services) besides {@link OutageTables}; segment
 * geometry on demand, O(edges of the segment) after one O(edges) grouping.
 */
public final class RiskTables {
    private static final GeometryFactory GF = new GeometryFactory();

    /** One valve segment's row. */
    public record SegmentRow(int segment, String systemId, List<String> mains, int services, long servicesOff, long metersOff,
                             long criticalOff, int valves, boolean isolable, List<String> stopStations) {
        public SegmentRow {
            mains = List.copyOf(mains);
            stopStations = List.copyOf(stopStations);
        }
    }

    /**
     * One station's row: what its outage puts off, and the valves that stop it
     * ({@code inletValves}: its verified {@link StationStop}, operating order; empty when
     * valves alone cannot stop it or it passes no gas already) with the stop's note and
     * the services the stop puts off besides the station's own district.
     */
    public record StationRow(String stationId, String name, String inSys, String outSys, boolean inService, long servicesOff,
                             long metersOff, long criticalOff, List<String> inletValves, String stopNote, long stopOtherOff) {
        public StationRow {
            inletValves = List.copyOf(inletValves);
        }
    }

    /** One relied-on valve: how much its failure enlarges the isolation of either side, and the outage of both sides. */
    public record ValveRow(int rank, String valveId, String systemId, String operable, long growth, long servicesOffWhenFails,
                           long metersOffWhenFails) {}

    private final ValveSegments segs;
    private final OutageTables tables;
    private final List<SegmentRow> segmentRows;
    private final List<StationRow> stationRows;
    private final List<ValveRow> valveRows;
    private final Csr edgesBySegment;
    /** Pressure system of each segment's pipe (-1 for an empty segment), computed once. */
    private final int[] segSystem;

    private RiskTables(ValveSegments segs, Progress progress) {
        this.segs = segs;
        this.tables = OutageTables.build(segs, progress);
        SegmentGraph sg = segs.graph();
        NetworkState s = segs.state();
        int units = tables.unitCount();
        int nodes = 1 + units + s.stationCount();
        Dominators dom = tables.dominators();
        long[] crit = new long[nodes];
        List<Service> services = s.network().services();
        for (int seg = 0; seg < segs.segmentCount(); seg++) {
            for (int sv : segs.services(seg)) if (services.get(sv).isCritical()) crit[1 + tables.unitOf(seg)]++;
        }
        long[] subCrit = dom.subtreeSums(crit);
        segSystem = new int[segs.segmentCount()];
        for (int seg = 0; seg < segSystem.length; seg++) segSystem[seg] = Restoration.segmentSystem(segs, seg);
        int[] valveCount = new int[units];
        boolean[] notIsolable = new boolean[units];
        for (int l = 0; l < sg.linkCount(); l++) {
            if (!sg.isOpen(l)) continue;
            int a = 1 + tables.unitOf(sg.linkA(l)), b = 1 + tables.unitOf(sg.linkB(l));
            if (sg.isValve(l)) {
                if (a == b || sg.isOpenInoperable(l)) continue;
                if (fedAfter(dom, a, b)) valveCount[a - 1]++;
                if (fedAfter(dom, b, a)) valveCount[b - 1]++;
            } else if (a != b && dom.isReachable(a)) {
                notIsolable[b - 1] = true;
            }
        }
        for (int i = 0; i < sg.sourceCount(); i++) if (sg.sourceSegment(i) >= 0) notIsolable[tables.unitOf(sg.sourceSegment(i))] = true;
        progress.checkCancelled();
        segmentRows = segmentRows(s, dom, subCrit, valveCount, notIsolable, progress);
        stationRows = stationRows(s, dom, subCrit, units);
        valveRows = valveRows(s);
        int[] edgeSeg = new int[s.edgeCount()];
        for (int e = 0; e < edgeSeg.length; e++) edgeSeg[e] = segs.edgeSegment(e);
        edgesBySegment = Csr.group(edgeSeg, segs.segmentCount());
    }

    public static RiskTables build(ValveSegments segs, Progress progress) {
        return new RiskTables(segs, progress);
    }

    public static RiskTables build(ValveSegments segs) {
        return new RiskTables(segs, Progress.NONE);
    }

    /** Far unit {@code far} still fed when unit {@code unit} is isolated. */
    private static boolean fedAfter(Dominators dom, int unit, int far) {
        if (!dom.isReachable(far)) return false;
        return !dom.isReachable(unit) || !dom.dominates(unit, far);
    }

    private List<SegmentRow> segmentRows(NetworkState s, Dominators dom, long[] subCrit, int[] valveCount, boolean[] notIsolable,
                                         Progress progress) {
        List<SegmentRow> rows = new ArrayList<>();
        for (int seg = 0; seg < segs.segmentCount(); seg++) {
            if (segs.isEmpty(seg)) continue;
            int u = tables.unitOf(seg);
            List<String> mains = new ArrayList<>();
            for (int m : segs.mains(seg)) mains.add(s.mainId(m));
            if ((seg & 0xFFF) == 0) progress.checkCancelled();
            Isolation.Counts fed = tables.stationFedCounts(u);
            rows.add(new SegmentRow(seg, s.graph().systemId(segSystem[seg]), mains, segs.serviceCount(seg), tables.servicesOffWhenIsolated(seg),
                    tables.metersOffWhenIsolated(seg), fed != null ? fed.critical() : dom.isReachable(1 + u) ? subCrit[1 + u] : 0,
                    fed != null ? fed.valves() : valveCount[u], fed != null ? fed.isolable() : !notIsolable[u],
                    fed != null ? fed.stationsToStop() : List.of()));
        }
        rows.sort(Comparator.comparingLong(SegmentRow::servicesOff).reversed().thenComparingLong(r -> -r.metersOff())
                .thenComparingInt(SegmentRow::segment));
        return rows;
    }

    private List<StationRow> stationRows(NetworkState s, Dominators dom, long[] subCrit, int units) {
        List<StationRow> rows = new ArrayList<>();
        Network net = s.network();
        // only the stop valves are read: they do not depend on the inspection date
        Isolation iso = new Isolation(segs, ValveDoubt.Settings.defaults(java.time.LocalDate.of(2000, 1, 1)));
        for (int st = 0; st < s.stationCount(); st++) {
            Station station = net.stations().get(st);
            int x = 1 + units + st;
            StationStop.Result stop = iso.stationStop(st);
            rows.add(new StationRow(station.id(), station.name(), station.inSys(), station.outSys(), s.stationInService(st),
                    tables.servicesOffWhenStationOut(st), tables.metersOffWhenStationOut(st), dom.isReachable(x) ? subCrit[x] : 0,
                    stop.stoppable() ? stop.valves() : List.of(), stop.summary(), stop.otherOff().cardinality()));
        }
        rows.sort(Comparator.comparingLong(StationRow::servicesOff).reversed().thenComparing(StationRow::stationId));
        return rows;
    }

    private List<ValveRow> valveRows(NetworkState s) {
        List<long[]> order = new ArrayList<>();
        for (int v = 0; v < s.valveCount(); v++) {
            if (!tables.isRelied(v)) continue;
            order.add(new long[] {v, Math.max(tables.growthFromSideA(v), tables.growthFromSideB(v)), tables.servicesOffWhenFails(v)});
        }
        order.sort(Comparator.<long[]>comparingLong(a -> -a[1]).thenComparingLong(a -> -a[2])
                .thenComparing(a -> s.valveId((int) a[0])));
        List<ValveRow> rows = new ArrayList<>();
        int rank = 1;
        for (long[] a : order) {
            int v = (int) a[0];
            int e = s.valveEdge(v);
            String sys = "";
            if (e >= 0) {
                int seg = segs.nodeSegment(s.edgeFrom(e));
                int sy = seg >= 0 ? segSystem[seg] : -1;
                if (sy < 0 && segs.nodeSegment(s.edgeTo(e)) >= 0) sy = segSystem[segs.nodeSegment(s.edgeTo(e))];
                if (sy >= 0) sys = s.graph().systemId(sy);
            }
            rows.add(new ValveRow(rank++, s.valveId(v), sys, s.valveOperability(v).name().toLowerCase(java.util.Locale.ROOT), a[1],
                    tables.servicesOffWhenFails(v), tables.metersOffWhenFails(v)));
        }
        return rows;
    }

    /** Segments with pipe, most services off first. */
    public List<SegmentRow> segments() { return segmentRows; }

    /** Stations, most services off first. */
    public List<StationRow> stations() { return stationRows; }

    /** Relied-on valves ranked by how much their failure enlarges an outage. */
    public List<ValveRow> valvesToFix() { return valveRows; }

    public OutageTables outageTables() { return tables; }

    /** The pipe of a segment as lines (a MultiLineString) in the network CRS. */
    public Geometry segmentGeometry(int seg) {
        NetworkState s = segs.state();
        int[] st = edgesBySegment.start(), list = edgesBySegment.items();
        LineString[] lines = new LineString[st[seg + 1] - st[seg]];
        for (int i = st[seg]; i < st[seg + 1]; i++) {
            Geometry g = ZoneSegments.edgeLine(s, list[i]);
            lines[i - st[seg]] = g instanceof LineString ls ? ls : GF.createLineString(g.getCoordinates());
        }
        return GF.createMultiLineString(lines);
    }
}
