package aequa.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The code keeps the architecture DEVELOPERS.md documents: the dependency graph and the libraries' homes
 * are read from its tables ({@link ArchitectureRules}), so the document is what this test enforces.
 */
class ArchitectureTest {

    private static ArchitectureRules documented() throws IOException {
        return ArchitectureRules.fromMarkdown(Files.readString(Path.of("DEVELOPERS.md"), StandardCharsets.UTF_8));
    }

    @Test
    void theCodeKeepsTheDocumentedGraphAndLibraryHomes() throws IOException {
        assertEquals(List.of(), documented().violations(Path.of("generator/aequa")));
    }

    @Test
    void theDocumentedGraphHasTheBoundariesTheDesignNames() throws IOException {
        ArchitectureRules rules = documented();
        // DEVELOPERS.md, "The shape of the program": the readers of regions and of figures are independent,
        // statistics never sees projected geometry, and nothing before a stage uses it
        assertFalse(rules.mayUse().get("inputs.figures").contains("inputs.regions"));
        assertFalse(rules.mayUse().get("inputs.regions").contains("inputs.figures"));
        assertFalse(rules.mayUse().get("statistics").contains("planar"));
        assertTrue(rules.mayUse().get("findings").isEmpty());
        assertEquals(List.of("inputs", "inputs.figures", "inputs.regions"),
                List.copyOf(rules.libraryHomes().get("java.sql")));
        assertFalse(rules.libraryHomes().get("com.fasterxml.jackson").contains("atlas"));
    }

    @Test
    void theGraphHasNoCycle() throws IOException {
        ArchitectureRules rules = documented();
        for (String start : rules.mayUse().keySet()) {
            java.util.Deque<String> todo = new java.util.ArrayDeque<>(rules.mayUse().get(start));
            java.util.Set<String> seen = new java.util.HashSet<>();
            while (!todo.isEmpty()) {
                String next = todo.pop();
                assertFalse(next.equals(start), "a cycle through " + start);
                if (seen.add(next)) {
                    todo.addAll(rules.mayUse().getOrDefault(next, java.util.Set.of()));
                }
            }
        }
    }
}
