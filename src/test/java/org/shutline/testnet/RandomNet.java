package org.shutline.testnet;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.shutline.model.MainStatus;
import org.shutline.model.Operability;

/**
 * Seeded random test networks: 1 to 3 pressure systems, each a grid of mains (cells
 * 100 m, each grid edge present with probability 0.85, one main per edge, a valve in
 * the middle of 40 % of them), systems linked by 1 to 3 stations from system k to k+1;
 * 1 or 2 sources in the first system and sometimes one in another; valves operable
 * yes / no / unknown about 60 / 20 / 20 %, 10 % normally closed; 5 % of mains abandoned;
 * 0 to 2 services per main with 1 to 4 meters, a few critical. Station inlets vary
 * ({@link #stationInlet}): no valve, a station-kind valve on a stub, two, or an inline
 * station valve that alone does not stop the station.
 */
public final class RandomNet {
    private RandomNet() {}

    /** The sketch, not yet built (tests may change valves before {@link NetSketch#build()}). */
    public static Generated sketch(long seed) {
        Random rnd = new Random(seed);
        NetSketch sk = new NetSketch();
        int systems = 1 + rnd.nextInt(3);
        List<int[][]> grids = new ArrayList<>();
        List<String> valves = new ArrayList<>();
        int mainNo = 0, serviceNo = 0;
        for (int k = 0; k < systems; k++) {
            String sys = "P" + k;
            int w = 2 + rnd.nextInt(5), h = 2 + rnd.nextInt(4);
            int[][] g = new int[w][h];
            for (int i = 0; i < w; i++) for (int j = 0; j < h; j++) g[i][j] = sk.node(k * 1000 + i * 100, j * 100);
            grids.add(g);
            for (int i = 0; i < w; i++) {
                for (int j = 0; j < h; j++) {
                    for (int dir = 0; dir < 2; dir++) {
                        int i2 = dir == 0 ? i + 1 : i, j2 = dir == 0 ? j : j + 1;
                        if (i2 >= w || j2 >= h || rnd.nextDouble() >= 0.85) continue;
                        String id = "m" + (mainNo++);
                        List<NetSketch.Stop> stops = new ArrayList<>();
                        stops.add(NetSketch.Stop.node(g[i][j]));
                        boolean valve = rnd.nextDouble() < 0.4;
                        if (valve) {
                            String vid = "v" + valves.size();
                            valves.add(vid);
                            stops.add(NetSketch.Stop.valve(vid, k * 1000 + (i + i2) * 50.0, (j + j2) * 50.0));
                            double r = rnd.nextDouble();
                            if (r < 0.2) sk.operable(vid, Operability.NO);
                            else if (r < 0.4) sk.operable(vid, Operability.UNKNOWN);
                            if (rnd.nextDouble() < 0.1) sk.closed(vid);
                        }
                        stops.add(NetSketch.Stop.node(g[i2][j2]));
                        MainStatus st = rnd.nextDouble() < 0.05 ? MainStatus.ABANDONED : MainStatus.ACTIVE;
                        sk.main(id, sys, st, stops);
                        int n = rnd.nextInt(3);
                        for (int s = 0; s < n; s++) {
                            sk.service("s" + (serviceNo++), id, valve ? rnd.nextInt(2) : 0, 1 + rnd.nextInt(4),
                                    rnd.nextDouble() < 0.05 ? "clinic" : null);
                        }
                    }
                }
            }
        }
        int stationNo = 0;
        Random inlets = new Random(seed * 31 + 7); // separate draws: the rest of the network is as before
        for (int k = 0; k + 1 < systems; k++) {
            int links = 1 + rnd.nextInt(3);
            for (int s = 0; s < links; s++) {
                String id = "st" + (stationNo++);
                int in = pick(grids.get(k), rnd), out = pick(grids.get(k + 1), rnd);
                sk.station(id, "P" + k, "P" + (k + 1), stationInlet(sk, inlets, id, "P" + k, in, pick(grids.get(k), inlets)), out);
            }
        }
        int sources = 1 + rnd.nextInt(2);
        for (int s = 0; s < sources; s++) sk.source("src" + s, pick(grids.get(0), rnd));
        if (systems > 1 && rnd.nextDouble() < 0.3) sk.source("srcx", pick(grids.get(systems - 1), rnd));
        return new Generated(sk, List.copyOf(valves));
    }

