package org.thermion.power.startup;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.IntConsumer;
import java.util.function.IntFunction;

/**
 * Runs the independent transients of a sweep on a pool of threads: the network is immutable and
 * each run owns its state, so runs share nothing. Results come back in the order of the inputs.
 */
final class SweepPool {
    private SweepPool() {
    }

    /**
     * {@code task} for 0 .. {@code count - 1} on {@code threads} threads; {@code progress} hears how many
     * are finished after each one. A run's failure is rethrown as it was.
     */
    static <T> List<T> map(int count, int threads, IntFunction<T> task, IntConsumer progress) {
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(threads, Math.max(1, count))));
        AtomicInteger finished = new AtomicInteger();
        try {
            List<Future<T>> futures = new ArrayList<>(count);
            for (int i = 0; i < count; i++) {
                int k = i;
                futures.add(pool.submit(() -> {
                    T t = task.apply(k);
                    progress.accept(finished.incrementAndGet());
                    return t;
                }));
            }
            List<T> out = new ArrayList<>(count);
            for (Future<T> f : futures) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("sweep interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }
}
