package aequa.cli;

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
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The geometry stage's cache as a user meets it: a figures-only rebuild takes the geometry from the cache and
 * gives the very bytes a build without any cache gives; a damaged cache is made again, never trusted or
 * fatal; a changed geometry file is read again.
 */
class GeometryCacheTest {

    @TempDir
    Path tmp;

    private Path project;
    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @BeforeEach
    void publishOnceToFillTheCache() throws IOException {
        project = tmp.resolve("project");
        assertEquals(0, run("scaffold", project.toString()));
        ProjectFolders.settle(project);
        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("first").toString()), err.toString());
        assertTrue(cacheFiles().stream().anyMatch(f -> f.contains("-layer-")), "the layer is cached: " + cacheFiles());
        assertTrue(cacheFiles().stream().anyMatch(f -> f.contains("-planar-")), "the planar layer is cached: " + cacheFiles());
    }

    @Test
    void aFiguresOnlyRebuildUsesTheCachedGeometryAndMatchesAColdBuild() throws IOException {
        changeACell(project);
        Path cold = ProjectFolders.copyWithoutCache(project, tmp.resolve("cold-project"));
        // the cache alone can now supply the geometry: the file keeps its size and time but cannot be read
        Path geometry = project.resolve("regions/districts.geojson");
        FileTime time = Files.getLastModifiedTime(geometry);
        byte[] garbage = new byte[(int) Files.size(geometry)];
        Arrays.fill(garbage, (byte) '#');
        Files.write(geometry, garbage);
        Files.setLastModifiedTime(geometry, time);

        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("cached").toString()), err.toString());
        assertEquals(0, run("publish", cold.toString(), "--out", tmp.resolve("cold").toString()), err.toString());
        assertEquals(ProjectFolders.contents(tmp.resolve("cold")), ProjectFolders.contents(tmp.resolve("cached")));
        assertNotEquals(ProjectFolders.contents(tmp.resolve("first")).get("report.json"), ProjectFolders.contents(tmp.resolve("cached")).get("report.json"),
                "the changed figure is published");
    }

    @Test
    void theMonthlyUpdateIntoTheSameFolderMatchesAColdProjectDoingTheSame() throws IOException {
        // the second publish into a folder has a previous projection; the cache answers from the first choice
        Path cold = ProjectFolders.copyWithoutCache(project, tmp.resolve("cold-project"));
        assertEquals(0, run("publish", cold.toString(), "--out", tmp.resolve("cold").toString()), err.toString());
        deleteTree(cold.resolve(".aequa-cache"));
        changeACell(project);
        changeACell(cold);
        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("first").toString()), err.toString());
        assertEquals(0, run("publish", cold.toString(), "--out", tmp.resolve("cold").toString()), err.toString());
        assertEquals(ProjectFolders.contents(tmp.resolve("cold")), ProjectFolders.contents(tmp.resolve("first")));
    }

    @Test
    void aDamagedCacheIsMadeAgainAndNeverTrusted() throws IOException {
        for (String name : cacheFiles()) {
            Path file = project.resolve(".aequa-cache").resolve(name);
            byte[] bytes = Files.readAllBytes(file);
            if (name.contains("-layer-")) {
                Files.write(file, Arrays.copyOf(bytes, bytes.length / 2)); // truncated
            } else {
                bytes[bytes.length / 3] ^= 0x10; // one bit flipped
                Files.write(file, bytes);
            }
        }
        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("again").toString()), err.toString());
        assertEquals(ProjectFolders.contents(tmp.resolve("first")), ProjectFolders.contents(tmp.resolve("again")));
        // made again: a build with the geometry unreadable now succeeds from the repaired cache
        Path geometry = project.resolve("regions/districts.geojson");
        FileTime time = Files.getLastModifiedTime(geometry);
        Files.write(geometry, new byte[(int) Files.size(geometry)]);
        Files.setLastModifiedTime(geometry, time);
        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("repaired").toString()), err.toString());
        assertEquals(ProjectFolders.contents(tmp.resolve("first")), ProjectFolders.contents(tmp.resolve("repaired")));
    }

    @Test
    void aChangedGeometryIsReadAgain() throws IOException {
        Path geometry = project.resolve("regions/districts.geojson");
        // moves the corner the four districts share (the same point in each), keeping the coverage clean
        Files.writeString(geometry, Files.readString(geometry).replace("[11,46.0]", "[11,46.05]")
                .replace("[11.0,46]", "[11.0,46.05]").replace("[11,46.0]", "[11,46.05]"));
        Path cold = ProjectFolders.copyWithoutCache(project, tmp.resolve("cold-project"));
        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("cached").toString()), err.toString());
        assertEquals(0, run("publish", cold.toString(), "--out", tmp.resolve("cold").toString()), err.toString());
        assertEquals(ProjectFolders.contents(tmp.resolve("cold")), ProjectFolders.contents(tmp.resolve("cached")));
        assertNotEquals(ProjectFolders.contents(tmp.resolve("first")).get("report.json"), ProjectFolders.contents(tmp.resolve("cached")).get("report.json"));
    }

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    private List<String> cacheFiles() throws IOException {
        try (Stream<Path> files = Files.list(project.resolve(".aequa-cache"))) {
            return files.map(f -> f.getFileName().toString()).sorted().toList();
        }
    }

    private static void changeACell(Path dir) throws IOException {
        Path csv = dir.resolve("figures/districts.csv");
        String before = Files.readString(csv);
        Files.writeString(csv, before.replace("SE,Dunmarsh,10.4", "SE,Dunmarsh,19.4"));
        assertNotEquals(before, Files.readString(csv));
    }

    private static void deleteTree(Path root) throws IOException {
        try (Stream<Path> paths = Files.walk(root)) {
            for (Path p : paths.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
