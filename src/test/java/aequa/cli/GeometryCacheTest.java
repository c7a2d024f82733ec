package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
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
        // inputs written an hour ago, so their time stamps are settled (FileStamp.SETTLE_MILLIS)
        FileTime anHourAgo = FileTime.fromMillis(System.currentTimeMillis() - 3_600_000);
        try (Stream<Path> files = Files.walk(project)) {
            for (Path f : files.filter(Files::isRegularFile).toList()) {
                Files.setLastModifiedTime(f, anHourAgo);
            }
        }
        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("first").toString()), err.toString());
        assertTrue(cacheFiles().stream().anyMatch(f -> f.contains("-layer-")), "the layer is cached: " + cacheFiles());
        assertTrue(cacheFiles().stream().anyMatch(f -> f.contains("-planar-")), "the planar layer is cached: " + cacheFiles());
    }

    @Test
    void aFiguresOnlyRebuildUsesTheCachedGeometryAndMatchesAColdBuild() throws IOException {
        changeACell(project);
        Path cold = copyWithoutCache(project, tmp.resolve("cold-project"));
        // the cache alone can now supply the geometry: the file keeps its size and time but cannot be read
        Path geometry = project.resolve("regions/districts.geojson");
        FileTime time = Files.getLastModifiedTime(geometry);
        byte[] garbage = new byte[(int) Files.size(geometry)];
        Arrays.fill(garbage, (byte) '#');
        Files.write(geometry, garbage);
        Files.setLastModifiedTime(geometry, time);

        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("cached").toString()), err.toString());
        assertEquals(0, run("publish", cold.toString(), "--out", tmp.resolve("cold").toString()), err.toString());
        assertEquals(contents(tmp.resolve("cold")), contents(tmp.resolve("cached")));
        assertNotEquals(contents(tmp.resolve("first")).get("report.json"), contents(tmp.resolve("cached")).get("report.json"),
                "the changed figure is published");
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
        assertEquals(contents(tmp.resolve("first")), contents(tmp.resolve("again")));
        // made again: a build with the geometry unreadable now succeeds from the repaired cache
        Path geometry = project.resolve("regions/districts.geojson");
        FileTime time = Files.getLastModifiedTime(geometry);
        Files.write(geometry, new byte[(int) Files.size(geometry)]);
        Files.setLastModifiedTime(geometry, time);
        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("repaired").toString()), err.toString());
        assertEquals(contents(tmp.resolve("first")), contents(tmp.resolve("repaired")));
    }

    @Test
    void aChangedGeometryIsReadAgain() throws IOException {
        Path geometry = project.resolve("regions/districts.geojson");
        // moves the corner the four districts share (the same point in each), keeping the coverage clean
        Files.writeString(geometry, Files.readString(geometry).replace("[11,46.0]", "[11,46.05]")
                .replace("[11.0,46]", "[11.0,46.05]").replace("[11,46.0]", "[11,46.05]"));
        Path cold = copyWithoutCache(project, tmp.resolve("cold-project"));
        assertEquals(0, run("publish", project.toString(), "--out", tmp.resolve("cached").toString()), err.toString());
        assertEquals(0, run("publish", cold.toString(), "--out", tmp.resolve("cold").toString()), err.toString());
        assertEquals(contents(tmp.resolve("cold")), contents(tmp.resolve("cached")));
        assertNotEquals(contents(tmp.resolve("first")).get("report.json"), contents(tmp.resolve("cached")).get("report.json"));
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

    private static Path copyWithoutCache(Path from, Path to) throws IOException {
        try (Stream<Path> walk = Files.walk(from)) {
            for (Path p : walk.filter(p -> !p.toString().contains(".aequa-cache")).toList()) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(p, target);
                }
            }
        }
        return to;
    }

    /** Every file of a site by relative path, with its exact bytes (as ISO 8859-1 text, one char per byte). */
    private static Map<String, String> contents(Path site) throws IOException {
        Map<String, String> files = new TreeMap<>();
        try (Stream<Path> walk = Files.walk(site)) {
            for (Path p : walk.filter(Files::isRegularFile).toList()) {
                files.put(site.relativize(p).toString(), new String(Files.readAllBytes(p), StandardCharsets.ISO_8859_1));
            }
        }
        return files;
    }
}
