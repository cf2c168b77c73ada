package org.shutline.io.sample;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.linearref.LengthIndexedLine;
import org.shutline.model.ContextLayer;
import org.shutline.model.CrsInfo;
import org.shutline.model.LinearUnit;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.TapDevice;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;

/**
 * The invented sample town of Tallowmere, generated deterministically from a seed
 * (the shipped files use {@link #DEFAULT_SEED}). The layout is fixed; the seed decides
 * service counts, positions along the street, customer classes, which mains carry
 * valves, valve states and inspection dates.
 *
 * <pre>
 *   row 11 +--+--+--+ ... +--+   LP-NORTH (rows 7..11, all 16 columns), fed by
 *          |  |  |  |     |  |   ST-N1 (column 3) and ST-N2 (column 12): a grid
 *   row 7  +--+--+--+ ... +--+
 *             N1             N2
 *   SRC-W ==IP-1 along row 6==========================  (IP-1, 400 kPa)
 *          S1 (column 5)     ||  E1 (row 2)
 *   row 5  +--+--+ .. +      ||      +--+--+--+--+
 *          LP-SOUTH          ||      LP-EAST
 *          (cols 0..9)       ||      (cols 11..15)
 *   row 0  +--+--+ .. +      ||      +--+--+--+--+
 *                          SRC-S
 * </pre>
 *
 * Streets run every 100 m ({@link #BLOCK}); low-pressure mains lie 3 m north/east of
 * the street centre line, IP-1 mains 3 m south/west, and mains join end to end at
 * street intersections (a few ends are off by up to 0.3 m, inside the 0.5 m snap).
 * Each station point is the end of its outlet stub main and 1.5 m from the IP-1
 * main; its inlet valve (kind {@code station}) is on IP-1, 1.8 m away.
 *
 * <p>Deliberate features for the plan and the check (ids as constants here):
 * the 1952 cast-iron main {@link #CAST_IRON_MAIN} in LP-SOUTH with the proposed
 * parallel {@link #PROPOSED_MAIN} 4 m south; ST-S1's only sensing tap on the cast-iron
 * main; ST-N2 with one tap serving worker and monitor; ST-S1 without monitor or
 * relief; and the data flaws {@link #NEAR_MISS_MAIN} (end 1.2 m short),
 * {@link #FAR_SERVICE} (90 m from any main, no main_id), {@link #OFF_MAIN_VALVE}
 * (5 m off its main), {@link #DUPLICATE_VALVE_ID} (two valves), {@link #MISSPELT_MAIN}
 * (status "actve") and {@link #CROSSING_MAIN} (crosses a main mid-block with no
 * junction).
 */
public final class SampleTown {
    public static final long DEFAULT_SEED = 1952;
    public static final String NAME = "tallowmere";
    public static final CrsInfo CRS = new CrsInfo("WGS 84 / UTM zone 15N", 32615,
        "+proj=utm +zone=15 +datum=WGS84 +units=m +no_defs", LinearUnit.METRE);
    /** The date the valve inspection dates are drawn against (overdue: before 2025-09-01). */
    public static final LocalDate AS_OF = LocalDate.of(2026, 12, 1);
    public static final double BLOCK = 100;
    public static final String CAST_IRON_MAIN = "M-CI-01";
    public static final String PROPOSED_MAIN = "M-PR-01";
    public static final String NEAR_MISS_MAIN = "M-E-NM";
    public static final String CROSSING_MAIN = "M-N-ALLEY";
    public static final String MISSPELT_MAIN = "M-N-0001";
    public static final String FAR_SERVICE = "SV-FAR";
    public static final String OFF_MAIN_VALVE = "V-OFF";
    public static final String DUPLICATE_VALVE_ID = "V-017";

    static final double X0 = 512000;
    static final double Y0 = 4890000;
    static final int COLS = 16;
    static final int ROWS = 12;
    static final double LP_OFF = 3;
    static final double IP_OFF = -3;
    static final double LP_KPA = 1.74; // 7 in w.c. (NIST SP 811: 7 x 249.0889 Pa)
    /** MAOP of low-pressure mains: 0.5 psi = 14 in w.c. = 3.45 kPa, the usual low-pressure ceiling (trade-facts.md). */
    static final double LP_MAOP = 3.45;

