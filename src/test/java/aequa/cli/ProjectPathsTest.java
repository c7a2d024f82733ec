package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Project folders given as '.', as relative paths or through links, and data files that are links: paths
 * are compared as real paths, and no file outside the project is read or quoted.
 */
class ProjectPathsTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @TempDir
    Path tmp;

    private int run(String... args) {
        return Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
    }

    private Path scaffolded() {
        Path project = tmp.resolve("project");
        assertEquals(0, run("scaffold", project.toString()));
        return project;
    }

    @Test
    void auditOfTheCurrentFolderFindsItsFiles() throws Exception {
        Path project = scaffolded();
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                Main.class.getName(), "audit", ".")
                .directory(project.toFile()).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        String stderr = new String(child.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, child.waitFor(), stderr);
        assertFalse(stderr.contains("outside the project folder"), stderr);
    }

    @Test
    void anAbsolutePathInsideARelativelyGivenProjectIsAccepted() throws IOException {
        Path project = scaffolded();
        Path yaml = project.resolve("aequa.yaml");
        Path regions = project.resolve("regions/districts.geojson").toAbsolutePath();
        Files.writeString(yaml, Files.readString(yaml).replace("file: regions/districts.geojson", "file: " + regions));
        Path relative = Path.of("").toAbsolutePath().relativize(project.toAbsolutePath());
        assertEquals(0, run("audit", relative.toString()), err.toString());
    }

    @Test
    void aDataFileLinkedFromOutsideTheProjectIsRefusedAndNotQuoted() throws IOException {
        Path project = scaffolded();
        Path secret = Files.writeString(tmp.resolve("environ"), "TOKEN_6b1f0c9d2e7a4f3b8c5d1e9f0a2b4c6d=x\n");
        Path regions = project.resolve("regions/districts.geojson");
        Files.delete(regions);
        Files.createSymbolicLink(regions, secret);
        assertEquals(2, run("audit", project.toString()));
        assertTrue(err.toString().contains("is a link that leads outside the project folder"), err.toString());
        assertFalse(err.toString().contains("6b1f0c9d"), "the linked file's content was printed: " + err);
    }

    @Test
    void aProjectGivenThroughALinkStillFindsItsFiles() throws IOException {
        Path project = scaffolded();
        Path link = Files.createSymbolicLink(tmp.resolve("alias"), project);
        assertEquals(0, run("audit", link.toString()), err.toString());
    }
}
