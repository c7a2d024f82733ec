package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.Arrays;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A rebuild with nothing changed does no work as a whole command: it stops before the load step and leaves
 * every file of the output folder with its bytes and modification time, while any real change (a figure,
 * an output file edited by hand) still gets a normal build.
 */
class NoChangeRebuildTest {

    private static final String NOTHING_CHANGED = "Nothing changed since the last publish";

    @TempDir
    Path tmp;

    private Path project;
    private Path site;
    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @BeforeEach
    void publishOnce() throws IOException {
        project = tmp.resolve("project");
        site = tmp.resolve("site");
        assertEquals(0, run("scaffold", project.toString()));
        ProjectFolders.settle(project);
        assertEquals(0, run("publish", project.toString(), "--out", site.toString()), err.toString());
        out.getBuffer().setLength(0);
    }

    @Test
    void nothingChangedStopsBeforeTheLoadStepAndLeavesTheFolderUntouched() throws IOException {
        Map<String, String> before = snapshot(site);
        // Same size, same time, unreadable bytes: if the load step ran, this file would fail it (exit 1).
        Path geometry = project.resolve("regions/districts.geojson");
        FileTime time = Files.getLastModifiedTime(geometry);
        byte[] garbage = new byte[(int) Files.size(geometry)];
        Arrays.fill(garbage, (byte) '#');
        Files.write(geometry, garbage);
        Files.setLastModifiedTime(geometry, time);

        assertEquals(0, run("publish", project.toString(), "--out", site.toString()), err.toString());
        assertTrue(out.toString().contains(NOTHING_CHANGED), out.toString());
        assertEquals(before, snapshot(site), "every file keeps its bytes and modification time; none added or removed");
        Path fresh = ProjectFolders.copyWithoutCache(project, tmp.resolve("fresh"));
        assertEquals(1, run("audit", fresh.toString()), "loading that file, without a cache, fails");
    }

    @Test
    void aTouchedInputWithTheSameBytesIsStillUnchanged() throws IOException {
        Map<String, String> before = snapshot(site);
        Path csv = project.resolve("figures/districts.csv");
        Files.setLastModifiedTime(csv, FileTime.fromMillis(System.currentTimeMillis()));
        assertEquals(0, run("publish", project.toString(), "--out", site.toString()), err.toString());
        assertTrue(out.toString().contains(NOTHING_CHANGED), out.toString());
        assertEquals(before, snapshot(site));
    }

    @Test
    void aChangedFigureIsPublished() throws IOException {
        byte[] report = Files.readAllBytes(site.resolve("report.json"));
        Path csv = project.resolve("figures/districts.csv");
        Files.writeString(csv, Files.readString(csv).replace("SE,Dunmarsh,10.4", "SE,Dunmarsh,19.4"));
        assertEquals(0, run("publish", project.toString(), "--out", site.toString()), err.toString());
        assertTrue(out.toString().contains("Published"), out.toString());
        assertNotEquals(new String(report), Files.readString(site.resolve("report.json")));
    }

    @Test
    void anOutputFileRemovedByHandIsPutBack() throws IOException {
        byte[] index = Files.readAllBytes(site.resolve("index.html"));
        Files.delete(site.resolve("index.html"));
        assertEquals(0, run("publish", project.toString(), "--out", site.toString()), err.toString());
        assertTrue(out.toString().contains("Published"), out.toString());
        assertArrayEquals(index, Files.readAllBytes(site.resolve("index.html")));
    }

    @Test
    void aDamagedRecordMeansANormalBuild() throws IOException {
        try (Stream<Path> records = Files.list(project.resolve(".aequa-cache"))) {
            for (Path record : records.filter(p -> p.getFileName().toString().startsWith("publish-")).toList()) {
                byte[] bytes = Files.readAllBytes(record);
                bytes[bytes.length / 2] ^= 1;
                Files.write(record, bytes);
            }
        }
        assertEquals(0, run("publish", project.toString(), "--out", site.toString()), err.toString());
        assertTrue(!out.toString().contains(NOTHING_CHANGED) && out.toString().contains("left as it was"), out.toString());
        out.getBuffer().setLength(0);
        assertEquals(0, run("publish", project.toString(), "--out", site.toString()), err.toString());
        assertTrue(out.toString().contains(NOTHING_CHANGED), "the record is made again: " + out);
    }

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    /** Every path in the folder with its bytes' hash code and modification time. */
    private static Map<String, String> snapshot(Path dir) throws IOException {
        Map<String, String> files = new TreeMap<>();
        try (Stream<Path> walk = Files.walk(dir)) {
            for (Path p : walk.toList()) {
                String content = Files.isRegularFile(p) ? Integer.toString(Arrays.hashCode(Files.readAllBytes(p))) : "folder";
                files.put(dir.relativize(p).toString(), content + " @ " + Files.getLastModifiedTime(p).toMillis());
            }
        }
        return files;
    }
}
