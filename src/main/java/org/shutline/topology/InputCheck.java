package org.shutline.topology;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.MultiLineString;
import org.locationtech.jts.geom.Point;
import org.shutline.model.Feature;
import org.shutline.model.Finding;
import org.shutline.model.Findings;
import org.shutline.model.Main;
import org.shutline.model.Network;
import org.shutline.model.Severity;

/**
 * First pass of {@link NetworkBuilder}: per-layer duplicate ids, empty and invalid
 * geometry, zero-length mains; numbers the systems (in order of first appearance
 * among the mains) and builds the {@link LineSet} of usable main parts.
 *
 * <p>A feature whose id repeats an earlier id of its layer is left out
 * ({@code duplicate-id}, error); the first one is kept. Blank ids are not compared.
 * A feature with null or empty geometry is left out ({@code empty-geometry}, error).
 * A main that is not a LineString or MultiLineString, or has a non-finite
 * coordinate, is left out ({@code invalid-geometry}, error); so is a point feature
 * with a non-finite coordinate. Empty parts of a MultiLineString are skipped
 * silently when other parts remain. A part whose length is zero is kept as a
 * zero-length line ({@code zero-length-main}, warning).
 */
final class InputCheck {
    final LineSet lines = new LineSet();
    /** First line of main i and one past its last line (lines of a main are contiguous). */
    final int[] mainLine0;
    final int[] mainLine1;
    final String[] systemIds;
    final int[] mainSystem;
    final boolean[] systemHasLine;
    final Map<String, Integer> systemIndex = new HashMap<>();
    final Map<String, Integer> mainById = new HashMap<>();
    final Map<String, Integer> stationById = new HashMap<>();
    final boolean[] valveOk;
    final boolean[] stationOk;
    final boolean[] tapOk;
    final boolean[] serviceOk;
    final boolean[] sourceOk;

    InputCheck(Network n, Findings out) {
        List<Main> mains = n.mains();
        mainLine0 = new int[mains.size()];
        mainLine1 = new int[mains.size()];
        mainSystem = new int[mains.size()];
        List<String> sys = new ArrayList<>();
        for (int i = 0; i < mains.size(); i++) {
            String s = key(mains.get(i).systemId());
            Integer k = systemIndex.get(s);
            if (k == null) {
                k = sys.size();
                systemIndex.put(s, k);
                sys.add(s);
            }
            mainSystem[i] = k;
        }
        systemIds = sys.toArray(new String[0]);
        systemHasLine = new boolean[systemIds.length];
        boolean[] mainOk = firstOfId(mains, FindingCodes.MAINS, out);
        long parts = 0, vertices = 0;
        for (Main m : mains) {
            Geometry g = m.geometry();
            if (g == null) continue;
            parts += g.getNumGeometries();
            vertices += g.getNumPoints();
        }
        if (parts < Integer.MAX_VALUE / 2 && vertices < Integer.MAX_VALUE / 2) lines.reserve((int) parts, (int) vertices);
        for (int i = 0; i < mains.size(); i++) {
            Main m = mains.get(i);
            if (!mainById.containsKey(key(m.id()))) mainById.put(key(m.id()), i);
            mainLine0[i] = lines.count();
            if (mainOk[i]) addMain(i, m, out);
            mainLine1[i] = lines.count();
            if (mainLine1[i] > mainLine0[i]) systemHasLine[mainSystem[i]] = true;
        }
        valveOk = points(n.valves(), FindingCodes.VALVES, out);
        stationOk = points(n.stations(), FindingCodes.STATIONS, out);
        for (int i = 0; i < n.stations().size(); i++) {
            stationById.putIfAbsent(key(n.stations().get(i).id()), i);
        }
        tapOk = points(n.taps(), FindingCodes.TAPS, out);
        serviceOk = points(n.services(), FindingCodes.SERVICES, out);
        sourceOk = points(n.sources(), FindingCodes.SOURCES, out);
    }

    static String key(String s) {
        return s == null ? "" : s;
    }

    /** System index of a system id, or -1 when no main has it. */
    int system(String id) {
        Integer k = systemIndex.get(key(id));
        return k == null ? -1 : k;
    }

