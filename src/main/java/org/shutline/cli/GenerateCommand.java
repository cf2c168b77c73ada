package org.shutline.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.shutline.io.sample.GeneratedTown;
import org.shutline.io.sample.GridTown;
import org.shutline.io.sample.SampleTown;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code shutline generate OUT [--mains N] [--seed S] [--format gpkg|shp]}: writes the
 * sample town ({@link SampleTown}) or, with {@code --mains}, a synthetic grid town of
 * exactly N mains ({@link GridTown}). The format defaults to gpkg when OUT ends in
 * {@code .gpkg}, else shp (OUT is then a folder). An existing OUT file, or an existing
 * folder that is not empty, is refused unless {@code --force} is given. Exit 0, or 2
 * when OUT cannot be written or is refused.
 */
@Command(name = "generate", mixinStandardHelpOptions = true,
    description = "Write the sample town, or a large synthetic grid town for benchmarks.")
public final class GenerateCommand implements Callable<Integer> {
    /** Output formats. */
    public enum Format { gpkg, shp }

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "OUT", description = "a .gpkg file, or a folder for shapefiles")
    private Path out;

    @Option(names = "--mains", paramLabel = "N", description = "write a grid town of N mains instead of the sample town")
    private Integer mains;

    @Option(names = "--seed", paramLabel = "S", description = "random seed (default: the sample town's)")
    private Long seed;

    @Option(names = "--format", description = "gpkg or shp (default: from OUT's extension)")
    private Format format;

    @Option(names = "--force", description = "write over an existing OUT file, or into a folder that is not empty")
    private boolean force;

    @Override
    public Integer call() {
        PrintWriter o = spec.commandLine().getOut();
        long s = seed == null ? SampleTown.DEFAULT_SEED : seed;
        if (mains != null && mains < 20) {
            spec.commandLine().getErr().println("--mains must be at least 20");
            return 2;
        }
        String taken = force ? null : taken(out);
        if (taken != null) {
            spec.commandLine().getErr().println("generate: " + taken + "; give --force to write over it, or another OUT");
            return 2;
        }
        GeneratedTown town = mains == null ? SampleTown.generate(s) : GridTown.generate(mains, s);
        Format f = format != null ? format
            : out.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".gpkg") ? Format.gpkg : Format.shp;
        Progress progress = mains == null ? Progress.NONE : new TextProgress(spec.commandLine().getErr());
        try {
            if (f == Format.gpkg) town.writeGeoPackage(out, progress);
            else town.writeShapefiles(out, progress);
        } catch (IOException e) {
            spec.commandLine().getErr().println("cannot write " + out + ": " + e.getMessage());
            return 2;
        }
        Network n = town.network();
        o.printf(Locale.ROOT, "wrote %s (%s): %d mains, %d valves, %d stations, %d sensing taps, %d services, %d sources%n",
            out, f, n.mains().size(), n.valves().size(), n.stations().size(), n.taps().size(), n.services().size(),
            n.sources().size());
        o.flush();
        return 0;
    }

    /** Why writing to {@code out} would replace something already there, or null when nothing is there. */
    static String taken(Path out) {
        if (java.nio.file.Files.isRegularFile(out)) return out + " exists";
        if (java.nio.file.Files.isDirectory(out)) {
            try (java.util.stream.Stream<Path> s = java.nio.file.Files.list(out)) {
                if (s.findAny().isPresent()) return out + " is a folder that is not empty";
            } catch (IOException e) {
                return out + " is a folder that cannot be listed (" + e.getMessage() + ")";
            }
        }
        return null;
    }
}
