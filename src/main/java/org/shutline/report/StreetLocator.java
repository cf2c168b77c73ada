package org.shutline.report;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Lineal;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.index.strtree.STRtree;
import org.locationtech.jts.operation.distance.DistanceOp;
import org.shutline.model.ContextLayer;
import org.shutline.model.LinearUnit;

/**
 * Describes where a point is from the street layer, for field lists: "on Elder Street,
 * 35 m east of Tannery Lane".
 *
 * <p>Streets are the lines of the context layer named {@code streets} (any case) with a
 * non-blank attribute {@code name} (any case); lines of one name form one street. For a
 * point: the <em>street</em> is the named line nearest to it (ties: the name first in
 * alphabetical order), except for a point on a pipe (a main given to the locator within
 * {@link #ON_PIPE_M} metres, as a valve is): then it is the nearest named line within
 * {@link #ON_STREET_M} metres that runs along that pipe (within {@link #ALONG_DEGREES}
 * degrees of the pipe's direction there, measured square to the street's line), so a
 * valve near a corner is named on the street its main follows, not on the cross street
 * whose line happens to pass a metre away; the plain nearest line when none runs along
 * it. The <em>cross street</em> is the other named street whose
 * crossing with that street (a point where the two lines meet) is nearest to the
 * point's foot on the street. The text is
 * <ul>
 * <li>"on S, D U C of X" where D is the straight distance from the crossing to the foot,
 *     U the unit, C the compass direction (eight points, from grid north) from the
 *     crossing to the foot and X the cross street; "on S at X" when D rounds to 0;</li>
 * <li>"O U C' of S, ..." instead of "on S, ..." when the point is farther than
 *     {@link #ON_STREET_M} metres from the street (O the distance, C' the direction from
 *     the foot to the point);</li>
 * <li>"on S" when S crosses no other named street; the empty string when no street lies
 *     within {@link #SEARCH_M} metres.</li>
 * </ul>
 * Distances are whole metres in a metric CRS and whole feet in a foot CRS. Crossings are
 * found once, when the locator is built: for each pair of streets whose envelopes meet,
 * the intersection of their lines (O(pairs x vertices)); a query is a nearest-neighbour
 * search in an STR tree plus a scan of the street's crossings. No AWT: usable by any
 * layer from {@code report} up.
 */
public final class StreetLocator {
    /** A point within this many metres of the street centre line is "on" it. */
    public static final double ON_STREET_M = 15;
    /** Streets farther than this many metres are not used. */
    public static final double SEARCH_M = 500;
    /** A point within this many metres of a main lies on it (valves lie on their mains). */
    public static final double ON_PIPE_M = 0.5;
    /** A street runs along a pipe when their directions differ by at most this many degrees. */
    public static final double ALONG_DEGREES = 30;
    private static final String[] COMPASS = {"north", "north-east", "east", "south-east", "south", "south-west",
        "west", "north-west"};

    private record Piece(String name, Geometry line) {}

    private final STRtree tree = new STRtree();
    private final STRtree pipes = new STRtree();
    private final Map<String, Geometry> streets = new TreeMap<>();
    private final Map<String, List<Crossing>> crossings = new HashMap<>();
    private final LinearUnit unit;
    private final GeometryFactory gf = new GeometryFactory();

    private record Crossing(String other, Coordinate at) {}

    /** A locator over the {@code streets} layer among {@code context} (none: every description is empty). */
    public StreetLocator(List<ContextLayer> context, LinearUnit unit) {
        this(context, unit, List.of());
    }

    /** As {@link #StreetLocator(List, LinearUnit)}, with the mains' lines: a point on one is named on the street it runs along. */
    public StreetLocator(List<ContextLayer> context, LinearUnit unit, List<? extends Geometry> mains) {
        this.unit = unit;
        for (Geometry g : mains) if (g != null && !g.isEmpty() && g instanceof Lineal) pipes.insert(g.getEnvelopeInternal(), g);
        pipes.build();
        Map<String, List<Geometry>> byName = new TreeMap<>();
        for (ContextLayer layer : context) {
            if (!layer.name().equalsIgnoreCase("streets")) continue;
            for (ContextLayer.Item item : layer.items()) {
                String name = nameOf(item);
                Geometry g = item.geometry();
                if (name == null || g == null || g.isEmpty() || !(g instanceof Lineal)) continue;
                byName.computeIfAbsent(name, k -> new ArrayList<>()).add(g);
                tree.insert(g.getEnvelopeInternal(), new Piece(name, g));
            }
        }
        tree.build();
        byName.forEach((n, gs) -> streets.put(n, gf.buildGeometry(gs)));
        findCrossings();
    }

    private static String nameOf(ContextLayer.Item item) {
        for (Map.Entry<String, Object> e : item.attributes().entrySet()) {
            if (e.getKey().equalsIgnoreCase("name") && e.getValue() != null && !e.getValue().toString().isBlank()) {
                return e.getValue().toString().trim();
            }
        }
        return null;
    }

