package org.shutline.cli;

import org.shutline.analysis.ValveDoubt;
import java.io.IOException;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.shutline.analysis.Isolation;
import org.shutline.analysis.OutageTables;
import org.shutline.analysis.Zone;
import org.shutline.io.FieldMapping;
import org.shutline.io.InputException;
import org.shutline.io.NetworkReader;
import org.shutline.io.sample.GeneratedTown;
import org.shutline.io.sample.GridTown;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.model.Tolerances;
import org.shutline.topology.NetworkBuilder;
import org.shutline.topology.Topology;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code shutline bench [--sizes 3000,200000,1000000] [--zones 1000] [--seed S] [--work DIR]}:
 * generates synthetic grid towns, writes each as a GeoPackage, and measures on it: the
 * raw read of all features (baseline 1), load plus topology build, feed trace (live set
 * only, and with per-station attribution), single isolations of random points (median
 * and 95th percentile, whole-network scope), single isolations of random segments (most
 * of them isolable by valves, unlike random points in a grid town), the all-cases tables against the plain
 * per-segment traversal loop (baseline 2; sampled and extrapolated on large networks),
 * and heap in use. Prints a Markdown table (docs/performance.md explains it).
 * Times are wall-clock on this machine; read the ratios, which hold better on a noisy
 * machine. The read and load+topology are also timed in CPU time of the measuring
 * thread (the CPU ratio column), which other processes on a shared machine do not
 * inflate; GC threads are not counted there. Isolations are timed alone and also
 * together with reading every service id off (the result's id list is resolved lazily).
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
    description = "Benchmark load, topology, trace, isolation and all-cases tables on generated networks.")
public final class BenchCommand implements Callable<Integer> {
    @Spec private CommandSpec spec;

    @Option(names = "--sizes", split = ",", defaultValue = "3000,200000,1000000", description = "numbers of mains (default: ${DEFAULT-VALUE})")
    private List<Integer> sizes;

    @Option(names = "--zones", defaultValue = "1000", description = "random isolations per network (default: ${DEFAULT-VALUE})")
    private int zones;

    @Option(names = "--seed", defaultValue = "7", description = "random seed (default: ${DEFAULT-VALUE})")
    private long seed;

    @Option(names = "--work", paramLabel = "DIR", description = "folder for the generated files (default: a temporary folder, deleted after)")
    private Path work;

