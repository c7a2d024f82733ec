package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The drawing-code fingerprint follows the class files, whether they sit in a folder or a jar. */
class DrawingCodeTest {

    @TempDir
    Path dir;

    @Test
    void changesWithTheClassesAndAgreesBetweenFolderAndJar() throws IOException {
        Path folder = dir.resolve("classes");
        write(folder.resolve("aequa/drawing/Legend.class"), "legend v1");
        write(folder.resolve("aequa/drawing/Caption.class"), "caption");
        write(folder.resolve("aequa/pages/PageRenderer.class"), "not drawing code");
        String before = DrawingCode.fingerprint(folder);
        assertEquals(64, before.length());

        Path jar = dir.resolve("aequa.jar");
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(jar))) {
            for (String name : new String[] {"aequa/pages/PageRenderer.class", "aequa/drawing/Legend.class", "aequa/drawing/Caption.class"}) {
                out.putNextEntry(new JarEntry(name));
                out.write(Files.readAllBytes(folder.resolve(name)));
                out.closeEntry();
            }
        }
        assertEquals(before, DrawingCode.fingerprint(jar), "same classes, same hash, in any entry order");

        write(folder.resolve("aequa/pages/PageRenderer.class"), "changed, but not drawing code");
        assertEquals(before, DrawingCode.fingerprint(folder));
        write(folder.resolve("aequa/drawing/Legend.class"), "legend v2");
        assertNotEquals(before, DrawingCode.fingerprint(folder));
    }

    @Test
    void theRunningDrawingCodeIsFound() {
        String running = DrawingCode.fingerprint();
        assertTrue(running.matches("[0-9a-f]{64}"), running);
        assertEquals(running, DrawingCode.fingerprint());
    }

    private static void write(Path file, String content) throws IOException {
        Files.createDirectories(file.getParent());
        try (OutputStream out = Files.newOutputStream(file)) {
            out.write(content.getBytes(StandardCharsets.UTF_8));
        }
    }
}
