package org.shutline.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.shutline.io.OutputPackage;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code shutline verify DIR}: checks a folder written by {@code export}, {@code plan --out},
 * {@code risk} or {@code cards} against its manifest ({@link OutputPackage}, every file's
 * size and SHA-256) and says whether the package in it is whole. Exit 0 when whole, 1
 * when a file is missing or differs (a run stopped part-way, or a file changed since),
 * 2 when the folder has no readable manifest or cannot be read. Reads only.
 */
@Command(name = "verify", mixinStandardHelpOptions = true,
    description = "Check that a folder of written files (export, plan --out, risk, cards) is whole, by its manifest.")
public final class VerifyCommand implements Callable<Integer> {
    @Spec private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DIR", description = "a folder written by export, plan --out, risk or cards")
    private Path dir;

    @Override
    public Integer call() {
        PrintWriter o = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (!Files.isDirectory(dir)) return NetworkInput.badInput(err, "verify: " + dir + " is not a folder");
        OutputPackage.Check c;
        try {
            c = OutputPackage.check(dir);
        } catch (IOException e) {
            return NetworkInput.badInput(err, "verify: cannot read " + dir + ": " + e.getMessage());
        }
        switch (c.status()) {
            case WHOLE -> {
                o.println(dir + ": " + c.describe());
                for (OutputPackage.Entry e : c.files()) o.println("  " + e.name() + "  " + e.size() + " bytes  sha256 " + e.sha256());
                o.flush();
                return 0;
            }
            case BROKEN -> {
                o.println(dir + ": NOT a whole package (manifest of " + c.command() + ", written " + c.written() + "):");
                for (String p : c.problems()) o.println("  " + p);
                o.println("Run the command again to write the whole package.");
                o.flush();
                return 1;
            }
            default -> {
                return NetworkInput.badInput(err, "verify: " + dir + ": " + c.describe());
            }
        }
    }
}
