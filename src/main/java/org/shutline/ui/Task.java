package org.shutline.ui;

import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import javax.swing.SwingWorker;
import org.shutline.model.Progress;

/**
 * A background job with progress and cancel: {@link Work#run} runs on a worker thread
 * with a {@link Progress} of its own that the status bar polls ({@link #task()}, {@link #fraction()});
 * {@link #cancel()} makes the progress report cancelled, so the engine's
 * {@code checkCancelled()} stops the work. The outcome is delivered on the event thread:
 * the value to {@code onDone}, or the failure (a {@link CancellationException} when
 * cancelled) to {@code onFail}.
 *
 * @param <T> the result type
 */
public final class Task<T> extends SwingWorker<T, Void> {
    /** The work, run off the event thread. */
    @FunctionalInterface
    public interface Work<T> {
        T run(Progress progress) throws Exception;
    }

    private final String name;
    private final Work<T> work;
    private final Consumer<T> onDone;
    private final Consumer<Throwable> onFail;
    private volatile boolean cancelled;
    private volatile String task = "";
    private volatile long total;
    private volatile long done;

    public Task(String name, Work<T> work, Consumer<T> onDone, Consumer<Throwable> onFail) {
        this.name = name;
        this.work = work;
        this.onDone = onDone;
        this.onFail = onFail;
        this.task = name;
    }

    public String name() {
        return name;
    }

    @Override
    protected T doInBackground() throws Exception {
        return work.run(meter);
    }

    @Override
    protected void done() {
        if (cancelled) {
            onFail.accept(new CancellationException(name + " cancelled"));
            return;
        }
        try {
            onDone.accept(get());
        } catch (ExecutionException e) {
            onFail.accept(e.getCause() == null ? e : e.getCause());
        } catch (InterruptedException | CancellationException e) {
            onFail.accept(e);
        }
    }

    /** Asks the work to stop (it stops at its next cancellation check). */
    public void cancel() {
        cancelled = true;
    }

    private final Progress meter = new Progress() {
        @Override public void begin(String t, long tot) {
            task = t;
            total = tot;
            done = 0;
        }

        @Override public void done(long units) {
            done = units;
        }

        @Override public boolean isCancelled() {
            return cancelled;
        }
    };

    /** Whether {@link #cancel()} was called. */
    public boolean cancelAsked() {
        return cancelled;
    }

    /** The current sub-task name. */
    public String task() {
        return task;
    }

    /** Fraction done 0..1, or -1 when the size is unknown. */
    public double fraction() {
        long t = total;
        return t <= 0 ? -1 : Math.min(1.0, (double) done / t);
    }
}
