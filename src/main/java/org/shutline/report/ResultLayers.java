package org.shutline.report;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Polygon;
import org.shutline.analysis.GasOffExtent;
import org.shutline.model.Finding;
import org.shutline.io.WriteLayer;
import org.shutline.io.WriteLayer.Column;
import org.shutline.io.WriteLayer.ColumnType;
import org.shutline.io.WriteLayer.GeometryKind;
import org.shutline.model.NormalPosition;
import org.shutline.model.Service;
import org.shutline.model.Station;
import org.shutline.render.GeoTransform;
import org.shutline.render.GridReference;
import org.shutline.render.IsolationRing;
import org.shutline.render.StateFeatures;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;

/**
 * The result layers of a view, in the network CRS, for a GeoPackage or GeoJSON that
 * opens in any GIS. Every row carries {@code view} ("step 2" or "incident"),
 * {@code step} (null for an incident) and {@code phase}.
 * <ul>
 * <li>{@code gas_off}: the gas-off extent as one MultiPolygon row (no row when nothing
 *     is off), with services and meters off;</li>
 * <li>{@code valves_to_operate}: one point per valve in operating order;</li>
 * <li>{@code affected_services}: one point per service off gas, with its map-book sheet;</li>
 * <li>{@code hazards}: one point per hazard (no geometry when the hazard has no position);</li>
 * <li>{@code station_sheds}: per district station in service with a live inlet, the pipe
 *     it feeds in the state drawn (live pipe edges reached through it, transitively)
 *     buffered by {@link #SHED_BUFFER_M} metres, as a MultiPolygon, with the services and
 *     meters fed through it and those it feeds alone;</li>
 * <li>{@code isolation_circle}: the incident's isolation circle as a polygon of 64 sides
 *     (incidents at a point only);</li>
 * <li>{@code plan_pipe}: pipe the plan has laid and that is in place in the state drawn
 *     (a bypass, temporary; a tie-in connection), one MultiLineString row each;</li>
 * <li>{@code plan_valves}: valves the plan has added and that are in place (a bypass's
 *     valves), open or closed as in the state;</li>
 * <li>{@code cuts}: open cuts (cut and capped) in the state.</li>
 * </ul>
 * The last three come from {@link StateFeatures}, the same features the maps draw; they are
 * written for every plan step (empty when the state has none) and for other views only
 * when the state has some. Polygon layers always hold MultiPolygons and line layers
 * MultiLineStrings, so each layer has one geometry type.
 */
public final class ResultLayers {
    /** Buffer around the pipe a station feeds, for its shed polygon, in metres (common practice for maps). */
    public static final double SHED_BUFFER_M = 10;

    private ResultLayers() {}

    public static List<WriteLayer> build(ReportView view, GeoTransform geo, StreetLocator streets, MapBook book) {
        List<WriteLayer> out = new ArrayList<>();
        out.add(gasOff(view));
        out.add(valves(view, geo, streets));
        out.add(services(view, book));
        out.add(hazards(view));
        out.add(sheds(view));
        if (view.ring() != null) out.add(ring(view));
        StateFeatures f = StateFeatures.of(view.state());
        if (view.kind() == ReportView.Kind.STEP || !f.isEmpty()) {
            out.add(planPipe(view, f));
            out.add(planValves(view, f));
            out.add(cuts(view, f));
        }
        return out;
    }

    static WriteLayer planPipe(ReportView v, StateFeatures f) {
        List<Geometry> gs = new ArrayList<>();
        List<List<Object>> rows = new ArrayList<>();
        GeometryFactory gf = new GeometryFactory();
        for (StateFeatures.AddedPipe p : f.addedPipes()) {
            Geometry g = p.main().geometry();
            List<LineString> parts = new ArrayList<>();
            for (int i = 0; i < g.getNumGeometries(); i++) if (g.getGeometryN(i) instanceof LineString l) parts.add(l);
            gs.add(gf.createMultiLineString(parts.toArray(new LineString[0])));
            rows.add(row(v, p.main().id(), p.kind(), p.temporary() ? "yes" : "no", p.main().systemId(),
                    p.main().status().name().toLowerCase(Locale.ROOT)));
        }
        return WriteLayer.of("plan_pipe", GeometryKind.LINE, withView(new Column("pipe_id", ColumnType.TEXT),
                new Column("kind", ColumnType.TEXT), new Column("temporary", ColumnType.TEXT),
                new Column("system", ColumnType.TEXT), new Column("status", ColumnType.TEXT)), gs, rows);
    }