    private static final String[] EAST_WEST = {"Alder Row", "Birch Street", "Cedar Walk", "Damson Road",
        "Elder Street", "Fennel Way", "Gorse Avenue", "Hazel Row", "Juniper Street", "Larch Road", "Medlar Way",
        "Nettle Row"};
    private static final String[] NORTH_SOUTH = {"Quarry Lane", "Kiln Street", "Millrace Road", "Tannery Lane",
        "Cooper Street", "Weir Lane", "Forge Road", "Saddler Street", "Chandler Lane", "Wheelwright Road",
        "Ropewalk", "Thatcher Lane", "Glassworks Road", "Brickfield Lane", "Limeburner Road", "Tinsmith Street"};

    private final Random rnd;
    private final GeometryFactory gf = new GeometryFactory();
    private final List<Main> mains = new ArrayList<>();
    private final List<Valve> valves = new ArrayList<>();
    private final List<Station> stations = new ArrayList<>();
    private final List<SenseTap> taps = new ArrayList<>();
    private final List<Service> services = new ArrayList<>();
    private final List<Source> sources = new ArrayList<>();
    private final List<GeneratedTown.RawValue> raw = new ArrayList<>();
    /** Mains that get services and may get valves: index into mains, street name, house-number base. */
    private final List<int[]> serviceMains = new ArrayList<>();
    private final Map<Integer, String> mainStreet = new LinkedHashMap<>();
    private int mainSeq;
    private int valveSeq;

    private SampleTown(long seed) {
        rnd = new Random(seed);
    }

    /** Generate the town for {@code seed}; equal seeds give equal networks. */
    public static GeneratedTown generate(long seed) {
        return new SampleTown(seed).build();
    }

    private GeneratedTown build() {
        backbone();
        district("LP-NORTH", 0, COLS - 1, 7, ROWS - 1);
        district("LP-SOUTH", 0, 9, 0, 5);
        district("LP-EAST", 11, COLS - 1, 0, 5);
        specialMains();
        stationsAndTaps();
        lpValves();
        workValves();
        services();
        flaws();
        Network n = new Network(NAME, CRS, mains, valves, stations, taps, services, sources,
            List.of(streets()), List.of());
        return new GeneratedTown(n, raw);
    }

    // ---- geometry helpers ----

    static Coordinate lp(int c, int r) {
        return new Coordinate(X0 + c * BLOCK + LP_OFF, Y0 + r * BLOCK + LP_OFF);
    }

    static Coordinate ip(int c, int r) {
        return new Coordinate(X0 + c * BLOCK + IP_OFF, Y0 + r * BLOCK + IP_OFF);
    }

    private LineString line(Coordinate... cs) {
        return gf.createLineString(cs);
    }

    private Point point(double x, double y) {
        return gf.createPoint(new Coordinate(x, y));
    }

    private Point along(Main m, double distance) {
        Coordinate c = new LengthIndexedLine(m.geometry()).extractPoint(distance);
        return point(c.x, c.y);
    }

    private int addMain(String id, String sys, MainStatus st, String material, double diam, double maop,
                        Integer year, LineString g) {
        mains.add(new Main(id, sys, st, material, diam, maop, year, g));
        return mains.size() - 1;
    }

    private String nextMainId(String prefix) {
        return String.format("M-%s-%04d", prefix, ++mainSeq);
    }

    private String nextValveId() {
        return String.format("V-%03d", ++valveSeq);
    }

    // ---- network ----

    private void backbone() {
        String[] mat = {"steel", "PE"};
        List<LineString> lines = new ArrayList<>();
        lines.add(line(new Coordinate(X0 - 203, Y0 + 597), ip(0, 6))); // west feeder from SRC-W
        for (int c = 0; c < COLS - 1; c++) lines.add(line(ip(c, 6), ip(c + 1, 6)));
        for (int r = 0; r < 6; r++) lines.add(line(ip(10, r), ip(10, r + 1)));
        lines.add(line(new Coordinate(X0 + 997, Y0 - 153), ip(10, 0))); // south feeder from SRC-S
        for (int i = 0; i < lines.size(); i++) {
            String id = String.format("M-IP-%03d", i + 1);
            addMain(id, "IP-1", MainStatus.ACTIVE, mat[i % 2], i % 2 == 0 ? 200.0 : 150.0, 420.0,
                1975 + (i * 7) % 40, lines.get(i));
        }
        sources.add(new Source("SRC-W", "IP-1", 400.0, point(X0 - 203, Y0 + 597)));
        sources.add(new Source("SRC-S", "IP-1", 400.0, point(X0 + 997, Y0 - 153)));
        valve(ValveKind.MAIN, "IP-1", along(mains.get(0), 20));
        valve(ValveKind.MAIN, "IP-1", along(mains.get(lines.size() - 1), 20));
        for (int i : new int[] {3, 6, 9, 12, 14, 17, 19, 21}) valve(ValveKind.MAIN, "IP-1", along(mains.get(i), 50));
    }

