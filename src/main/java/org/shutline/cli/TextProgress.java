package org.shutline.cli;

import java.io.PrintWriter;
import org.shutline.model.Progress;

/** A {@link Progress} for the command line: prints each task's name and size on one line; never cancelled. */
final class TextProgress implements Progress {
    private final PrintWriter err;

    TextProgress(PrintWriter err) {
        this.err = err;
    }

    @Override
    public void begin(String task, long total) {
        err.println(total > 0 ? task + " (" + total + ")" : task);
        err.flush();
    }

    @Override
    public void done(long units) {
        // one line per task is enough for the command line
    }

    @Override
    public boolean isCancelled() {
        return false;
    }
}
