package org.shutline.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.shutline.model.MainStatus;
import org.shutline.model.Operability;
import org.shutline.testnet.NetSketch;
import org.shutline.topology.Topology;

/**
 * Seeded random networks for the cross-checks and property tests: a high-pressure part
 * (nodes 0..h-1, one or two sources) and a low-pressure part fed by one to three
 * stations; each part a random spanning tree plus a few chords (loops), mains on a
 * 10 m lattice of random points; about 60 % of mains carry a valve at their midpoint;
 * valve states: 10 % closed, 15 % inoperable, 15 % unknown; a few mains abandoned;
 * services on random main pieces, 1-3 meters, about 10 % critical; sometimes a source
 * on the low-pressure part too. Station inlets vary ({@link org.shutline.testnet.RandomNet#stationInlet}): no valve, a
 * station-kind valve on a stub, two station-kind valves, or an inline station valve
 * that alone does not stop the station. {@code forceInoperable} valve ids are made inoperable
 * (the same network otherwise: the random draws do not depend on it).
 */
final class RandomNets {
    private RandomNets() {}

    static Topology generate(long seed, Set<String> forceInoperable) {
        Random rnd = new Random(seed);
        NetSketch sk = new NetSketch();
        int h = 3 + rnd.nextInt(8), l = 3 + rnd.nextInt(14);
        int n = h + l;
        for (int i = 0; i < n; i++) sk.node(10 * (i % 6) + 100 * (i / 6) + rnd.nextInt(5), 10 * rnd.nextInt(40) + (i < h ? 0 : 1000));
        List<int[]> edges = new ArrayList<>();
        tree(rnd, 0, h, edges);
        tree(rnd, h, n, edges);
        for (int k = rnd.nextInt(4); k > 0; k--) chord(rnd, 0, h, edges);
        for (int k = rnd.nextInt(6); k > 0; k--) chord(rnd, h, n, edges);
        List<String> mainIds = new ArrayList<>();
        List<Integer> pieces = new ArrayList<>();
        int valve = 0;
        for (int i = 0; i < edges.size(); i++) {
            int a = edges.get(i)[0], b = edges.get(i)[1];
            String id = String.format("m%02d", i);
            String sys = a < h ? "HP" : "LP";
            MainStatus st = rnd.nextInt(20) == 0 ? MainStatus.ABANDONED : MainStatus.ACTIVE;
            List<NetSketch.Stop> stops = new ArrayList<>();
            stops.add(NetSketch.Stop.node(a));
            int np = 1;
            if (rnd.nextInt(10) < 6) {
                String v = "V" + (++valve);
                stops.add(NetSketch.Stop.valve(v, (sk.nodeX(a) + sk.nodeX(b)) / 2, (sk.nodeY(a) + sk.nodeY(b)) / 2));
                int r = rnd.nextInt(20);
                if (r < 2) sk.closed(v);
                else if (r < 5) sk.operable(v, Operability.NO);
                else if (r < 8) sk.operable(v, Operability.UNKNOWN);
                if (forceInoperable.contains(v)) sk.operable(v, Operability.NO);
                np = 2;
            }
            stops.add(NetSketch.Stop.node(b));
            sk.main(id, sys, st, stops);
            mainIds.add(id);
            pieces.add(np);
        }
        Random inlets = new Random(seed * 31 + 7); // separate draws: the rest of the network is as before
        for (int k = 1 + rnd.nextInt(3); k > 0; k--) {
            int in = rnd.nextInt(h), out = h + rnd.nextInt(l);
            sk.station("R" + k, "HP", "LP", org.shutline.testnet.RandomNet.stationInlet(sk, inlets, "R" + k, "HP", in, rnd.nextInt(h)), out);
        }
        sk.source("S1", rnd.nextInt(h));
        if (rnd.nextBoolean()) sk.source("S2", rnd.nextInt(h));
        if (rnd.nextInt(8) == 0) sk.source("S3", h + rnd.nextInt(l));
        int services = 5 + rnd.nextInt(30);
        for (int s = 0; s < services; s++) {
            int m = rnd.nextInt(mainIds.size());
            sk.service("s" + s, mainIds.get(m), rnd.nextInt(pieces.get(m)), 1 + rnd.nextInt(3), rnd.nextInt(10) == 0 ? "clinic" : null);
        }
        return sk.build();
    }

    private static void tree(Random rnd, int from, int to, List<int[]> edges) {
        for (int i = from + 1; i < to; i++) edges.add(new int[] {from + rnd.nextInt(i - from), i});
    }

    private static void chord(Random rnd, int from, int to, List<int[]> edges) {
        int a = from + rnd.nextInt(to - from), b = from + rnd.nextInt(to - from);
        if (a != b) edges.add(new int[] {a, b});
    }
}