    private void district(String sys, int c0, int c1, int r0, int r1) {
        String prefix = sys.substring(3, 4);
        for (int r = r0; r <= r1; r++) {
            for (int c = c0; c < c1; c++) {
                if (sys.equals("LP-SOUTH") && r == 4 && (c == 3 || c == 4)) continue; // the cast-iron main
                if (sys.equals("LP-EAST") && r == 4 && c == 13) continue; // the near-miss main
                gridMain(sys, prefix, lp(c, r), lp(c + 1, r), EAST_WEST[r], (c + 1) * 100);
            }
        }
        for (int c = c0; c <= c1; c++) {
            for (int r = r0; r < r1; r++) {
                if (sys.equals("LP-SOUTH") && c == 4 && r == 3) continue; // keeps the proposed main clear
                gridMain(sys, prefix, lp(c, r), lp(c, r + 1), NORTH_SOUTH[c], (r + 1) * 100);
            }
        }
    }

    private void gridMain(String sys, String prefix, Coordinate a, Coordinate b, String street, int number) {
        Coordinate start = new Coordinate(a);
        if (rnd.nextInt(7) == 0) { // a slightly imprecise digitised end, within the 0.5 m snap
            start.x += rnd.nextDouble() * 0.2 - 0.1;
            start.y += rnd.nextDouble() * 0.2 - 0.1;
        }
        boolean old = rnd.nextInt(5) == 0;
        int i = addMain(nextMainId(prefix), sys, MainStatus.ACTIVE, old ? "steel" : "PE", old ? 100.0 : 63.0,
            LP_MAOP, old ? 1961 + rnd.nextInt(20) : 1985 + rnd.nextInt(38), line(start, b));
        serviceMains.add(new int[] {i, number});
        mainStreet.put(i, street);
    }

    private void specialMains() {
        int ci = addMain(CAST_IRON_MAIN, "LP-SOUTH", MainStatus.ACTIVE, "cast iron", 100.0, LP_MAOP, 1952,
            line(lp(3, 4), lp(4, 4), lp(5, 4)));
        serviceMains.add(new int[] {ci, 400});
        mainStreet.put(ci, EAST_WEST[4]);
        Coordinate p0 = lp(3, 4);
        addMain(PROPOSED_MAIN, "LP-SOUTH", MainStatus.PROPOSED, "PE", 110.0, LP_MAOP, null,
            line(new Coordinate(p0.x + 5, p0.y - 4), new Coordinate(p0.x + 195, p0.y - 4)));
        Coordinate n0 = lp(13, 4);
        int nm = addMain(NEAR_MISS_MAIN, "LP-EAST", MainStatus.ACTIVE, "PE", 63.0, LP_MAOP, 2004,
            line(n0, new Coordinate(n0.x + BLOCK - 1.2, n0.y)));
        serviceMains.add(new int[] {nm, 1400});
        mainStreet.put(nm, EAST_WEST[4]);
        double ax = X0 + 5 * BLOCK + 53;
        int al = addMain(CROSSING_MAIN, "LP-NORTH", MainStatus.ACTIVE, "PE", 63.0, LP_MAOP, 1999,
            line(new Coordinate(ax, Y0 + 8 * BLOCK + LP_OFF), new Coordinate(ax, Y0 + 10 * BLOCK + LP_OFF)));
        serviceMains.add(new int[] {al, 800});
        mainStreet.put(al, "Cooper Yard");
    }

