package org.shutline.model;

import java.util.concurrent.CancellationException;

/**
 * Progress and cancellation for long work. The engine reports through this and calls
 * {@link #checkCancelled()} every few thousand items; the window passes one that drives
 * a progress bar, the command line a silent or text one. Implementations must be
 * safe to call from a worker thread.
 */
public interface Progress {
    /** Start a task of {@code total} units (0 when unknown). */
    void begin(String task, long total);

    /** Units done so far in the current task. */
    void done(long units);

    boolean isCancelled();

    /** Throws {@link CancellationException} when cancellation was asked for. */
    default void checkCancelled() {
        if (isCancelled()) throw new CancellationException("cancelled");
    }

    /** A progress that shows nothing and is never cancelled. */
    Progress NONE = new Progress() {
        @Override public void begin(String task, long total) {}
        @Override public void done(long units) {}
        @Override public boolean isCancelled() { return false; }
    };
}
