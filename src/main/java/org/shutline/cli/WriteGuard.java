package org.shutline.cli;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.shutline.io.InputException;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * The one check, run for every command before it reads or writes anything, that no
 * command writes over a file it reads in the same run, and that its output folder can
 * take the files.
 *
 * <p>Inputs are every path given on the command line except the outputs: each
 * {@link Path} option or parameter (with mixins: network, {@code --mapping},
 * {@code --settings}, a plan, {@code export --plan}) other than {@code --out} and a
 * parameter labelled {@code OUT}. A folder given as an input (a shapefile folder)
 * stands for every file in it. Outputs are what a command that implements
 * {@link Writes} says it may write. Paths are compared by their real path
 * ({@link Path#toRealPath}: links and {@code ..} resolved, so two names of one file
 * match); an output that does not exist yet by the real path of its nearest existing
 * folder and the rest of its name. A match is an {@link InputException} (exit 2)
 * naming the command, the output and the input, before anything is written.
 *
 * <p>The output folder: a regular file given as the folder, or an existing folder that
 * cannot be written (or whose nearest existing parent cannot be, when it is to be
 * made), is refused the same way.
 */
final class WriteGuard {
    private WriteGuard() {}

    /** A command that writes files: the files it may write in this run (a superset is fine) and the folder they go into. */
    interface Writes {
        /** The files this run may write, as given (relative to the working folder or absolute). */
        List<Path> outputs();

        /** The folder the files go into, with the option that names it (for messages), or null when the outputs name no folder. */
        default Path outputFolder() {
            return null;
        }

        /** How the user named the output folder, e.g. {@code --out}. */
        default String outputOption() {
            return "--out";
        }
    }

    /**
     * Checks the parsed command line (the innermost subcommand decides); throws
     * {@link InputException} when an output is an input or the output folder is unusable.
     */
    static void check(CommandLine.ParseResult parsed) throws InputException {
        CommandLine.ParseResult p = parsed;
        while (true) {
            if (p.isUsageHelpRequested() || p.isVersionHelpRequested()) return;
            if (!p.hasSubcommand()) break;
            p = p.subcommand();
        }
        Object command = p.commandSpec().userObject();
        if (!(command instanceof Writes w)) return;
        String name = p.commandSpec().name();
        Path folder = w.outputFolder();
        if (folder != null) checkFolder(name, w.outputOption(), folder);
        Map<Path, Path> inputs = inputs(p.matchedArgs());
        for (Path out : w.outputs()) {
            Path real = realOrPlanned(out);
            Path in = inputs.get(real);
            if (in != null) {
                throw new InputException(name + ": refusing to write " + out + ": it is an input " + describe(in) + " read by this command ("
                        + in + "); nothing was written. Choose another " + w.outputOption() + (folder == null ? "" : " folder")
                        + " or move the input.");
            }
        }
    }

    /** Every input path of the matched arguments, by real path, with the name the user gave. */
    static Map<Path, Path> inputs(Collection<ArgSpec> args) {
        Map<Path, Path> m = new LinkedHashMap<>();
        for (ArgSpec a : args) {
            if (isOutput(a)) continue;
            for (Path given : paths(a.getValue())) {
                if (Files.isDirectory(given)) {
                    try (DirectoryStream<Path> ds = Files.newDirectoryStream(given)) {
                        for (Path f : ds) m.putIfAbsent(realOrPlanned(f), f);
                    } catch (IOException e) {
                        // an unreadable folder: the command's own read reports it; nothing in it can be matched
                    }
                }
                m.putIfAbsent(realOrPlanned(given), given);
            }
        }
        return m;
    }

    private static boolean isOutput(ArgSpec a) {
        if (a instanceof OptionSpec o) return List.of(o.names()).contains("--out");
        return a instanceof PositionalParamSpec pp && "OUT".equals(pp.paramLabel());
    }

    private static List<Path> paths(Object v) {
        List<Path> out = new ArrayList<>();
        if (v instanceof Path p) {
            out.add(p);
        } else if (v instanceof Collection<?> c) {
            for (Object o : c) {
                if (o instanceof Path p) out.add(p);
            }
        } else if (v instanceof Path[] ps) {
            out.addAll(List.of(ps));
        }
        return out;
    }

    /** The real path of {@code p}, or for a path not there yet the real path of its nearest existing folder with the rest of the name. */
    static Path realOrPlanned(Path p) {
        Path abs = p.toAbsolutePath().normalize();
        Path rest = abs.getFileSystem().getPath("");
        for (Path at = abs; at != null; at = at.getParent()) {
            try {
                return at.toRealPath().resolve(rest).normalize();
            } catch (IOException e) {
                // not there (or not reachable): try the parent
            }
            if (at.getFileName() != null) rest = at.getFileName().resolve(rest);
        }
        return abs;
    }

    private static String describe(Path in) {
        return Files.isDirectory(in) ? "folder" : "file";
    }

    private static void checkFolder(String command, String option, Path folder) throws InputException {
        if (Files.exists(folder) && !Files.isDirectory(folder)) {
            throw new InputException(command + ": " + option + " " + folder + " is a file, not a folder; give a folder"
                    + " (it is made when missing)");
        }
        Path existing = folder.toAbsolutePath().normalize();
        while (existing != null && !Files.exists(existing)) existing = existing.getParent();
        if (existing == null) return;
        if (!Files.isDirectory(existing)) {
            throw new InputException(command + ": " + option + " " + folder + " cannot be made: " + existing + " is a file");
        }
        if (!Files.isWritable(existing)) {
            throw new InputException(command + ": " + option + " " + folder + ": "
                    + (existing.equals(folder.toAbsolutePath().normalize()) ? "the folder" : "the folder " + existing)
                    + " is not writable here; give a folder you can write to");
        }
    }
}