    private void stationsAndTaps() {
        station("ST-N1", "LP-NORTH", "Tannery Lane Station", lp(3, 7), new Coordinate(lp(3, 7).x, Y0 + 598.5),
            2.24, 2.74);
        station("ST-N2", "LP-NORTH", "Glassworks Road Station", lp(12, 7), new Coordinate(lp(12, 7).x, Y0 + 598.5),
            2.24, null);
        station("ST-S1", "LP-SOUTH", "Weir Lane Station", lp(5, 5), new Coordinate(lp(5, 5).x, Y0 + 595.5),
            null, null);
        station("ST-E1", "LP-EAST", "Ropewalk Station", lp(11, 2), new Coordinate(X0 + 998.5, lp(11, 2).y),
            2.24, 2.74);
        tap("T-N1-W", "ST-N1", TapDevice.WORKER, mainAt(lp(3, 7), lp(4, 7)), 40);
        tap("T-N1-M", "ST-N1", TapDevice.MONITOR, mainAt(lp(3, 7), lp(3, 8)), 60);
        tap("T-N2-B", "ST-N2", TapDevice.BOTH, mainAt(lp(12, 7), lp(13, 7)), 35);
        tap("T-S1-W", "ST-S1", TapDevice.WORKER, index(CAST_IRON_MAIN), 150);
        tap("T-E1-W", "ST-E1", TapDevice.WORKER, mainAt(lp(11, 2), lp(12, 2)), 45);
        tap("T-E1-M", "ST-E1", TapDevice.MONITOR, mainAt(lp(11, 2), lp(11, 3)), 55);
    }

    private void station(String id, String out, String name, Coordinate node, Coordinate at, Double mon, Double rel) {
        addMain("M-STUB-" + id.substring(3), out, MainStatus.ACTIVE, "steel", 150.0, LP_MAOP, 1990, line(at, node));
        // ST-N1's relief is recorded full-capacity, ST-E1's as token capacity (relief_full no)
        Boolean full = rel == null ? null : id.equals("ST-N1");
        stations.add(new Station(id, "IP-1", out, LP_KPA, mon, rel, name, point(at.x, at.y), full));
        // inlet valve on IP-1, 1 m along the main from the station's projection: 1.80 m from the station
        boolean vertical = at.x == X0 + 998.5;
        Point v = vertical ? point(X0 + 997, at.y - 1) : point(at.x - 1, Y0 + 597);
        valve(ValveKind.STATION, "IP-1", v);
    }

    private void tap(String id, String station, TapDevice d, int main, double distance) {
        taps.add(new SenseTap(id, station, d, along(mains.get(main), distance)));
    }

    private int mainAt(Coordinate a, Coordinate b) {
        for (int i = 0; i < mains.size(); i++) {
            Coordinate[] cs = mains.get(i).geometry().getCoordinates();
            if (cs[0].distance(a) < 0.5 && cs[cs.length - 1].distance(b) < 0.5) return i;
        }
        throw new IllegalStateException("no main from " + a + " to " + b);
    }

    private int index(String mainId) {
        for (int i = 0; i < mains.size(); i++) if (mains.get(i).id().equals(mainId)) return i;
        throw new IllegalStateException("no main " + mainId);
    }

    private void valve(ValveKind kind, String sys, Point at) {
        int k = valves.size();
        Operability op = k % 13 == 5 ? Operability.NO : k % 11 == 3 ? Operability.UNKNOWN : Operability.YES;
        LocalDate checked;
        if (k % 15 == 7) checked = AS_OF.minusMonths(16 + rnd.nextInt(12)).withDayOfMonth(1 + rnd.nextInt(28));
        else if (k % 23 == 11) checked = null;
        else checked = AS_OF.minusDays(20 + rnd.nextInt(400));
        valves.add(new Valve(nextValveId(), sys, kind, NormalPosition.OPEN, op, checked, at));
    }

    /**
     * Valves of the low-pressure grids, placed as a utility valves a grid: on every main
     * that crosses a valve line, 30 m from the main's start, so that closing the valves of
     * one line parts the grid into valve zones. LP-SOUTH: a line between Cooper Street and
     * Weir Lane (the cast-iron main's own valve V-CI-E serves on Elder Street) and one
     * between Cedar Walk and Damson Road: four zones. LP-NORTH: lines between Weir Lane
     * and Forge Road and between Ropewalk and Thatcher Lane: three zones, ST-N1 in the
     * west, ST-N2 in the east. LP-EAST: a line between Cedar Walk and Damson Road: two
     * zones, ST-E1 in the south. Two valves in LP-NORTH are normally closed.
     */
    private void lpValves() {
        for (int r = 0; r <= 5; r++) if (r != 4) cutValve(lp(4, r), lp(5, r));
        for (int c = 0; c <= 9; c++) cutValve(lp(c, 2), lp(c, 3));
        for (int r = 7; r <= 11; r++) {
            cutValve(lp(5, r), lp(6, r));
            cutValve(lp(10, r), lp(11, r));
        }
        for (int c = 11; c <= 15; c++) cutValve(lp(c, 2), lp(c, 3));
        // two normally closed valves in LP-NORTH, on the eastern valve line
        closeValve(nearestValve("LP-NORTH", lp(10, 9)));
        closeValve(nearestValve("LP-NORTH", lp(10, 11)));
    }

