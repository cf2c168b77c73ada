package org.shutline.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.EventQueue;
import org.junit.jupiter.api.Test;

/** The event-thread watch records a dispatch longer than its threshold and nothing for short ones. */
class EdtWatchTest {
    @Test
    void aLongDispatchIsRecorded() throws Exception {
        EdtWatch w = EdtWatch.install(100, false);
        EventQueue.invokeAndWait(() -> { });
        w.reset();
        EventQueue.invokeAndWait(() -> { });
        assertThat(w.longDispatches()).isEmpty();
        EventQueue.invokeAndWait(() -> {
            long end = System.nanoTime() + 150_000_000L;
            while (System.nanoTime() < end) Thread.onSpinWait();
        });
        // invokeAndWait returns when the runnable ends, before the watch's own bookkeeping: one more event to flush it
        EventQueue.invokeAndWait(() -> { });
        assertThat(w.longDispatches()).hasSize(1);
        assertThat(w.longDispatches().get(0).millis()).isGreaterThanOrEqualTo(150);
        assertThat(w.maxMillis()).isGreaterThanOrEqualTo(150);
    }
}
