package org.shutline.trace;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * Station sheds as polygons, from a {@link FeedTrace} result: the area a station feeds,
 * the area it feeds alone, and the areas fed jointly by each set of two or more stations.
 *
 * <p>Kept simple on purpose: a shed is the JTS buffer, at distance {@code buffer} (CRS
 * units, e.g. half a typical block), of the live pipe edges concerned, so it follows the
 * mains and covers the services along them (services sit within the service tolerance of
 * their main). <em>Reach</em>: the live pipe a station's outlet reaches. <em>Alone</em>:
 * the pipe reached by that station and no other. <em>Joint</em>: pipe reached by exactly
 * the same set of two or more stations, one shed per distinct set. Pipe fed by no station
 * (the supply system itself) is in no shed.
 *
 * <p>Cost: O(edges x stations) to classify edges, plus the JTS buffers (the dominant
 * cost on large networks); meant for maps, not for hot paths.
 */
public final class StationSheds {
    private static final GeometryFactory GF = new GeometryFactory();

    private StationSheds() {}

    /** A shed fed jointly by a set of stations (indices ascending). */
    public record Joint(int[] stations, Geometry area) {
        public Joint {
            stations = stations.clone();
        }

        @Override
        public int[] stations() {
            return stations.clone();
        }
    }

    /** Per station (index order) its reach and its alone shed; the joint sheds in order of first appearance. */
    public record Result(List<Geometry> reach, List<Geometry> alone, List<Joint> joint) {
        public Result {
            reach = List.copyOf(reach);
            alone = List.copyOf(alone);
            joint = List.copyOf(joint);
        }
    }

    public static Result of(NetworkState s, FeedTrace.Result trace, double buffer) {
        List<BitSet> edges = trace.stationEdges();
        int nst = edges.size();
        List<List<Geometry>> reach = new ArrayList<>(), alone = new ArrayList<>();
        for (int i = 0; i < nst; i++) {
            reach.add(new ArrayList<>());
            alone.add(new ArrayList<>());
        }
        Map<String, int[]> jointSets = new LinkedHashMap<>();
        Map<String, List<Geometry>> jointLines = new LinkedHashMap<>();
        BitSet any = new BitSet();
        for (BitSet b : edges) any.or(b);
        int[] set = new int[nst];
        for (int e = any.nextSetBit(0); e >= 0; e = any.nextSetBit(e + 1)) {
            int c = 0;
            for (int st = 0; st < nst; st++) if (edges.get(st).get(e)) set[c++] = st;
            Geometry line = EdgeGeometry.line(s, e);
            for (int k = 0; k < c; k++) reach.get(set[k]).add(line);
            if (c == 1) {
                alone.get(set[0]).add(line);
            } else {
                int[] key = Arrays.copyOf(set, c);
                String k = Arrays.toString(key);
                jointSets.putIfAbsent(k, key);
                jointLines.computeIfAbsent(k, x -> new ArrayList<>()).add(line);
            }
        }
        List<Geometry> reachAreas = new ArrayList<>(), aloneAreas = new ArrayList<>();
        for (int st = 0; st < nst; st++) {
            reachAreas.add(area(reach.get(st), buffer));
            aloneAreas.add(area(alone.get(st), buffer));
        }
        List<Joint> joint = new ArrayList<>();
        for (Map.Entry<String, int[]> en : jointSets.entrySet()) {
            joint.add(new Joint(en.getValue(), area(jointLines.get(en.getKey()), buffer)));
        }
        return new Result(reachAreas, aloneAreas, joint);
    }

    private static Geometry area(List<Geometry> lines, double buffer) {
        if (lines.isEmpty()) return GF.createPolygon();
        return GF.buildGeometry(lines).buffer(buffer);
    }
}
