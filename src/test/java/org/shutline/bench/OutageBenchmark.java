package org.shutline.bench;

import org.shutline.analysis.BruteForceOutages;
import org.shutline.analysis.OutageTables;
import org.shutline.testnet.RandomNet;
import org.shutline.testnet.TestNet;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * Benchmark (a main method, not a test): all-cases outage tables by the dominator tree
 * against the brute-force baseline (one segment-graph traversal per case,
 * {@code BruteForceOutages}, test code) on a large grid, over the same cases as the
 * tables: every segment isolated, every station out, every valve failing. Each kind is
 * timed on an evenly spread sample of cases (every case when there are few) and scaled to
 * all cases; every sampled case is checked against the tables. Arguments: grid width
 * (default 200, i.e. 40 000 nodes), cases sampled per kind (default 400).
 */
public final class OutageBenchmark {
    private OutageBenchmark() {}

    public static void main(String[] args) {
        int w = args.length > 0 ? Integer.parseInt(args[0]) : 200;
        int sample = args.length > 1 ? Integer.parseInt(args[1]) : 400;
        TestNet t = RandomNet.largeGrid(42, w, w);
        NetworkState s = t.state();
        System.out.printf("nodes %d, edges %d, valves %d, services %d%n", s.nodeCount(), s.edgeCount(),
                s.valveCount(), s.serviceCount());
        long t0 = System.nanoTime();
        FeedTrace.Result fr = FeedTrace.run(s);
        long t1 = System.nanoTime();
        ValveSegments vs = ValveSegments.build(s);
        long t2 = System.nanoTime();
        OutageTables tab = OutageTables.build(vs);
        long t3 = System.nanoTime();
        double tablesMs = (t3 - t2) / 1e6;
        System.out.printf("feed trace %.1f ms (%d fed); segments %.1f ms (%d); tables %.1f ms (%d units)%n",
                (t1 - t0) / 1e6, fr.fedServices().cardinality(), (t2 - t1) / 1e6, vs.segmentCount(),
                tablesMs, tab.unitCount());
        BruteForceOutages brute = new BruteForceOutages(vs);
        String[] kinds = {"segment", "station", "valve"};
        int[] counts = {vs.segmentCount(), s.stationCount(), s.valveCount()};
        double total = 0;
        for (int kind = 0; kind < 3; kind++) {
            int n = counts[kind];
            if (n == 0) continue;
            int cases = Math.min(sample, n);
            long b0 = System.nanoTime();
            for (int i = 0; i < cases; i++) {
                int c = (int) ((long) i * n / cases);
                long bf = kind == 0 ? brute.servicesOffWhenIsolated(c) : kind == 1 ? brute.servicesOffWhenStationOut(c)
                        : brute.servicesOffWhenFails(c);
                long tb = kind == 0 ? tab.servicesOffWhenIsolated(c) : kind == 1 ? tab.servicesOffWhenStationOut(c)
                        : tab.servicesOffWhenFails(c);
                if (bf != tb) throw new IllegalStateException("mismatch at " + kinds[kind] + " " + c + ": " + bf + " vs " + tb);
            }
            double perCase = (System.nanoTime() - b0) / 1e6 / cases;
            total += perCase * n;
            System.out.printf("brute force %.3f ms per %s case, about %.0f ms for all %d%s%n", perCase, kinds[kind],
                    perCase * n, n, cases < n ? " (" + cases + " timed and scaled)" : "");
        }
        System.out.printf("brute force about %.0f ms for all cases against %.1f ms for the tables: %.0fx%n", total, tablesMs,
                total / tablesMs);
    }
}
