package org.shutline.fuzz;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;

/**
 * The rule every fuzz test applies to one input: the code under test ends within
 * {@link #LIMIT_SECONDS} and throws nothing but the exceptions its reader documents for
 * bad input. Anything else (a runtime exception, an error, a checked exception not
 * documented, a time-out) is a finding: runtime exceptions and errors are rethrown as
 * they are, so that the fuzzer reports their own stack trace.
 *
 * <p>The body runs on a worker thread so that a hang is reported as a time-out instead
 * of stopping the run; a worker that does not end is abandoned (it is a daemon) and a
 * new one started.
 */
public final class Bounded {
    /** Time allowed for one fuzz input, far above what any input of a few KB needs. */
    public static final int LIMIT_SECONDS = 10;

    /** The code under test. */
    @FunctionalInterface
    public interface Body {
        void run() throws Exception;
    }

    private static ExecutorService worker = newWorker();

    private Bounded() {}

    /**
     * Runs {@code body}; returns the documented exception it threw (one of {@code allowed}),
     * or null when it ended normally.
     */
    @SafeVarargs
    public static synchronized Throwable run(Body body, Class<? extends Throwable>... allowed) {
        Future<?> f = worker.submit(() -> {
            body.run();
            return null;
        });
        try {
            f.get(LIMIT_SECONDS, TimeUnit.SECONDS);
            return null;
        } catch (TimeoutException e) {
            f.cancel(true);
            worker.shutdownNow();
            worker = newWorker();
            throw new AssertionError("one input ran longer than " + LIMIT_SECONDS + " s (a hang)");
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            for (Class<? extends Throwable> a : allowed) {
                if (a.isInstance(cause)) return cause;
            }
            if (cause instanceof RuntimeException re) throw re;
            if (cause instanceof Error er) throw er;
            throw new AssertionError("undocumented exception " + cause, cause);
        }
    }

    private static ExecutorService newWorker() {
        return Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "fuzz-body");
            t.setDaemon(true);
            return t;
        });
    }
}
