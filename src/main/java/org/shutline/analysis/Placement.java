package org.shutline.analysis;

import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.operation.distance.DistanceOp;
import org.shutline.model.LinearUnit;
import org.shutline.trace.EdgeGeometry;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * Places a location given by a person (a point typed or clicked, a grid reference's
 * centre, a service's address, a main id) on the active pipe of a network, or refuses
 * it. Every command and the window place incident points through this class, so they
 * accept and refuse the same places.
 *
 * <p>Rule. A point is placed on the nearest active main (of the given pressure system
 * when one is named; exact distance ties to the lower main id), at the point of that
 * main's pipe edge nearest to it, when that distance is at most the limit (default
 * {@value #DEFAULT_MAX_DISTANCE_M} m, common practice: about one street block, so a
 * point is never silently moved to another street's pipe far away). A point farther
 * than the limit from every active main is refused with the distance to the nearest
 * active main and the extent of the network's active mains; a non-finite coordinate
 * (NaN, infinity) is refused as such. A service is placed where it is attached to its
 * main (its valve segment is the incident's), refused when it is not attached to
 * active pipe. A main is refused when the network has no main with that id or none of
 * its pipe is active.
 *
 * <p>Cost: building the edge index is O(E log E) once; a point costs O(log E + k) for
 * the k edges near it (growing-square search, see {@link EdgeIndex#nearestHit}), which
 * ends for every finite input.
 */
public final class Placement {
    /** Default refusal distance in metres (common practice; an option of the commands). */
    public static final double DEFAULT_MAX_DISTANCE_M = 100;

    private static final GeometryFactory GF = new GeometryFactory();

    /** The outcome: placed on a main, or refused with a plain reason. */
    public sealed interface Result permits Placed, Refused {}

    /**
     * A placed location: the point given (x, y), the pipe edge and valve segment it was
     * placed on, that main's id and pressure system, the point on the pipe (snapped x,
     * y), and the distance moved in CRS units and in metres. {@code edge} is -1 for a
     * whole main (then the snapped point is NaN and the distance 0).
     */
    public record Placed(double x, double y, int edge, int segment, String mainId, String systemId,
                         double snappedX, double snappedY, double distance, double distanceM) implements Result {
        /** The zone to isolate: the valve segment placed on, or the whole main when a main was named. */
        public Zone zone() {
            return edge < 0 ? Zone.main(mainId) : new Zone.OfSegments(new int[] {segment});
        }

        /** For example "on main M-LP-012 (LP-NORTH), moved 2.9 m" (a whole main: "on main M-LP-012 (LP-NORTH)"). */
        public String describe() {
            String on = "on main " + mainId + (systemId == null ? "" : " (" + systemId + ")");
            return edge < 0 ? on : on + ", moved " + metres(distanceM);
        }
    }

    /**
     * A refused location: the reason (a sentence naming the distance and the network's
     * extent where there is one), the distance in metres to the nearest active main (NaN
     * when there is none or the point is not finite) and the extent of the active mains
     * (a null envelope when there are none).
     */
    public record Refused(String reason, double nearestM, Envelope extent) implements Result {
        public Refused {
            extent = new Envelope(extent);
        }

        @Override
        public Envelope extent() {
            return new Envelope(extent);
        }
    }

    private final ValveSegments segs;
    private final NetworkState s;
    private final EdgeIndex index;
    private final LinearUnit unit;

    /** Places on the active pipe of these valve segments; builds the edge index (O(E log E)). */
    public Placement(ValveSegments segs) {
        this.segs = segs;
        this.s = segs.state();
        this.index = new EdgeIndex(segs);
        this.unit = s.network().crs().unit();
    }

    /** The extent of the active mains (CRS units; a null envelope when there are none). */
    public Envelope extent() {
        return index.extent();
    }

    /**
     * Places (x, y) in the network CRS on the nearest active main of {@code systemId}
     * (any system when null), or refuses it when it is not finite or farther than
     * {@code maxDistanceM} metres from every such main.
     *
     * @throws IllegalArgumentException when {@code maxDistanceM} is not a positive finite number
     */
    public Result point(double x, double y, String systemId, double maxDistanceM) {
        checkLimit(maxDistanceM);
        Envelope ext = index.extent();
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            return new Refused("the point " + coord(x) + "," + coord(y) + " is not a finite position", Double.NaN, ext);
        }
        if (systemId != null && s.graph().systemIndex(systemId) < 0) {
            return new Refused("the network has no pressure system '" + systemId + "'", Double.NaN, ext);
        }
        EdgeIndex.Hit hit = index.nearestHit(x, y, systemId);
        String where = String.format(Locale.ROOT, "the point %.1f,%.1f", x, y);
        String sys = systemId == null ? "" : " of system " + systemId;
        if (hit.edge() < 0) {
            return new Refused(where + ": the network has no active main" + sys, Double.NaN, ext);
        }
        int e = hit.edge();
        double dM = unit.toMetres(hit.distance());
        int main = s.edgeFeature(e);
        if (dM > maxDistanceM) {
            return new Refused(where + " is " + metres(dM) + " from the nearest active main" + sys + " (" + s.mainId(main)
                    + "), farther than the limit of " + metres(maxDistanceM) + "; " + extentText(ext), dM, ext);
        }
        Coordinate snap = snapped(e, x, y);
        return new Placed(x, y, e, segs.edgeSegment(e), s.mainId(main), systemOfMain(main), snap.x, snap.y,
                hit.distance(), dM);
    }

    /** Places service {@code service} (index in the network) where it is attached to active pipe, or refuses it. */
    public Result service(int service) {
        var svc = s.network().services().get(service);
        int seg = segs.serviceSegment(service);
        int e = s.serviceEdge(service);
        if (seg < 0 || e < 0) {
            return new Refused("service " + svc.id() + " is not attached to active pipe", Double.NaN, index.extent());
        }
        Coordinate at = s.pointAt(e, s.serviceMeasure(service));
        double x = svc.geometry() == null ? at.x : svc.geometry().getX();
        double y = svc.geometry() == null ? at.y : svc.geometry().getY();
        double d = Math.hypot(at.x - x, at.y - y);
        int main = s.edgeFeature(e);
        return new Placed(x, y, e, seg, s.mainId(main), systemOfMain(main), at.x, at.y, d, unit.toMetres(d));
    }

    /** Places a whole main by id, or refuses it when the network has no such main or none of its pipe is active. */
    public Result main(String mainId) {
        int found = -1;
        for (int i = 0; i < s.mainCount(); i++) {
            if (s.mainId(i).equals(mainId)) {
                found = i;
                break;
            }
        }
        if (found < 0) return new Refused("the network has no main with id '" + mainId + "'", Double.NaN, index.extent());
        for (int e = 0; e < s.edgeCount(); e++) {
            if (segs.edgeSegment(e) >= 0 && s.mainId(s.edgeFeature(e)).equals(mainId)) {
                return new Placed(Double.NaN, Double.NaN, -1, segs.edgeSegment(e), mainId, systemOfMain(found),
                        Double.NaN, Double.NaN, 0, 0);
            }
        }
        return new Refused("main " + mainId + " has no active pipe (it is " + s.mainStatus(found).name().toLowerCase(Locale.ROOT)
                + " or not connected)", Double.NaN, index.extent());
    }

    /** "the network's active mains span x 511 997 to 513 503, y 4 889 997 to 4 891 103" in CRS units. */
    public String extentText(Envelope ext) {
        if (ext.isNull()) return "the network has no active mains";
        String u = unit.symbol();
        return String.format(Locale.ROOT, "the network's active mains span x %.0f to %.0f, y %.0f to %.0f (%s)",
                ext.getMinX(), ext.getMaxX(), ext.getMinY(), ext.getMaxY(), u);
    }

    /** A distance in metres as people read it: "2.9 m", "87 m", "86.5 km". */
    public static String metres(double m) {
        if (!Double.isFinite(m)) return "an unknown distance";
        if (m < 10) return String.format(Locale.ROOT, "%.1f m", m);
        if (m < 10_000) return String.format(Locale.ROOT, "%.0f m", m);
        return String.format(Locale.ROOT, "%.1f km", m / 1000);
    }

    /** @throws IllegalArgumentException unless {@code m} is a positive finite number of metres */
    public static void checkLimit(double m) {
        if (!(m > 0) || !Double.isFinite(m)) {
            throw new IllegalArgumentException("the refusal distance must be a positive number of metres: " + m);
        }
    }

    private Coordinate snapped(int e, double x, double y) {
        Geometry g = EdgeGeometry.line(s, e);
        if (g == null) return new Coordinate(s.nodeX(s.edgeFrom(e)), s.nodeY(s.edgeFrom(e)));
        return DistanceOp.nearestPoints(g, GF.createPoint(new Coordinate(x, y)))[0];
    }

    private String systemOfMain(int main) {
        int sys = s.mainSystem(main);
        return sys < 0 ? null : s.graph().systemId(sys);
    }

    private static String coord(double v) {
        return Double.isNaN(v) ? "NaN" : Double.isInfinite(v) ? (v > 0 ? "Infinity" : "-Infinity") : String.format(Locale.ROOT, "%.1f", v);
    }
}