    private void cutValve(Coordinate a, Coordinate b) {
        Main main = mains.get(mainAt(a, b));
        valve(ValveKind.MAIN, main.systemId(), along(main, 30));
    }

    /**
     * Valves for the sample work plan (operable, checked two months before {@link #AS_OF}):
     * four around each end junction of the cast-iron main (Elder Street at Tannery Lane and
     * at Weir Lane), 4-7 m from the junction on every main that meets there, so a junction
     * can be isolated for a tie-in; and one on the Cooper Street main 4 m north of its tee
     * on the cast-iron main.
     */
    private void workValves() {
        LocalDate checked = AS_OF.minusMonths(2);
        Coordinate w = lp(3, 4);
        Coordinate e = lp(5, 4);
        Coordinate c = lp(4, 4);
        String[][] ids = {{"V-TAN-N", "V-TAN-S", "V-ELD-W", "V-CI-W"}, {"V-WEI-N", "V-WEI-S", "V-CI-E", "V-ELD-E"}};
        Coordinate[] ends = {w, e};
        for (int k = 0; k < 2; k++) {
            Coordinate j = ends[k];
            double[][] at = {{j.x, j.y + 4}, {j.x, j.y - 9}, {j.x - 4, j.y}, {j.x + 4, j.y}};
            for (int i = 0; i < 4; i++) {
                valves.add(new Valve(ids[k][i], "LP-SOUTH", ValveKind.MAIN, NormalPosition.OPEN, Operability.YES, checked,
                    onMain("LP-SOUTH", at[i][0], at[i][1])));
            }
        }
        valves.add(new Valve("V-COO-N", "LP-SOUTH", ValveKind.MAIN, NormalPosition.OPEN, Operability.YES, checked,
            onMain("LP-SOUTH", c.x, c.y + 4)));
    }

    /** The point of the nearest main of {@code sys} to (x, y), so a valve lies exactly on its main. */
    private Point onMain(String sys, double x, double y) {
        Point q = point(x, y);
        Main best = null;
        double d = Double.MAX_VALUE;
        for (Main m : mains) {
            if (!m.systemId().equals(sys)) continue;
            double dm = m.geometry().distance(q);
            if (dm < d) {
                d = dm;
                best = m;
            }
        }
        if (best == null) throw new IllegalStateException("no main of " + sys);
        LengthIndexedLine lil = new LengthIndexedLine(best.geometry());
        Coordinate c = lil.extractPoint(lil.project(q.getCoordinate()));
        return point(c.x, c.y);
    }

    private int nearestValve(String sys, Coordinate c) {
        int best = -1;
        double d = Double.MAX_VALUE;
        for (int i = 0; i < valves.size(); i++) {
            Valve v = valves.get(i);
            double e = v.geometry().getCoordinate().distance(c);
            if (v.systemId().equals(sys) && v.kind() == ValveKind.MAIN && v.operable() == Operability.YES && e < d) {
                d = e;
                best = i;
            }
        }
        return best;
    }

    private void closeValve(int i) {
        Valve v = valves.get(i);
        valves.set(i, new Valve(v.id(), v.systemId(), v.kind(), NormalPosition.CLOSED, v.operable(), v.checked(),
            v.geometry()));
    }

    // ---- customers ----

