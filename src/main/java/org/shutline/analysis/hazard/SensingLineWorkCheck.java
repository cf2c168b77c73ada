package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.shutline.model.ContextLayer;
import org.shutline.model.Network;
import org.shutline.model.SenseTap;
import org.shutline.model.Severity;
import org.shutline.model.Station;
import org.shutline.plan.WorkPoint;
import org.shutline.trace.NetworkState;

/**
 * A cut or tie-in within a set distance (default 10 m, common practice) of a sensing tap
 * of a station in service, or of its control line: the excavation or the work may damage
 * the line, and a station whose line is broken senses no outlet pressure and opens wide
 * (the control line carries downstream pressure back to the regulator: 49 CFR 192.195-199,
 * PHMSA interpretation PI-92-0104). Warning. The line's path is the line of the
 * {@code control_lines} layer with the tap's {@code station_id} and {@code tap_id}, as
 * recorded; otherwise (or once the plan has moved the tap) the straight line from the
 * station to the tap, labelled assumed. Mitigated by an attending person. O(work points x
 * taps x control lines).
 */
public final class SensingLineWorkCheck implements HazardCheck {
    /** Name of the optional layer of control lines (read as a context layer). */
    public static final String LAYER = "control_lines";
    private static final GeometryFactory GF = new GeometryFactory();

    @Override public String code() { return "work-near-sensing-line"; }

    @Override public String description() {
        return "cut or tie-in near a sensing tap or its control line";
    }

    @Override public boolean mitigatedByAttendance() { return true; }

    @Override
    public List<Finding> check(StepContext ctx) {
        List<Finding> out = new ArrayList<>();
        if (ctx.step() == null || ctx.step().workPoints().isEmpty()) return out;
        Network net = ctx.network();
        NetworkState s = ctx.before();
        double limit = net.crs().unit().fromMetres(ctx.settings().sensingLineM());
        for (WorkPoint wp : ctx.step().workPoints()) {
            Geometry p = GF.createPoint(new Coordinate(wp.x(), wp.y()));
            for (int st = 0; st < net.stations().size(); st++) {
                if (!s.stationInService(st)) continue;
                Station station = net.stations().get(st);
                for (int t : ctx.tapsOf(station.id())) {
                    SenseTap tap = net.taps().get(t);
                    Coordinate now = tapPoint(s, t, tap);
                    boolean moved = now.distance(tapPoint(ctx.base(), t, tap)) > 1e-6;
                    if (!moved) now = tap.geometry().getCoordinate();
                    Geometry line = moved ? null : recorded(net, station.id(), tap.id());
                    boolean assumed = line == null;
                    if (assumed) line = GF.createLineString(new Coordinate[] {station.geometry().getCoordinate(), now});
                    double d = line.distance(p);
                    if (d > limit) continue;
                    out.add(Finding.hazard(code(), Severity.WARNING, ctx.stepNumber(), List.of(station.id(), tap.id(), wp.mainId()),
                            wp.x(), wp.y(),
                            String.format(Locale.ROOT, "At %s, the %s on main %s is %.1f %s from the control line of station %s%s "
                                    + "(tap %s; path %s): the work may damage it, and the station would then sense no outlet pressure and open wide.",
                                    ctx.stepLabel(), wp.kind(), wp.mainId(), d, net.crs().unit().symbol(), station.id(),
                                    TapOnDeadMainCheck.label(station), tap.id(),
                                    assumed ? "assumed straight from the station to the tap" : "as recorded in " + LAYER),
                            "Locate and mark the control line of " + station.id() + " before digging, protect it during the work, and staff the "
                                    + "station with a qualified person able to shut it down while the work is open."));
                }
            }
        }
        return out;
    }

    private static Coordinate tapPoint(NetworkState s, int t, SenseTap tap) {
        int e = s.tapEdge(t);
        return e < 0 ? tap.geometry().getCoordinate() : s.pointAt(e, s.tapMeasure(t));
    }

    /** The recorded control line of this station and tap, or null. */
    static Geometry recorded(Network net, String stationId, String tapId) {
        for (ContextLayer l : net.context()) {
            if (!l.name().equalsIgnoreCase(LAYER)) continue;
            for (ContextLayer.Item it : l.items()) {
                if (stationId.equals(it.text("station_id")) && tapId.equals(it.text("tap_id"))) return it.geometry();
            }
        }
        return null;
    }
}