    static WriteLayer planValves(ReportView v, StateFeatures f) {
        List<Geometry> gs = new ArrayList<>();
        List<List<Object>> rows = new ArrayList<>();
        for (StateFeatures.AddedValve a : f.addedValves()) {
            gs.add(a.valve().geometry());
            rows.add(row(v, a.valve().id(), a.valve().kind() == null ? null : a.valve().kind().name().toLowerCase(Locale.ROOT),
                    a.valve().normal() == NormalPosition.CLOSED ? "closed" : "open", a.temporary() ? "yes" : "no",
                    a.valve().systemId()));
        }
        return WriteLayer.of("plan_valves", GeometryKind.POINT, withView(new Column("valve_id", ColumnType.TEXT),
                new Column("kind", ColumnType.TEXT), new Column("position", ColumnType.TEXT),
                new Column("temporary", ColumnType.TEXT), new Column("system", ColumnType.TEXT)), gs, rows);
    }

    static WriteLayer cuts(ReportView v, StateFeatures f) {
        GeometryFactory gf = new GeometryFactory();
        List<Geometry> gs = new ArrayList<>();
        List<List<Object>> rows = new ArrayList<>();
        for (StateFeatures.Cut c : f.cuts()) {
            gs.add(gf.createPoint(new org.locationtech.jts.geom.Coordinate(c.x(), c.y())));
            rows.add(row(v, c.mainId()));
        }
        return WriteLayer.of("cuts", GeometryKind.POINT, withView(new Column("main_id", ColumnType.TEXT)), gs, rows);
    }

    private static List<Column> withView(Column... cols) {
        List<Column> c = new ArrayList<>(List.of(cols));
        c.add(new Column("view", ColumnType.TEXT));
        c.add(new Column("step", ColumnType.INTEGER));
        c.add(new Column("phase", ColumnType.TEXT));
        return c;
    }

    private static List<Object> row(ReportView v, Object... values) {
        List<Object> r = new ArrayList<>(java.util.Arrays.asList(values));
        r.add(v.label());
        r.add(v.kind() == ReportView.Kind.STEP ? v.step() : null);
        r.add(v.phase());
        return r;
    }

    static WriteLayer gasOff(ReportView v) {
        List<Geometry> gs = new ArrayList<>();
        List<List<Object>> rows = new ArrayList<>();
        if (!v.gasOff().isEmpty()) {
            gs.add(multi(v.gasOff()));
            rows.add(row(v, v.subject(), v.servicesOff().cardinality(), v.metersOff()));
        }
        return WriteLayer.of("gas_off", GeometryKind.POLYGON, withView(new Column("subject", ColumnType.TEXT),
                new Column("svc_off", ColumnType.INTEGER), new Column("meters_off", ColumnType.INTEGER)), gs, rows);
    }

    static WriteLayer valves(ReportView v, GeoTransform geo, StreetLocator streets) {
        GeometryFactory gf = new GeometryFactory();
        List<Geometry> gs = new ArrayList<>();
        List<List<Object>> rows = new ArrayList<>();
        for (ReportView.OperatedValve o : v.valves()) {
            gs.add(gf.createPoint(new org.locationtech.jts.geom.Coordinate(o.x(), o.y())));
            rows.add(row(v, o.order(), o.crew() == 0 ? null : o.crew(), o.valveId(), o.close() ? "close" : "open",
                    o.valveKind() == null ? null : o.valveKind().name().toLowerCase(Locale.ROOT),
                    o.operable() == null ? null : o.operable().name().toLowerCase(Locale.ROOT), o.checked(),
                    o.overdue() ? "yes" : "no", FieldLists.grid(geo, o.x(), o.y(), GridReference.Precision.M1),
                    streets.describe(o.x(), o.y()), o.ifFails().isEmpty() ? null : o.ifFails(),
                    o.fallbacks().isEmpty() ? null : String.join(" ", o.fallbacks())));
        }
        return WriteLayer.of("valves_to_operate", GeometryKind.POINT, withView(new Column("op_order", ColumnType.INTEGER),
                new Column("crew", ColumnType.INTEGER),
                new Column("valve_id", ColumnType.TEXT), new Column("action", ColumnType.TEXT),
                new Column("kind", ColumnType.TEXT), new Column("operable", ColumnType.TEXT),
                new Column("checked", ColumnType.DATE), new Column("overdue", ColumnType.TEXT),
                new Column("usng", ColumnType.TEXT), new Column("location", ColumnType.TEXT),
                new Column("if_fails", ColumnType.TEXT), new Column("fallback", ColumnType.TEXT)), gs, rows);
    }

    static WriteLayer services(ReportView v, MapBook book) {
        List<Geometry> gs = new ArrayList<>();
        List<List<Object>> rows = new ArrayList<>();
        List<Service> svc = v.state().network().services();
        BitSet off = v.servicesOff();
        for (int i = off.nextSetBit(0); i >= 0; i = off.nextSetBit(i + 1)) {
            Service s = svc.get(i);
            int sheet = FieldLists.sheetOf(book, s);
            gs.add(s.geometry());
            rows.add(row(v, s.id(), s.address(), s.serviceClass() == null ? null : s.serviceClass().name().toLowerCase(Locale.ROOT),
                    s.meters(), s.isCritical() ? (s.critical() == null || s.critical().isBlank() ? "critical" : s.critical()) : null,
                    sheet == 0 ? null : sheet));
        }
        return WriteLayer.of("affected_services", GeometryKind.POINT, withView(new Column("service_id", ColumnType.TEXT),
                new Column("address", ColumnType.TEXT), new Column("class", ColumnType.TEXT),
                new Column("meters", ColumnType.INTEGER), new Column("critical", ColumnType.TEXT),
                new Column("sheet", ColumnType.INTEGER)), gs, rows);
    }