    /** One network's figures, times in milliseconds. */
    record Row(int mains, int nodes, int edges, int services, int segments, double rawRead, double loadTopo,
               double rawReadCpu, double loadTopoCpu, double traceLive,
               double traceFull, double isoMedian, double isoP95, double isoIdsMedian, double segIsoMedian, double segIsoP95, double tables, double heapMb) {
    }

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        Path dir = work != null ? Files.createDirectories(work) : Files.createTempDirectory("shutline-bench");
        List<Row> rows = new ArrayList<>();
        try {
            for (int n : sizes) {
                out.println("generating and measuring " + n + " mains ...");
                out.flush();
                rows.add(measure(n, dir));
                out.println(line(rows.get(rows.size() - 1)));
                out.flush();
            }
        } finally {
            if (work == null) deleteTree(dir);
        }
        out.println();
        out.print(table(rows));
        out.flush();
        return 0;
    }

    private Row measure(int n, Path dir) throws IOException, InputException {
        Path file = dir.resolve("grid-" + n + ".gpkg");
        if (!Files.exists(file)) {
            GeneratedTown town = GridTown.generate(n, seed);
            town.writeGeoPackage(file, Progress.NONE);
        }
        // baseline 1: the raw read of all features into the model, no graph (best of two, the first also warms up)
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        double raw = Double.MAX_VALUE;
        double rawCpu = Double.MAX_VALUE;
        for (int i = 0; i < 2; i++) {
            gc();
            long c0 = threads.getCurrentThreadCpuTime();
            long t0 = System.nanoTime();
            Network net = NetworkReader.read(file, FieldMapping.DEFAULT);
            raw = Math.min(raw, ms(t0));
            rawCpu = Math.min(rawCpu, (threads.getCurrentThreadCpuTime() - c0) / 1e6);
            if (net.mains().isEmpty()) throw new IllegalStateException("no mains read");
        }
        gc();
        long c0 = threads.getCurrentThreadCpuTime();
        long t0 = System.nanoTime();
        Network net2 = NetworkReader.read(file, FieldMapping.DEFAULT);
        Topology topo = NetworkBuilder.build(net2, Tolerances.DEFAULT);
        double loadTopo = ms(t0);
        double loadTopoCpu = (threads.getCurrentThreadCpuTime() - c0) / 1e6;
        NetworkState state = NetworkState.of(topo);

        double live = best(3, () -> FeedTrace.fedServices(state));
        double full = best(1, () -> FeedTrace.run(state));

        ValveSegments segs = ValveSegments.build(state);
        Isolation iso = new Isolation(segs, ValveDoubt.Settings.defaults(LocalDate.of(2026, 12, 1)));
        double[] isoTimes = isolations(topo, iso);
        double[] segTimes = segmentIsolations(segs.segmentCount(), iso);

        t0 = System.nanoTime();
        OutageTables tables = OutageTables.build(segs);
        double tablesMs = ms(t0);
        int segCount = segs.segmentCount();
        if (tables.unitCount() < 0) throw new IllegalStateException();

        MemoryMXBean mem = ManagementFactory.getMemoryMXBean();
        gc();
        double heap = mem.getHeapMemoryUsage().getUsed() / 1048576.0;
        return new Row(n, topo.graph().nodeCount(), topo.graph().edgeCount(), net2.services().size(), segCount, raw, loadTopo,
                rawCpu, loadTopoCpu, live, full, isoTimes[0], isoTimes[1], isoTimes[2], segTimes[0], segTimes[1], tablesMs, heap);
    }

    private double[] isolations(Topology topo, Isolation iso) {
        Random rnd = new Random(seed);
        org.locationtech.jts.geom.Envelope env = new org.locationtech.jts.geom.Envelope();
        for (var m : topo.network().mains()) env.expandToInclude(m.geometry().getEnvelopeInternal());
        int warm = Math.min(50, zones);
        for (int i = 0; i < warm; i++) iso.isolate(randomZone(rnd, env));
        double[] t = new double[zones];
        double[] withIds = new double[zones];
        long sink = 0;
        for (int i = 0; i < zones; i++) {
            Zone z = randomZone(rnd, env);
            long t0 = System.nanoTime();
            Isolation.Result r = iso.isolate(z);
            t[i] = ms(t0);
            for (String id : r.serviceIdsOff()) sink += id.length();
            withIds[i] = ms(t0);
        }
        if (sink < 0) throw new IllegalStateException();
        Arrays.sort(t);
        Arrays.sort(withIds);
        return new double[] {t[zones / 2], t[(int) Math.min(zones - 1, Math.ceil(zones * 0.95) - 1)], withIds[zones / 2]};
    }

    /**
     * Isolations of single segments (random segments, up to {@code zones} of them): unlike
     * random points, which in a grid town nearly always fall in the one large segment,
     * most of these are isolable by valves, the other branch of the computation.
     */
    private double[] segmentIsolations(int segCount, Isolation iso) {
        Random rnd = new Random(seed + 1);
        int n = Math.min(zones, segCount);
        if (n == 0) return new double[] {Double.NaN, Double.NaN};
        for (int i = 0; i < Math.min(50, n); i++) iso.isolate(new Zone.OfSegments(new int[] {rnd.nextInt(segCount)}));
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            Zone z = new Zone.OfSegments(new int[] {rnd.nextInt(segCount)});
            long t0 = System.nanoTime();
            iso.isolate(z);
            t[i] = ms(t0);
        }
        Arrays.sort(t);
        return new double[] {t[n / 2], t[(int) Math.min(n - 1, Math.ceil(n * 0.95) - 1)]};
    }

    private static Zone randomZone(Random rnd, org.locationtech.jts.geom.Envelope env) {
        return new Zone.AtPoint(env.getMinX() + rnd.nextDouble() * env.getWidth(), env.getMinY() + rnd.nextDouble() * env.getHeight(), null);
    }

    private static double best(int runs, Runnable r) {
        double best = Double.MAX_VALUE;
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            r.run();
            best = Math.min(best, ms(t0));
        }
        return best;
    }

    private static double ms(long t0) {
        return (System.nanoTime() - t0) / 1e6;
    }

    private static void gc() {
        System.gc();
        System.gc();
    }

    static String line(Row r) {
        return String.format(Locale.ROOT, "  %d mains: read %.0f ms, load+topology %.0f ms (%.2fx; main-thread CPU %.0f / %.0f ms, %.2fx), trace %.1f ms live / %.0f ms full, "
                        + "isolation median %.3f ms p95 %.3f ms (median %.3f ms reading every id off), single segments median %.3f ms p95 %.3f ms, tables %.0f ms, heap %.0f MB",
                r.mains(), r.rawRead(), r.loadTopo(), r.loadTopo() / r.rawRead(), r.rawReadCpu(), r.loadTopoCpu(),
                r.loadTopoCpu() / r.rawReadCpu(), r.traceLive(), r.traceFull(), r.isoMedian(), r.isoP95(), r.isoIdsMedian(),
                r.segIsoMedian(), r.segIsoP95(), r.tables(), r.heapMb());
    }

    static String table(List<Row> rows) {
        StringBuilder sb = new StringBuilder();
        sb.append("| mains | nodes | edges | services | segments | raw read ms | load+topology ms | ratio | CPU ratio | trace live ms | trace with stations ms | isolation median ms | isolation p95 ms | isolation + ids read median ms | segment isolation median ms | segment isolation p95 ms | all-cases tables ms | heap MB |\n");
        sb.append("|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|\n");
        for (Row r : rows) {
            sb.append(String.format(Locale.ROOT, "| %d | %d | %d | %d | %d | %.0f | %.0f | %.2f | %.2f | %.1f | %.0f | %.3f | %.3f | %.3f | %.3f | %.3f | %.0f | %.0f |%n",
                    r.mains(), r.nodes(), r.edges(), r.services(), r.segments(), r.rawRead(), r.loadTopo(), r.loadTopo() / r.rawRead(),
                    r.loadTopoCpu() / r.rawReadCpu(), r.traceLive(), r.traceFull(), r.isoMedian(), r.isoP95(), r.isoIdsMedian(),
                    r.segIsoMedian(), r.segIsoP95(), r.tables(), r.heapMb()));
        }
        sb.append("\nThe brute-force baseline of the tables is timed by the test-side benchmark bench.OutageBenchmark.\n");
        sb.append("CPU ratio: the same ratio in CPU time of the measuring thread (GC threads not counted).\n");
        return sb.toString();
    }

    private static void deleteTree(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : (Iterable<Path>) s.sorted(Comparator.reverseOrder())::iterator) Files.deleteIfExists(p);
        }
    }
}
