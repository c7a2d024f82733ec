package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicIntegerArray;

import org.junit.jupiter.api.Test;

/** Jobs of a publish run once each, on the threads of the pool the caller runs in, and a failure stops the rest. */
class ParallelJobsTest {

    @Test
    void everyJobRunsOnceOnThePoolsThreads() throws Exception {
        ForkJoinPool pool = new ForkJoinPool(3);
        try {
            AtomicIntegerArray runs = new AtomicIntegerArray(40);
            Set<String> threads = ConcurrentHashMap.newKeySet();
            List<Runnable> jobs = new ArrayList<>();
            for (int i = 0; i < runs.length(); i++) {
                int job = i;
                jobs.add(() -> {
                    threads.add(Thread.currentThread().getName());
                    busy(5);
                    runs.incrementAndGet(job);
                });
            }
            assertEquals(3, pool.submit(ParallelJobs::threads).get(), "inside a pool: its parallelism");
            pool.submit(() -> ParallelJobs.runAll(jobs)).get();
            for (int i = 0; i < runs.length(); i++) {
                assertEquals(1, runs.get(i), "job " + i);
            }
            assertTrue(threads.size() > 1, "more than one thread took jobs: " + threads);
            assertTrue(threads.stream().allMatch(name -> name.contains("ForkJoinPool")), threads.toString());
        } finally {
            pool.shutdown();
        }
    }

    @Test
    void aFailureStartsNoFurtherJobAndReachesTheCaller() throws Exception {
        ForkJoinPool pool = new ForkJoinPool(1);
        try {
            AtomicIntegerArray runs = new AtomicIntegerArray(5);
            IllegalStateException failure = new IllegalStateException("job 2 failed");
            List<Runnable> jobs = new ArrayList<>();
            for (int i = 0; i < runs.length(); i++) {
                int job = i;
                jobs.add(() -> {
                    runs.incrementAndGet(job);
                    if (job == 2) {
                        throw failure;
                    }
                });
            }
            Exception thrown = assertThrows(Exception.class, () -> pool.submit(() -> ParallelJobs.runAll(jobs)).get());
            assertSame(failure, rootCause(thrown));
            assertEquals("[1, 1, 1, 0, 0]", runs.toString(), "one thread: the jobs after the failed one never start");
        } finally {
            pool.shutdown();
        }
    }

    private static Throwable rootCause(Throwable t) {
        Throwable cause = t;
        while (cause.getCause() != null) {
            cause = cause.getCause();
        }
        return cause;
    }

    private static void busy(long millis) {
        long end = System.nanoTime() + millis * 1_000_000;
        while (System.nanoTime() < end) {
            Thread.onSpinWait();
        }
    }
}
