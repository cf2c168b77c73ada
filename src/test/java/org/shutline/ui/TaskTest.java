package org.shutline.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.concurrent.CancellationException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;

/** A background task reports progress, delivers its value, and stops at the engine's next check when cancelled. */
class TaskTest {
    @Test
    void cancelStopsTheWorkAtItsNextCheck() throws Exception {
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch finished = new CountDownLatch(1);
        AtomicReference<Throwable> failure = new AtomicReference<>();
        AtomicReference<Long> reached = new AtomicReference<>(0L);
        Task<String> t = new Task<>("loop", p -> {
            p.begin("count", 1_000_000_000L);
            for (long i = 0; ; i++) {
                if ((i & 4095) == 0) {
                    p.done(i);
                    reached.set(i);
                    started.countDown();
                    p.checkCancelled();
                }
            }
        }, v -> finished.countDown(), e -> {
            failure.set(e);
            finished.countDown();
        });
        t.execute();
        assertThat(started.await(10, TimeUnit.SECONDS)).isTrue();
        assertThat(t.task()).isEqualTo("count");
        assertThat(t.fraction()).isBetween(0.0, 1.0);
        t.cancel();
        assertThat(finished.await(10, TimeUnit.SECONDS)).isTrue();
        assertThat(failure.get()).isInstanceOf(CancellationException.class);
        assertThat(t.cancelAsked()).isTrue();
    }

    @Test
    void theValueArrives() throws Exception {
        CountDownLatch done = new CountDownLatch(1);
        AtomicReference<Integer> value = new AtomicReference<>();
        new Task<>("sum", p -> 6 * 7, v -> {
            value.set(v);
            done.countDown();
        }, e -> done.countDown()).execute();
        assertThat(done.await(10, TimeUnit.SECONDS)).isTrue();
        assertThat(value.get()).isEqualTo(42);
    }
}
