package org.shutline.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.shutline.io.InputException;
import org.shutline.model.Progress;
import org.shutline.topology.Topology;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code shutline check NETWORK [--mapping FILE] [--format text|json]}: reads the
 * network, builds its topology with the tolerances of the mapping file (else the defaults) and prints a
 * {@link CheckReport}. Exit 0 when there is no ERROR (or CRITICAL) finding, 1 when there
 * is, 2 when the input cannot be read (the message goes to stderr, no stack trace).
 */
@Command(name = "check", mixinStandardHelpOptions = true,
    description = "Check a network (GeoPackage or shapefile folder): counts per layer and system, and findings.")
public final class CheckCommand implements Callable<Integer> {
    /** Output formats. */
    public enum Format { text, json }

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "NETWORK", description = "a .gpkg file or a folder of shapefiles")
    private Path network;

    @Option(names = "--mapping", paramLabel = "FILE", description = "field-mapping file (YAML)")
    private Path mapping;

    @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
    private Format format;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Topology t;
        try {
            t = NetworkInput.read(network, mapping, Progress.NONE);
        } catch (InputException e) {
            return NetworkInput.badInput(err, e.getMessage());
        }
        CheckReport r = CheckReport.of(t.network(), t.findings());
        out.print(format == Format.json ? r.toJson() : r.toText());
        out.flush();
        return r.exitCode();
    }
}
