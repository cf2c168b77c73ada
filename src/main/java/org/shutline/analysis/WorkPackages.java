package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
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
 * Field work lists for shutting off or relighting a set of services, grouped by map
 * sheet and ordered along streets.
 *
 * <ul>
 * <li>Street of a service: when its address contains the name of a street of the
 *     context layer {@code streets} (any case; the longest such name), the nearest line
 *     of that name, so that a corner lot is listed on the street of its address; else
 *     the nearest line of the layer that has a {@code name} attribute (any case), by an
 *     STR-tree nearest neighbour search. Position along it: the service point projected
 *     on that line ({@link LengthIndexedLine#project}). A network without such a layer
 *     gives every service the street "" and position 0.</li>
 * <li>Order within a list: street name (case-insensitive), then the street line (in
 *     layer order), then position along it, then service id.</li>
 * <li>Packages: first one package of the critical customers (sheet {@link #CRITICAL}),
 *     then one per map sheet (the {@link SheetKey} of the service's point), sheets in
 *     name order. A service with no point goes to the sheet "(no location)".</li>
 * <li>Crews: the critical package goes to crew 1; the sheet packages, largest (meters)
 *     first, each to the crew with the fewest meters so far (lowest number on a tie):
 *     the longest-processing-time rule of list scheduling (Graham, 1969).</li>
 * </ul>
 * Cost O(s log s + s log L) for s services and L street lines, plus O(s N) address
 * matching for N distinct street names.
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

    /** One premises to visit. */
    public record Visit(String serviceId, String address, String street, double along, int meters, String critical) {}

    /** One work package: a sheet, its visits in order, its meters, the crew it is given to (1-based). */
    public record Package(String sheet, List<Visit> visits, long meters, int crew) {
        public Package {
            visits = List.copyOf(visits);
        }
    }

    /** Packages in order (critical first, then sheets by name). */
    public record Result(List<Package> packages, long[] crewMeters) {
        public Result {
            packages = List.copyOf(packages);
            crewMeters = crewMeters.clone();
        }

        @Override public long[] crewMeters() { return crewMeters.clone(); }

        /** The packages of one crew, in the order given to it. */
        public List<Package> ofCrew(int crew) {
            return packages.stream().filter(p -> p.crew() == crew).toList();
        }
    }

    private record Street(String name, int index, Geometry line) {}

    /** Named street lines: an STR-tree of all, and the lines of each name (lower case). */
    private record Streets(STRtree tree, Map<String, List<Street>> byName) {}

    private record Keyed(Visit visit, int streetIndex, String sheet) {}

    private WorkPackages() {}

    public static Result build(Network net, BitSet services, SheetKey key, int crews) {
        if (crews < 1) throw new IllegalArgumentException("crews must be at least 1");
        Streets tree = streets(net);
        List<Keyed> critical = new ArrayList<>();
        Map<String, List<Keyed>> bySheet = new TreeMap<>();
        List<Service> all = net.services();
        for (int i = services.nextSetBit(0); i >= 0; i = services.nextSetBit(i + 1)) {
            Service sv = all.get(i);
            Keyed k = keyed(sv, tree, key);
            if (sv.isCritical()) critical.add(k);
            else bySheet.computeIfAbsent(k.sheet(), x -> new ArrayList<>()).add(k);
        }
        Comparator<Keyed> order = Comparator.<Keyed, String>comparing(k -> k.visit().street().toLowerCase(Locale.ROOT))
                .thenComparingInt(Keyed::streetIndex).thenComparingDouble(k -> k.visit().along())
                .thenComparing(k -> k.visit().serviceId());
        long[] load = new long[crews];
        List<Package> out = new ArrayList<>();
        if (!critical.isEmpty()) {
            Package p = pack(CRITICAL, critical, order, 1);
            load[0] += p.meters();
            out.add(p);
        }
        List<Package> sheets = new ArrayList<>();
        for (Map.Entry<String, List<Keyed>> e : bySheet.entrySet()) sheets.add(pack(e.getKey(), e.getValue(), order, 0));
        List<Package> bySize = new ArrayList<>(sheets);
        bySize.sort(Comparator.comparingLong(Package::meters).reversed().thenComparing(Package::sheet));
        Map<String, Integer> crewOf = new HashMap<>();
        for (Package p : bySize) {
            int c = 0;
            for (int i = 1; i < crews; i++) if (load[i] < load[c]) c = i;
            load[c] += p.meters();
            crewOf.put(p.sheet(), c + 1);
        }
        for (Package p : sheets) out.add(new Package(p.sheet(), p.visits(), p.meters(), crewOf.get(p.sheet())));
        return new Result(out, load);
    }

    private static Package pack(String sheet, List<Keyed> items, Comparator<Keyed> order, int crew) {
        List<Keyed> sorted = new ArrayList<>(items);
        sorted.sort(order);
        List<Visit> visits = new ArrayList<>();
        long m = 0;
        for (Keyed k : sorted) {
            visits.add(k.visit());
            m += k.visit().meters();
        }
        return new Package(sheet, visits, m, crew);
    }

    private static Keyed keyed(Service sv, Streets tree, SheetKey key) {
        Point p = sv.geometry();
        String critical = sv.isCritical() ? (sv.critical() == null || sv.critical().isBlank() ? "critical" : sv.critical()) : "";
        if (p == null || p.isEmpty()) {
            return new Keyed(new Visit(sv.id(), sv.address(), "", 0, sv.meters(), critical), Integer.MAX_VALUE, "(no location)");
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
        return new Keyed(new Visit(sv.id(), sv.address(), street, along, sv.meters(), critical), idx, key.sheetOf(p.getX(), p.getY()));
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
