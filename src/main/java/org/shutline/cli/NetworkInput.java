package org.shutline.cli;

import java.nio.file.Path;
import org.shutline.app.AnalysisSettings;
import org.shutline.app.Workspace;
import org.shutline.io.InputException;
import org.shutline.model.Progress;

/** Opens a network (with an optional mapping file) for the commands, through {@link Workspace#open}. */
final class NetworkInput {
    private NetworkInput() {}

    /** Reports a user's input problem on stderr (message only, no stack trace) and gives exit code 2. */
    static int badInput(java.io.PrintWriter err, String message) {
        err.println(message);
        err.flush();
        return 2;
    }

    /**
     * Opens the network for a command other than {@code check}: the error-level
     * findings are reported through {@link DataErrors} (one line on stderr, exit 1), and a
     * network with no usable main (none active with a geometry, after the read skipped what
     * it had to) is refused with an {@link InputException} (exit 2) naming the file.
     */
    static Workspace load(Path network, Path mapping, AnalysisSettings settings, Progress progress) throws InputException {
        Workspace w = Workspace.open(network, mapping, settings, progress);
        DataErrors.record(w.network().sourceName(), w.findings());
        if (w.usableMains() == 0) {
            long errors = DataErrors.countsByCode(w.findings()).values().stream().mapToInt(Integer::intValue).sum();
            throw new InputException("no usable mains in " + network + ": " + w.network().mains().size()
                    + " main(s) read, none active with a geometry" + (errors > 0 ? " (" + errors + " error finding(s) from the read)" : "")
                    + "; nothing to trace. Run `shutline check " + network + "` for the reasons.");
        }
        return w;
    }
}
