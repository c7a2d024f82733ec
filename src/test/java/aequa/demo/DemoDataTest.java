package aequa.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The committed demo data is exactly what the generator writes, so anyone can regenerate and review it. */
class DemoDataTest {

    @Test
    void committedDemoDataIsWhatTheGeneratorWrites(@TempDir Path fresh) throws IOException {
        DemoGenerator.write(fresh);
        List<Path> generated;
        try (Stream<Path> files = Files.walk(fresh)) {
            generated = files.filter(Files::isRegularFile).map(fresh::relativize).sorted().toList();
        }
        assertEquals(12, generated.size(), "six region files and six figure files");
        for (Path relative : generated) {
            Path committed = Path.of("data-demo").resolve(relative);
            assertTrue(Files.isRegularFile(committed), "missing in data-demo/: " + relative);
            assertArrayEquals(Files.readAllBytes(fresh.resolve(relative)), Files.readAllBytes(committed),
                    "data-demo/" + relative + " differs from the generator's output; regenerate it (DEVELOPERS.md)");
        }
    }
}
