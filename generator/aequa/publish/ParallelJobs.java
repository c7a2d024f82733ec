package aequa.publish;

import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;

/**
 * Runs independent jobs on every thread of the fork/join pool the caller runs in (the common pool unless the
 * caller runs inside another), plus the calling thread. Each thread takes the next job in the order given
 * until none is left (greedy list scheduling: with the longest jobs first, the last one to finish ends
 * soonest; R. L. Graham, "Bounds on multiprocessing timing anomalies", SIAM J. Appl. Math. 17, 1969).
 *
 * <p>Guarantees: every job runs exactly once, unless one throws, after which no further job starts and the
 * failure is thrown once the running ones end; everything the jobs did is visible to the caller when
 * {@link #runAll} returns (fork/join completion). Jobs must not depend on one another's order: what they make
 * is collected by the caller afterwards, in an order of its own, so output never depends on scheduling.
 */
final class ParallelJobs {

    private ParallelJobs() {
    }

    /** Runs every job, taking them in the order given. */
    static void runAll(List<Runnable> jobs) {
        AtomicInteger next = new AtomicInteger();
        int runners = Math.min(jobs.size(), threads());
        IntStream.range(0, runners).parallel().forEach(runner -> {
            for (int j = next.getAndIncrement(); j < jobs.size(); j = next.getAndIncrement()) {
                try {
                    jobs.get(j).run();
                } catch (RuntimeException | Error e) {
                    next.set(jobs.size()); // start nothing more
                    throw e;
                }
            }
        });
    }

    /**
     * How many threads work at once: the parallelism of the pool the caller runs in, plus the calling thread
     * when it is not one of the pool's (it takes part in the work of its parallel streams).
     */
    static int threads() {
        return ForkJoinTask.inForkJoinPool() ? Math.max(1, ForkJoinTask.getPool().getParallelism())
                : ForkJoinPool.getCommonPoolParallelism() + 1;
    }
}
