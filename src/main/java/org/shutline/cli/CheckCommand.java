package org.shutline.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.shutline.app.Workspace;
import org.shutline.io.InputException;
import org.shutline.model.Progress;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code shutline check NETWORK [--mapping FILE] [--settings FILE] [--format text|json]}: reads the
 * network, builds its topology with the tolerances of the settings file, else of the mapping file, else
 * the defaults, and prints a {@link CheckReport}. Exit 0 when there is no ERROR (or CRITICAL) finding, 1 when there
 * is, 2 when the input cannot be read (the message goes to stderr, no stack trace).
 */
@Command(name = "check", mixinStandardHelpOptions = true,
    description = "Check a network (GeoPackage or shapefile folder): counts per layer and system, and findings.")
public final class CheckCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin private NetworkOptions input;
    @Mixin private SettingsFileOption settings;
    @Mixin private Formats.TextJson format;

    @Override
    public Integer call() throws InputException {
        PrintWriter out = spec.commandLine().getOut();
        Workspace w = Workspace.open(input.network, input.mapping, settings.load(), Progress.NONE);
        CheckReport r = CheckReport.of(w.network(), w.findings());
        out.print(format.format() == Formats.Format.json ? r.toJson() : r.toText());
        out.flush();
        return r.exitCode();
    }
}
