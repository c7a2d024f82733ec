package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.publish.SiteLock;

/**
 * A publish into an output that another publish is writing: it learns so before its load step, may wait
 * with {@code --wait SECONDS}, and exits with its own code 4 (README, exit codes).
 */
class BusyOutputTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @TempDir
    Path tmp;

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    /** A scaffolded project whose figures lack a region the project treats as an error: its load step fails. */
    private Path projectWithDataErrors() throws IOException {
        Path project = tmp.resolve("project");
        assertEquals(0, run("scaffold", project.toString()));
        Path yaml = project.resolve("aequa.yaml");
        Files.writeString(yaml, Files.readString(yaml) + "checks:\n  missing-figures: error\n");
        Path csv = project.resolve("figures/districts.csv");
        Files.writeString(csv, Files.readString(csv).replace("SE,Dunmarsh,10.4\n", ""));
        return project;
    }

    @Test
    void theLockIsCheckedBeforeTheLoadStep() throws IOException {
        Path project = projectWithDataErrors();
        Path site = tmp.resolve("site");
        try (SiteLock held = SiteLock.acquire(site, Duration.ZERO)) {
            // the load step would end with exit 1 (data errors); the busy output must be reported first
            assertEquals(4, run("publish", project.toString(), "--out", site.toString()), err.toString());
        }
        assertTrue(err.toString().contains("--wait SECONDS"), err.toString());
        assertEquals(1, err.toString().strip().lines().count(), "the load step ran and reported findings: " + err);
    }

    @Test
    void waitGivesTheOtherPublishThatLongThenFailsWithFour() throws IOException {
        Path project = projectWithDataErrors();
        Path site = tmp.resolve("site");
        long start = System.nanoTime();
        try (SiteLock held = SiteLock.acquire(site, Duration.ZERO)) {
            assertEquals(4, run("publish", project.toString(), "--out", site.toString(), "--wait", "1"));
        }
        assertTrue(System.nanoTime() - start >= 1_000_000_000L, "did not wait");
        assertTrue(err.toString().contains("within 1 s"), err.toString());
    }

    @Test
    void theHelpListsTheExitCodeForABusyOutput() {
        assertEquals(0, run("--help"));
        assertTrue(out.toString().contains("4") && out.toString().contains("another publish is writing"), out.toString());
    }
}
