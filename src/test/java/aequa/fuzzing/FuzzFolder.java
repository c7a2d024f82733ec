package aequa.fuzzing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * A scratch project folder shared by the fuzz tests of one JVM: each input is written to a file there and
 * read back by aequa's front doors, as a user's file would be. Deleted when the JVM exits.
 */
final class FuzzFolder {

    private static final Path ROOT = create();

    /** Runs each input on a thread of its own, so a hang is noticed; daemon threads, so a hung one cannot keep the JVM. */
    private static final ExecutorService RUNNER = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "aequa-fuzz-input");
        t.setDaemon(true);
        return t;
    });

    private FuzzFolder() {
    }

    /** A fresh folder for one fuzz test's files (emptied of that test's files by each write). */
    static Path of(String name) {
        try {
            return Files.createDirectories(ROOT.resolve(name));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Writes {@code bytes} to {@code folder/relative}, replacing what an earlier input left there. */
    static void write(Path folder, String relative, byte[] bytes) {
        try {
            Path file = folder.resolve(relative);
            Files.createDirectories(file.getParent());
            Files.write(file, bytes);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Runs {@code work} and fails (a finding for the fuzzer) when it takes longer than {@code seconds}: the
     * "bounded time per input" of the fuzz property. Exceptions and errors of {@code work} are rethrown as
     * they are. (JUnit's {@code @Timeout} is no substitute: in a fuzzing run it bounds the whole campaign.)
     */
    static void withinSeconds(long seconds, Runnable work) {
        Future<?> running = RUNNER.submit(work);
        try {
            running.get(seconds, TimeUnit.SECONDS);
        } catch (TimeoutException hang) {
            running.cancel(true);
            throw new AssertionError("the input took longer than " + seconds + " s");
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException runtime) {
                throw runtime;
            }
            if (cause instanceof Error error) {
                throw error;
            }
            throw new IllegalStateException(cause);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        }
    }

    /**
     * The property every reader promises for any input: problems come back as findings that say what is
     * wrong in the user's terms (a code and a sentence), about the file the user named.
     */
    static void assertClear(Findings findings, String file) {
        assertClear(findings);
        for (Finding finding : findings.list()) {
            assertTrue(finding.file().isEmpty() || finding.file().equals(file), "a finding about the file read: " + finding.toLine());
        }
    }

    /** Every finding has a code and a sentence. */
    static void assertClear(Findings findings) {
        for (Finding finding : findings.list()) {
            assertFalse(finding.code().isBlank(), finding.toLine());
            assertFalse(finding.message().isBlank(), finding.toLine());
        }
    }

    private static Path create() {
        try {
            Path root = Files.createTempDirectory("aequa-fuzz-");
            Runtime.getRuntime().addShutdownHook(new Thread(() -> deleteTree(root)));
            return root;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void deleteTree(Path root) {
        try (var paths = Files.walk(root)) {
            for (Path p : paths.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            // a temporary folder left behind is harmless
        }
    }
}