    static WriteLayer hazards(ReportView v) {
        GeometryFactory gf = new GeometryFactory();
        List<Geometry> gs = new ArrayList<>();
        List<List<Object>> rows = new ArrayList<>();
        for (Finding h : v.hazards()) {
            boolean at = Double.isFinite(h.x()) && Double.isFinite(h.y());
            gs.add(at ? gf.createPoint(new org.locationtech.jts.geom.Coordinate(h.x(), h.y())) : null);
            rows.add(row(v, h.code(), h.severity().name().toLowerCase(Locale.ROOT), String.join(" ", h.features()),
                    h.message(), h.action(), h.mitigatedBy()));
        }
        return WriteLayer.of("hazards", GeometryKind.POINT, withView(new Column("code", ColumnType.TEXT),
                new Column("severity", ColumnType.TEXT), new Column("features", ColumnType.TEXT),
                new Column("message", ColumnType.TEXT), new Column("action", ColumnType.TEXT),
                new Column("mitigated_by", ColumnType.TEXT)), gs, rows);
    }

    static WriteLayer sheds(ReportView v) {
        NetworkState s = v.state();
        FeedTrace.Result tr = v.traceAfter();
        GeometryFactory gf = new GeometryFactory();
        double buffer = s.network().crs().unit().fromMetres(SHED_BUFFER_M);
        List<Station> stations = s.network().stations();
        List<Geometry> gs = new ArrayList<>();
        List<List<Object>> rows = new ArrayList<>();
        for (int i = 0; i < tr.stationCount() && i < stations.size(); i++) {
            BitSet edges = tr.stationEdges().get(i);
            List<Geometry> lines = new ArrayList<>();
            for (int e = edges.nextSetBit(0); e >= 0; e = edges.nextSetBit(e + 1)) {
                if (e >= s.edgeCount() || s.edgeKind(e) != org.shutline.topology.EdgeKind.PIPE) continue;
                Geometry g = GasOffExtent.pipeGeometry(s, e, gf);
                if (g != null) lines.add(g);
            }
            if (lines.isEmpty()) continue;
            Station st = stations.get(i);
            gs.add(multi(gf.buildGeometry(lines).buffer(buffer, 4)));
            rows.add(row(v, st.id(), st.name(), st.outSys(), tr.servicesFedThrough(i).cardinality(),
                    tr.stationMeters()[i], tr.servicesExclusiveTo(i).cardinality(), tr.stationExclusiveMeters()[i]));
        }
        return WriteLayer.of("station_sheds", GeometryKind.POLYGON, withView(new Column("station_id", ColumnType.TEXT),
                new Column("name", ColumnType.TEXT), new Column("out_sys", ColumnType.TEXT),
                new Column("services", ColumnType.INTEGER), new Column("meters", ColumnType.INTEGER),
                new Column("excl_svc", ColumnType.INTEGER), new Column("excl_mtr", ColumnType.INTEGER)), gs, rows);
    }

    static WriteLayer ring(ReportView v) {
        IsolationRing r = v.ring();
        GeometryFactory gf = new GeometryFactory();
        double radius = v.state().network().crs().unit().fromMetres(r.radiusMetres());
        Geometry circle = gf.createPoint(new org.locationtech.jts.geom.Coordinate(r.centerX(), r.centerY())).buffer(radius, 16);
        String basis = r.radiusMetres() == ReportView.ERG_115_ISOLATION_M
                ? "Emergency Response Guidebook (2024), Guide 115: initial isolation at least 100 m in all directions"
                : "radius set by the user";
        return WriteLayer.of("isolation_circle", GeometryKind.POLYGON, withView(new Column("radius_m", ColumnType.REAL),
                new Column("basis", ColumnType.TEXT)), List.of(multi(circle)), List.of(row(v, r.radiusMetres(), basis)));
    }

    /** A polygonal geometry as a MultiPolygon (non-polygonal parts dropped). */
    static MultiPolygon multi(Geometry g) {
        GeometryFactory gf = g.getFactory();
        if (g instanceof MultiPolygon m) return m;
        List<Polygon> ps = new ArrayList<>();
        for (int i = 0; i < g.getNumGeometries(); i++) {
            if (g.getGeometryN(i) instanceof Polygon p && !p.isEmpty()) ps.add(p);
        }
        return gf.createMultiPolygon(ps.toArray(new Polygon[0]));
    }
}
