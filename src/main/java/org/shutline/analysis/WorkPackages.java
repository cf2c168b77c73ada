package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.index.strtree.ItemBoundable;
import org.locationtech.jts.index.strtree.ItemDistance;
import org.locationtech.jts.index.strtree.STRtree;
import org.locationtech.jts.linearref.LengthIndexedLine;
import org.shutline.model.ContextLayer;
import org.shutline.model.Network;
import org.shutline.model.Service;

/**
 * Shut-off work packages: one per crew, balanced by technician-hours, each a run of
 * neighbouring premises along streets, critical customers first in each.
 *
 * <ul>
 * <li>Street of a service: when its address contains the name of a street of the
 *     context layer {@code streets} (any case; the longest such name), the nearest line
 *     of that name, so that a corner lot is listed on the street of its address; else
 *     the nearest line of the layer that has a {@code name} attribute (any case), by an
 *     STR-tree nearest neighbour search. Position along it: the service point projected
 *     on that line ({@link LengthIndexedLine#project}). A network without such a layer
 *     gives every service the street "" and position 0.</li>
 * <li>One walking order over all services: map sheet (the {@link SheetKey} of the
 *     service's point, for example the 1 km US National Grid square; "(no location)"
 *     without a point), then street name (case-insensitive), street line (layer order),
 *     position along it, service id. A <em>run</em> is a stretch of one street on one
 *     sheet.</li>
 * <li>Packages are consecutive pieces of that order, so each keeps to its grid squares
 *     and streets. Package hours = meters / (shut-offs per technician-hour x
 *     technicians per crew).
 *     <ul>
 *     <li>Crews computed from the target: every package at most the target hours
 *         (target x meters per crew-hour, in whole meters). The number of packages is
 *         the fewest that do it (greedy filling of consecutive pieces is optimal for
 *         this); it is the sizing's crew count unless the premises do not divide
 *         evenly, when it is more ({@link Result#extraCrews()}) and says so. A single
 *         premises larger than the target gets a package of its own, over the target
 *         ({@link Result#overTarget()}).</li>
 *     <li>Crews given: exactly that many packages (fewer only when there are fewer
 *         premises), with the largest package as small as consecutive pieces allow
 *         (binary search on the meters of the largest, greedy check: the linear
 *         partition problem).</li>
 *     </ul>
 *     Where a package ends is chosen, among the ends that keep every later package
 *     within that size, at the end of a run when one is allowed (the street is kept
 *     whole), as near as possible to an equal share of what is left.</li>
 * <li>Within a package: its critical customers first (in walking order), then the
 *     rest in walking order. Crew k gets package k.</li>
 * </ul>
 * Cost O(s log s + s log L + s log M) for s services, L street lines and M meters,
 * plus O(s N) address matching for N distinct street names.
 */
public final class WorkPackages {
    /** The sheet of the critical customers' package. */
    public static final String CRITICAL = "critical customers first";

    /** The map sheet of a point of the network CRS (for example the 1 km US National Grid square). */
    @FunctionalInterface
    public interface SheetKey {
        String sheetOf(double x, double y);

        SheetKey NONE = (x, y) -> "all";
    }

    /** One premises to visit; {@code sheet} is its map sheet. */
    public record Visit(String serviceId, String address, String street, double along, int meters, String critical, String sheet) {}

    /** One work package: the crew (1-based), the sheets it covers (in walking order), its visits in order, its meters and technician-hours shared by the crew's technicians (hours). */
    public record Package(int crew, List<String> sheets, List<Visit> visits, long meters, double hours) {
        public Package {
            sheets = List.copyOf(sheets);
            visits = List.copyOf(visits);
        }

        /** The sheets as one label: "15T WJ 12 90" or "15T WJ 12 89, 15T WJ 12 90". */
        public String sheet() {
            return String.join(", ", sheets);
        }

        /** The streets of the package in walking order, each once ("" left out). */
        public List<String> streets() {
            java.util.LinkedHashSet<String> out = new java.util.LinkedHashSet<>();
            for (Visit v : visits) if (!v.street().isEmpty()) out.add(v.street());
            return List.copyOf(out);
        }

        /** Critical customers in the package. */
        public int criticalCount() {
            int n = 0;
            for (Visit v : visits) if (!v.critical().isEmpty()) n++;
            return n;
        }
    }

    /**
     * Packages in crew order; {@code crewsComputed} when the crew count came from the
     * target; {@code targetHours} the target; {@code extraCrews} crews beyond the
     * sizing's count that the packing needed; {@code overTarget} packages over the target
     * (a single premises larger than it).
     */
    public record Result(List<Package> packages, boolean crewsComputed, double targetHours, int extraCrews, int overTarget) {
        public Result {
            packages = List.copyOf(packages);
        }

        /** Meters per crew (index crew - 1). */
        public long[] crewMeters() {
            long[] m = new long[packages.size()];
            for (int i = 0; i < m.length; i++) m[i] = packages.get(i).meters();
            return m;
        }

        /** The longest package in hours (0 when none). */
        public double maxHours() {
            double h = 0;
            for (Package p : packages) h = Math.max(h, p.hours());
            return h;
        }