    private void findCrossings() {
        List<String> names = new ArrayList<>(streets.keySet());
        for (String n : names) crossings.put(n, new ArrayList<>());
        for (int i = 0; i < names.size(); i++) {
            Geometry a = streets.get(names.get(i));
            for (int j = i + 1; j < names.size(); j++) {
                Geometry b = streets.get(names.get(j));
                if (!a.getEnvelopeInternal().intersects(b.getEnvelopeInternal()) || !a.intersects(b)) continue;
                Geometry x = a.intersection(b);
                for (Coordinate c : x.getCoordinates()) {
                    crossings.get(names.get(i)).add(new Crossing(names.get(j), c));
                    crossings.get(names.get(j)).add(new Crossing(names.get(i), c));
                }
            }
        }
    }

    /** Number of named streets found. */
    public int streetCount() {
        return streets.size();
    }

    /** The description of point (x, y) in the network CRS; empty when no street is near. */
    public String describe(double x, double y) {
        if (tree.isEmpty()) return "";
        Point p = gf.createPoint(new Coordinate(x, y));
        double search = unit.fromMetres(SEARCH_M);
        Envelope env = new Envelope(x - search, x + search, y - search, y + search);
        String best = null;
        double bestD = Double.POSITIVE_INFINITY;
        double[] along = pipeDirection(p);
        double onStreet = unit.fromMetres(ON_STREET_M);
        double cosMax = Math.cos(Math.toRadians(ALONG_DEGREES));
        for (Object o : tree.query(env)) {
            Piece piece = (Piece) o;
            double d = piece.line().distance(p);
            if (along != null) {
                double[] dir = direction(piece.line(), p);
                if (d > onStreet || dir == null || Math.abs(dir[0] * along[0] + dir[1] * along[1]) < cosMax) continue;
            }
            if (d < bestD || (d == bestD && best != null && piece.name().compareTo(best) < 0)) {
                bestD = d;
                best = piece.name();
            }
        }
        if (best == null && along != null) {
            for (Object o : tree.query(env)) {
                Piece piece = (Piece) o;
                double d = piece.line().distance(p);
                if (d < bestD || (d == bestD && best != null && piece.name().compareTo(best) < 0)) {
                    bestD = d;
                    best = piece.name();
                }
            }
        }
        if (best == null || bestD > search) return "";
        Coordinate foot = DistanceOp.nearestPoints(streets.get(best), p)[0];
        StringBuilder sb = new StringBuilder();
        if (unit.toMetres(bestD) > ON_STREET_M) {
            sb.append(length(bestD)).append(' ').append(direction(foot, p.getCoordinate())).append(" of ").append(best);
        } else {
            sb.append("on ").append(best);
        }
        Crossing near = null;
        double nearD = Double.POSITIVE_INFINITY;
        for (Crossing c : crossings.get(best)) {
            double d = c.at().distance(foot);
            if (d < nearD || (d == nearD && near != null && c.other().compareTo(near.other()) < 0)) {
                nearD = d;
                near = c;
            }
        }
        if (near == null) return sb.toString();
        long rounded = Math.round(toUnit(nearD));
        if (rounded == 0) return sb.append(" at ").append(near.other()).toString();
        return sb.append(", ").append(length(nearD)).append(' ').append(direction(near.at(), foot))
                .append(" of ").append(near.other()).toString();
    }

    /** The unit direction of the main the point lies on (within {@link #ON_PIPE_M}), or null. */
    private double[] pipeDirection(Point p) {
        if (pipes.isEmpty()) return null;
        double r = unit.fromMetres(ON_PIPE_M);
        Envelope env = new Envelope(p.getX() - r, p.getX() + r, p.getY() - r, p.getY() + r);
        Geometry best = null;
        double bestD = Double.POSITIVE_INFINITY;
        for (Object o : pipes.query(env)) {
            Geometry g = (Geometry) o;
            double d = g.distance(p);
            if (d <= r && d < bestD) {
                bestD = d;
                best = g;
            }
        }
        return best == null ? null : direction(best, p);
    }

    /** The unit direction of the segment of a line nearest the point (first of equals), or null for a line without length. */
    static double[] direction(Geometry line, Point p) {
        double best = Double.POSITIVE_INFINITY;
        double[] out = null;
        Coordinate c = p.getCoordinate();
        for (int i = 0; i < line.getNumGeometries(); i++) {
            Coordinate[] cs = line.getGeometryN(i).getCoordinates();
            for (int k = 0; k + 1 < cs.length; k++) {
                double len = cs[k].distance(cs[k + 1]);
                if (len == 0) continue;
                double d = org.locationtech.jts.algorithm.Distance.pointToSegment(c, cs[k], cs[k + 1]);
                if (d < best) {
                    best = d;
                    out = new double[] {(cs[k + 1].x - cs[k].x) / len, (cs[k + 1].y - cs[k].y) / len};
                }
            }
        }
        return out;
    }

    private double toUnit(double crsDistance) {
        double m = unit.toMetres(crsDistance);
        return unit == LinearUnit.METRE ? m : m / LinearUnit.INTERNATIONAL_FOOT.metres();
    }

    private String length(double crsDistance) {
        return String.format(Locale.ROOT, "%d %s", Math.round(toUnit(crsDistance)), unit == LinearUnit.METRE ? "m" : "ft");
    }

    /** The eight-point compass direction from a to b, grid north up. */
    static String direction(Coordinate a, Coordinate b) {
        double angle = Math.toDegrees(Math.atan2(b.x - a.x, b.y - a.y));
        int sector = (int) Math.floorMod(Math.round(angle / 45.0), 8L);
        return COMPASS[sector];
    }
}
