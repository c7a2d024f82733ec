package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The lock holds against this process and against another process, even after a failed second attempt. */
class SiteLockTest {

    /** Exit code of {@link #main} when the lock was busy. */
    static final int BUSY = 3;

    @TempDir
    Path tmp;

    /** Run in a child JVM: tries the lock on {@code args[0]} once; exits 0 when taken, {@link #BUSY} when held. */
    public static void main(String[] args) throws IOException {
        try (SiteLock lock = SiteLock.acquire(Path.of(args[0]), Duration.ZERO)) {
            System.exit(0);
        } catch (SiteLockedException busy) {
            System.exit(BUSY);
        }
    }

    @Test
    void aSecondAttemptInThisProcessDoesNotFreeTheLockForOthers() throws Exception {
        Path out = tmp.resolve("site");
        try (SiteLock held = SiteLock.acquire(out, Duration.ZERO)) {
            assertThrows(SiteLockedException.class, () -> SiteLock.acquire(out, Duration.ZERO));
            assertEquals(BUSY, tryFromAnotherProcess(out));
        }
        assertEquals(0, tryFromAnotherProcess(out));
    }

    @Test
    void waitingGivesUpWithTheTimeInTheMessage() throws Exception {
        Path out = tmp.resolve("site");
        try (SiteLock held = SiteLock.acquire(out, Duration.ZERO)) {
            SiteLockedException e = assertThrows(SiteLockedException.class,
                    () -> SiteLock.acquire(out, Duration.ofMillis(300)));
            assertEquals(SiteLock.lockFileFor(out), e.lockFile());
        }
    }

    private static int tryFromAnotherProcess(Path out) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                SiteLockTest.class.getName(), out.toString())
                .redirectError(ProcessBuilder.Redirect.DISCARD).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .start();
        return child.waitFor();
    }

}