        /** The packages of one crew (one, or none). */
        public List<Package> ofCrew(int crew) {
            return packages.stream().filter(p -> p.crew() == crew).toList();
        }
    }

    private record Street(String name, int index, Geometry line) {}

    /** Named street lines: an STR-tree of all, and the lines of each name (lower case). */
    private record Streets(STRtree tree, Map<String, List<Street>> byName) {}

    private record Keyed(Visit visit, int streetIndex, String sheet) {}

    private WorkPackages() {}

    /** {@code crews} given crews at the default rates (4 h target, used only for the hours). */
    public static Result build(Network net, BitSet services, SheetKey key, int crews) {
        ResponseSettings s = ResponseSettings.DEFAULT.withCrews(crews);
        return build(net, services, key, crews, false, s);
    }

    /**
     * @param crews the crews in use: given, or (with {@code computed}) the sizing's count from the target
     * @param computed whether the crews were computed from {@code settings.targetHours()}
     */
    public static Result build(Network net, BitSet services, SheetKey key, int crews, boolean computed, ResponseSettings settings) {
        if (crews < 1) throw new IllegalArgumentException("crews must be at least 1");
        Streets tree = streets(net);
        List<Keyed> items = new ArrayList<>();
        List<Service> all = net.services();
        for (int i = services.nextSetBit(0); i >= 0; i = services.nextSetBit(i + 1)) items.add(keyed(all.get(i), tree, key));
        items.sort(Comparator.comparing(Keyed::sheet).thenComparing(k -> k.visit().street().toLowerCase(Locale.ROOT))
                .thenComparingInt(Keyed::streetIndex).thenComparingDouble(k -> k.visit().along())
                .thenComparing(k -> k.visit().serviceId()));
        int n = items.size();
        double perHour = settings.metersPerCrewHour();
        if (n == 0) return new Result(List.of(), computed, settings.targetHours(), 0, 0);
        long[] m = new long[n];
        boolean[] runEnd = new boolean[n];
        long biggest = 0, total = 0;
        for (int i = 0; i < n; i++) {
            m[i] = items.get(i).visit().meters();
            biggest = Math.max(biggest, m[i]);
            total += m[i];
            runEnd[i] = i == n - 1 || !sameRun(items.get(i), items.get(i + 1));
        }
        long cap;
        int k;
        int extra = 0;
        if (computed) {
            long target = (long) Math.floor(settings.targetHours() * perHour + 1e-9);
            long c = Math.max(target, biggest);
            k = Math.max(count(m, c), 1);
            extra = Math.max(0, k - crews);
            k = Math.max(k, Math.min(crews, n));
            cap = smallestCap(m, k, biggest, c);
        } else {
            k = Math.min(crews, n);
            cap = smallestCap(m, k, biggest, total);
        }
        int[] need = need(m, cap);
        List<Package> out = new ArrayList<>();
        int i = 0;
        long left = total;
        for (int c = 0; c < k && i < n; c++) {
            int rest = k - c - 1;
            int end = cutAfter(m, runEnd, need, i, cap, rest, (double) left / (rest + 1));
            List<Keyed> piece = items.subList(i, end + 1);
            Package p = pack(c + 1, piece, perHour);
            out.add(p);
            left -= p.meters();
            i = end + 1;
        }
        int over = 0;
        for (Package p : out) if (p.hours() > settings.targetHours() + 1e-9) over++;
        return new Result(out, computed, settings.targetHours(), extra, over);
    }

    private static boolean sameRun(Keyed a, Keyed b) {
        return a.sheet().equals(b.sheet()) && a.streetIndex() == b.streetIndex() && a.visit().street().equals(b.visit().street());
    }

    /** Fewest consecutive pieces of at most {@code cap} meters (each item at most cap). */
    static int count(long[] m, long cap) {
        int pieces = 0;
        long sum = 0;
        for (int i = 0; i < m.length; i++) {
            if (i == 0 || sum + m[i] > cap) {
                pieces++;
                sum = 0;
            }
            sum += m[i];
        }
        return pieces;
    }

    /** The smallest cap in [lo, hi] with at most k pieces (hi must allow it). */
    static long smallestCap(long[] m, int k, long lo, long hi) {
        while (lo < hi) {
            long mid = lo + (hi - lo) / 2;
            if (count(m, mid) <= k) hi = mid;
            else lo = mid + 1;
        }
        return lo;
    }

    /** need[i] = fewest pieces of at most cap for items i..n-1 (need[n] = 0), by greedy from the back with two pointers. */
    static int[] need(long[] m, long cap) {
        int n = m.length;
        int[] need = new int[n + 1];
        // far[i]: the last item of the greedy piece starting at i
        int j = -1;
        long sum = 0;
        int[] far = new int[n];
        for (int i = 0; i < n; i++) {
            if (j < i) {
                j = i;
                sum = m[i];
            }
            while (j + 1 < n && sum + m[j + 1] <= cap) sum += m[++j];
            far[i] = j;
            sum -= m[i];
        }
        for (int i = n - 1; i >= 0; i--) need[i] = 1 + need[far[i] + 1];
        return need;
    }

