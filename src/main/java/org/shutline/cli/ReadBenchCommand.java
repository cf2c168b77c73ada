package org.shutline.cli;

import java.io.File;
import java.io.IOException;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.shutline.io.FieldMapping;
import org.shutline.io.InputException;
import org.shutline.io.NetworkReader;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.model.Tolerances;
import org.shutline.topology.NetworkBuilder;
import org.shutline.topology.Topology;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code shutline bench-read NETWORK [--repeat N] [--processes N]}: how fast one network
 * file opens. In this process: the raw read ({@code NetworkReader.read}, every feature
 * into the model) in features per second (best of {@code --repeat}, wall and thread CPU
 * time), then topology and the full feed trace with per-station attribution, and heap in
 * use after a full GC with the network, topology and trace live. Then, unless
 * {@code --processes 0}, the whole-process time of {@code shutline trace NETWORK --format json}
 * (a new JVM with this process's JVM options and class path) beside GDAL's
 * {@code ogrinfo -ro -al -q NETWORK} (reading and printing every feature), alternated in
 * one run, each {@code --processes} times; peak resident memory of each child from
 * GNU time when {@code /usr/bin/time} exists. Prints a Markdown table; docs/performance.md
 * explains it. Wall-clock times on a shared machine vary: compare the two columns of one run.
 */
@Command(name = "bench-read", mixinStandardHelpOptions = true,
    description = "Benchmark opening one network file: raw read rate, trace, and the whole process beside GDAL ogrinfo.")
public final class ReadBenchCommand implements Callable<Integer> {
    @Spec private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "NETWORK", description = "GeoPackage or shapefile folder.")
    private Path network;

    @Option(names = "--repeat", defaultValue = "3", description = "In-process reads (the best counts; default ${DEFAULT-VALUE}).")
    private int repeat;

    @Option(names = "--processes", defaultValue = "2", description = "Whole-process runs of each command (default ${DEFAULT-VALUE}; 0: none).")
    private int processes;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        ThreadMXBean cpu = ManagementFactory.getThreadMXBean();
        double bestMs = Double.MAX_VALUE;
        double bestCpuMs = 0;
        Network n = null;
        for (int i = 0; i < Math.max(1, repeat); i++) {
            n = null;
            gc();
            long c0 = cpu.getCurrentThreadCpuTime();
            long t0 = System.nanoTime();
            try {
                n = NetworkReader.read(network, FieldMapping.DEFAULT);
            } catch (InputException e) {
                return NetworkInput.badInput(err, e.getMessage());
            }
            double ms = (System.nanoTime() - t0) / 1e6;
            if (ms < bestMs) {
                bestMs = ms;
                bestCpuMs = (cpu.getCurrentThreadCpuTime() - c0) / 1e6;
            }
        }
        long features = (long) n.mains().size() + n.valves().size() + n.stations().size() + n.taps().size()
                + n.services().size() + n.sources().size();
        for (var c : n.context()) features += c.items().size();
        long t1 = System.nanoTime();
        Topology topo = NetworkBuilder.build(n, Tolerances.DEFAULT, Progress.NONE);
        double topoMs = (System.nanoTime() - t1) / 1e6;
        long t2 = System.nanoTime();
        FeedTrace.Result tr = FeedTrace.run(NetworkState.of(topo));
        double traceMs = (System.nanoTime() - t2) / 1e6;
        gc();
        Runtime rt = Runtime.getRuntime();
        double heapMb = (rt.totalMemory() - rt.freeMemory()) / 1048576.0;
        out.printf(Locale.ROOT, "%n| file | features | raw read ms | raw read CPU ms | features/s | topology ms | full trace ms | stations | heap MB |%n");
        out.printf(Locale.ROOT, "|---|---:|---:|---:|---:|---:|---:|---:|---:|%n");
        out.printf(Locale.ROOT, "| %s | %d | %.0f | %.0f | %.0f | %.0f | %.0f | %d | %.0f |%n", network.getFileName(), features,
                bestMs, bestCpuMs, features / (bestMs / 1000), topoMs, traceMs, n.stations().size(), heapMb);
        out.flush();
        if (processes > 0) processes(out);
        return 0;
    }

    private void processes(PrintWriter out) throws IOException, InterruptedException {
        String javaBin = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> trace = new ArrayList<>(List.of(javaBin));
        trace.addAll(ManagementFactory.getRuntimeMXBean().getInputArguments());
        trace.addAll(List.of("-cp", System.getProperty("java.class.path"), Main.class.getName(), "trace",
                network.toString(), "--format", "json"));
        boolean gnuTime = Files.isExecutable(Path.of("/usr/bin/time"));
        boolean ogr = Files.isExecutable(Path.of("/usr/bin/ogrinfo")) || Files.isExecutable(Path.of("/usr/local/bin/ogrinfo"));
        out.printf(Locale.ROOT, "%n| run | shutline trace s | peak RSS MB | ogrinfo -al -q s | peak RSS MB | ratio |%n|---:|---:|---:|---:|---:|---:|%n");
        for (int i = 1; i <= processes; i++) {
            double[] a = run(trace, gnuTime);
            double[] b = ogr ? run(List.of("ogrinfo", "-ro", "-al", "-q", network.toString()), gnuTime) : new double[] {Double.NaN, Double.NaN};
            out.printf(Locale.ROOT, "| %d | %.2f | %.0f | %.2f | %.0f | %.2f |%n", i, a[0], a[1], b[0], b[1], a[0] / b[0]);
            out.flush();
        }
    }

    /** Runs a command with its output discarded: wall seconds and peak RSS in MB (NaN without GNU time). */
    private static double[] run(List<String> cmd, boolean gnuTime) throws IOException, InterruptedException {
        File rss = File.createTempFile("shutline-bench", ".txt");
        try {
            List<String> full = new ArrayList<>();
            if (gnuTime) full.addAll(List.of("/usr/bin/time", "-f", "%M", "-o", rss.toString()));
            full.addAll(cmd);
            long t0 = System.nanoTime();
            Process p = new ProcessBuilder(full).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                    .redirectError(ProcessBuilder.Redirect.DISCARD).start();
            int rc = p.waitFor();
            double s = (System.nanoTime() - t0) / 1e9;
            if (rc != 0) throw new IOException(String.join(" ", cmd) + " failed (exit " + rc + ")");
            double mb = Double.NaN;
            if (gnuTime) {
                String t = Files.readString(rss.toPath()).trim();
                String[] lines = t.split("\\R");
                mb = Double.parseDouble(lines[lines.length - 1].trim()) / 1024;
            }
            return new double[] {s, mb};
        } finally {
            Files.deleteIfExists(rss.toPath());
        }
    }

    private static void gc() {
        System.gc();
        System.gc();
    }
}