    public static TestNet build(long seed) {
        return sketch(seed).net();
    }

    /**
     * One large grid system for benchmarks: w x h nodes, every grid edge a main, a valve
     * on 70 % of them (15 % of those inoperable), one service per main, sources at two corners.
     */
    public static TestNet largeGrid(long seed, int w, int h) {
        Random rnd = new Random(seed);
        NetSketch sk = new NetSketch();
        int[][] g = new int[w][h];
        for (int i = 0; i < w; i++) for (int j = 0; j < h; j++) g[i][j] = sk.node(i * 100, j * 100);
        int mainNo = 0, valveNo = 0;
        for (int i = 0; i < w; i++) {
            for (int j = 0; j < h; j++) {
                for (int dir = 0; dir < 2; dir++) {
                    int i2 = dir == 0 ? i + 1 : i, j2 = dir == 0 ? j : j + 1;
                    if (i2 >= w || j2 >= h) continue;
                    String id = "m" + (mainNo++);
                    List<NetSketch.Stop> stops = new ArrayList<>();
                    stops.add(NetSketch.Stop.node(g[i][j]));
                    if (rnd.nextDouble() < 0.7) {
                        String vid = "v" + (valveNo++);
                        stops.add(NetSketch.Stop.valve(vid, (i + i2) * 50.0, (j + j2) * 50.0));
                        if (rnd.nextDouble() < 0.15) sk.operable(vid, Operability.NO);
                    }
                    stops.add(NetSketch.Stop.node(g[i2][j2]));
                    sk.main(id, "P0", MainStatus.ACTIVE, stops);
                    sk.service("s" + mainNo, id, 0, 1, null);
                }
            }
        }
        sk.source("src0", g[0][0]);
        sk.source("src1", g[w - 1][h - 1]);
        return new TestNet(sk.build(), java.util.Map.of());
    }

    /**
     * The inlet node of a station at node {@code in}: as drawn (no valve), on a 1 m stub
     * behind a valve of kind station, with a second station valve on a stub to
     * {@code other} (two inlet valves), or inline: the tee joined to {@code in} by plain
     * pipe and to {@code other} through a station valve 1 m from the tee, so that valve
     * alone does not stop the station. Station valves are sometimes unknown or never checked.
     */
    public static int stationInlet(NetSketch sk, Random rnd, String station, String sys, int in, int other) {
        int kind = rnd.nextInt(4);
        if (kind == 0) return in;
        double x = sk.nodeX(in), y = sk.nodeY(in);
        int tee = sk.node(x + 1.5, y + 0.5);
        String v1 = "sv" + station + "a";
        if (kind == 3) {
            sk.main("st" + station + "a", sys, MainStatus.ACTIVE, List.of(NetSketch.Stop.node(in), NetSketch.Stop.node(tee)));
        } else {
            sk.main("st" + station + "a", sys, MainStatus.ACTIVE,
                    List.of(NetSketch.Stop.node(in), NetSketch.Stop.valve(v1, x + 0.75, y + 0.25), NetSketch.Stop.node(tee)));
            stationValve(sk, rnd, v1);
        }
        if (kind >= 2 && other != in) {
            String v2 = "sv" + station + "b";
            sk.main("st" + station + "b", sys, MainStatus.ACTIVE,
                    List.of(NetSketch.Stop.node(tee), NetSketch.Stop.valve(v2, x + 2.5, y + 0.5), NetSketch.Stop.node(other)));
            stationValve(sk, rnd, v2);
        }
        return tee;
    }

    private static void stationValve(NetSketch sk, Random rnd, String id) {
        sk.kind(id, org.shutline.model.ValveKind.STATION);
        int r = rnd.nextInt(6);
        if (r == 0) sk.operable(id, Operability.UNKNOWN);
        else if (r == 1) sk.neverChecked(id);
    }

    private static int pick(int[][] g, Random rnd) {
        return g[rnd.nextInt(g.length)][rnd.nextInt(g[0].length)];
    }

    /** A generated sketch and its valve ids. */
    public record Generated(NetSketch sketch, List<String> valveIds) {
        public TestNet net() {
            return new TestNet(sketch.build(), java.util.Map.of());
        }
    }
}