    /** True when the system has at least one usable main line. */
    boolean systemUsable(int s) {
        return s >= 0 && systemHasLine[s];
    }

    private void addMain(int i, Main m, Findings out) {
        Geometry g = m.geometry();
        if (g == null || g.isEmpty()) {
            out.add(Finding.of(FindingCodes.EMPTY_GEOMETRY, Severity.ERROR, FindingCodes.MAINS,
                    "Main " + m.id() + " has no geometry; it is left out of the network.", m.id()));
            return;
        }
        List<LineString> parts = new ArrayList<>();
        if (g instanceof LineString ls) {
            parts.add(ls);
        } else if (g instanceof MultiLineString mls) {
            for (int p = 0; p < mls.getNumGeometries(); p++) parts.add((LineString) mls.getGeometryN(p));
        } else {
            Coordinate c = g.getCoordinate();
            out.add(Finding.at(FindingCodes.INVALID_GEOMETRY, Severity.ERROR, FindingCodes.MAINS, c.x, c.y,
                    "Main " + m.id() + " is a " + g.getGeometryType()
                            + ", not a line; it is left out of the network.", m.id()));
            return;
        }
        for (LineString ls : parts) {
            if (!finite(ls)) {
                out.add(Finding.of(FindingCodes.INVALID_GEOMETRY, Severity.ERROR, FindingCodes.MAINS,
                        "Main " + m.id() + " has a coordinate that is not a finite number;"
                                + " it is left out of the network.", m.id()));
                return;
            }
        }
        for (int p = 0; p < parts.size(); p++) {
            LineString ls = parts.get(p);
            if (ls.isEmpty()) continue;
            int l = lines.add(i, p, ls);
            if (lines.length(l) == 0) {
                String which = parts.size() > 1 ? "Part " + p + " of main " : "Main ";
                out.add(Finding.at(FindingCodes.ZERO_LENGTH_MAIN, Severity.WARNING, FindingCodes.MAINS,
                        lines.x(l, 0), lines.y(l, 0),
                        which + m.id() + " has zero length; it is kept as a single junction point"
                                + " that carries no valves or other point features.", m.id()));
            }
        }
    }

    private static boolean finite(Geometry g) {
        for (Coordinate c : g.getCoordinates()) {
            if (!Double.isFinite(c.x) || !Double.isFinite(c.y)) return false;
        }
        return true;
    }

    private static <F extends Feature> boolean[] firstOfId(List<F> fs, String layer, Findings out) {
        boolean[] ok = new boolean[fs.size()];
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < fs.size(); i++) {
            F f = fs.get(i);
            String id = f.id();
            ok[i] = true;
            if (id == null || id.isBlank()) continue;
            if (!seen.add(id)) {
                ok[i] = false;
                Geometry g = f.geometry();
                Coordinate c = g == null || g.isEmpty() ? null : g.getCoordinate();
                String msg = "Id " + id + " is used by more than one feature in " + layer
                        + "; this one (feature " + (i + 1) + " of the layer) is left out and the first is kept.";
                out.add(c == null
                        ? Finding.of(FindingCodes.DUPLICATE_ID, Severity.ERROR, layer, msg, id)
                        : Finding.at(FindingCodes.DUPLICATE_ID, Severity.ERROR, layer, c.x, c.y, msg, id));
            }
        }
        return ok;
    }

    private static <F extends Feature> boolean[] points(List<F> fs, String layer, Findings out) {
        boolean[] ok = firstOfId(fs, layer, out);
        for (int i = 0; i < fs.size(); i++) {
            if (!ok[i]) continue;
            Geometry g = fs.get(i).geometry();
            String id = fs.get(i).id();
            if (g == null || g.isEmpty()) {
                ok[i] = false;
                out.add(Finding.of(FindingCodes.EMPTY_GEOMETRY, Severity.ERROR, layer,
                        "Feature " + id + " in " + layer + " has no location; it is left out.", id));
            } else if (!(g instanceof Point) || !finite(g)) {
                ok[i] = false;
                out.add(Finding.of(FindingCodes.INVALID_GEOMETRY, Severity.ERROR, layer,
                        "Feature " + id + " in " + layer + " has a location that is not a finite point;"
                                + " it is left out.", id));
            }
        }
        return ok;
    }
}
