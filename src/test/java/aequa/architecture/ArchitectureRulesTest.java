package aequa.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Named;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@link ArchitectureRules} sees each kind of violation: a small source tree is checked clean, then one
 * violation at a time is planted in it and must be the one reported.
 */
class ArchitectureRulesTest {

    /** A three-stage graph in the form DEVELOPERS.md uses, with one library home. */
    private static final String RULES = """
            Some prose before the tables.

            | package | may use |
            |---|---|
            | `base` | |
            | `read` | `base` |
            | `read.shapes` | `base`, `read` |
            | `read.tables` | `base`, `read` |
            | `late` | `base`, `read`, `read.shapes`, `read.tables` |

            | library | prefix | home packages |
            |---|---|---|
            | Jackson | `com.fasterxml.jackson` | `read`, `read.tables` |
            | JDBC | `java.sql` | `read.tables` |
            """;

    @TempDir
    Path root;

    private void write(String pkg, String name, String body) throws IOException {
        Path dir = root.resolve(pkg.replace('.', '/'));
        Files.createDirectories(dir);
        Files.writeString(dir.resolve(name + ".java"), "package aequa." + pkg + ";\n\n" + body, StandardCharsets.UTF_8);
    }

    private List<String> violations() throws IOException {
        return ArchitectureRules.fromMarkdown(RULES).violations(root);
    }

    private void cleanTree() throws IOException {
        write("base", "Base", "public final class Base {\n}\n");
        write("read", "Reader", "import aequa.base.Base;\nimport com.fasterxml.jackson.databind.ObjectMapper;\n\n"
                + "final class Reader {\n    Base base;\n}\n");
        write("read.tables", "Table", "import java.sql.Connection;\nimport aequa.read.Reader;\n\nfinal class Table {\n}\n");
        write("read.shapes", "Shape", "final class Shape {\n    aequa.base.Base base;\n}\n");
        write("late", "Late", "import aequa.read.shapes.*;\nimport static aequa.base.Base.ORIGIN;\n\nfinal class Late {\n}\n");
    }

    @Test
    void theCleanTreePasses() throws IOException {
        cleanTree();
        assertEquals(List.of(), violations());
    }

    /** Each kind of violation: the package and source planted in the clean tree, and what the one report names. */
    static Stream<Arguments> plantedViolations() {
        return Stream.of(
                planted("an import of a later stage", "base",
                        "import aequa.late.Late;\n\nfinal class Planted {\n}\n", "'base' uses 'late'"),
                planted("a fully qualified name into a sub-package", "read.tables",
                        "final class Planted {\n    Object shape = new aequa.read.shapes . Shape();\n}\n",
                        "'read.tables' uses 'read.shapes'"),
                planted("sibling readers using each other", "read.shapes",
                        "import aequa.read.tables.*;\n\nfinal class Planted {\n}\n", "'read.shapes' uses 'read.tables'"),
                planted("a library outside its homes", "late",
                        "final class Planted {\n    com.fasterxml.jackson.databind.JsonNode node;\n}\n",
                        "com.fasterxml.jackson is used in 'late'"),
                planted("JDBC outside its homes", "read.shapes",
                        "import java.sql.DriverManager;\n\nfinal class Planted {\n}\n", "java.sql is used in 'read.shapes'"),
                planted("a package without a row", "extra", "final class Planted {\n}\n", "package 'extra' has no row"));
    }

    private static Arguments planted(String kind, String pkg, String source, String expected) {
        return Arguments.of(Named.of(kind, pkg), source, expected);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("plantedViolations")
    void eachPlantedViolationIsTheOneReported(String pkg, String source, String expected) throws IOException {
        cleanTree();
        write(pkg, "Planted", source);
        List<String> found = violations();
        assertEquals(1, found.size(), found.toString());
        assertTrue(found.get(0).contains(expected), found.get(0));
    }

    @Test
    void aRowNamingAnUnknownPackageFails() throws IOException {
        cleanTree();
        List<String> found = ArchitectureRules.fromMarkdown(RULES.replace("| `late` | `base`,", "| `late` | `bse`, `base`,"))
                .violations(root);
        assertEquals(List.of("the row of 'late' names 'bse', which has no row"), found);
    }

    @Test
    void commentsAndTextMayNameAnyPackage() throws IOException {
        cleanTree();
        write("base", "Quiet", """
                /** Read on in {@link aequa.late.Late}. */
                final class Quiet {
                    // aequa.late.Late comes later; com.fasterxml.jackson.X too
                    String name = "aequa.late.Late";
                    String block = \"""
                            aequa.late.Late and java.sql.Connection
                            \""";
                    char quote = '"';
                    /* aequa.read.Reader */
                }
                """);
        assertEquals(List.of(), violations());
    }

    @Test
    void aLostTableIsAnErrorNotAnEmptyRuleSet() {
        assertThrows(IllegalArgumentException.class,
                () -> ArchitectureRules.fromMarkdown("| package | may use |\n|---|---|\n| `a` | |\n"));
    }
}