    private void services() {
        int seq = 0;
        for (int[] sm : serviceMains) {
            Main m = mains.get(sm[0]);
            LineString g = (LineString) m.geometry();
            int k = 4 + rnd.nextInt(3);
            Coordinate a = g.getCoordinateN(0);
            Coordinate b = g.getCoordinateN(g.getNumPoints() - 1);
            double len = a.distance(b);
            double ux = (b.x - a.x) / len;
            double uy = (b.y - a.y) / len;
            for (int j = 0; j < k; j++) {
                boolean left = j % 2 == 0;
                double t = (j + 0.5) / k * len;
                double off = (12 + rnd.nextDouble() * 13) * (left ? 1 : -1);
                double x = a.x + ux * t - uy * off;
                double y = a.y + uy * t + ux * off;
                int roll = rnd.nextInt(100);
                ServiceClass cls = roll < 86 ? ServiceClass.RESIDENTIAL : roll < 98 ? ServiceClass.COMMERCIAL
                    : ServiceClass.INDUSTRIAL;
                int meters = cls == ServiceClass.RESIDENTIAL ? (rnd.nextInt(20) == 0 ? 2 + rnd.nextInt(5) : 1)
                    : 1 + rnd.nextInt(3);
                String mainId = rnd.nextInt(100) < 85 ? m.id() : null;
                String address = (sm[1] + 2 * j + (left ? 1 : 0)) + " " + mainStreet.get(sm[0]);
                services.add(new Service(String.format("SV-%04d", ++seq), m.systemId(), cls, meters, null, mainId,
                    address, point(x, y)));
            }
        }
        critical("SV-C-CLINIC", "clinic", "LP-NORTH", lp(6, 9), 2, "Larch Road Clinic, 611 Larch Road");
        critical("SV-C-SCHOOL1", "school", "LP-NORTH", lp(10, 8), 1, "Juniper Street School, 1020 Juniper Street");
        critical("SV-C-SCHOOL2", "school", "LP-EAST", lp(13, 2), 1, "Cedar Walk School, 1340 Cedar Walk");
        critical("SV-C-CARE", "care home", "LP-SOUTH", new Coordinate(lp(4, 4).x + 30, lp(4, 4).y),
            3, "Elder Street Care Home, 431 Elder Street");
    }

    /** A critical customer 18 m north of the main through {@code on}, attached by main_id. */
    private void critical(String id, String kind, String sys, Coordinate on, int meters, String address) {
        String mainId = null;
        double best = Double.MAX_VALUE;
        Point p = point(on.x, on.y);
        for (Main m : mains) {
            double d = m.geometry().distance(p);
            if (m.systemId().equals(sys) && m.status() == MainStatus.ACTIVE && d < best) {
                best = d;
                mainId = m.id();
            }
        }
        services.add(new Service(id, sys, ServiceClass.CRITICAL, meters, kind, mainId, address,
            point(on.x + 10, on.y + 18)));
    }

    // ---- data flaws for the check ----

    private void flaws() {
        // a service 90 m north of the northernmost main, with no main_id
        services.add(new Service(FAR_SERVICE, "LP-NORTH", ServiceClass.RESIDENTIAL, 1, null, null,
            "1175 Nettle Row", point(X0 + 753, lp(7, ROWS - 1).y + 90)));
        // a valve 5 m south of the middle of a LP-SOUTH main
        Coordinate mid = lp(7, 2);
        valves.add(new Valve(OFF_MAIN_VALVE, "LP-SOUTH", ValveKind.MAIN, NormalPosition.OPEN, Operability.YES,
            AS_OF.minusMonths(3), point(mid.x + 50, mid.y - 5)));
        // a second valve carrying an id already used
        Main e = mains.get(mainAt(lp(14, 1), lp(15, 1)));
        valves.add(new Valve(DUPLICATE_VALVE_ID, "LP-EAST", ValveKind.MAIN, NormalPosition.OPEN, Operability.YES,
            AS_OF.minusMonths(5), along(e, 70)));
        // a misspelt status word, written as is
        raw.add(new GeneratedTown.RawValue("mains", index(MISSPELT_MAIN), "status", "actve"));
    }

    private ContextLayer streets() {
        List<ContextLayer.Item> items = new ArrayList<>();
        double xe = X0 + (COLS - 1) * BLOCK;
        double yn = Y0 + (ROWS - 1) * BLOCK;
        for (int r = 0; r < ROWS; r++) {
            double y = Y0 + r * BLOCK;
            double west = r == 6 ? X0 - 260 : X0 - 60;
            items.add(new ContextLayer.Item(line(new Coordinate(west, y), new Coordinate(xe + 60, y)),
                Map.of("name", EAST_WEST[r])));
        }
        for (int c = 0; c < COLS; c++) {
            double x = X0 + c * BLOCK;
            double south = c == 10 ? Y0 - 200 : Y0 - 60;
            items.add(new ContextLayer.Item(line(new Coordinate(x, south), new Coordinate(x, yn + 60)),
                Map.of("name", NORTH_SOUTH[c])));
        }
        double ax = X0 + 5 * BLOCK + 50;
        items.add(new ContextLayer.Item(line(new Coordinate(ax, Y0 + 8 * BLOCK), new Coordinate(ax, Y0 + 10 * BLOCK)),
            Map.of("name", "Cooper Yard")));
        return new ContextLayer("streets", items);
    }
}
