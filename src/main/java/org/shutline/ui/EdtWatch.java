package org.shutline.ui;

import java.awt.AWTEvent;
import java.awt.EventQueue;
import java.awt.Toolkit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Watches the event thread: an {@link EventQueue} pushed on the system queue that
 * measures how long each event takes to dispatch and keeps every dispatch longer than
 * the threshold (event class and milliseconds). With {@code -Dshutline.edtWatch=true}
 * the window installs it at start and each long dispatch is also written to stderr as
 * {@code shutline: event thread busy 143 ms on java.awt.event.InvocationEvent}. The
 * threshold is {@code -Dshutline.edtWatchMs} (default 100). Tests install it and
 * assert on {@link #longDispatches()}.
 */
public final class EdtWatch extends EventQueue {
    /** One dispatch that took longer than the threshold. */
    public record Long(String event, double millis) {}

    private static EdtWatch installed;

    private final double thresholdMs;
    private final boolean log;
    private final List<Long> slow = new ArrayList<>();
    private double maxMs;

    private EdtWatch(double thresholdMs, boolean log) {
        this.thresholdMs = thresholdMs;
        this.log = log;
    }

    /** Installs the watch when {@code shutline.edtWatch} is true; returns it or null. */
    public static synchronized EdtWatch installIfAsked() {
        if (!Boolean.getBoolean("shutline.edtWatch")) return null;
        return install(thresholdFromProperty(), true);
    }

    /** Installs (once) a watch with this threshold; later calls return the one installed. */
    public static synchronized EdtWatch install(double thresholdMs, boolean log) {
        if (installed == null) {
            installed = new EdtWatch(thresholdMs, log);
            Toolkit.getDefaultToolkit().getSystemEventQueue().push(installed);
        }
        return installed;
    }

    static double thresholdFromProperty() {
        String s = System.getProperty("shutline.edtWatchMs", "100");
        try {
            return Double.parseDouble(s);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("shutline.edtWatchMs must be a number of milliseconds: '" + s + "'", e);
        }
    }

    @Override
    protected void dispatchEvent(AWTEvent event) {
        long t0 = System.nanoTime();
        try {
            super.dispatchEvent(event);
        } finally {
            double ms = (System.nanoTime() - t0) / 1e6;
            if (ms > thresholdMs) record(event, ms);
            else if (ms > maxMs) note(ms);
        }
    }

    private synchronized void note(double ms) {
        if (ms > maxMs) maxMs = ms;
    }

    private synchronized void record(AWTEvent event, double ms) {
        maxMs = Math.max(maxMs, ms);
        String what = event.getClass().getName() + (event instanceof java.awt.event.InvocationEvent ie ? " " + ie.paramString() : "");
        slow.add(new Long(what, ms));
        if (log) System.err.printf(Locale.ROOT, "shutline: event thread busy %.0f ms on %s%n", ms, what);
    }

    public double thresholdMs() {
        return thresholdMs;
    }

    /** The dispatches over the threshold so far (a copy). */
    public synchronized List<Long> longDispatches() {
        return List.copyOf(slow);
    }

    /** The longest dispatch seen so far, in milliseconds. */
    public synchronized double maxMillis() {
        return maxMs;
    }

    /** Forgets what was recorded (tests measure one phase at a time). */
    public synchronized void reset() {
        slow.clear();
        maxMs = 0;
    }
}
