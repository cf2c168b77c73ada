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
 * against the brute-force baseline on a large grid. The baseline is timed on a sample of
 * segments and extrapolated. Argument: grid width (default 200, i.e. 40 000 nodes).
 */
public final class OutageBenchmark {
    private OutageBenchmark() {}

    public static void main(String[] args) {
        int w = args.length > 0 ? Integer.parseInt(args[0]) : 200;
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
        System.out.printf("feed trace %.1f ms (%d fed); segments %.1f ms (%d); tables %.1f ms (%d units)%n",
                (t1 - t0) / 1e6, fr.fedServices().cardinality(), (t2 - t1) / 1e6, vs.segmentCount(),
                (t3 - t2) / 1e6, tab.unitCount());
        BruteForceOutages brute = new BruteForceOutages(vs);
        int sample = Math.min(200, vs.segmentCount());
        long b0 = System.nanoTime();
        long check = 0;
        for (int i = 0; i < sample; i++) {
            int seg = (int) ((long) i * vs.segmentCount() / sample);
            long bf = brute.servicesOffWhenIsolated(seg);
            if (bf != tab.servicesOffWhenIsolated(seg)) throw new IllegalStateException("mismatch at segment " + seg);
            check += bf;
        }
        long b1 = System.nanoTime();
        double perCase = (b1 - b0) / 1e6 / sample;
        System.out.printf("brute force %.3f ms per segment case, about %.0f ms for all %d segments (sum %d)%n",
                perCase, perCase * vs.segmentCount(), vs.segmentCount(), check);
        int nv = s.valveCount(), vsample = Math.min(200, nv);
        long v0 = System.nanoTime();
        for (int i = 0; i < vsample; i++) {
            int v = (int) ((long) i * nv / vsample);
            if (brute.servicesOffWhenFails(v) != tab.servicesOffWhenFails(v)) {
                throw new IllegalStateException("mismatch at valve " + v);
            }
        }
        long v1 = System.nanoTime();
        double perValve = (v1 - v0) / 1e6 / vsample;
        System.out.printf("brute force %.3f ms per valve case, about %.0f ms for all %d valves%n",
                perValve, perValve * nv, nv);
    }
}
