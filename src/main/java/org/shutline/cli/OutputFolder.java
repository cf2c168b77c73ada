package org.shutline.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import org.shutline.io.OutputPackage;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/**
 * Begins the package of files a command writes into its {@code --out} folder
 * ({@link OutputPackage}: stale temporary files of a stopped run removed, the manifest
 * written last) and says on the error stream what it found there: temporary files
 * removed, or a package that was not whole (a run stopped part-way).
 */
final class OutputFolder {
    private OutputFolder() {}

    static OutputPackage start(Path dir, CommandSpec spec, PrintWriter err) throws IOException {
        CommandLine.ParseResult parsed = spec.root().commandLine().getParseResult();
        String command = "shutline " + String.join(" ", parsed == null ? List.of(spec.name()) : parsed.originalArgs());
        OutputPackage pkg = OutputPackage.start(dir, command);
        int n = pkg.removedTemporaries().size();
        if (n > 0) err.println(spec.name() + ": removed " + n + " temporary file" + (n == 1 ? "" : "s") + " left in " + dir + " by a stopped run");
        OutputPackage.Status st = pkg.previous().status();
        if (st == OutputPackage.Status.BROKEN || st == OutputPackage.Status.UNREADABLE) {
            err.println(spec.name() + ": the files found in " + dir + " were " + pkg.previous().describe() + "; writing them anew");
        }
        err.flush();
        return pkg;
    }
}
