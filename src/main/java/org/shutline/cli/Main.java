package org.shutline.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code shutline} command: one subcommand class per command, registered here.
 * Exit codes: 0 done (for {@code check}: no error findings), 1 {@code check} found
 * errors, or any other command's network gave error-level findings (one line on stderr
 * names them, {@link DataErrors}; {@code plan} also exits 1 on a critical hazard), 2 the input could not be read or the command line is wrong, 3 an internal
 * error (the exception and where it was thrown go to stderr for a bug report), among
 * them an answer whose re-trace check failed
 * ({@link org.shutline.analysis.UnverifiedInstructionException}: the query is named and
 * no instruction printed).
 */
@Command(name = "shutline", mixinStandardHelpOptions = true, version = "shutline 0.1.0",
    description = "Gas distribution outage zoning: network check, feed trace, valve isolation, work plans, maps.",
    subcommands = {CheckCommand.class, TraceCommand.class, IsolateCommand.class, PlanCommand.class, IncidentCommand.class,
        RiskCommand.class, CardsCommand.class, ExportCommand.class, GenerateCommand.class, BenchCommand.class, ReadBenchCommand.class,
        PlanBenchCommand.class, OpenCommand.class, VerifyCommand.class, CommandLine.HelpCommand.class})
public final class Main implements Runnable {
    /** Exit code for a failure inside Shutline itself (a bug), distinct from 1 (errors found) and 2 (bad input). */
    public static final int INTERNAL_ERROR = 3;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        // The GeoPackage library logs through SLF4J and no provider is bundled: without this,
        // SLF4J prints a three-line notice about that on every run.
        if (System.getProperty("slf4j.internal.verbosity") == null) {
            System.setProperty("slf4j.internal.verbosity", "ERROR");
        }
        // no arguments: the window on the bundled sample when there is a display; without one,
        // the main job on the sample at the command line (the sample plan's evaluation)
        if (args.length == 0) {
            String[] open = OpenCommand.sampleArgs();
            if (!java.awt.GraphicsEnvironment.isHeadless()) {
                args = open;
            } else if (open.length == 3) {
                System.err.println("shutline: no display for the window; evaluating the sample plan instead"
                        + " (see ./shutline --help for all commands)");
                args = new String[] {"plan", open[1], open[2]};
            }
        }
        System.exit(commandLine().execute(args));
    }

    /** The configured command line (used by {@link #main} and the tests). */
    public static CommandLine commandLine() {
        quietLibraryLogging();
        CommandLine cl = new CommandLine(new Main());
        // data problems reach every command: a run whose network gave error-level findings
        // prints one line about them (DataErrors) and does not exit 0
        cl.setExecutionStrategy(parsed -> {
            // before anything is read or written: no output may be an input of this run (WriteGuard)
            try {
                WriteGuard.check(parsed);
            } catch (org.shutline.io.InputException e) {
                return NetworkInput.badInput(parsed.commandSpec().commandLine().getErr(), e.getMessage());
            }
            DataErrors.begin(parsed.commandSpec().commandLine().getErr());
            int code;
            int errors;
            try {
                code = new CommandLine.RunLast().execute(parsed);
            } finally {
                errors = DataErrors.end();
            }
            return code == 0 && errors > 0 ? 1 : code;
        });
        cl.setExecutionExceptionHandler((e, line, parsed) -> {
            // input that cannot be read or used (network, mapping, settings or plan file): the message, exit 2
            if (e instanceof org.shutline.io.InputException || e instanceof org.shutline.plan.PlanException) {
                return NetworkInput.badInput(line.getErr(), e.getMessage());
            }
            if (e instanceof org.shutline.analysis.UnverifiedInstructionException u) {
                // an answer that its re-trace does not confirm is never printed as an instruction
                line.getErr().println("shutline: " + u.getMessage());
                line.getErr().println("  no instruction was printed for \"" + u.query() + "\"; please report this with the network and command");
                line.getErr().flush();
                return INTERNAL_ERROR;
            }
            // a broken contract inside Shutline, not bad input: say so, with where it happened
            line.getErr().println("shutline: internal error: " + e);
            for (Throwable t = e; t != null; t = t.getCause()) {
                if (t != e) line.getErr().println("  caused by: " + t);
                StackTraceElement[] st = t.getStackTrace();
                if (st.length > 0) line.getErr().println("    at " + st[0]);
            }
            line.getErr().flush();
            return INTERNAL_ERROR;
        });
        return cl;
    }

    /**
     * Library log lines (java.util.logging, which the GeoPackage and SQLite libraries use)
     * never reach the terminal: a file problem reaches the user as one located message
     * from our own handler. {@code SHUTLINE_LIBRARY_LOG=1} keeps them, for a bug report.
     */
    static void quietLibraryLogging() {
        if (System.getenv("SHUTLINE_LIBRARY_LOG") != null) return;
        java.util.logging.Logger root = java.util.logging.LogManager.getLogManager().getLogger("");
        if (root == null) return;
        for (java.util.logging.Handler h : root.getHandlers()) root.removeHandler(h);
        root.setLevel(java.util.logging.Level.OFF);
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