    /**
     * The last item of the piece that starts at {@code i}: among ends whose piece is within
     * cap and whose remainder fits {@code rest} pieces, a run end nearest the share, else
     * any end nearest the share.
     */
    private static int cutAfter(long[] m, boolean[] runEnd, int[] need, int i, long cap, int rest, double share) {
        int n = m.length;
        if (rest == 0) return n - 1;
        int bestRun = -1, bestAny = -1;
        double dRun = Double.POSITIVE_INFINITY, dAny = Double.POSITIVE_INFINITY;
        long sum = 0;
        for (int e = i; e < n; e++) {
            sum += m[e];
            if (sum > cap || n - 1 - e < rest) break;
            if (need[e + 1] > rest) continue;
            double d = Math.abs(sum - share);
            if (d < dAny) {
                dAny = d;
                bestAny = e;
            }
            if (runEnd[e] && d < dRun) {
                dRun = d;
                bestRun = e;
            }
        }
        if (bestRun >= 0) return bestRun;
        if (bestAny >= 0) return bestAny;
        return i;
    }

    private static Package pack(int crew, List<Keyed> items, double perHour) {
        List<Visit> critical = new ArrayList<>(), rest = new ArrayList<>();
        List<String> sheets = new ArrayList<>();
        long m = 0;
        for (Keyed k : items) {
            (k.visit().critical().isEmpty() ? rest : critical).add(k.visit());
            if (sheets.isEmpty() || !sheets.get(sheets.size() - 1).equals(k.sheet())) sheets.add(k.sheet());
            m += k.visit().meters();
        }
        List<Visit> visits = new ArrayList<>(critical);
        visits.addAll(rest);
        return new Package(crew, sheets, visits, m, m / perHour);
    }

    private static Keyed keyed(Service sv, Streets tree, SheetKey key) {
        Point p = sv.geometry();
        String critical = sv.isCritical() ? (sv.critical() == null || sv.critical().isBlank() ? "critical" : sv.critical()) : "";
        if (p == null || p.isEmpty()) {
            return new Keyed(new Visit(sv.id(), sv.address(), "", 0, sv.meters(), critical, "(no location)"), Integer.MAX_VALUE, "(no location)");
        }
        String street = "";
        double along = 0;
        int idx = Integer.MAX_VALUE;
        if (tree != null) {
            Street st = byAddress(tree, sv.address(), p);
            if (st == null) st = (Street) tree.tree().nearestNeighbour(p.getEnvelopeInternal(), p, DISTANCE);
            if (st != null) {
                street = st.name();
                idx = st.index();
                along = new LengthIndexedLine(st.line()).project(new Coordinate(p.getX(), p.getY()));
            }
        }
        String sheet = key.sheetOf(p.getX(), p.getY());
        return new Keyed(new Visit(sv.id(), sv.address(), street, along, sv.meters(), critical, sheet), idx, sheet);
    }

    private static final ItemDistance DISTANCE = (ItemBoundable a, ItemBoundable b) -> {
        Geometry ga = a.getItem() instanceof Street s ? s.line() : (Geometry) a.getItem();
        Geometry gb = b.getItem() instanceof Street s ? s.line() : (Geometry) b.getItem();
        return ga.distance(gb);
    };

    /** The nearest line of the longest street name the address contains, or null. */
    private static Street byAddress(Streets streets, String address, Point p) {
        if (address == null || address.isBlank()) return null;
        String a = address.toLowerCase(Locale.ROOT);
        String best = null;
        for (String name : streets.byName().keySet()) {
            if (a.contains(name) && (best == null || name.length() > best.length())) best = name;
        }
        if (best == null) return null;
        Street near = null;
        double d = Double.POSITIVE_INFINITY;
        for (Street s : streets.byName().get(best)) {
            double x = s.line().distance(p);
            if (x < d) {
                d = x;
                near = s;
            }
        }
        return near;
    }

    /** Named street lines, or null when the network has none. */
    private static Streets streets(Network net) {
        STRtree tree = null;
        Map<String, List<Street>> byName = new HashMap<>();
        int index = 0;
        for (ContextLayer layer : net.context()) {
            if (!layer.name().equalsIgnoreCase("streets")) continue;
            for (ContextLayer.Item item : layer.items()) {
                String name = nameOf(item);
                Geometry g = item.geometry();
                if (name == null || g == null || g.isEmpty() || g.getDimension() != 1) continue;
                if (tree == null) tree = new STRtree();
                Street st = new Street(name, index++, g);
                tree.insert(g.getEnvelopeInternal(), st);
                byName.computeIfAbsent(name.toLowerCase(Locale.ROOT), k -> new ArrayList<>()).add(st);
            }
        }
        return tree == null ? null : new Streets(tree, byName);
    }

    private static String nameOf(ContextLayer.Item item) {
        for (Map.Entry<String, Object> e : item.attributes().entrySet()) {
            if (e.getKey().equalsIgnoreCase("name") && e.getValue() != null && !e.getValue().toString().isBlank()) {
                return e.getValue().toString();
            }
        }
        return null;
    }
}
