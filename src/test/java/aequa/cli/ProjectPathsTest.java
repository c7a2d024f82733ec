package aequa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
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

    private final CliSession cli = new CliSession();

    @TempDir
    Path tmp;

    @Test
    void auditOfTheCurrentFolderFindsItsFiles() throws Exception {
        Path project = cli.scaffold(tmp.resolve("project"));
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
        Path project = cli.scaffold(tmp.resolve("project"));
        Path yaml = project.resolve("aequa.yaml");
        Path regions = project.resolve("regions/districts.geojson").toAbsolutePath();
        Files.writeString(yaml, Files.readString(yaml).replace("file: regions/districts.geojson", "file: " + regions));
        Path relative = Path.of("").toAbsolutePath().relativize(project.toAbsolutePath());
        assertEquals(0, cli.run("audit", relative.toString()), cli.errText());
    }

    @Test
    void aDataFileLinkedFromOutsideTheProjectIsRefusedAndNotQuoted() throws IOException {
        Path project = cli.scaffold(tmp.resolve("project"));
        Path secret = Files.writeString(tmp.resolve("environ"), "TOKEN_6b1f0c9d2e7a4f3b8c5d1e9f0a2b4c6d=x\n");
        Path regions = project.resolve("regions/districts.geojson");
        Files.delete(regions);
        Files.createSymbolicLink(regions, secret);
        assertEquals(2, cli.run("audit", project.toString()));
        assertTrue(cli.errText().contains("is a link that leads outside the project folder"), cli.errText());
        assertFalse(cli.errText().contains("6b1f0c9d"), "the linked file's content was printed: " + cli.errText());
    }

    @Test
    void aProjectGivenThroughALinkStillFindsItsFiles() throws IOException {
        Path project = cli.scaffold(tmp.resolve("project"));
        Path link = Files.createSymbolicLink(tmp.resolve("alias"), project);
        assertEquals(0, cli.run("audit", link.toString()), cli.errText());
    }
}
